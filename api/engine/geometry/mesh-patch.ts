import type { PointKm, RupturePlane } from '../ruptures/rupture.ts';
import { toDegrees } from '../units.ts';
import type { ContourMesh } from './contour-mesh.ts';

/**
 * Pieces of a contour mesh (contour-mesh.ts) as rupture planes: the part between two
 * along-strike and two down-dip coordinates (km), each mesh cell it covers cut at the part's
 * edges. Inside a cell a point is the bilinear blend of its four nodes, so the cut pieces of a
 * flat cell are flat and the pieces together are the cell.
 */

/**
 * Corners closer than this to the merged plane's edges and plane (10 m, km) let neighbouring
 * cells merge into one plane, so a rupture's distances move by at most this much: far below
 * what a screening resolves (ground-motion models take distances in km), and enough to merge
 * contours that are straight on the map but bend by metres in the study's projected frame
 * (a 200 km straight line drawn in another frame bends by about 1 m). Without it a planar
 * interface given as contours held 90 times the planes and screened 18 times slower
 * (npm run bench -- contoured).
 */
const MERGE_SLACK_KM = 0.01;
/** Cut positions this close (in cells) to a mesh line fall on it: no sliver cells. */
const CUT_SLACK = 1e-9;

/** Fractional index of `km` in the increasing `table` (clamped to its ends). */
function fractionalIndex(table: Float64Array, km: number): number {
  const last = table.length - 1;
  if (km <= (table[0] as number)) return 0;
  if (km >= (table[last] as number)) return last;
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((table[mid] as number) <= km) lo = mid;
    else hi = mid;
  }
  const from = table[lo] as number;
  return lo + (km - from) / ((table[hi] as number) - from);
}

/** The point at fractional row `r` and column `c` of the mesh (bilinear inside a cell). */
function meshPoint(mesh: ContourMesh, r: number, c: number): PointKm {
  const r0 = Math.min(Math.floor(r), mesh.rowCount - 2);
  const c0 = Math.min(Math.floor(c), mesh.columnCount - 2);
  const fr = r - r0;
  const fc = c - c0;
  const n = mesh.columnCount;
  const a = mesh.nodes[r0 * n + c0] as PointKm;
  const b = mesh.nodes[r0 * n + c0 + 1] as PointKm;
  const d = mesh.nodes[(r0 + 1) * n + c0] as PointKm;
  const e = mesh.nodes[(r0 + 1) * n + c0 + 1] as PointKm;
  // Written out rather than through a helper taking the coordinate's name: this runs for every
  // corner of every floating rupture.
  const top = 1 - fr;
  const left = 1 - fc;
  return {
    x: top * (left * a.x + fc * b.x) + fr * (left * d.x + fc * e.x),
    y: top * (left * a.y + fc * b.y) + fr * (left * d.y + fc * e.y),
    z: top * (left * a.z + fc * b.z) + fr * (left * d.z + fc * e.z),
  };
}

/** The point `alongKm` along strike and `downDipKm` down dip on the mesh. */
export function pointOnMesh(mesh: ContourMesh, alongKm: number, downDipKm: number): PointKm {
  return meshPoint(
    mesh,
    fractionalIndex(mesh.downDipKm, downDipKm),
    fractionalIndex(mesh.alongKm, alongKm),
  );
}

/** `from`, the mesh lines strictly between, and `to` (fractional indices). */
function cuts(from: number, to: number): number[] {
  const out = [from];
  for (let k = Math.floor(from + CUT_SLACK) + 1; k < to - CUT_SLACK; k++) out.push(k);
  out.push(Math.max(to, from));
  return out;
}

const sub = (a: PointKm, b: PointKm): PointKm => ({ x: a.x - b.x, y: a.y - b.y, z: a.z - b.z });

/** Distance from p to the segment a-b, km. */
function offSegmentKm(p: PointKm, a: PointKm, b: PointKm): number {
  const ab = sub(b, a);
  const ap = sub(p, a);
  const lengthSq = ab.x * ab.x + ab.y * ab.y + ab.z * ab.z;
  const t =
    lengthSq === 0
      ? 0
      : Math.min(1, Math.max(0, (ap.x * ab.x + ap.y * ab.y + ap.z * ab.z) / lengthSq));
  return Math.hypot(ap.x - ab.x * t, ap.y - ab.y * t, ap.z - ab.z * t);
}

/** Distance of corner 2 from the plane of corners 0, 1 and 3, km (0 for a flat quadrilateral). */
function warpKm(q: RupturePlane['corners']): number {
  const u = sub(q[1], q[0]);
  const v = sub(q[3], q[0]);
  const n = { x: u.y * v.z - u.z * v.y, y: u.z * v.x - u.x * v.z, z: u.x * v.y - u.y * v.x };
  const length = Math.hypot(n.x, n.y, n.z);
  if (length === 0) return Infinity;
  const w = sub(q[2], q[0]);
  return Math.abs(w.x * n.x + w.y * n.y + w.z * n.z) / length;
}

/**
 * Planes in a line (each sharing its end side with the next one's start side) merged into as
 * few planes as keep every corner within MERGE_SLACK_KM of them: a run merges while its
 * outline is flat and every inner corner lies on the outline's sides. `alongRow`: the planes
 * follow one another along a row (else down a column).
 */
function mergeRun(planes: readonly RupturePlane[], alongRow: boolean): RupturePlane[] {
  const out: RupturePlane[] = [];
  let start = 0;
  const outline = (first: RupturePlane, last: RupturePlane): RupturePlane['corners'] =>
    alongRow
      ? [first.corners[0], last.corners[1], last.corners[2], first.corners[3]]
      : [first.corners[0], first.corners[1], last.corners[2], last.corners[3]];
  const fits = (from: number, to: number): boolean => {
    const q = outline(planes[from] as RupturePlane, planes[to] as RupturePlane);
    if (warpKm(q) > MERGE_SLACK_KM) return false;
    for (let k = from; k < to; k++) {
      const c = (planes[k] as RupturePlane).corners;
      const [p1, p2] = alongRow ? [c[1], c[2]] : [c[3], c[2]];
      const [a1, b1, a2, b2] = alongRow ? [q[0], q[1], q[3], q[2]] : [q[0], q[3], q[1], q[2]];
      if (offSegmentKm(p1, a1, b1) > MERGE_SLACK_KM || offSegmentKm(p2, a2, b2) > MERGE_SLACK_KM)
        return false;
    }
    return true;
  };
  // The usual case first, in one pass: the whole line is one flat plane.
  if (planes.length > 1 && fits(0, planes.length - 1))
    return [
      { corners: outline(planes[0] as RupturePlane, planes[planes.length - 1] as RupturePlane) },
    ];
  for (let k = 1; k <= planes.length; k++) {
    if (k < planes.length && fits(start, k)) continue;
    const first = planes[start] as RupturePlane;
    const last = planes[k - 1] as RupturePlane;
    out.push(start === k - 1 ? first : { corners: outline(first, last) });
    start = k;
  }
  return out;
}

/** A piece of a mesh as planes: rows from the top down, each along strike. */
export interface MeshPatch {
  readonly planes: RupturePlane[];
  /** How many leading planes make the top row, whose top edges are the piece's top trace. */
  readonly tracePlanes: number;
}

/**
 * The part of `mesh` between `alongKm` and `downDipKm` (km): its cells cut at the part's
 * edges, neighbours along a row merged where they are one flat plane (mergeRun), and rows
 * merged down dip where each row became one plane and they are one flat plane together.
 */
export function meshPatch(
  mesh: ContourMesh,
  alongKm: readonly [from: number, to: number],
  downDipKm: readonly [from: number, to: number],
): MeshPatch {
  const columns = cuts(
    fractionalIndex(mesh.alongKm, alongKm[0]),
    fractionalIndex(mesh.alongKm, alongKm[1]),
  );
  const rows = cuts(
    fractionalIndex(mesh.downDipKm, downDipKm[0]),
    fractionalIndex(mesh.downDipKm, downDipKm[1]),
  );
  const grid = rows.map((r) => columns.map((c) => meshPoint(mesh, r, c)));
  const rowPlanes: RupturePlane[][] = [];
  for (let i = 1; i < grid.length; i++) {
    const top = grid[i - 1] as PointKm[];
    const bottom = grid[i] as PointKm[];
    const cells: RupturePlane[] = [];
    for (let j = 1; j < top.length; j++)
      cells.push({
        corners: [
          top[j - 1] as PointKm,
          top[j] as PointKm,
          bottom[j] as PointKm,
          bottom[j - 1] as PointKm,
        ],
      });
    rowPlanes.push(mergeRun(cells, true));
  }
  if (rowPlanes.every((row) => row.length === 1)) {
    const planes = mergeRun(
      rowPlanes.map((row) => row[0] as RupturePlane),
      false,
    );
    return { planes, tracePlanes: 1 };
  }
  return { planes: rowPlanes.flat(), tracePlanes: (rowPlanes[0] as RupturePlane[]).length };
}

/** Area-weighted mean dip of planes, degrees (each plane's dip from its normal). */
export function meanDipDeg(planes: readonly RupturePlane[]): number {
  let weighted = 0;
  let total = 0;
  for (const { corners: q } of planes) {
    const u = sub(q[2], q[0]);
    const v = sub(q[3], q[1]);
    const n = { x: u.y * v.z - u.z * v.y, y: u.z * v.x - u.x * v.z, z: u.x * v.y - u.y * v.x };
    const length = Math.hypot(n.x, n.y, n.z);
    if (length === 0) continue;
    weighted += length * Math.acos(Math.min(1, Math.abs(n.z) / length));
    total += length;
  }
  return total > 0 ? toDegrees(weighted / total) : 90;
}

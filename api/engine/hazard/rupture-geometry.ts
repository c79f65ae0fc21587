import { PLANE_STRIDE, type RuptureTable } from './rupture-table.ts';

/**
 * The numbers of a rupture table's planes that do not depend on the site, worked out once for
 * the fast path's distances (site-distances.ts), and a bounding circle per rupture for its
 * early cut-off.
 */

// Layout of one plane in RuptureGeometry.planes, the numbers read for every pair: corner c0,
// then for a plane that is a rectangle (as every fault-surface.ts plane is) the closed-form
// distances' axes (the site in the rectangle's own axes, clamped to its sides), then the top
// edge for GC2. A plane that is not a rectangle is measured by the quadrilateral tests of
// geometry/plane-distance.ts from RuptureGeometry.quads.
export const ORIGIN = 0; // c0: x, y, z
export const RECT = 3; // flag, unit axes û (c0 → c1), v̂ (c0 → c3), n̂, then the side lengths
export const RECT_XY = 15; // the surface projection, when a rectangle too (maybe of zero width: a vertical plane): flag, unit axes, side lengths
export const TOP = 22; // top edge c0 → c1 in the horizontal: length l and unit direction sx, sy
export const PLANE_FIELDS = 25;
// Layout of one plane in RuptureGeometry.quads (read only for planes that are not rectangles).
export const CORNERS = 0; // c0 .. c3: x, y, z each
export const NORMAL = 12; // n = (c1 − c0) × (c3 − c0): x, y, z, then |n|
export const EDGE_NORMAL = 16; // n × (c[k+1] − c[k]) for the four edges, 3 each
export const EDGE = 28; // c[k+1] − c[k], 3 each
export const EDGE_LENGTH_SQ = 40; // |edge|², 4
export const EDGE_LENGTH_SQ_XY = 44; // |edge projected|², 4
// 48 numbers per plane in all.

/**
 * Slack on a plane's box, km: far above the rounding of the distances measured to the plane (about
 * 1e-12 km at 1,000 km), so a box farther than the nearest plane found so far is truly farther.
 */
const BOX_SLACK_KM = 1e-6;

/** Relative slack of the rectangle tests: corners off a rectangle by less than this share of its size are rounding. */
const RECTANGLE_SLACK = 1e-9;

/** Site-independent geometry of a table's ruptures. */
export interface RuptureGeometry {
  readonly table: RuptureTable;
  /** PLANE_FIELDS numbers per plane (the layout above). */
  readonly planes: Float64Array;
  /** Where each plane's 48 numbers start in `quads`, or −1 for a rectangle, which needs none. */
  readonly quadStart: Int32Array;
  readonly quads: Float64Array;
  /** Centre x, y and radius (km) of a circle holding each rupture's surface projection. */
  readonly bounds: Float64Array;
  /**
   * Per plane, a box (min x, y, z, then max x, y, z; km) holding every point its Rrup or Rjb can
   * be measured to: its corners, widened by how far corner c2 lies off the plane of c0, c1 and
   * c3 (the quadrilateral tests measure a plane's inside from that plane) and by BOX_SLACK_KM.
   * A site farther from the box than from a plane already measured needs no more of this one.
   */
  readonly planeBox: Float64Array;
}

export function ruptureGeometry(table: RuptureTable): RuptureGeometry {
  const planeCount = table.planeStart[table.count] as number;
  const planes = new Float64Array(planeCount * PLANE_FIELDS);
  const quadStart = new Int32Array(planeCount).fill(-1);
  const c = table.planeCorners;
  const quadList: number[] = [];
  const planeBox = new Float64Array(planeCount * 6);
  for (let p = 0; p < planeCount; p++) {
    const at = p * PLANE_FIELDS;
    const cAt = p * PLANE_STRIDE;
    const x0 = c[cAt] as number,
      y0 = c[cAt + 1] as number,
      z0 = c[cAt + 2] as number;
    const ux = (c[cAt + 3] as number) - x0,
      uy = (c[cAt + 4] as number) - y0,
      uz = (c[cAt + 5] as number) - z0;
    const vx = (c[cAt + 9] as number) - x0,
      vy = (c[cAt + 10] as number) - y0,
      vz = (c[cAt + 11] as number) - z0;
    const nx = uy * vz - uz * vy,
      ny = uz * vx - ux * vz,
      nz = ux * vy - uy * vx;
    const warpKm =
      nx === 0 && ny === 0 && nz === 0
        ? 0
        : Math.abs(
            ((c[cAt + 6] as number) - x0) * nx +
              ((c[cAt + 7] as number) - y0) * ny +
              ((c[cAt + 8] as number) - z0) * nz,
          ) / Math.sqrt(nx * nx + ny * ny + nz * nz);
    planeBounds(planeBox, p, c, cAt, warpKm + BOX_SLACK_KM);
    planes[at + ORIGIN] = x0;
    planes[at + ORIGIN + 1] = y0;
    planes[at + ORIGIN + 2] = z0;
    // As geometry/gc2.ts measures a top edge (Math.hypot there too, so the lengths agree exactly).
    const l = Math.hypot(ux, uy);
    planes[at + TOP] = l;
    planes[at + TOP + 1] = l === 0 ? 0 : ux / l;
    planes[at + TOP + 2] = l === 0 ? 0 : uy / l;
    if (rectangleAxes(planes, at, c, cAt, ux, uy, uz, vx, vy, vz, nx, ny, nz)) continue;
    quadStart[p] = quadList.length;
    for (let i = 0; i < PLANE_STRIDE; i++) quadList.push(c[cAt + i] as number);
    quadList.push(nx, ny, nz, Math.sqrt(nx * nx + ny * ny + nz * nz));
    const edges: number[] = [];
    const edgeNormals: number[] = [];
    const lengths: number[] = [];
    const lengthsXY: number[] = [];
    for (let k = 0; k < 4; k++) {
      const a = cAt + 3 * k,
        b = cAt + 3 * ((k + 1) % 4);
      const ex = (c[b] as number) - (c[a] as number),
        ey = (c[b + 1] as number) - (c[a + 1] as number),
        ez = (c[b + 2] as number) - (c[a + 2] as number);
      edgeNormals.push(ny * ez - nz * ey, nz * ex - nx * ez, nx * ey - ny * ex);
      edges.push(ex, ey, ez);
      lengths.push(ex * ex + ey * ey + ez * ez);
      lengthsXY.push(ex * ex + ey * ey);
    }
    quadList.push(...edgeNormals, ...edges, ...lengths, ...lengthsXY);
  }

  const bounds = new Float64Array(table.count * 3);
  for (let i = 0; i < table.count; i++) {
    const first = table.planeStart[i] as number;
    const last = table.planeStart[i + 1] as number;
    if (first === last) {
      bounds[3 * i] = table.hypocentre[3 * i] as number;
      bounds[3 * i + 1] = table.hypocentre[3 * i + 1] as number;
      continue;
    }
    let sx = 0,
      sy = 0;
    for (let q = first * PLANE_STRIDE; q < last * PLANE_STRIDE; q += 3) {
      sx += c[q] as number;
      sy += c[q + 1] as number;
    }
    const corners = 4 * (last - first);
    const cx = sx / corners,
      cy = sy / corners;
    let radiusSq = 0;
    for (let q = first * PLANE_STRIDE; q < last * PLANE_STRIDE; q += 3) {
      const dx = (c[q] as number) - cx,
        dy = (c[q + 1] as number) - cy;
      radiusSq = Math.max(radiusSq, dx * dx + dy * dy);
    }
    bounds[3 * i] = cx;
    bounds[3 * i + 1] = cy;
    bounds[3 * i + 2] = Math.sqrt(radiusSq);
  }
  return { table, planes, quadStart, quads: Float64Array.from(quadList), bounds, planeBox };
}

/** Writes plane p's box, its corners' extent widened by slackKm, to box at 6p. */
function planeBounds(
  box: Float64Array,
  p: number,
  c: Float64Array,
  cAt: number,
  slackKm: number,
): void {
  for (let axis = 0; axis < 3; axis++) {
    let min = Infinity,
      max = -Infinity;
    for (let k = 0; k < 4; k++) {
      const v = c[cAt + 3 * k + axis] as number;
      min = Math.min(min, v);
      max = Math.max(max, v);
    }
    box[6 * p + axis] = min - slackKm;
    box[6 * p + 3 + axis] = max + slackKm;
  }
}

/**
 * Fills the RECT and RECT_XY fields of one plane (u = c1 − c0, v = c3 − c0, n = u × v); true
 * when both apply, so the plane needs no quadrilateral tests.
 */
function rectangleAxes(
  planes: Float64Array,
  at: number,
  c: Float64Array,
  cAt: number,
  ux: number,
  uy: number,
  uz: number,
  vx: number,
  vy: number,
  vz: number,
  nx: number,
  ny: number,
  nz: number,
): boolean {
  const lu = Math.sqrt(ux * ux + uy * uy + uz * uz);
  const lv = Math.sqrt(vx * vx + vy * vy + vz * vz);
  const ln = Math.sqrt(nx * nx + ny * ny + nz * nz);
  const size = lu + lv;
  // c2 must be c0 + u + v, and u ⟂ v.
  const gap =
    Math.abs((c[cAt + 6] as number) - (c[cAt] as number) - ux - vx) +
    Math.abs((c[cAt + 7] as number) - (c[cAt + 1] as number) - uy - vy) +
    Math.abs((c[cAt + 8] as number) - (c[cAt + 2] as number) - uz - vz);
  const parallelogram = size > 0 && gap <= RECTANGLE_SLACK * size;
  if (!(
    parallelogram &&
    lu > 0 &&
    lv > 0 &&
    Math.abs(ux * vx + uy * vy + uz * vz) <= RECTANGLE_SLACK * lu * lv
  ))
    return false;
  // The projection: û₂ along the projected u, ŵ₂ perpendicular to it on the side v points to (either side when v projects to nothing).
  const lu2 = Math.sqrt(ux * ux + uy * uy);
  const lv2 = Math.sqrt(vx * vx + vy * vy);
  if (lu2 === 0 || Math.abs(ux * vx + uy * vy) > RECTANGLE_SLACK * lu2 * Math.max(lv2, lu2))
    return false;
  planes.set(
    [1, ux / lu, uy / lu, uz / lu, vx / lv, vy / lv, vz / lv, nx / ln, ny / ln, nz / ln, lu, lv],
    at + RECT,
  );
  const ax = ux / lu2,
    ay = uy / lu2;
  const side = ax * vy - ay * vx >= 0 ? 1 : -1;
  planes.set([1, ax, ay, -ay * side, ax * side, lu2, lv2], at + RECT_XY);
  return true;
}

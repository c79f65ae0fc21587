import type { PointKm } from '../ruptures/rupture.ts';
import type { PointXY } from './projection.ts';

/** One depth contour in the local frame: its points (km) and its depth (km). */
export interface DepthContour {
  readonly depthKm: number;
  readonly points: readonly PointXY[];
}

/**
 * A surface meshed between its depth contours, in the local frame (km): nodes on a grid of
 * rows (down dip, row 0 on the first contour) and columns (along strike), row-major.
 *
 * How it is built (the rules a user can predict):
 * - every contour is resampled to the same number of nodes at equal fractions of its own
 *   length, so contours of different lengths join proportionally (the node a third of the way
 *   along one contour joins the node a third of the way along the next); that number is one
 *   more than the longest contour's length divided by the spacing, rounded up;
 * - between two neighbouring contours each column is a straight line from one contour's node
 *   to the next one's, cut into equal parts, as many as the longest such line (3-D) needs for
 *   parts no longer than the spacing; so the mesh follows the contours exactly and is straight
 *   between them.
 *
 * The along-strike coordinate of a column is the mean over rows of the distance (3-D) from
 * column 0 along each row; the down-dip coordinate of a row the mean over columns of the
 * distance down each column. On a plane given as parallel straight contours both are exact.
 */
export interface ContourMesh {
  readonly rowCount: number;
  readonly columnCount: number;
  readonly nodes: readonly PointKm[];
  /** Along-strike coordinate of each column, km (0 first). */
  readonly alongKm: Float64Array;
  /** Down-dip coordinate of each row, km (0 first). */
  readonly downDipKm: Float64Array;
  /** Sum of the cells' areas, km² (each cell as the quadrilateral of its four nodes). */
  readonly areaKm2: number;
}

/** Points at `count` equal fractions of the polyline's length, both ends included. */
export function resampleLine(points: readonly PointXY[], count: number): PointXY[] {
  const cumulative = [0];
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as PointXY;
    const b = points[i] as PointXY;
    cumulative.push((cumulative[i - 1] as number) + Math.hypot(b.x - a.x, b.y - a.y));
  }
  const total = cumulative[cumulative.length - 1] as number;
  const out: PointXY[] = [];
  let k = 1;
  for (let j = 0; j < count; j++) {
    const target = (total * j) / (count - 1);
    while (k < points.length - 1 && (cumulative[k] as number) < target) k++;
    const a = points[k - 1] as PointXY;
    const b = points[k] as PointXY;
    const from = cumulative[k - 1] as number;
    const span = (cumulative[k] as number) - from;
    const f = span > 0 ? Math.min(1, Math.max(0, (target - from) / span)) : 0;
    out.push({ x: a.x + (b.x - a.x) * f, y: a.y + (b.y - a.y) * f });
  }
  return out;
}

const lineLengthKm = (points: readonly PointXY[]): number =>
  points.reduce(
    (sum, p, i) =>
      i === 0
        ? 0
        : sum + Math.hypot(p.x - (points[i - 1] as PointXY).x, p.y - (points[i - 1] as PointXY).y),
    0,
  );

const distanceKm = (a: PointKm, b: PointKm): number => Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);

/** Area of the quadrilateral a-b-c-d (km²): half the cross product of its diagonals, exact when planar. */
export function quadAreaKm2(a: PointKm, b: PointKm, c: PointKm, d: PointKm): number {
  const p = { x: c.x - a.x, y: c.y - a.y, z: c.z - a.z };
  const q = { x: d.x - b.x, y: d.y - b.y, z: d.z - b.z };
  return 0.5 * Math.hypot(p.y * q.z - p.z * q.y, p.z * q.x - p.x * q.z, p.x * q.y - p.y * q.x);
}

/**
 * The mesh of the surface through `contours` (at least two, in order down dip, running the
 * same way, depths increasing; the study schema checks this) with cell sides no longer than
 * `spacingKm`.
 */
export function contourMesh(contours: readonly DepthContour[], spacingKm: number): ContourMesh {
  const longest = Math.max(...contours.map((c) => lineLengthKm(c.points)));
  const columnCount = Math.max(2, Math.ceil(longest / spacingKm) + 1);
  const levels = contours.map((c) =>
    resampleLine(c.points, columnCount).map((p) => ({ x: p.x, y: p.y, z: c.depthKm })),
  );
  const nodes: PointKm[] = [...(levels[0] as PointKm[])];
  for (let i = 1; i < levels.length; i++) {
    const upper = levels[i - 1] as PointKm[];
    const lower = levels[i] as PointKm[];
    const parts = Math.max(
      1,
      Math.ceil(Math.max(...upper.map((a, j) => distanceKm(a, lower[j] as PointKm))) / spacingKm),
    );
    for (let r = 1; r <= parts; r++) {
      const f = r / parts;
      upper.forEach((a, j) => {
        const b = lower[j] as PointKm;
        nodes.push({
          x: a.x + (b.x - a.x) * f,
          y: a.y + (b.y - a.y) * f,
          z: a.z + (b.z - a.z) * f,
        });
      });
    }
  }
  const rowCount = nodes.length / columnCount;
  const at = (r: number, c: number): PointKm => nodes[r * columnCount + c] as PointKm;
  const alongKm = new Float64Array(columnCount);
  for (let c = 1; c < columnCount; c++) {
    let sum = 0;
    for (let r = 0; r < rowCount; r++) sum += distanceKm(at(r, c - 1), at(r, c));
    alongKm[c] = (alongKm[c - 1] as number) + sum / rowCount;
  }
  const downDipKm = new Float64Array(rowCount);
  let areaKm2 = 0;
  for (let r = 1; r < rowCount; r++) {
    let sum = 0;
    for (let c = 0; c < columnCount; c++) sum += distanceKm(at(r - 1, c), at(r, c));
    downDipKm[r] = (downDipKm[r - 1] as number) + sum / columnCount;
    for (let c = 1; c < columnCount; c++)
      areaKm2 += quadAreaKm2(at(r - 1, c - 1), at(r - 1, c), at(r, c), at(r, c - 1));
  }
  return { rowCount, columnCount, nodes, alongKm, downDipKm, areaKm2 };
}

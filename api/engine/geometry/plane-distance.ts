import type { PointKm, RupturePlane } from '../ruptures/rupture.ts';
import type { PointXY } from './projection.ts';

/**
 * Distances from a point to one convex planar quadrilateral (a rupture plane), in 3-D and in
 * its surface projection. A point counts as inside only when it lies strictly inside every
 * edge; on an edge the edge distance (zero) answers, which also covers the degenerate,
 * zero-area projection of a vertical plane.
 */

const sub = (a: PointKm, b: PointKm): PointKm => ({ x: a.x - b.x, y: a.y - b.y, z: a.z - b.z });
const dot = (a: PointKm, b: PointKm): number => a.x * b.x + a.y * b.y + a.z * b.z;
const cross = (a: PointKm, b: PointKm): PointKm => ({
  x: a.y * b.z - a.z * b.y,
  y: a.z * b.x - a.x * b.z,
  z: a.x * b.y - a.y * b.x,
});

/** Closest point of segment a-b to p (3-D, km). */
function closestOnSegment(p: PointKm, a: PointKm, b: PointKm): PointKm {
  const ab = sub(b, a);
  const lengthSq = dot(ab, ab);
  const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, dot(sub(p, a), ab) / lengthSq));
  return { x: a.x + ab.x * t, y: a.y + ab.y * t, z: a.z + ab.z * t };
}

const distance = (a: PointKm, b: PointKm): number => Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);

/** Shortest distance from `point` to the plane's quadrilateral, km. */
export function distanceToPlaneKm(plane: RupturePlane, point: PointKm): number {
  const c = plane.corners;
  const normal = cross(sub(c[1], c[0]), sub(c[3], c[0]));
  const normalLength = Math.hypot(normal.x, normal.y, normal.z);
  if (normalLength > 0) {
    let positive = 0;
    for (let k = 0; k < 4; k++) {
      const a = c[k] as PointKm;
      const b = c[(k + 1) % 4] as PointKm;
      if (dot(cross(sub(b, a), sub(point, a)), normal) > 0) positive++;
    }
    if (positive === 4) return Math.abs(dot(sub(point, c[0]), normal)) / normalLength;
  }
  let best = Infinity;
  for (let k = 0; k < 4; k++) {
    const a = c[k] as PointKm;
    const b = c[(k + 1) % 4] as PointKm;
    best = Math.min(best, distance(point, closestOnSegment(point, a, b)));
  }
  return best;
}

/** Closest point of the plane's surface projection to `site`, and the distance to it, km. */
export function closestPointOnProjection(
  plane: RupturePlane,
  site: PointXY,
): { readonly point: PointXY; readonly distanceKm: number } {
  const p: PointKm = { x: site.x, y: site.y, z: 0 };
  const c = plane.corners.map((q) => ({ x: q.x, y: q.y, z: 0 }));
  let positive = 0;
  let negative = 0;
  for (let k = 0; k < 4; k++) {
    const a = c[k] as PointKm;
    const b = c[(k + 1) % 4] as PointKm;
    const side = (b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x);
    if (side > 0) positive++;
    else if (side < 0) negative++;
  }
  if (positive === 4 || negative === 4) return { point: { x: site.x, y: site.y }, distanceKm: 0 };
  let best: PointKm = c[0] as PointKm;
  let bestKm = Infinity;
  for (let k = 0; k < 4; k++) {
    const q = closestOnSegment(p, c[k] as PointKm, c[(k + 1) % 4] as PointKm);
    const d = distance(p, q);
    if (d < bestKm) {
      bestKm = d;
      best = q;
    }
  }
  return { point: { x: best.x, y: best.y }, distanceKm: bestKm };
}

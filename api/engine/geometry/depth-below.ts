import type { RupturePlane } from '../ruptures/rupture.ts';
import { closestPointOnProjection } from './plane-distance.ts';
import type { PointXY } from './projection.ts';

/**
 * Depth of a plane's flat extension at `site`'s x and y, km, or undefined for a vertical plane.
 * The plane through corner 0 with normal n holds the points with n · (p − c0) = 0; solved for z.
 */
function planeDepthAtKm(plane: RupturePlane, site: PointXY): number | undefined {
  const [c0, c1, , c3] = plane.corners;
  const u = { x: c1.x - c0.x, y: c1.y - c0.y, z: c1.z - c0.z };
  const v = { x: c3.x - c0.x, y: c3.y - c0.y, z: c3.z - c0.z };
  const n = { x: u.y * v.z - u.z * v.y, y: u.z * v.x - u.x * v.z, z: u.x * v.y - u.y * v.x };
  if (Math.abs(n.z) < 1e-9 * Math.hypot(n.x, n.y, n.z)) return undefined;
  return c0.z - (n.x * (site.x - c0.x) + n.y * (site.y - c0.y)) / n.z;
}

/** Depth of a plane straight below `site`, km, or undefined when the site is not above it (or the plane is vertical). */
export function depthBelowPlaneKm(plane: RupturePlane, site: PointXY): number | undefined {
  if (closestPointOnProjection(plane, site).distanceKm > 0) return undefined;
  return planeDepthAtKm(plane, site);
}

/**
 * Depth of a surface (its planes) under `site`, km: the shallowest plane straight below it; off
 * the surface's projection, the depth at the nearest point of it (the surface's edge carried
 * out flat), so a cell beyond a slab's mapped edge takes the edge's depth. Undefined only when
 * every plane is vertical.
 */
export function depthUnderKm(planes: readonly RupturePlane[], site: PointXY): number | undefined {
  let shallowest: number | undefined;
  let nearest = { plane: planes[0], point: site, distanceKm: Infinity };
  for (const plane of planes) {
    const closest = closestPointOnProjection(plane, site);
    if (closest.distanceKm === 0) {
      const depth = planeDepthAtKm(plane, site);
      if (depth !== undefined && (shallowest === undefined || depth < shallowest))
        shallowest = depth;
    } else if (closest.distanceKm < nearest.distanceKm)
      nearest = { plane, point: closest.point, distanceKm: closest.distanceKm };
  }
  if (shallowest !== undefined || !nearest.plane) return shallowest;
  return planeDepthAtKm(nearest.plane, nearest.point);
}

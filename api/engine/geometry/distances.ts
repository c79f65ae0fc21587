import { TremoraError } from '../errors.ts';
import type { DistanceContext } from '../motion/types.ts';
import type { PointKm, RuptureSurface } from '../ruptures/rupture.ts';
import { ry0FromU, traceCoordinates } from './gc2.ts';
import { closestPointOnProjection, distanceToPlaneKm } from './plane-distance.ts';
import type { PointXY } from './projection.ts';

/**
 * Source-to-site distances (km) of one rupture for a site at the ground surface, `site` in the
 * local frame. Definitions as in the NGA-West2 flatfile (Ancheta et al. 2014, from memory).
 *
 * Planar ruptures: Rjb and Rrup are the minima over the rupture's planes (on a contoured
 * fault, its mesh cells); Rx and Ry0 come from the GC2 coordinates of the top edges of its top
 * row of planes taken together (gc2.ts, Spudich & Chiou 2015),
 * which on a single plane are exactly the usual definitions; Rhypo and Repi are to the
 * hypocentre and the point above it.
 *
 * Point ruptures (zone cells and point sources), common practice: Rjb = Repi and
 * Rrup = Rhypo; Rx = -Repi, which puts every site on the footwall so no hanging-wall term
 * switches on; Ry0 = 0. A point has no extent, so for large magnitudes (above about M 6, where
 * ruptures reach tens of km) near sites are farther from it than from the real rupture and the
 * shaking there is underestimated; faults should carry the large events.
 */
export function ruptureDistances(surface: RuptureSurface, site: PointXY): DistanceContext {
  const h = surface.hypocentre;
  const repiKm = Math.hypot(site.x - h.x, site.y - h.y);
  const rhypoKm = Math.hypot(repiKm, h.z);
  if (surface.kind === 'point')
    return { rjbKm: repiKm, rrupKm: rhypoKm, rxKm: -repiKm, ry0Km: 0, rhypoKm, repiKm };

  if (surface.planes.length === 0)
    throw new TremoraError('a planar rupture surface needs at least one plane, got none');
  const atSurface: PointKm = { x: site.x, y: site.y, z: 0 };
  let rjbKm = Infinity;
  let rrupKm = Infinity;
  for (const plane of surface.planes) {
    rjbKm = Math.min(rjbKm, closestPointOnProjection(plane, site).distanceKm);
    rrupKm = Math.min(rrupKm, distanceToPlaneKm(plane, atSurface));
  }
  const topEdges = surface.planes
    .slice(0, surface.tracePlanes ?? surface.planes.length)
    .map((p) => [p.corners[0], p.corners[1]] as const);
  const { tKm, uKm, lengthKm } = traceCoordinates(topEdges, site);
  return { rjbKm, rrupKm, rxKm: tKm, ry0Km: ry0FromU(uKm, lengthKm), rhypoKm, repiKm };
}

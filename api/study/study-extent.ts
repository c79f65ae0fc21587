import * as turf from '@turf/turf';
import { frameForStudy } from '../engine/geometry/projection.ts';
import type { Community, LonLat, Source } from '../engine/model.ts';
import type { IssueList } from './issues.ts';

/**
 * Farthest a community, source vertex or outline vertex may lie from the centre of the
 * study's local frame, km. The frame is one azimuthal equidistant projection
 * (engine/geometry/projection.ts) whose scale across the radius grows as c / sin c, c the
 * angular distance from the centre (Snyder 1987, from memory): 1.7% at 2,000 km (c = 18°),
 * a few hundred metres on a 20 km site-to-source distance out there, while beyond a
 * hemisphere points vanish or become infinite. A study wider than this is refused, naming
 * its extent; a screening concerns sources within a few hundred km of its communities, so
 * a wider one is better split into studies of one region each.
 */
export const MAX_FRAME_RADIUS_KM = 2_000;

/** Half the circumference of turf's sphere (mean Earth radius 6371.0088 km), km. */
const HALF_CIRCUMFERENCE_KM = Math.PI * 6371.0088;

/**
 * Refuses a study whose points lie more than MAX_FRAME_RADIUS_KM from the centre of its
 * frame (turf's spherical distance), naming the farthest point, the extent and the limit.
 */
export function checkStudyExtent(
  communities: readonly Community[],
  sources: readonly Source[],
  outline: readonly (readonly LonLat[])[] | undefined,
  issues: IssueList,
): void {
  if (communities.length === 0 && sources.length === 0) return;
  const centre = frameForStudy({ communities, sources }).origin;
  let farthest = { km: 0, path: [] as (string | number)[] };
  const consider = (point: LonLat, path: (string | number)[]) => {
    // turf's haversine (spherical) gives NaN at the exact antipode, where rounding puts its
    // argument a hair past 1: that point is half the Earth's circumference away.
    const haversineKm = turf.distance([centre[0], centre[1]], [point[0], point[1]], {
      units: 'kilometers',
    });
    const km = Number.isFinite(haversineKm) ? haversineKm : HALF_CIRCUMFERENCE_KM;
    if (km > farthest.km) farthest = { km, path };
  };
  communities.forEach((c, i) => consider([c.lon, c.lat], ['communities', i]));
  sources.forEach((source, i) => {
    const path = ['sources', 'features', i, 'geometry', 'coordinates'];
    if (source.kind === 'fault')
      (source.contours?.lines.flat() ?? source.trace).forEach((p) => consider(p, path));
    else if (source.kind === 'zone')
      source.rings.forEach((ring) => ring.forEach((p) => consider(p, path)));
    else consider(source.location, path);
  });
  outline?.forEach((ring) => ring.forEach((p) => consider(p, ['outline'])));
  if (farthest.km <= MAX_FRAME_RADIUS_KM) return;
  issues.add(
    farthest.path,
    `the study spans about ${Math.round(2 * farthest.km)} km: this point is ${Math.round(farthest.km)} km from the study's centre ` +
      `[${centre[0].toFixed(2)}, ${centre[1].toFixed(2)}], over the limit of ${MAX_FRAME_RADIUS_KM} km from it; ` +
      'expected a study of one region: split it into studies whose communities and sources lie close together',
  );
}

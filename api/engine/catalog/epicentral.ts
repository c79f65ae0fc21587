import geodesic from 'geographiclib-geodesic';
import { normaliseAzimuthDeg } from '../units.ts';

/**
 * Distance and direction between two epicentres on the WGS84 ellipsoid, by Karney (2013),
 * "Algorithms for geodesics", J. Geodesy 87, through geographiclib-geodesic (accurate to
 * nanometres; a pure library, so the engine may use it).
 */
const WGS84 = geodesic.Geodesic.WGS84;

export interface EpicentralPath {
  readonly distanceKm: number;
  /** Azimuth at the first point towards the second, degrees clockwise from north, [0, 360). */
  readonly azimuthDeg: number;
}

/** Geodesic distance (km) and azimuth (deg) from (lon1, lat1) to (lon2, lat2), degrees in. */
export function epicentralPath(
  lon1: number,
  lat1: number,
  lon2: number,
  lat2: number,
): EpicentralPath {
  const r = WGS84.Inverse(lat1, lon1, lat2, lon2);
  return { distanceKm: (r.s12 ?? 0) / 1000, azimuthDeg: normaliseAzimuthDeg(r.azi1 ?? 0) };
}

/** Geodesic distance between epicentres, km. */
export const epicentralDistanceKm = (
  lon1: number,
  lat1: number,
  lon2: number,
  lat2: number,
): number => epicentralPath(lon1, lat1, lon2, lat2).distanceKm;

/**
 * Shortest length of one degree of latitude on WGS84 (the meridian at the equator, a(1 − e²)
 * per radian = 110.574 km per degree), rounded down: two epicentres |Δlat| degrees apart are at
 * least this many km per degree apart, which lets a search skip far pairs before the geodesic.
 */
export const MIN_KM_PER_DEGREE_LATITUDE = 110.5;

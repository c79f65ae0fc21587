import { compassPoint, type Compass } from '../../api/engine/catalog/felt-history.ts';

/**
 * Directions in words use the eight compass points (N, NE, E, SE, S, SW, W, NW), each the
 * nearest to the bearing: 45° sectors centred on the points, a bearing on a boundary (22.5°)
 * going clockwise. The engine's felt history names its directions the same way
 * (api/engine/catalog/felt-history.ts compassPoint), so one rule serves both.
 */
export type { Compass };

/** Distances under this are said as "under 1 km", where a direction means little. */
export const NEAR_KM = 1;

export type PlaceFrom =
  | { readonly kind: 'here' }
  | { readonly kind: 'away'; readonly distanceKm: number; readonly compass: Compass };

/**
 * Where something is from a community: "here" under NEAR_KM (a fault beneath the place), or a
 * whole number of km (rounded to the nearest km) and the compass point towards it.
 */
export function placeFrom(distanceKm: number, bearingDeg: number): PlaceFrom {
  if (!(Number.isFinite(distanceKm) && distanceKm >= 0)) throw new RangeError(`expected a distance >= 0 km, got ${distanceKm}`);
  if (!Number.isFinite(bearingDeg)) throw new RangeError(`expected a bearing in degrees, got ${bearingDeg}`);
  if (distanceKm < NEAR_KM) return { kind: 'here' };
  return { kind: 'away', distanceKm: Math.round(distanceKm), compass: compassPoint(bearingDeg) };
}

export { compassPoint };

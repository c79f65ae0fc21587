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
  | { readonly kind: 'beside' }
  | { readonly kind: 'below'; readonly depthKm: number }
  | { readonly kind: 'away'; readonly distanceKm: number; readonly compass: Compass };

/**
 * A depth as said: to the nearest km under 20 km, to the nearest 5 km from 20 km (a fault's
 * depth is known to a few km at best; common practice).
 */
export function roundDepthKm(depthKm: number): number {
  return depthKm < 20 ? Math.round(depthKm) : 5 * Math.round(depthKm / 5);
}

/**
 * Where something is from a community. "Below" and "here" are said only of what lies truly under
 * the place (a horizontal distance of 0: the place stands over the surface or on its trace):
 * "below" at its depth when that is known and said as 1 km or more, else "here". Under NEAR_KM
 * away it is "beside" the place, never under it; further away, a whole number of km (rounded to
 * the nearest km) and the compass point towards it.
 */
export function placeFrom(
  distanceKm: number,
  bearingDeg: number,
  depthBelowKm?: number,
): PlaceFrom {
  if (!(Number.isFinite(distanceKm) && distanceKm >= 0))
    throw new RangeError(`expected a distance >= 0 km, got ${distanceKm}`);
  if (!Number.isFinite(bearingDeg))
    throw new RangeError(`expected a bearing in degrees, got ${bearingDeg}`);
  if (distanceKm === 0) {
    if (
      depthBelowKm !== undefined &&
      Number.isFinite(depthBelowKm) &&
      roundDepthKm(depthBelowKm) >= 1
    )
      return { kind: 'below', depthKm: roundDepthKm(depthBelowKm) };
    return { kind: 'here' };
  }
  if (distanceKm < NEAR_KM) return { kind: 'beside' };
  return { kind: 'away', distanceKm: Math.round(distanceKm), compass: compassPoint(bearingDeg) };
}

export { compassPoint };

import { createLocalFrame } from '../geometry/projection.ts';
import type { Community } from '../model.ts';
import { elevationSampler, type ElevationGrid } from '../terrain/elevation-grid.ts';
import { normaliseAzimuthDeg, toDegrees } from '../units.ts';

/** Height above sea level counted as high ground when the user sets none, m (our default, a common planning figure; local plans decide). */
export const DEFAULT_HIGH_GROUND_M = 30;

/** Farthest the search goes from a community, km; beyond a walk of about four hours at the pace below. */
export const HIGH_GROUND_SEARCH_KM = 15;

/** Spacing of the search rings and of the points on each, km: the distance is good to about this. */
export const HIGH_GROUND_STEP_KM = 0.05;

/**
 * Walking pace for the time to high ground, m/s: the slow walk of Wood & Schmidtlein (2012,
 * "Anisotropic path modeling to assess pedestrian-evacuation potential from Cascadia-related
 * tsunamis in the US Pacific Northwest", Natural Hazards 62:275–300), about 1.1 m/s (from
 * memory). A slow pace, because the old, the young and the injured set the pace of a village.
 */
export const SLOW_WALK_MS = 1.1;

export type HighGround =
  | {
      readonly kind: 'already-above';
      readonly heightM: number;
      readonly elevationM: number;
      readonly basis: 'community' | 'terrain';
    }
  | {
      readonly kind: 'found';
      readonly heightM: number;
      /** Straight-line distance, km; paths and roads are longer. */
      readonly distanceKm: number;
      /** Direction from the community, degrees clockwise from north. */
      readonly bearingDeg: number;
      /** distanceKm at SLOW_WALK_MS, whole minutes rounded up. */
      readonly walkingMinutes: number;
      readonly lon: number;
      readonly lat: number;
      readonly elevationM: number;
    }
  | { readonly kind: 'none'; readonly heightM: number; readonly searchKm: number };

/**
 * The nearest ground at or above `heightM` from a community, over the terrain (bilinear): rings
 * of HIGH_GROUND_STEP_KM round the community in its own azimuthal equidistant frame (so the
 * distance and direction are true), the first ring with such ground wins, the highest point of
 * it taken. The community's own `elevationM`, when given, says whether it already stands there
 * (the terrain's value at its position otherwise).
 */
export function highGround(
  grid: ElevationGrid,
  community: Community,
  heightM: number = DEFAULT_HIGH_GROUND_M,
): HighGround {
  const sample = elevationSampler(grid);
  const here = community.elevationM ?? sample([community.lon, community.lat]);
  if (here !== null && here >= heightM) {
    return {
      kind: 'already-above',
      heightM,
      elevationM: here,
      basis: community.elevationM === undefined ? 'terrain' : 'community',
    };
  }
  const frame = createLocalFrame([community.lon, community.lat]);
  const rings = Math.ceil(HIGH_GROUND_SEARCH_KM / HIGH_GROUND_STEP_KM);
  for (let k = 1; k <= rings; k += 1) {
    const radiusKm = k * HIGH_GROUND_STEP_KM;
    const points = Math.ceil((2 * Math.PI * radiusKm) / HIGH_GROUND_STEP_KM);
    let best: { z: number; angle: number } | undefined;
    for (let j = 0; j < points; j += 1) {
      const angle = (2 * Math.PI * j) / points;
      const z = sample(
        frame.toLonLat({ x: radiusKm * Math.sin(angle), y: radiusKm * Math.cos(angle) }),
      );
      if (z !== null && z >= heightM && (best === undefined || z > best.z)) best = { z, angle };
    }
    if (best) {
      const [lon, lat] = frame.toLonLat({
        x: radiusKm * Math.sin(best.angle),
        y: radiusKm * Math.cos(best.angle),
      });
      return {
        kind: 'found',
        heightM,
        distanceKm: radiusKm,
        bearingDeg: normaliseAzimuthDeg(toDegrees(best.angle)),
        walkingMinutes: Math.ceil((radiusKm * 1000) / SLOW_WALK_MS / 60),
        lon,
        lat,
        elevationM: best.z,
      };
    }
  }
  return { kind: 'none', heightM, searchKm: HIGH_GROUND_SEARCH_KM };
}

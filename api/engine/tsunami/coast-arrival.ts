import type { PointXY } from '../geometry/projection.ts';
import { cellCentre, cellsWithin, type MetricGrid } from './metric-grid.ts';

/**
 * A coastal community must have sea on the terrain grid within this distance, km; farther, it
 * is not where the grid says the coast is (a wrong position, flag or grid), and no time is
 * given. Our choice: a village on the shore is well inside it even on a 2 km grid.
 */
export const COAST_SEARCH_KM = 5;

/** The stretch of coast a time is read along on each side of the nearest sea cell, km (our choice: a village's shore). */
export const COAST_BAND_KM = 2;

/**
 * Share added below and above the grid times for what the solve leaves out: the linear
 * long-wave speed (no dispersion, no amplitude effect), a sea raised at once over the whole
 * rupture area, and a rupture that may reach nearer the coast than the study's source shows.
 * Our allowance, with no published source; it widens the range, it is not a measured error.
 */
export const MODEL_ALLOWANCE = 0.15;

/** A solve of the travel times on one metric grid (times in s, Infinity where not reached). */
export interface TravelTimes {
  readonly grid: MetricGrid;
  readonly timesS: Float64Array;
}

/**
 * The earliest arrival on the coast nearest a community, minutes, and how rough it is:
 * `firstArrivalMinutes` to `latestMinutes`, both rounded down (MinutesRange in tsunami-result).
 */
export type CoastArrival =
  | {
      readonly ok: true;
      readonly firstArrivalMinutes: number;
      readonly latestMinutes: number;
      /** The solve on the finer grid at the nearest reached sea cell, unrounded. */
      readonly gridMinutes: number;
      /** From the community to the centre of that sea cell, km. */
      readonly coastDistanceKm: number;
    }
  | { readonly ok: false; readonly problem: string };

/**
 * The range: the finer grid's times along COAST_BAND_KM of the nearest reached sea (their
 * lowest and highest), widened on each side by the difference between the finer and the
 * coarser grid at that coast (the first-order discretisation error: the solution converges
 * linearly with the cell, so the difference of a grid and one twice as coarse is about the
 * error of the finer, derived) and then by MODEL_ALLOWANCE. The low end, rounded down, is the
 * first arrival reported.
 */
export function coastArrival(fine: TravelTimes, coarse: TravelTimes, site: PointXY): CoastArrival {
  const nearFine = nearestSea(fine, site);
  if (!nearFine.ok) return nearFine;
  const coastPoint = cellCentre(fine.grid, nearFine.index);
  let lowS = Infinity,
    highS = -Infinity;
  for (const i of cellsWithin(
    fine.grid,
    coastPoint,
    Math.max(COAST_BAND_KM, 1.5 * fine.grid.spacingKm),
  )) {
    const t = fine.timesS[i] as number;
    if (!((fine.grid.elevationM[i] as number) < 0) || t === Infinity) continue;
    lowS = Math.min(lowS, t);
    highS = Math.max(highS, t);
  }
  const tS = fine.timesS[nearFine.index] as number;
  const nearCoarse = nearestSea(coarse, site);
  const gridErrorS = nearCoarse.ok ? Math.abs((coarse.timesS[nearCoarse.index] as number) - tS) : 0;
  const first = Math.max(0, Math.floor(((lowS - gridErrorS) * (1 - MODEL_ALLOWANCE)) / 60));
  const latest = Math.max(
    first + 1,
    Math.floor(((highS + gridErrorS) * (1 + MODEL_ALLOWANCE)) / 60),
  );
  return {
    ok: true,
    firstArrivalMinutes: first,
    latestMinutes: latest,
    gridMinutes: tS / 60,
    coastDistanceKm: nearFine.distanceKm,
  };
}

/** The sea cell reached by the wave nearest to `site` within COAST_SEARCH_KM, or why there is none. */
function nearestSea(
  solve: TravelTimes,
  site: PointXY,
): { ok: true; index: number; distanceKm: number } | { ok: false; problem: string } {
  let sea = 0;
  let best = -1,
    bestKm = Infinity;
  for (const i of cellsWithin(solve.grid, site, COAST_SEARCH_KM)) {
    if (!((solve.grid.elevationM[i] as number) < 0)) continue;
    sea += 1;
    if (solve.timesS[i] === Infinity) continue;
    const c = cellCentre(solve.grid, i);
    const km = Math.hypot(c.x - site.x, c.y - site.y);
    if (km < bestKm) {
      bestKm = km;
      best = i;
    }
  }
  if (sea === 0)
    return {
      ok: false,
      problem: `no sea within ${COAST_SEARCH_KM} km on the terrain grid; expected a coastal community near the shore (check its position, its coastal flag and the grid)`,
    };
  if (best < 0)
    return {
      ok: false,
      problem: `the sea within ${COAST_SEARCH_KM} km on the terrain grid is not reached from the source (walled in by land on the grid)`,
    };
  return { ok: true, index: best, distanceKm: bestKm };
}

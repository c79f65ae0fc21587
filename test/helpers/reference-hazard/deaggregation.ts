import type { DistanceContext } from '../../../api/engine/motion/types.ts';
import type { Deaggregation, DeaggregationBin } from '../../../api/engine/results.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import {
  distanceBin,
  distanceBinRange,
  epsilonBin,
  epsilonBinRange,
  magnitudeBin,
  magnitudeBinRange,
} from '../../../api/engine/hazard/deaggregation-bins.ts';
import {
  accumulate,
  accumulatedTotals,
  compensatedSum,
  createLevelAccumulator,
  type LevelAccumulator,
} from '../../../api/engine/summation.ts';
import type { RupturePredictions } from './rupture-predictions.ts';
import { sourceShares } from '../../../api/engine/hazard/source-shares.ts';
import type { DeaggregationTarget } from '../../../api/engine/hazard/fast-deaggregation.ts';
import {
  exceedanceProbability,
  standardisedLevel,
} from '../../../api/engine/hazard/truncated-exceedance.ts';

/** One logic-tree branch of one setting: its weight and its predictions of the measure. */
export interface DeaggregationBranch {
  readonly weight: number;
  readonly predictions: RupturePredictions;
}

/** The plain sum's inputs besides the target (sourceNames by rupture.sourceIndex). */
export interface DeaggregationOptions extends DeaggregationTarget {
  readonly ruptures: readonly Rupture[];
  readonly distances: readonly DistanceContext[];
  /** Every branch of every setting; contributions are weighted by branch weight. */
  readonly branches: readonly DeaggregationBranch[];
  readonly truncationSigma: number;
}

/**
 * ε of a zero-σ prediction is ±∞; it is held at ±10 for the means and bins (no finite σ of a
 * published model gets near it at a deaggregated level).
 */
const EPSILON_LIMIT = 10;

// Slots of each bin's accumulator: contribution, and contribution × M, × R, × ε.
const RATE = 0;
const M = 1;
const R = 2;
const E = 3;

interface Bin {
  readonly m: number;
  readonly r: number;
  readonly e: number;
  readonly acc: LevelAccumulator;
}

/**
 * Deaggregation of the mean hazard at one level (McGuire 1995, BSSA 85(5), citation from memory, for the idea; the
 * bins are those of deaggregation-bins.ts): each rupture's contribution is
 * weight × rate × P(IM > level), summed over the logic tree's branches, so the result is the
 * mean over the tree weighted by each branch's contribution. ε = (ln level − ln median) / σ
 * of the branch. Shares by source and by M–R–ε bin each sum to 1; means and the mode
 * (the largest bin, described by the contribution-weighted M, Rrup and ε inside it) in
 * magnitude, km and σ units. Null when nothing exceeds the level.
 */
export function deaggregate(options: DeaggregationOptions): Deaggregation | null {
  const { ruptures, distances, truncationSigma } = options;
  const lnLevel = Math.log(options.level);
  const bins = new Map<string, Bin>();
  const bySource = new Map<number, { readonly sourceId: string; readonly acc: LevelAccumulator }>();
  const overall = createLevelAccumulator(4);
  let minEpsilon = Infinity;
  let maxEpsilon = -Infinity;

  for (const { weight, predictions } of options.branches) {
    predictions.ruptureIndex.forEach((ruptureIndex, k) => {
      const rupture = ruptures[ruptureIndex] as Rupture;
      const sigma = predictions.sigma[k] as number;
      const rawEpsilon = standardisedLevel(lnLevel, predictions.lnMedian[k] as number, sigma);
      const contribution =
        weight * rupture.annualRate * exceedanceProbability(rawEpsilon, truncationSigma);
      if (!(contribution > 0)) return;
      const epsilon = Math.max(-EPSILON_LIMIT, Math.min(EPSILON_LIMIT, rawEpsilon));
      const magnitude = rupture.context.magnitude;
      const distanceKm = (distances[ruptureIndex] as DistanceContext).rrupKm;
      minEpsilon = Math.min(minEpsilon, epsilon);
      maxEpsilon = Math.max(maxEpsilon, epsilon);

      const m = magnitudeBin(magnitude);
      const r = distanceBin(distanceKm);
      const e = epsilonBin(epsilon);
      const key = `${m}|${r}|${e}`;
      let bin = bins.get(key);
      if (!bin) {
        bin = { m, r, e, acc: createLevelAccumulator(4) };
        bins.set(key, bin);
      }
      for (const acc of [bin.acc, overall]) {
        accumulate(acc, RATE, contribution);
        accumulate(acc, M, contribution * magnitude);
        accumulate(acc, R, contribution * distanceKm);
        accumulate(acc, E, contribution * epsilon);
      }
      let source = bySource.get(rupture.sourceIndex);
      if (!source) {
        source = { sourceId: rupture.sourceId, acc: createLevelAccumulator(1) };
        bySource.set(rupture.sourceIndex, source);
      }
      accumulate(source.acc, 0, contribution);
    });
  }

  const [total, sumM, sumR, sumE] = accumulatedTotals(overall) as [number, number, number, number];
  if (!(total > 0)) return null;

  const binTotals = [...bins.values()].map((bin) => ({ bin, totals: accumulatedTotals(bin.acc) }));
  const binSum = compensatedSum(binTotals.map((b) => b.totals[RATE] as number));
  binTotals.sort((a, b) => a.bin.m - b.bin.m || a.bin.r - b.bin.r || a.bin.e - b.bin.e);
  const resultBins: DeaggregationBin[] = binTotals.map(({ bin, totals }) => ({
    magnitude: magnitudeBinRange(bin.m),
    distanceKm: distanceBinRange(bin.r),
    epsilon: epsilonBinRange(bin.e, minEpsilon, maxEpsilon),
    share: (totals[RATE] as number) / binSum,
  }));

  // The first of equal largest bins, in the order above, so the mode is deterministic.
  let modal = binTotals[0] as (typeof binTotals)[number];
  for (const b of binTotals)
    if ((b.totals[RATE] as number) > (modal.totals[RATE] as number)) modal = b;
  const modalRate = modal.totals[RATE] as number;

  const sources = [...bySource.entries()].map(([sourceIndex, { sourceId, acc }]) => ({
    sourceId,
    name: options.sourceNames[sourceIndex] ?? sourceId,
    rate: accumulatedTotals(acc)[0] as number,
  }));

  return {
    measure: options.measure,
    level: options.level,
    returnPeriodYears: options.returnPeriodYears,
    // Normalising and ordering the per-source sums is plain bookkeeping, shared with the engine;
    // what this oracle checks is the contributions summed into them above.
    bySource: sourceShares(sources),
    mean: { magnitude: sumM / total, distanceKm: sumR / total, epsilon: sumE / total },
    mode: {
      magnitude: (modal.totals[M] as number) / modalRate,
      distanceKm: (modal.totals[R] as number) / modalRate,
      epsilon: (modal.totals[E] as number) / modalRate,
    },
    bins: resultBins,
  };
}

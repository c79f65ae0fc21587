import { createPairPredictions } from '../motion/prepared-period.ts';
import type { PairPredictions } from '../motion/types.ts';
import { compensatedSum } from '../summation.ts';
import {
  coefficientLevelRate,
  createLevelCoefficients,
  fillLevelCoefficients,
  levelRate,
  type LevelCoefficients,
  type RatedPairs,
} from './curve-accumulator.ts';
import {
  pairsAtSite,
  unusablePrediction,
  noteOf,
  type BranchWork,
  type FastHazard,
  type FastSite,
} from './fast-site-hazard.ts';
import { countsOf, validitySummaries, type ValidityCounts } from './validity-counts.ts';
import type { ValiditySummary } from './hazard-types.ts';

/**
 * One measure's mean hazard at a site read level by level on demand: the models are evaluated
 * once per pair (as fastSiteHazard does), their predictions kept per branch, and the mean
 * annual rate of exceeding a level summed only when asked for. A map that needs the level of one
 * return period asks for about log₂(levels) + 2 of them (return-period-search.ts) where the full
 * curve would sum them all.
 */
export interface SiteRates {
  /** Mean annual rate (over the logic tree) of exceeding the measure's level `levelIndex`. */
  rateAt(levelIndex: number): number;
  readonly validity: readonly ValiditySummary[];
}

/** Per-branch prediction buffers for one FastHazard (one per measure), reused from site to site. */
export interface FastRates {
  readonly hazard: FastHazard;
  readonly predictions: Map<BranchWork, readonly PairPredictions[]>;
  readonly coefficients: Map<BranchWork, LevelCoefficients>;
}

export function createFastRates(hazard: FastHazard): FastRates {
  const predictions = new Map<BranchWork, readonly PairPredictions[]>();
  const coefficients = new Map<BranchWork, LevelCoefficients>();
  for (const work of hazard.settings) {
    for (const branch of work.branches) {
      predictions.set(
        branch,
        hazard.options.measures.map(() => createPairPredictions(work.ruptures.length)),
      );
      coefficients.set(branch, createLevelCoefficients(work.ruptures.length));
    }
  }
  return { hazard, predictions, coefficients };
}

/** Predictions of measure `measureIndex` at one site, with its rates readable by level. */
export function fastSiteRates(rates: FastRates, at: FastSite, measureIndex = 0): SiteRates {
  const { hazard } = rates;
  const { options, exceedance } = hazard;
  const measure = options.measures[measureIndex]!;
  const validity: ValidityCounts = new Map();
  const terms: { weight: number; pairs: RatedPairs; coefficients: LevelCoefficients }[] = [];

  for (const work of hazard.settings) {
    const { pairs } = work;
    const modelPairs = pairsAtSite(hazard, work, at);
    const count = pairs.count;
    for (const branch of work.branches) {
      const all = rates.predictions.get(branch)!;
      const predictions = all[measureIndex]!;
      const summary = countsOf(validity, branch.model.name);
      if (count > 0) {
        branch.motions.predict(at.site, modelPairs, all);
        const { lnMedian, sigma: sigmas, applicable } = predictions;
        let firstOutside = -1;
        for (let k = 0; k < count; k++) {
          const mu = lnMedian[k] as number;
          const sigma = sigmas[k] as number;
          if (applicable[k] === 0) {
            if (firstOutside < 0) firstOutside = k;
            summary.outside++;
          }
          if (!(mu > -Infinity && mu < Infinity && sigma >= 0 && sigma < Infinity))
            throw unusablePrediction(hazard, work, branch, measureIndex, k, mu, sigma);
        }
        if (firstOutside >= 0 && !summary.firstNote)
          summary.firstNote = noteOf(hazard, work, branch, measureIndex, at, firstOutside);
      }
      summary.evaluated += count;
      const coefficients = rates.coefficients.get(branch)!;
      // Each setting's pairs stay in its buffer until the next site, so the terms can be summed at any level.
      const rated: RatedPairs = {
        rates: work.rates,
        pairRupture: pairs.rupture,
        predictions,
        count,
      };
      fillLevelCoefficients(coefficients, exceedance, rated);
      terms.push({ weight: branch.weight, pairs: rated, coefficients });
    }
  }

  const lnLevels = measure.levels.map(Math.log);
  return {
    rateAt(levelIndex) {
      const lnLevel = lnLevels[levelIndex] as number;
      return compensatedSum(
        terms.map(
          (t) =>
            t.weight *
            (t.coefficients.usable && exceedance.mode === 'table'
              ? coefficientLevelRate(lnLevel, exceedance, t.coefficients)
              : levelRate(lnLevel, exceedance, t.pairs)),
        ),
      );
    },
    validity: validitySummaries(validity),
  };
}

import {
  exceedanceProbability,
  standardisedLevel,
} from '../../../api/engine/hazard/truncated-exceedance.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import {
  accumulate,
  accumulatedTotals,
  createLevelAccumulator,
} from '../../../api/engine/summation.ts';
import type { RupturePredictions } from './rupture-predictions.ts';

/**
 * Classical PSHA (Cornell 1968; as set out in Baker 2008, eq. for λ(IM > x)): the annual rate of
 * exceeding each level is Σ over ruptures of rate × P(IM > level | rupture, site), with the
 * truncated lognormal of truncated-exceedance.ts. `levels` increasing, in the measure's units.
 * This is the plain reference path; a faster one must reproduce it.
 */
export function exceedanceCurve(
  predictions: RupturePredictions,
  ruptures: readonly Rupture[],
  levels: readonly number[],
  truncationSigma: number,
): number[] {
  const lnLevels = levels.map(Math.log);
  const acc = createLevelAccumulator(levels.length);
  predictions.ruptureIndex.forEach((ruptureIndex, k) => {
    const rate = (ruptures[ruptureIndex] as Rupture).annualRate;
    if (rate === 0) return;
    const lnMedian = predictions.lnMedian[k] as number;
    const sigma = predictions.sigma[k] as number;
    for (let j = 0; j < lnLevels.length; j++) {
      const p = exceedanceProbability(
        standardisedLevel(lnLevels[j] as number, lnMedian, sigma),
        truncationSigma,
      );
      // Levels increase, so once a rupture cannot exceed one it cannot exceed the rest.
      if (p === 0) break;
      accumulate(acc, j, rate * p);
    }
  });
  return accumulatedTotals(acc);
}

import type { PairPredictions, PreparedMotion } from './types.ts';

/** Adds `lnShift` to the first `count` ln medians of `out` (a median scaled by exp(lnShift)). */
export function shiftLnMedians(out: PairPredictions, count: number, lnShift: number): void {
  const { lnMedian } = out;
  for (let k = 0; k < count; k++) lnMedian[k] = (lnMedian[k] as number) + lnShift;
}

/**
 * `inner` with the constant `lnShift` added to every ln median it predicts (a median scaled by
 * exp(lnShift), a unit change for instance); σ and the rest as `inner` gives them.
 */
export function shiftedMotion(inner: PreparedMotion, lnShift: number): PreparedMotion {
  return {
    distances: inner.distances,
    predictPairs(site, pairs, out) {
      inner.predictPairs(site, pairs, out);
      shiftLnMedians(out, pairs.count, lnShift);
    },
  };
}

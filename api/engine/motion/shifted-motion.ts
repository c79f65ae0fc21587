import type { PreparedMotion } from './types.ts';

/**
 * `inner` with the constant `lnShift` added to every ln median it predicts (a median scaled by
 * exp(lnShift), a unit change for instance); σ and the rest as `inner` gives them.
 */
export function shiftedMotion(inner: PreparedMotion, lnShift: number): PreparedMotion {
  return {
    distances: inner.distances,
    predictPairs(site, pairs, out) {
      inner.predictPairs(site, pairs, out);
      for (let k = 0; k < pairs.count; k++) out.lnMedian[k] = (out.lnMedian[k] as number) + lnShift;
    },
  };
}

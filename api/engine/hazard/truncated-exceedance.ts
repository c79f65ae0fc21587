import { normalSurvival } from './normal-cdf.ts';

/**
 * P(IM > level | rupture) for a lognormal ground motion, from the standardised variable
 * ε = (ln level − ln median) / σ, with the normal distribution truncated at ±truncationSigma and
 * renormalised (two-sided truncation, as is common practice in PSHA):
 *
 *   P = (Q(ε) − Q(n)) / (1 − 2 Q(n))   for −n < ε < n;   1 for ε <= −n;   0 for ε >= n.
 *
 * truncationSigma = 0 is the median-only step function: 1 below the median, 0 at and above it.
 * An infinite truncationSigma is the untruncated normal.
 */
export function exceedanceProbability(epsilon: number, truncationSigma: number): number {
  if (truncationSigma <= 0) return epsilon < 0 ? 1 : 0;
  if (epsilon >= truncationSigma) return 0;
  if (epsilon <= -truncationSigma) return 1;
  const tail = truncationSigma === Infinity ? 0 : normalSurvival(truncationSigma);
  const p = (normalSurvival(epsilon) - tail) / (1 - 2 * tail);
  // The fit's 1.2e-7 relative error can push p a hair outside [0, 1] next to ±n.
  return p < 0 ? 0 : p > 1 ? 1 : p;
}

/**
 * ε of a level against a prediction. A zero sigma (a deterministic model) is the median-only
 * case: −∞ below the median, +∞ at or above it (the motion is the median, which does not
 * exceed itself), so both branches of exceedanceProbability agree.
 */
export function standardisedLevel(lnLevel: number, lnMedian: number, sigma: number): number {
  if (sigma > 0) return (lnLevel - lnMedian) / sigma;
  return lnLevel < lnMedian ? -Infinity : Infinity;
}

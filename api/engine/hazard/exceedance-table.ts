import { exceedanceProbability } from './truncated-exceedance.ts';

/**
 * The truncated exceedance probability P(ε) of truncated-exceedance.ts, tabulated for the fast
 * path: cubic Hermite interpolation between nodes NODES_PER_SIGMA to a unit of ε over
 * [−n, n], with the exact values and slopes (dP/dε = −φ(ε) / (1 − 2Q(n))) at the nodes, where
 * φ is the standard normal density. The interpolation error is below h⁴/384 · max|P⁗| for
 * node spacing h (the usual bound for cubic Hermite interpolation); P⁗ = (ε³ − 3ε) φ(ε) /
 * (1 − 2Q(n)), whose size stays under 0.56 / (1 − 2Q(n)), so with h = 1/64 the error is under
 * 9e-11 / (1 − 2Q(n)) in probability: under 1e-10 for the usual n ≥ 2, 2.4e-10 at n = 0.5
 * (test/engine/hazard/exceedance-table.test.ts measures it on a fine grid).
 * One evaluation is a multiply, a floor and a cubic, where the exact one costs an exponential.
 *
 * Only a finite truncation above 0 and at most MAX_TABULATED_SIGMA is tabulated: the
 * median-only step (n = 0) needs no table, and an untruncated or very wide distribution keeps
 * the exact function, whose far tail a table of fixed width would cut.
 */
export const NODES_PER_SIGMA = 64;
export const MAX_TABULATED_SIGMA = 8;

export type ExceedanceTable =
  | { readonly mode: 'step' }
  | { readonly mode: 'exact'; readonly truncationSigma: number }
  | {
      readonly mode: 'table';
      readonly truncationSigma: number;
      /** Nodes per unit of ε: (ε + n) × scale is the node position. */
      readonly scale: number;
      readonly intervals: number;
      /** a, b, c, d of a + b t + c t² + d t³ on each interval, t in [0, 1]. */
      readonly cubic: Float64Array;
    };

const INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

/** The table for truncation at ±truncationSigma (standard deviations). */
export function exceedanceTable(truncationSigma: number): ExceedanceTable {
  if (truncationSigma <= 0) return { mode: 'step' };
  if (!(truncationSigma <= MAX_TABULATED_SIGMA)) return { mode: 'exact', truncationSigma };
  const n = truncationSigma;
  const intervals = Math.ceil(2 * n * NODES_PER_SIGMA);
  const h = (2 * n) / intervals;
  const norm = 1 - 2 * exceedanceProbabilityTail(n);
  const value = (i: number): number =>
    i === 0 ? 1 : i === intervals ? 0 : exceedanceProbability(-n + i * h, n);
  const slope = (i: number): number => {
    const e = -n + i * h;
    return (-INV_SQRT_2PI * Math.exp(-0.5 * e * e)) / norm;
  };
  const cubic = new Float64Array(4 * intervals);
  for (let i = 0; i < intervals; i++) {
    const p0 = value(i),
      p1 = value(i + 1),
      m0 = slope(i) * h,
      m1 = slope(i + 1) * h;
    cubic.set([p0, m0, 3 * (p1 - p0) - 2 * m0 - m1, 2 * (p0 - p1) + m0 + m1], 4 * i);
  }
  return { mode: 'table', truncationSigma: n, scale: 1 / h, intervals, cubic };
}

/** Q(n), the untruncated normal's tail beyond n, from the exact function (its P at n with no truncation). */
function exceedanceProbabilityTail(n: number): number {
  return exceedanceProbability(n, Infinity);
}

/**
 * P(ε) from a 'table' ExceedanceTable, for −n < ε < n (callers handle ε outside, where P is 1
 * or 0 exactly); clamped to [0, 1] as the exact function is.
 */
export function tabulatedExceedance(
  cubic: Float64Array,
  scale: number,
  intervals: number,
  truncationSigma: number,
  epsilon: number,
): number {
  const x = (epsilon + truncationSigma) * scale;
  let i = Math.floor(x);
  if (i >= intervals) i = intervals - 1;
  else if (i < 0) i = 0;
  const t = x - i;
  const at = 4 * i;
  const p =
    (cubic[at] as number) +
    t *
      ((cubic[at + 1] as number) + t * ((cubic[at + 2] as number) + t * (cubic[at + 3] as number)));
  return p < 0 ? 0 : p > 1 ? 1 : p;
}

/** P(ε) from the table where there is one (1 and 0 exactly at and beyond ∓n), else the exact function. */
export function exceedanceFromTable(exceedance: ExceedanceTable, epsilon: number): number {
  if (exceedance.mode === 'step') return exceedanceProbability(epsilon, 0);
  if (exceedance.mode === 'exact')
    return exceedanceProbability(epsilon, exceedance.truncationSigma);
  const n = exceedance.truncationSigma;
  if (epsilon >= n) return 0;
  if (epsilon <= -n) return 1;
  return tabulatedExceedance(exceedance.cubic, exceedance.scale, exceedance.intervals, n, epsilon);
}

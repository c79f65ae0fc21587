import { InvalidInput } from '../errors.ts';

/**
 * The doubly truncated exponential magnitude distribution of a truncated Gutenberg–Richter
 * relation (Cosentino, Ficarra & Luzio 1977; the form of McGuire 2004 and Baker 2008 eq. 3.5,
 * from memory): with β = b ln 10, on mMin <= m <= mMax
 *   f(m) = β e^{-β(m - mMin)} / (1 - e^{-β(mMax - mMin)}).
 */

/** β = b ln 10, with b checked (> 0: a flat or rising magnitude density is not this law). */
export function betaOf(bValue: number): number {
  if (!(bValue > 0 && Number.isFinite(bValue))) {
    throw new InvalidInput([
      { path: 'recurrence.bValue', message: `expected a b-value > 0, got ${bValue}` },
    ]);
  }
  return bValue * Math.LN10;
}

/**
 * ∫ β e^{-βx} dx from x0 to x1 (x0 <= x1), written as e^{-βx0} (1 - e^{-β(x1 - x0)}) so that
 * narrow bins far up the tail keep their digits.
 */
export const exponentialMass = (beta: number, x0: number, x1: number): number =>
  -Math.exp(-beta * x0) * Math.expm1(-beta * (x1 - x0));

/**
 * Probability of each magnitude bin [edges[i], edges[i+1]] under a magnitude-frequency shape on
 * [mMin, mMax] with the given b-value: the truncated exponential below, the characteristic
 * shape in characteristic.ts.
 */
export type BinProbabilities = (
  edges: readonly number[],
  mMin: number,
  mMax: number,
  bValue: number,
) => number[];

/**
 * Probability of each bin [edges[i], edges[i+1]] under the truncated exponential between
 * mMin and mMax (parts of a bin outside them carry nothing). Sums to 1 when the edges span
 * [mMin, mMax].
 */
export const truncatedExponentialBinProbabilities: BinProbabilities = (
  edges,
  mMin,
  mMax,
  bValue,
) => {
  const beta = betaOf(bValue);
  const total = exponentialMass(beta, 0, mMax - mMin);
  const out: number[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const lo = Math.max(edges[i] as number, mMin);
    const hi = Math.min(edges[i + 1] as number, mMax);
    out.push(hi > lo ? exponentialMass(beta, lo - mMin, hi - mMin) / total : 0);
  }
  return out;
};

/** Annual rate of M >= mMin of a Gutenberg–Richter recurrence: `rate`, else 10^(a - b mMin). */
export function rateAboveMinimum(recurrence: {
  readonly aValue?: number;
  readonly rate?: number;
  readonly bValue: number;
  readonly mMin: number;
}): number {
  if (recurrence.rate !== undefined) return recurrence.rate;
  if (recurrence.aValue !== undefined)
    return 10 ** (recurrence.aValue - recurrence.bValue * recurrence.mMin);
  throw new InvalidInput([
    {
      path: 'recurrence.aValue',
      message:
        'expected aValue (log10 annual rate of M >= 0) or rate (annual rate of M >= mMin), got neither',
    },
  ]);
}

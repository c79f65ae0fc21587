import { InvalidInput } from '../errors.ts';
import type { Recurrence, Settings } from '../model.ts';
import { momentBalancedRates } from './moment-balanced.ts';
import { rateAboveMinimum, truncatedExponentialBinProbabilities } from './truncated-gr.ts';

/** Magnitude bins of a source: centre magnitudes, their annual rates, and the bins' edges. */
export interface MagnitudeBins {
  readonly magnitudes: readonly number[];
  readonly annualRates: readonly number[];
  /** magnitudes.length + 1 edges; bin i is [edges[i], edges[i+1]]. */
  readonly edges: readonly number[];
}

/**
 * A span within this many steps of a whole number of steps is taken as whole (absorbs rounding
 * in, e.g., (7.6 - 5.0) / 0.1).
 */
const WHOLE_STEPS_SLACK = 1e-6;
/** Edges are rounded to 1e-9 magnitude units so 5.0 + 3 x 0.1 reads 5.3. */
const roundEdge = (m: number): number => Math.round(m * 1e9) / 1e9;

/**
 * Bin edges from mMin to mMax, `stepM` wide. When mMax - mMin is not a whole number of steps
 * the last bin is narrower and ends at mMax, so the bins cover exactly [mMin, mMax] and
 * their rates add up to the rate of the whole range.
 */
export function magnitudeEdges(mMin: number, mMax: number, stepM: number): number[] {
  if (!(stepM > 0))
    throw new InvalidInput([
      { path: 'settings.magnitudeStep', message: `expected a magnitude step > 0, got ${stepM}` },
    ]);
  if (!(mMax > mMin))
    throw new InvalidInput([
      {
        path: 'recurrence.mMax',
        message: `expected mMax greater than mMin (${mMin}), got ${mMax}`,
      },
    ]);
  const steps = (mMax - mMin) / stepM;
  const whole = Math.round(steps);
  const count =
    Math.abs(steps - whole) <= WHOLE_STEPS_SLACK ? Math.max(1, whole) : Math.ceil(steps);
  const edges = Array.from({ length: count }, (_, k) => roundEdge(mMin + k * stepM));
  edges.push(mMax);
  return edges;
}

const centres = (edges: readonly number[]): number[] =>
  edges.slice(1).map((hi, i) => roundEdge(((edges[i] as number) + hi) / 2));

/**
 * The magnitude bins of a recurrence with annual rates (per year). Gutenberg–Richter: the
 * rate of M >= mMin spread by the truncated exponential; moment-balanced: from the fault's
 * moment rate (`faultAreaKm2`, km², required); fixed: one bin at its magnitude.
 */
export function magnitudeBins(
  recurrence: Recurrence,
  settings: Pick<Settings, 'magnitudeStep'>,
  faultAreaKm2?: number,
): MagnitudeBins {
  if (recurrence.type === 'fixed') {
    const half = settings.magnitudeStep / 2;
    return {
      magnitudes: [recurrence.magnitude],
      annualRates: [recurrence.rate],
      edges: [recurrence.magnitude - half, recurrence.magnitude + half],
    };
  }
  const edges = magnitudeEdges(recurrence.mMin, recurrence.mMax, settings.magnitudeStep);
  const magnitudes = centres(edges);
  if (recurrence.type === 'moment-balanced') {
    return {
      magnitudes,
      annualRates: momentBalancedRates(recurrence, edges, magnitudes, faultAreaKm2),
      edges,
    };
  }
  const total = rateAboveMinimum(recurrence);
  const shares = truncatedExponentialBinProbabilities(
    edges,
    recurrence.mMin,
    recurrence.mMax,
    recurrence.bValue,
  );
  return { magnitudes, annualRates: shares.map((p) => p * total), edges };
}

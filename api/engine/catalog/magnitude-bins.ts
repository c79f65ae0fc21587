import { InvalidInput } from '../errors.ts';

/**
 * Magnitude binning shared by the catalog analyses. Bins are centred on integer multiples of
 * the step (4.0, 4.1, ... for 0.1), as catalogs report magnitudes; a bin centred on m holds
 * magnitudes in [m − step/2, m + step/2).
 */

/**
 * Guard against representation error when a reported magnitude sits on a bin edge
 * (4.05 / 0.1 = 40.49999...): edges round up, as half-up rounding of the printed value would.
 */
const EDGE_GUARD = 1e-9;

/** The integer index of the bin holding `magnitude`. */
export const binIndex = (magnitude: number, stepM: number): number =>
  Math.floor(magnitude / stepM + 0.5 + EDGE_GUARD);

/** Bin centre of index k, rounded to 1e-9 so 43 × 0.1 reads 4.3. */
export const binMagnitude = (index: number, stepM: number): number =>
  Math.round(index * stepM * 1e9) / 1e9;

/** The centre of the bin holding `magnitude`. */
export const binCentre = (magnitude: number, stepM: number): number =>
  binMagnitude(binIndex(magnitude, stepM), stepM);

/** Throws InvalidInput unless the step is a finite number in (0, 1]. */
export function checkMagnitudeStep(stepM: number, path = 'magnitudeStep'): void {
  if (!(Number.isFinite(stepM) && stepM > 0 && stepM <= 1)) {
    throw new InvalidInput([
      {
        path,
        message: `expected a magnitude bin width greater than 0 and at most 1; got ${stepM}`,
      },
    ]);
  }
}

export interface MagnitudeBinCount {
  /** Bin centre. */
  readonly magnitude: number;
  readonly count: number;
}

/** Counts per bin, every bin from the lowest to the highest occupied one (empty bins included). */
export function magnitudeHistogram(
  magnitudes: readonly number[],
  stepM: number,
): MagnitudeBinCount[] {
  checkMagnitudeStep(stepM);
  if (magnitudes.length === 0) return [];
  const indices = magnitudes.map((m) => binIndex(m, stepM));
  let lo = Infinity;
  let hi = -Infinity;
  for (const k of indices) {
    if (k < lo) lo = k;
    if (k > hi) hi = k;
  }
  const counts = new Array<number>(hi - lo + 1).fill(0);
  for (const k of indices) counts[k - lo] = (counts[k - lo] as number) + 1;
  return counts.map((count, i) => ({ magnitude: binMagnitude(lo + i, stepM), count }));
}

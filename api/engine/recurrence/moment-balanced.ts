import { InvalidInput } from '../errors.ts';
import type { MomentBalancedRecurrence } from '../model.ts';
import { compensatedSum } from '../summation.ts';
import { characteristicBinProbabilities } from './characteristic.ts';
import { momentNm, momentRateNmYr } from './seismic-moment.ts';
import { truncatedExponentialBinProbabilities, type BinProbabilities } from './truncated-gr.ts';

/** The bin probabilities of each shape a moment-balanced fault may take. */
const SHAPE_BIN_PROBABILITIES = {
  'gutenberg-richter': truncatedExponentialBinProbabilities,
  characteristic: characteristicBinProbabilities,
} as const satisfies Record<MomentBalancedRecurrence['shape'], BinProbabilities>;

/**
 * Annual rates of the bins of a moment-balanced fault (per year): the shape's bin
 * probabilities scaled so that the bins, each an earthquake of its centre magnitude, release
 * exactly the fault's moment rate, shear modulus x area x slip rate.
 *
 * Balanced over the discrete bins rather than the continuous density because the bins are the
 * earthquakes the hazard integral counts. Over a bin of width h the continuous integral of
 * density x M0 differs from the bin mass x M0 at the centre by the factor
 * [sinh(kh/2)/(kh/2)] / [sinh(βh/2)/(βh/2)], k = 1.5 ln 10 - β (β = 0 in the uniform box): for
 * h = 0.1 and b = 1 that is +0.5% in the characteristic box and -0.17% in the exponential part.
 */
export function momentBalancedRates(
  recurrence: MomentBalancedRecurrence,
  edges: readonly number[],
  magnitudes: readonly number[],
  faultAreaKm2: number | undefined,
): number[] {
  if (faultAreaKm2 === undefined || !(faultAreaKm2 > 0)) {
    throw new InvalidInput([
      {
        path: 'recurrence.type',
        message: `moment balancing needs a fault area > 0 km², got ${faultAreaKm2}`,
      },
    ]);
  }
  const { mMin, mMax, bValue } = recurrence;
  const shares = SHAPE_BIN_PROBABILITIES[recurrence.shape](edges, mMin, mMax, bValue);
  const momentPerEvent = compensatedSum(
    shares.map((p, i) => p * momentNm(magnitudes[i] as number)),
  );
  const eventRate =
    momentRateNmYr(recurrence.shearModulusPa, faultAreaKm2, recurrence.slipRateMmYr) /
    momentPerEvent;
  return shares.map((p) => p * eventRate);
}

import { bracketPeriod, lerp } from './interpolate-period.ts';
import type { DistanceName, PairPredictions, PreparedMotion } from './types.ts';

/** Columns for `capacity` pair predictions. */
export function createPairPredictions(capacity: number): PairPredictions {
  return { lnMedian: new Float64Array(capacity), sigma: new Float64Array(capacity), applicable: new Uint8Array(capacity) };
}

/**
 * The prepared counterpart of predictAtPeriod (interpolate-period.ts), with the same rule: on a
 * table row, that row's predictor; between rows, both rows' predictions with ln median and σ
 * interpolated linearly in ln(period), applicable where both rows are. A period outside the
 * table throws UnsupportedPeriod here, when the model is prepared.
 */
export function preparedAtPeriod(
  modelName: string,
  periodsS: readonly number[],
  periodS: number,
  prepareRow: (rowIndex: number) => PreparedMotion,
): PreparedMotion {
  const { lower, upper, fraction } = bracketPeriod(modelName, periodsS, periodS);
  const lo = prepareRow(lower);
  if (fraction === 0) return lo;
  const hi = prepareRow(upper);
  // The upper row's predictions of the last block, reused from call to call (it grows when a block is larger).
  let upperRow = createPairPredictions(0);
  return {
    distances: [...new Set<DistanceName>([...lo.distances, ...hi.distances])],
    predictPairs(site, pairs, out) {
      lo.predictPairs(site, pairs, out);
      if (upperRow.lnMedian.length < pairs.count) upperRow = createPairPredictions(pairs.count);
      hi.predictPairs(site, pairs, upperRow);
      for (let k = 0; k < pairs.count; k++) {
        out.lnMedian[k] = lerp(out.lnMedian[k] as number, upperRow.lnMedian[k] as number, fraction);
        out.sigma[k] = lerp(out.sigma[k] as number, upperRow.sigma[k] as number, fraction);
        out.applicable[k] = (out.applicable[k] as number) & (upperRow.applicable[k] as number);
      }
    },
  };
}

/** True when `value` is inside [min, max], by the test validityNotes (validity.ts) uses (indexed, not destructured: it runs per pair). */
export const insideRange = (value: number, range: readonly [number, number]): boolean => !(value < range[0] || value > range[1]);

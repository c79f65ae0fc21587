import { UnsupportedPeriod } from '../errors.ts';
import type { ModelTable } from './coefficient-table.ts';
import type { Measure } from './measure.ts';
import type { GmmPrediction } from './types.ts';

/**
 * Where a spectral period falls in a model's table: the bracketing row indices and the weight of
 * the upper row for interpolation linear in ln(period). Predictions (ln median and sigma) at
 * periods between tabulated ones are interpolated this way, as is common practice; a period
 * outside the table is refused with UnsupportedPeriod rather than extrapolated.
 * A period within 1e-6 relative of a row is taken as that row (so "SA(0.2)" hits 0.2 exactly).
 */
export interface PeriodBracket {
  readonly lower: number;
  readonly upper: number;
  /** Weight of `upper`; 0 on a row. */
  readonly fraction: number;
}

export function bracketPeriod(
  modelName: string,
  periodsS: readonly number[],
  periodS: number,
): PeriodBracket {
  const first = periodsS[0];
  const last = periodsS[periodsS.length - 1];
  if (first === undefined || last === undefined)
    throw new UnsupportedPeriod(modelName, periodS, NaN, NaN);
  const onRow = periodsS.findIndex((p) => Math.abs(p / periodS - 1) <= 1e-6);
  if (onRow >= 0) return { lower: onRow, upper: onRow, fraction: 0 };
  if (!(periodS > first && periodS < last))
    throw new UnsupportedPeriod(modelName, periodS, first, last);
  let upper = 1;
  while ((periodsS[upper] as number) < periodS) upper++;
  const lower = upper - 1;
  const fraction =
    Math.log(periodS / (periodsS[lower] as number)) /
    Math.log((periodsS[upper] as number) / (periodsS[lower] as number));
  return { lower, upper, fraction };
}

/** Linear interpolation between two values with the bracket's weight. */
export const lerp = (a: number, b: number, fraction: number): number => a + (b - a) * fraction;

/**
 * A prediction at any period inside the table from a model's per-row prediction: on a row, that
 * row; between rows, ln median and the sigmas interpolated linearly in ln(period).
 */
export function predictAtPeriod(
  modelName: string,
  periodsS: readonly number[],
  periodS: number,
  predictRow: (rowIndex: number) => GmmPrediction,
): GmmPrediction {
  const { lower, upper, fraction } = bracketPeriod(modelName, periodsS, periodS);
  const lo = predictRow(lower);
  if (fraction === 0) return lo;
  const hi = predictRow(upper);
  return {
    lnMedian: lerp(lo.lnMedian, hi.lnMedian, fraction),
    sigma: lerp(lo.sigma, hi.sigma, fraction),
    tau: lerp(lo.tau, hi.tau, fraction),
    phi: lerp(lo.phi, hi.phi, fraction),
    applicable: lo.applicable && hi.applicable,
    notes: [...new Set([...lo.notes, ...hi.notes])],
  };
}

/**
 * One measure's prediction from a model's table: the PGA row, the PGV row (`pgv`, for a model
 * that has one; the others refuse PGV before they get here), or for SA the rows either side of
 * the period by predictAtPeriod, each row through `predictRow`.
 */
export function predictOnTable<Row>(
  modelName: string,
  table: ModelTable<Row>,
  pgv: Row | undefined,
  measure: Measure,
  predictRow: (row: Row) => GmmPrediction,
): GmmPrediction {
  if (measure.kind === 'SA')
    return predictAtPeriod(modelName, table.saPeriodsS, measure.periodS, (i) =>
      predictRow(table.sa[i] as Row),
    );
  return predictRow(measure.kind === 'PGV' ? (pgv as Row) : table.pga);
}

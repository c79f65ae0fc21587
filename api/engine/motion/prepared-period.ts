import type { ModelTable } from './coefficient-table.ts';
import { bracketPeriod, lerp } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import type { PairPredictions, PreparedMotion, PreparedMotions } from './types.ts';

/** Columns for `capacity` pair predictions. */
export function createPairPredictions(capacity: number): PairPredictions {
  return {
    lnMedian: new Float64Array(capacity),
    sigma: new Float64Array(capacity),
    applicable: new Uint8Array(capacity),
  };
}

/**
 * The table rows one measure's predictions come from, by the rule of predictAtPeriod
 * (interpolate-period.ts): on a table row, that row; between rows, both, ln median and σ
 * interpolated linearly in ln(period) with the upper row's weight `fraction`, applicable where
 * both rows are. A period outside the table throws UnsupportedPeriod here, when the model is
 * prepared.
 */
export interface RowPlan<Row> {
  readonly lower: Row;
  readonly upper: Row | undefined;
  readonly fraction: number;
}

export const singleRow = <Row>(row: Row): RowPlan<Row> => ({
  lower: row,
  upper: undefined,
  fraction: 0,
});

/** The RowPlan of SA at `periodS` from a model's SA rows (their periods `periodsS`, increasing). */
export function periodRows<Row>(
  modelName: string,
  periodsS: readonly number[],
  rows: readonly Row[],
  periodS: number,
): RowPlan<Row> {
  const { lower, upper, fraction } = bracketPeriod(modelName, periodsS, periodS);
  return fraction === 0
    ? singleRow(rows[lower] as Row)
    : { lower: rows[lower] as Row, upper: rows[upper] as Row, fraction };
}

/** The same plan over what `f` makes of each row (a model's per-rupture terms of that row). */
export const mapPlan = <Row, Terms>(
  plan: RowPlan<Row>,
  f: (row: Row) => Terms,
): RowPlan<Terms> => ({
  lower: f(plan.lower),
  upper: plan.upper === undefined ? undefined : f(plan.upper),
  fraction: plan.fraction,
});

/**
 * The RowPlan of one measure over what `termsOf` makes of a model's table rows: the PGA row, the
 * PGV row (`pgv`, for a model that has one; the others refuse PGV first), or for SA periodRows.
 */
export function measurePlan<Row, Terms>(
  modelName: string,
  table: ModelTable<Row>,
  pgv: Row | undefined,
  measure: Measure,
  termsOf: (row: Row) => Terms,
): RowPlan<Terms> {
  if (measure.kind === 'SA')
    return mapPlan(periodRows(modelName, table.saPeriodsS, table.sa, measure.periodS), termsOf);
  return singleRow(termsOf(measure.kind === 'PGV' ? (pgv as Row) : table.pga));
}

/** The distinct rows the plans read, in the order they first appear. */
export const plannedRows = <Row>(plans: readonly RowPlan<Row>[]): Row[] => [
  ...new Set(
    plans.flatMap((plan) => (plan.upper === undefined ? [plan.lower] : [plan.lower, plan.upper])),
  ),
];

/** `build` made once per row however many measures ask for it (a row's terms cost a pass over the ruptures). */
export function rowMemo<Row, Terms>(build: (row: Row) => Terms): (row: Row) => Terms {
  const made = new Map<Row, Terms>();
  return (row) => {
    let terms = made.get(row);
    if (terms === undefined) made.set(row, (terms = build(row)));
    return terms;
  };
}

/** The upper row's predictions of interpolated measures, reused from call to call (it grows when a call has more pairs). */
export interface RowScratch {
  buffer: PairPredictions;
}

export const createRowScratch = (): RowScratch => ({ buffer: createPairPredictions(0) });

/**
 * Fills `out` for the first `count` pairs from a RowPlan: `evaluate` writes one row's
 * predictions, and for a period between rows both are evaluated and interpolated as
 * predictAtPeriod does.
 */
export function predictRows<Row>(
  plan: RowPlan<Row>,
  count: number,
  out: PairPredictions,
  scratch: RowScratch,
  evaluate: (row: Row, into: PairPredictions) => void,
): void {
  evaluate(plan.lower, out);
  if (plan.upper === undefined) return;
  if (scratch.buffer.lnMedian.length < count) scratch.buffer = createPairPredictions(count);
  const upper = scratch.buffer;
  evaluate(plan.upper, upper);
  const { fraction } = plan;
  const { lnMedian, sigma, applicable } = out;
  for (let k = 0; k < count; k++) {
    lnMedian[k] = lerp(lnMedian[k] as number, upper.lnMedian[k] as number, fraction);
    sigma[k] = lerp(sigma[k] as number, upper.sigma[k] as number, fraction);
    applicable[k] = (applicable[k] as number) & (upper.applicable[k] as number);
  }
}

/** One measure's predictor (GroundMotionModel.prepare) from a predictor of that measure alone (prepareMeasures). */
export function singleMeasure(motions: PreparedMotions): PreparedMotion {
  return {
    distances: motions.distances,
    predictPairs(site, pairs, out) {
      motions.predictPairs(site, pairs, [out]);
    },
  };
}

/** A Float64Array of at least `capacity` entries: `column` itself when long enough (scratch that grows). */
export const atLeast = (column: Float64Array, capacity: number): Float64Array =>
  column.length >= capacity ? column : new Float64Array(capacity);

/** True when `value` is inside [min, max], by the test validityNotes (validity.ts) uses (indexed, not destructured: it runs per pair). */
export const insideRange = (value: number, range: readonly [number, number]): boolean =>
  !(value < range[0] || value > range[1]);

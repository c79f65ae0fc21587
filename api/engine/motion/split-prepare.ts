import { UnsupportedMeasure } from '../errors.ts';
import type { ModelTable } from './coefficient-table.ts';
import { predictOnTable } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import {
  createRowScratch,
  predictRows,
  rowMemo,
  type RowPlan,
  measurePlan,
} from './prepared-period.ts';
import type {
  DistanceName,
  GmmInput,
  GmmPrediction,
  PairDistances,
  PairPredictions,
  PreparedMotions,
  RuptureContext,
  SiteContext,
} from './types.ts';

/**
 * A model written as the terms of one table row that depend on the rupture alone and the
 * prediction of one (rupture, site) pair from them: the shape every model here has, so the
 * fast path can use the model's own functions (prepareSplitMeasures) rather than a copy.
 */
export interface SplitModel<Row, Terms> {
  readonly name: string;
  /** The model's coefficient table: its PGA row and spectral rows. */
  readonly table: ModelTable<Row>;
  /** The PGV row, where the model has one (a model without refuses PGV in checkMeasure). */
  readonly pgv?: Row;
  /** The distance columns pairPrediction reads. */
  readonly distances: readonly DistanceName[];
  /** Throws what predict() throws for a measure the model cannot give. */
  checkMeasure(measure: Measure): void;
  /** Throws what predict() throws for the rupture's own inputs. */
  checkRupture(rupture: RuptureContext): void;
  ruptureTerms(row: Row, rupture: RuptureContext): Terms;
  /** Writes one row's prediction for one pair into `out` (reused from pair to pair: nothing is allocated per pair). */
  pairPrediction(terms: Terms, pair: GmmInput, out: PairPrediction): void;
  /** Whether predict() would say applicable for the pair (no validity notes), without building the notes. */
  applicable(pair: GmmInput): boolean;
}

/** One row's median and standard deviations for one pair, ln units. */
export interface PairPrediction {
  lnMedian: number;
  tau: number;
  phi: number;
  sigma: number;
}

export const emptyPairPrediction = (): PairPrediction => ({
  lnMedian: 0,
  tau: 0,
  phi: 0,
  sigma: 0,
});

/** One row's rupture terms for every prepared rupture. */
interface PreparedRow<Row, Terms> {
  readonly row: Row;
  readonly terms: readonly Terms[];
}

type MutablePair = { -readonly [K in keyof GmmInput]: GmmInput[K] };

/**
 * The fast path of a SplitModel for `measures` over `ruptures`: each row's rupture terms once per
 * rupture, then the model's pairPrediction per pair and row; between table rows the predictions
 * are interpolated in ln(period) as predict() does (prepared-period.ts). One pair input object is
 * reused from pair to pair.
 */
export function prepareSplitMeasures<Row, Terms>(
  model: SplitModel<Row, Terms>,
  ruptures: readonly RuptureContext[],
  measures: readonly Measure[],
): PreparedMotions {
  measures.forEach((m) => model.checkMeasure(m));
  ruptures.forEach((r) => model.checkRupture(r));
  const termsOf = rowMemo((row: Row): PreparedRow<Row, Terms> => ({
    row,
    terms: ruptures.map((r) => model.ruptureTerms(row, r)),
  }));
  const plans: RowPlan<PreparedRow<Row, Terms>>[] = measures.map((m) =>
    measurePlan(model.name, model.table, model.pgv, m, termsOf),
  );
  const scratch = createRowScratch();
  const pair = {} as MutablePair;
  const prediction = emptyPairPrediction();
  let applicable = new Uint8Array(0);

  const setPair = (rupture: RuptureContext, pairs: PairDistances, k: number): void => {
    pair.magnitude = rupture.magnitude;
    pair.rakeDeg = rupture.rakeDeg;
    pair.mechanism = rupture.mechanism;
    pair.setting = rupture.setting;
    pair.dipDeg = rupture.dipDeg;
    pair.ztorKm = rupture.ztorKm;
    pair.widthKm = rupture.widthKm;
    pair.hypoDepthKm = rupture.hypoDepthKm;
    pair.rjbKm = pairs.rjbKm[k] as number;
    pair.rrupKm = pairs.rrupKm[k] as number;
    pair.rxKm = pairs.rxKm[k] as number;
    pair.ry0Km = pairs.ry0Km[k] as number;
    pair.rhypoKm = pairs.rhypoKm[k] as number;
    pair.repiKm = pairs.repiKm[k] as number;
  };

  const evaluate = (
    prepared: PreparedRow<Row, Terms>,
    pairs: PairDistances,
    out: PairPredictions,
  ): void => {
    for (let k = 0; k < pairs.count; k++) {
      const r = pairs.rupture[k] as number;
      setPair(ruptures[r] as RuptureContext, pairs, k);
      model.pairPrediction(prepared.terms[r] as Terms, pair, prediction);
      out.lnMedian[k] = prediction.lnMedian;
      out.sigma[k] = prediction.sigma;
      out.applicable[k] = applicable[k] as number;
    }
  };

  return {
    distances: model.distances,
    predictPairs(site: SiteContext, pairs: PairDistances, out: readonly PairPredictions[]) {
      pair.vs30 = site.vs30;
      pair.vs30Measured = site.vs30Measured;
      pair.z1Km = site.z1Km;
      pair.z2p5Km = site.z2p5Km;
      if (applicable.length < pairs.count) applicable = new Uint8Array(pairs.count);
      for (let k = 0; k < pairs.count; k++) {
        setPair(ruptures[pairs.rupture[k] as number] as RuptureContext, pairs, k);
        applicable[k] = model.applicable(pair) ? 1 : 0;
      }
      plans.forEach((plan, i) =>
        predictRows(plan, pairs.count, out[i] as PairPredictions, scratch, (p, into) =>
          evaluate(p, pairs, into),
        ),
      );
    },
  };
}

/** Refuses SA at a period not above 0 s (PGA is asked for by name, not as SA(0)). */
export function requirePositivePeriod(measure: Measure): void {
  if (measure.kind === 'SA' && !(measure.periodS > 0))
    throw new UnsupportedMeasure(`SA(${measure.periodS})`, 'the period must be greater than 0 s');
}

/** predict() of a SplitModel for one measure, once the caller has checked the inputs (predictOnTable). */
export function predictSplit<Row, Terms>(
  model: SplitModel<Row, Terms>,
  measure: Measure,
  predictRow: (row: Row) => GmmPrediction,
): GmmPrediction {
  model.checkMeasure(measure);
  return predictOnTable(model.name, model.table, model.pgv, measure, predictRow);
}

/** The prepareMeasures hook of a SplitModel (model-assembly.ts derives prepare from it). */
export const splitPrepareMeasures =
  <Row, Terms>(model: SplitModel<Row, Terms>) =>
  (ruptures: readonly RuptureContext[], measures: readonly Measure[]): PreparedMotions =>
    prepareSplitMeasures(model, ruptures, measures);

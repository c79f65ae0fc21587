import { UnsupportedMeasure } from '../errors.ts';
import { STANDARD_GRAVITY_MS2 } from '../units.ts';
import type { Measure } from './measure.ts';
import { shiftedMotion, shiftLnMedians } from './shifted-motion.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  PairPredictions,
  PreparedMotion,
  PreparedMotions,
  RuptureContext,
} from './types.ts';

/**
 * PGV for a model that predicts none, from its own SA(0.5 s):
 *
 *   PGV (cm/s) = SA(0.5 s) (cm/s²) / 20
 *
 * Bommer, J. J. & Alarcón, J. E. (2006). The prediction and use of peak ground velocity.
 * Journal of Earthquake Engineering 10(1), 1–31 (relation and constant from memory).
 * The σ of ln SA(0.5) is kept unchanged, a simplification of this screening; the true σ of ln PGV so
 * derived is somewhat larger, so the derived PGV hazard is a screening estimate only.
 */
export const PGV_FROM_SA_PERIOD_S = 0.5;
export const PGV_FROM_SA_DIVISOR = 20;

/** ln of the factor from SA in g to PGV in cm/s: g in cm/s² over 20. */
const LN_G_TO_PGV_CMS = Math.log((STANDARD_GRAVITY_MS2 * 100) / PGV_FROM_SA_DIVISOR);

export const PGV_FROM_SA_NOTE = 'PGV derived from SA(0.5 s) / 20 (Bommer & Alarcón 2006)';

/** Whether `model` can give SA at the period the derivation needs. */
export function canDerivePgv(model: GroundMotionModel): boolean {
  const first = model.periodsS[0];
  const last = model.periodsS[model.periodsS.length - 1];
  return (
    first !== undefined &&
    last !== undefined &&
    first <= PGV_FROM_SA_PERIOD_S &&
    PGV_FROM_SA_PERIOD_S <= last
  );
}

/**
 * `model` itself when it predicts PGV; otherwise the same model with PGV from its SA(0.5 s).
 * Throws UnsupportedMeasure when the model has neither PGV nor SA(0.5 s).
 */
export function withPgvFromSa(model: GroundMotionModel): GroundMotionModel {
  if (model.hasPgv) return model;
  if (!canDerivePgv(model)) {
    throw new UnsupportedMeasure(
      'PGV',
      `${model.name} predicts no PGV and no SA(${PGV_FROM_SA_PERIOD_S}) to derive it from`,
    );
  }
  const saMeasure: Measure = { kind: 'SA', periodS: PGV_FROM_SA_PERIOD_S };
  const inner = model.prepare?.bind(model);
  // The fast path's hook (GroundMotionModel.prepare), where the model has one: its SA(0.5 s)
  // predictor with the same constant added to every ln median.
  const prepare = inner
    ? (ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion =>
        measure.kind === 'PGV'
          ? shiftedMotion(inner(ruptures, saMeasure), LN_G_TO_PGV_CMS)
          : inner(ruptures, measure)
    : undefined;
  const innerMeasures = model.prepareMeasures?.bind(model);
  // The same for several measures at once: PGV asked of the model as SA(0.5 s), the constant added to its output.
  const prepareMeasures = innerMeasures
    ? (ruptures: readonly RuptureContext[], measures: readonly Measure[]): PreparedMotions => {
        const derived = measures.map((m) => m.kind === 'PGV');
        const motions = innerMeasures(
          ruptures,
          measures.map((m) => (m.kind === 'PGV' ? saMeasure : m)),
        );
        return {
          distances: motions.distances,
          predictPairs(site, pairs, out) {
            motions.predictPairs(site, pairs, out);
            derived.forEach((isPgv, i) => {
              if (isPgv) shiftLnMedians(out[i] as PairPredictions, pairs.count, LN_G_TO_PGV_CMS);
            });
          },
        };
      }
    : undefined;
  return {
    name: model.name,
    citation: model.citation,
    settings: model.settings,
    distanceMetric: model.distanceMetric,
    periodsS: model.periodsS,
    hasPga: model.hasPga,
    hasPgv: true,
    validity: model.validity,
    predict(input: GmmInput, measure: Measure): GmmPrediction {
      if (measure.kind !== 'PGV') return model.predict(input, measure);
      const sa = model.predict(input, saMeasure);
      return { ...sa, lnMedian: sa.lnMedian + LN_G_TO_PGV_CMS };
    },
    ...(prepare ? { prepare } : {}),
    ...(prepareMeasures ? { prepareMeasures } : {}),
  };
}

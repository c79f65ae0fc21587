import type { PointXY } from '../geometry/projection.ts';
import type { Measure } from '../motion/measure.ts';
import {
  DISTANCE_NAMES,
  type DistanceContext,
  type DistanceName,
  type GroundMotionModel,
  type PairDistances,
  type PairPredictions,
  type PreparedMotion,
  type RuptureContext,
  type SiteContext,
} from '../motion/types.ts';
import { gmmInput } from './gmm-input.ts';
import type { RuptureGeometry } from './rupture-geometry.ts';
import { createPairBuffer, siteDistances } from './site-distances.ts';

/**
 * A model that has no precomputation hook, evaluated pair by pair through predict() with every
 * distance: slower, and exactly the reference path's numbers.
 */
function pairByPair(
  model: GroundMotionModel,
  ruptures: readonly RuptureContext[],
  measure: Measure,
): PreparedMotion {
  return {
    distances: DISTANCE_NAMES,
    predictPairs(site, pairs, out) {
      for (let k = 0; k < pairs.count; k++) {
        const distances: DistanceContext = {
          rjbKm: pairs.rjbKm[k] as number,
          rrupKm: pairs.rrupKm[k] as number,
          rxKm: pairs.rxKm[k] as number,
          ry0Km: pairs.ry0Km[k] as number,
          rhypoKm: pairs.rhypoKm[k] as number,
          repiKm: pairs.repiKm[k] as number,
        };
        const p = model.predict(
          gmmInput(ruptures[pairs.rupture[k] as number]!, distances, site),
          measure,
        );
        out.lnMedian[k] = p.lnMedian;
        out.sigma[k] = p.sigma;
        out.applicable[k] = p.applicable ? 1 : 0;
      }
    },
  };
}

/**
 * A model's predictor for a screening's measures, prepared up front: through its
 * prepareMeasures hook (the measures' shared work done once per pair) where it has one, else
 * measure by measure through prepare, else pair by pair through predict(). Preparing can fail
 * (a measure the model lacks): the error is kept and thrown when that measure is first
 * evaluated for some pair, as the reference path throws only when it first evaluates the model.
 */
export interface LazyMotions {
  readonly distances: readonly DistanceName[];
  /** Predictions of every measure for the first `pairs.count` pairs: out[i] for measure i. */
  predict(site: SiteContext, pairs: PairDistances, out: readonly PairPredictions[]): void;
}

function measureByMeasure(
  model: GroundMotionModel,
  ruptures: readonly RuptureContext[],
  measures: readonly Measure[],
): LazyMotions {
  const prepared = measures.map(
    (measure): { distances: readonly DistanceName[]; predictor: () => PreparedMotion } => {
      try {
        const motion = model.prepare
          ? model.prepare(ruptures, measure)
          : pairByPair(model, ruptures, measure);
        return { distances: motion.distances, predictor: () => motion };
      } catch (error) {
        return {
          distances: DISTANCE_NAMES,
          predictor: () => {
            throw error;
          },
        };
      }
    },
  );
  return {
    distances: [...new Set(prepared.flatMap((p) => p.distances))],
    predict(site, pairs, out) {
      prepared.forEach((p, i) =>
        p.predictor().predictPairs(site, pairs, out[i] as PairPredictions),
      );
    },
  };
}

export function preparedMotions(
  model: GroundMotionModel,
  ruptures: readonly RuptureContext[],
  measures: readonly Measure[],
): LazyMotions {
  if (model.prepareMeasures) {
    try {
      const motions = model.prepareMeasures(ruptures, measures);
      return {
        distances: motions.distances,
        predict: (site, pairs, out) => motions.predictPairs(site, pairs, out),
      };
    } catch {
      // One of the measures cannot be prepared: measure by measure keeps each one's error for when it is reached.
    }
  }
  return measureByMeasure(model, ruptures, measures);
}

/** Every distance of one rupture (table index) to a site, by the fast path's geometry (km). */
export function pairDistanceContext(
  geometry: RuptureGeometry,
  ruptureIndex: number,
  site: PointXY,
): DistanceContext {
  const one = createPairBuffer(1);
  siteDistances(
    {
      geometry,
      ruptures: Int32Array.of(ruptureIndex),
      site,
      maxDistanceKm: Infinity,
      distances: new Set(DISTANCE_NAMES),
    },
    one,
  );
  return {
    rjbKm: one.rjbKm[0] as number,
    rrupKm: one.rrupKm[0] as number,
    rxKm: one.rxKm[0] as number,
    ry0Km: one.ry0Km[0] as number,
    rhypoKm: one.rhypoKm[0] as number,
    repiKm: one.repiKm[0] as number,
  };
}

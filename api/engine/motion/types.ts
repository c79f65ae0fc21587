import type { Mechanism, TectonicSetting } from '../model.ts';
import type { Measure } from './measure.ts';

/** What a ground-motion model may need of the rupture. */
export interface RuptureContext {
  readonly magnitude: number;
  readonly rakeDeg: number;
  readonly mechanism: Mechanism;
  readonly setting: TectonicSetting;
  readonly dipDeg: number;
  /** Depth to the top of the rupture, km. */
  readonly ztorKm: number;
  /** Down-dip width of the rupture, km. */
  readonly widthKm: number;
  /** Hypocentral depth, km. */
  readonly hypoDepthKm: number;
}

/** The numeric fields of a RuptureContext (the rupture table keeps one column for each). */
export const RUPTURE_NUMBERS = [
  'magnitude',
  'rakeDeg',
  'dipDeg',
  'ztorKm',
  'widthKm',
  'hypoDepthKm',
] as const satisfies readonly (keyof RuptureContext)[];

/** Source-to-site distances, km (definitions as in the NGA-West2 flatfile). */
export interface DistanceContext {
  /** Joyner-Boore: shortest horizontal distance to the surface projection of the rupture. */
  readonly rjbKm: number;
  /** Shortest distance to the rupture plane. */
  readonly rrupKm: number;
  /** Horizontal distance from the top edge, perpendicular to strike; positive on the hanging wall. */
  readonly rxKm: number;
  /** Horizontal distance off the ends of the rupture, parallel to strike; 0 alongside it. */
  readonly ry0Km: number;
  readonly rhypoKm: number;
  readonly repiKm: number;
}

export interface SiteContext {
  /** m/s */
  readonly vs30: number;
  readonly vs30Measured: boolean;
  /** Depth to Vs = 1.0 km/s, km; models use their own Vs30-based default when absent. */
  readonly z1Km?: number;
  /** Depth to Vs = 2.5 km/s, km. */
  readonly z2p5Km?: number;
}

export type GmmInput = RuptureContext & DistanceContext & SiteContext;

/**
 * A prediction: natural log of the median (ln g for PGA and SA, ln cm/s for PGV) and the
 * standard deviations in natural-log units. Outside the model's validity the numbers are still
 * finite, `applicable` is false and `notes` say why.
 */
export interface GmmPrediction {
  readonly lnMedian: number;
  readonly sigma: number;
  /** Between-event standard deviation. */
  readonly tau: number;
  /** Within-event standard deviation. */
  readonly phi: number;
  readonly applicable: boolean;
  readonly notes: readonly string[];
}

export interface ValidityRange {
  readonly magnitude: readonly [min: number, max: number];
  /** Over the model's own distance metric (`distanceMetric`), km. */
  readonly distanceKm: readonly [min: number, max: number];
  readonly vs30: readonly [min: number, max: number];
  /** Hypocentral (or top-of-rupture, as the paper says) depth, km; absent where the model sets none. */
  readonly depthKm?: readonly [min: number, max: number];
}

export interface GroundMotionModel {
  /** The short name used in studies, e.g. "BSSA14". */
  readonly name: string;
  /** Authors, year, title, journal. */
  readonly citation: string;
  readonly settings: readonly TectonicSetting[];
  readonly distanceMetric: 'rjb' | 'rrup' | 'rhypo';
  /** Tabulated spectral periods, s, increasing. */
  readonly periodsS: readonly number[];
  readonly hasPga: boolean;
  readonly hasPgv: boolean;
  readonly validity: ValidityRange;
  /**
   * Median and sigma for one measure. Spectral periods between tabulated ones are the model's
   * business (see interpolate-period.ts); a period outside the table throws UnsupportedPeriod.
   */
  predict(input: GmmInput, measure: Measure): GmmPrediction;
  /**
   * Optional precomputation hook for the fast hazard path (hazard/fast-site-hazard.ts): does the
   * work that does not depend on the site once for `ruptures` and `measure` (magnitude and
   * mechanism terms, period interpolation weights, validity of the rupture's own inputs), and
   * returns a predictor for many (rupture, site) pairs at a time. Its numbers are predict()'s
   * for the same inputs (the tests of each model check this pair by pair). It throws what
   * predict() would throw for the measure or for a rupture's inputs. Models without it are
   * evaluated pair by pair through predict() (hazard/prepared-motion.ts). A model made by
   * spreading another and replacing predict must replace or drop this hook too, or the fast
   * path would use the other model's numbers.
   */
  prepare?(ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion;
  /**
   * Optional: `prepare` for several measures at once, whose predictor fills one output per
   * measure and does the work the measures share once per pair (the rock motion that drives a
   * nonlinear site term, distance terms that do not depend on the period). Its numbers are
   * each measure's own prepare()'s. Models without it are prepared measure by measure. As
   * with `prepare`, a model made by spreading another and replacing predict must replace or
   * drop it.
   */
  prepareMeasures?(
    ruptures: readonly RuptureContext[],
    measures: readonly Measure[],
  ): PreparedMotions;
}

/** A distance of DistanceContext, by its field name. */
export type DistanceName = keyof DistanceContext;

/** Every distance of DistanceContext, in its order. */
export const DISTANCE_NAMES = [
  'rjbKm',
  'rrupKm',
  'rxKm',
  'ry0Km',
  'rhypoKm',
  'repiKm',
] as const satisfies readonly DistanceName[];

/**
 * Distances (km) of many (rupture, site) pairs at one site, as columns: entry k is one pair.
 * Only the columns a predictor lists in `PreparedMotion.distances` need be filled.
 */
export interface PairDistances {
  readonly count: number;
  /** Each pair's rupture, as an index into the list the predictor was prepared for. */
  readonly rupture: Int32Array;
  readonly rjbKm: Float64Array;
  readonly rrupKm: Float64Array;
  readonly rxKm: Float64Array;
  readonly ry0Km: Float64Array;
  readonly rhypoKm: Float64Array;
  readonly repiKm: Float64Array;
}

/** Where a predictor writes, entry k for pair k: ln median, σ (ln units) and 1 where applicable. */
export interface PairPredictions {
  readonly lnMedian: Float64Array;
  readonly sigma: Float64Array;
  readonly applicable: Uint8Array;
}

/** A model's predictor for one measure over a fixed list of ruptures (GroundMotionModel.prepare). */
export interface PreparedMotion {
  /** The distance columns predictPairs reads. */
  readonly distances: readonly DistanceName[];
  /** Predictions for the first `pairs.count` pairs at `site` (the notes come from predict()). */
  predictPairs(site: SiteContext, pairs: PairDistances, out: PairPredictions): void;
}

/** A model's predictor for several measures over a fixed list of ruptures (GroundMotionModel.prepareMeasures). */
export interface PreparedMotions {
  /** The distance columns predictPairs reads. */
  readonly distances: readonly DistanceName[];
  /** Predictions for the first `pairs.count` pairs at `site`: out[i] for measure i of those prepared. */
  predictPairs(site: SiteContext, pairs: PairDistances, out: readonly PairPredictions[]): void;
}

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
}

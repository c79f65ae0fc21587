/**
 * The typed domain of a study, after validation (api/study/ turns the JSON contract of
 * DESIGN.md section 2 into these). Plain data: every later stage reads it and none mutates it.
 * Degrees and WGS84 [lon, lat] here, as at the boundary; radians and km frames live inside geometry.
 */

export type TectonicSetting = 'crustal' | 'interface' | 'intraslab';
export const TECTONIC_SETTINGS: readonly TectonicSetting[] = ['crustal', 'interface', 'intraslab'];

export type Mechanism = 'strike-slip' | 'reverse' | 'normal';

/** WGS84 longitude, latitude in degrees (RFC 7946 order). */
export type LonLat = readonly [lonDeg: number, latDeg: number];

/** ASCE 7-16 site class letters, with the intermediate classes. */
export type SiteClass = 'A' | 'B' | 'BC' | 'C' | 'CD' | 'D' | 'DE' | 'E';

export interface Community {
  readonly id: string;
  readonly name: string;
  readonly lon: number;
  readonly lat: number;
  /** Time-averaged shear-wave velocity of the top 30 m, m/s. */
  readonly vs30: number;
  /**
   * Where vs30 came from: given directly, the representative value of a site class, or the
   * slope–Vs30 proxy over the study's terrain grid (then `vs30Proxy` says how).
   */
  readonly vs30Basis: 'measured' | 'site-class' | 'slope-proxy';
  readonly siteClass?: SiteClass;
  /** The slope proxy behind vs30 when `vs30Basis` is `slope-proxy` (engine/terrain/slope-vs30.ts). */
  readonly vs30Proxy?: Vs30Proxy;
  readonly population?: number;
  readonly coastal: boolean;
  readonly elevationM?: number;
  /** What the community's file says that the computation does not use (school, clinic, notes), shown on its page. */
  readonly details?: Readonly<Record<string, string>>;
}

/** A Vs30 estimated from topographic slope (Wald & Allen 2007), with the range it stands for. */
export interface Vs30Proxy {
  /** Topographic slope, m/m. */
  readonly slope: number;
  /** The NEHRP class of the slope's row. */
  readonly siteClass: 'B' | 'C' | 'D' | 'E';
  /** The class's Vs30 range, m/s: the proxy's stated uncertainty. */
  readonly vs30Range: readonly [min: number, max: number];
}

export type Recurrence = GutenbergRichterRecurrence | MomentBalancedRecurrence | FixedRecurrence;

/** One alternative of a source-model logic-tree branch point, with its weight. */
export interface Alternative<T> {
  readonly value: T;
  readonly weight: number;
}

/**
 * A source's logic tree: alternatives for some of its recurrence parameters, each list's
 * weights summing to 1. A parameter listed here replaces the recurrence's single value in the
 * tree; its variants are every combination of one alternative per parameter
 * (recurrence/recurrence-variants.ts).
 */
export interface RecurrenceAlternatives {
  readonly mMax?: readonly Alternative<number>[];
  readonly bValue?: readonly Alternative<number>[];
  readonly shape?: readonly Alternative<'gutenberg-richter' | 'characteristic'>[];
  readonly slipRateMmYr?: readonly Alternative<number>[];
  /** Annual rate of M >= mMin (Gutenberg–Richter given by `rate`) or of the fixed magnitude. */
  readonly rate?: readonly Alternative<number>[];
}

/** log10 N(M >= m) = aValue - bValue m per year, truncated at mMax; or `rate` = N(M >= mMin). */
export interface GutenbergRichterRecurrence {
  readonly type: 'gutenberg-richter';
  readonly bValue: number;
  readonly mMin: number;
  readonly mMax: number;
  readonly aValue?: number;
  readonly rate?: number;
  readonly alternatives?: RecurrenceAlternatives;
}

export interface MomentBalancedRecurrence {
  readonly type: 'moment-balanced';
  readonly slipRateMmYr: number;
  readonly bValue: number;
  readonly mMin: number;
  readonly mMax: number;
  readonly shape: 'gutenberg-richter' | 'characteristic';
  readonly shearModulusPa: number;
  readonly alternatives?: RecurrenceAlternatives;
}

export interface FixedRecurrence {
  readonly type: 'fixed';
  readonly magnitude: number;
  readonly rate: number;
  readonly alternatives?: RecurrenceAlternatives;
}

interface SourceCommon {
  readonly id: string;
  readonly name: string;
  readonly setting: TectonicSetting;
  readonly mechanism: Mechanism;
  readonly rakeDeg: number;
  readonly recurrence: Recurrence;
}

/**
 * A surface given by its depth contours (a GeoJSON MultiLineString): lines in order down dip,
 * each at one depth, all running the same way.
 */
export interface FaultContours {
  readonly lines: readonly (readonly LonLat[])[];
  /** One depth per line, km, increasing. */
  readonly depthsKm: readonly number[];
  /** Largest side of the mesh cells built between the contours, km. */
  readonly meshSpacingKm: number;
}

/**
 * A fault: planar by segment from a LineString trace, or, with `contours`, the mesh between
 * its depth contours (geometry/contour-mesh.ts). A contoured fault's trace is its top contour,
 * its depths those of its first and last contours and its dip their mean, for what only needs
 * an outline (maps, the study's extent, size estimates).
 */
export interface FaultSource extends SourceCommon {
  readonly kind: 'fault';
  readonly trace: readonly LonLat[];
  readonly contours?: FaultContours;
  readonly dipDeg: number;
  /** Azimuth (deg clockwise from north) the fault dips towards. */
  readonly dipDirectionDeg: number;
  readonly upperDepthKm: number;
  readonly lowerDepthKm: number;
}

/** One hypocentral depth of a zone and its weight (the weights of a zone sum to 1). */
export interface WeightedDepth {
  readonly depthKm: number;
  readonly weight: number;
}

/** Distributed seismicity inside a polygon (outer ring first, then holes). */
export interface ZoneSource extends SourceCommon {
  readonly kind: 'zone';
  readonly rings: readonly (readonly LonLat[])[];
  /** Hypocentral depth, km; with depthFrom or depths, only a representative value (their mean). */
  readonly depthKm: number;
  /**
   * Each cell's hypocentres `offsetKm` below the surface of the contoured fault `sourceId`
   * straight under the cell's centre (ruptures/zone-depths.ts).
   */
  readonly depthFrom?: { readonly sourceId: string; readonly offsetKm: number };
  /** Hypocentral depths with weights, the same in every cell. */
  readonly depths?: readonly WeightedDepth[];
  /** Seismogenic depths (km) the finite ruptures of large earthquakes are kept within (ruptures/virtual-ruptures.ts); the ground and no lower bound when absent. */
  readonly upperDepthKm?: number;
  readonly lowerDepthKm?: number;
}

export interface PointSource extends SourceCommon {
  readonly kind: 'point';
  readonly location: LonLat;
  readonly depthKm: number;
  /** As a zone's: the seismogenic depths its large earthquakes' finite ruptures are kept within, km. */
  readonly upperDepthKm?: number;
  readonly lowerDepthKm?: number;
}

export type Source = FaultSource | ZoneSource | PointSource;

export interface Branch {
  readonly model: string;
  readonly weight: number;
}

export type GroundMotionBranches = Readonly<Record<TectonicSetting, readonly Branch[]>>;

export interface Settings {
  /** Intensity measures: "PGA", "PGV", "SA(T)" with T in seconds. */
  readonly measures: readonly string[];
  /** Hazard-curve levels per measure, g (PGV cm/s), increasing. */
  readonly levels: Readonly<Record<string, readonly number[]>>;
  readonly horizonsYears: readonly number[];
  readonly returnPeriodsYears: readonly number[];
  /** Ground-motion distribution truncated at this many standard deviations above and below. */
  readonly truncationSigma: number;
  /** Ruptures farther than this (Rjb, km) from a site are skipped. */
  readonly maxDistanceKm: number;
  /** Width of the magnitude bins, magnitude units. */
  readonly magnitudeStep: number;
  /** Spacing of floating-rupture positions along strike and down dip, km. */
  readonly ruptureSpacingKm: number;
  /** Side of the square cells a zone is spread over, km. */
  readonly zoneCellKm: number;
  /** Which Worden et al. (2012) relation intensity comes from: 'PGA' (when absent) or 'PGV'. */
  readonly intensityMeasure?: 'PGA' | 'PGV';
  /** Fractiles of the hazard curves over the logic tree, in (0, 1); 0.16, 0.5, 0.84 when absent. */
  readonly fractiles?: readonly number[];
}

export interface Study {
  readonly name: string;
  readonly communities: readonly Community[];
  readonly sources: readonly Source[];
  readonly groundMotion: GroundMotionBranches;
  readonly settings: Settings;
  /** Optional coastline or outline polygons for maps (outer rings), WGS84. */
  readonly outline?: readonly (readonly LonLat[])[];
  /** File name of the terrain grid (elevation, m; negative below sea level), as the study gives it. */
  readonly terrain?: string;
}

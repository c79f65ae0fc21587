/**
 * The results of a screening (DESIGN.md section 2: these key names are a contract; extend,
 * never rename). Accelerations in g, PGV in cm/s, rates per year, probabilities in [0, 1].
 */

import type { Vs30Proxy } from './model.ts';
export interface HazardCurve {
  readonly levels: readonly number[];
  /** Mean annual rate of exceeding each level over the logic tree. */
  readonly annualRate: readonly number[];
  /** Per-branch curves (one per combination of the settings' branches present), for the spread. */
  readonly branches?: readonly BranchCurve[];
  /**
   * Fractile curves over the whole logic tree (source alternatives × ground-motion branches),
   * level by level, keyed by the fractile as written in the settings ("0.16", "0.5", "0.84").
   */
  readonly fractiles?: Readonly<Record<string, readonly number[]>>;
}

export interface BranchCurve {
  /** e.g. "crustal=BSSA14, interface=AGA16". */
  readonly label: string;
  readonly weight: number;
  readonly annualRate: readonly number[];
}

/** Where a return period's level falls outside the computed curve. */
export type ReturnPeriodStatus = 'ok' | 'below-lowest-level' | 'above-highest-level';

export interface DeaggregationBin {
  readonly magnitude: readonly [min: number, max: number];
  readonly distanceKm: readonly [min: number, max: number];
  readonly epsilon: readonly [min: number, max: number];
  readonly share: number;
}

export interface Deaggregation {
  readonly measure: string;
  readonly level: number;
  readonly returnPeriodYears: number;
  readonly bySource: readonly {
    readonly sourceId: string;
    readonly name: string;
    readonly share: number;
  }[];
  readonly mean: {
    readonly magnitude: number;
    readonly distanceKm: number;
    readonly epsilon: number;
  };
  readonly mode: {
    readonly magnitude: number;
    readonly distanceKm: number;
    readonly epsilon: number;
  };
  readonly bins: readonly DeaggregationBin[];
}

export interface IntensityResult {
  /** MMI at each return period (key: years as a string), with the measure it came from. */
  readonly atReturnPeriod: Readonly<
    Record<
      string,
      { readonly mmi: number | null; readonly roman: string | null; readonly fromMeasure: string }
    >
  >;
  /** Chance of reaching MMI VI, VII and VIII in each horizon (key: years as a string). */
  readonly chanceOfReaching: Readonly<
    Record<string, Readonly<Record<'VI' | 'VII' | 'VIII', number>>>
  >;
  /** The conversion the intensities come from and the scatter (MMI units) the chances include; absent in results saved before it was recorded. */
  readonly conversion?: {
    readonly measure: 'PGA' | 'PGV';
    readonly relation: string;
    readonly sigmaMmi: number;
  };
}

export interface NearestFault {
  readonly sourceId: string;
  readonly name: string;
  /** Joyner-Boore distance to the whole fault surface, km. */
  readonly distanceKm: number;
  /** Bearing from the community to the closest point of the surface projection, deg from north. */
  readonly bearingDeg: number;
  /** Shortest distance to the whole fault surface, through the ground (Rrup), km: the order of the list. */
  readonly rrupKm: number;
  /** Where the community stands above the fault (distanceKm 0): the fault's depth straight below it, km. */
  readonly depthBelowKm?: number;
}

export interface ScreeningBand {
  readonly id: string;
  readonly label: string;
  readonly mmi475: number | null;
}

/** One alternative of a logic-tree choice, with the band the mean hazard would give if it were the only one. */
export interface HingeAlternative {
  /** The alternative's value ("7.2", "characteristic") or, for ground motion, the model. */
  readonly value: string;
  readonly weight: number;
  /** 475-year MMI of the mean hazard with this alternative alone (the band's MMI; null below the curve). */
  readonly mmi475: number | null;
  readonly bandId: string;
}

/** One choice of the logic tree and how far switching it alone moves the 475-year intensity. */
export interface BandHinge {
  /** "groundMotion", or the recurrence parameter: mMax, bValue, shape, slipRateMmYr, rate. */
  readonly choice: string;
  readonly setting: string;
  /** The source whose parameter it is; absent for a setting's ground-motion models. */
  readonly sourceId?: string;
  readonly sourceName?: string;
  /** Largest less smallest 475-year MMI over the alternatives. */
  readonly mmiShift: number;
  /** Whether the alternatives give more than one band. */
  readonly changesBand: boolean;
  readonly alternatives: readonly HingeAlternative[];
}

/** How firmly the logic tree puts a community in its band. */
export interface BandRobustness {
  /** Share of the logic tree's weight in each band, by band id (every band listed). */
  readonly bandShares: Readonly<Record<string, number>>;
  /** Combinations of the whole tree (source alternatives × ground-motion branches). */
  readonly combinations: number;
  /** How many combinations were drawn when the tree was too large to list (null: listed exactly). */
  readonly sampled: number | null;
  /** The choices that move the 475-year intensity most, largest first (band changes first). */
  readonly hinges: readonly BandHinge[];
}

export interface CommunityResult {
  readonly communityId: string;
  readonly name: string;
  readonly curves: Readonly<Record<string, HazardCurve>>;
  /** atReturnPeriod["475"]["PGA"]: the level (g; PGV cm/s) with that return period, or null. */
  readonly atReturnPeriod: Readonly<Record<string, Readonly<Record<string, number | null>>>>;
  readonly returnPeriodStatus: Readonly<
    Record<string, Readonly<Record<string, ReturnPeriodStatus>>>
  >;
  /** chanceOfExceeding["50"]["PGA"][i]: Poisson probability of exceeding levels[i] within 50 years. */
  readonly chanceOfExceeding: Readonly<Record<string, Readonly<Record<string, readonly number[]>>>>;
  readonly intensity: IntensityResult;
  /** deaggregation["475"]: at the first measure of the settings (PGA by default). */
  readonly deaggregation: Readonly<Record<string, Deaggregation>>;
  readonly nearestFaults: readonly NearestFault[];
  readonly band: ScreeningBand;
  /** Absent in results saved before the logic tree was summarised. */
  readonly bandRobustness?: BandRobustness;
  /** Present when the community's Vs30 (m/s) is the slope proxy's estimate, not a given value. */
  readonly vs30Proxy?: Vs30Proxy & { readonly vs30: number };
  readonly warnings: readonly string[];
}

export interface Provenance {
  readonly tool: 'tremora';
  readonly toolVersion: string;
  /** SHA-256 of the canonical JSON of the validated study. */
  readonly inputHash: string;
  readonly models: Readonly<
    Record<string, readonly { readonly model: string; readonly weight: number }[]>
  >;
  readonly settings: unknown;
  readonly startedAt: string;
  readonly finishedAt: string;
}

/** The depths one zone's cells were given (ruptures/zone-depth-report.ts). */
export interface ZoneDepthReport {
  readonly sourceId: string;
  readonly name: string;
  /** Where the depths came from: a contoured source and the offset below it (km), or the zone's weighted list. */
  readonly basis: { readonly depthFromSource: string; readonly offsetKm: number } | 'depths';
  /** Each cell's centre (degrees) and its hypocentral depths (km) with their weights. */
  readonly cells: readonly {
    readonly lon: number;
    readonly lat: number;
    readonly depths: readonly { readonly depthKm: number; readonly weight: number }[];
  }[];
}

/** What the screening used that is not a result: zone depths per cell. */
export interface StudyDiagnostics {
  readonly zoneDepths: readonly ZoneDepthReport[];
}

export interface StudyResult {
  readonly studyName: string;
  readonly communities: readonly CommunityResult[];
  readonly warnings: readonly string[];
  /** Absent from results stored before diagnostics were reported. */
  readonly diagnostics?: StudyDiagnostics;
  readonly provenance: Provenance;
}

import type { TectonicSetting } from '../model.ts';
import type { GroundMotionModel } from '../motion/types.ts';
import type { Measure } from '../motion/measure.ts';

/** One logic-tree branch of a tectonic setting: a model and its weight. */
export interface HazardBranch {
  readonly model: GroundMotionModel;
  readonly weight: number;
}

/** A measure as named in the study ("SA(0.2)"), parsed, with its curve levels. */
export interface HazardMeasure {
  readonly key: string;
  readonly measure: Measure;
  readonly levels: readonly number[];
}

/** Rupture evaluations outside one model's validity at a site, over all measures. */
export interface ValiditySummary {
  readonly model: string;
  readonly outside: number;
  readonly evaluated: number;
  readonly firstNote: string;
}

/** What a site's hazard integral is asked for: the logic tree, the measures and the cut-offs. */
export interface HazardIntegralOptions {
  /** The branches of every setting that has ruptures (others are ignored). */
  readonly branches: Readonly<Partial<Record<TectonicSetting, readonly HazardBranch[]>>>;
  readonly measures: readonly HazardMeasure[];
  /** Ground-motion distribution truncated at this many standard deviations (Settings). */
  readonly truncationSigma: number;
  /** Ruptures farther than this (Rjb, km) from the site are skipped (Settings). */
  readonly maxDistanceKm: number;
  /** Per-branch curves are listed for at most this many branch combinations (logic-tree.ts). */
  readonly maxBranchCombinations?: number;
}

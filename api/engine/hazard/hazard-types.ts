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

import type { Measure } from './measure.ts';
import { singleMeasure } from './prepared-period.ts';
import type { GroundMotionModel, RuptureContext } from './types.ts';

/** What a model file states about itself; `prepare` follows from `prepareMeasures`. */
export type ModelParts = Omit<GroundMotionModel, 'prepare' | 'prepareMeasures'> & {
  readonly prepareMeasures: NonNullable<GroundMotionModel['prepareMeasures']>;
};

/**
 * The frozen GroundMotionModel of a model file: its own predict and prepareMeasures, and
 * prepare as prepareMeasures for the one measure, so the two fast-path hooks cannot disagree.
 */
export function assembleModel(parts: ModelParts): GroundMotionModel {
  const { prepareMeasures } = parts;
  return Object.freeze({
    ...parts,
    settings: Object.freeze([...parts.settings]),
    prepare: (ruptures: readonly RuptureContext[], measure: Measure) =>
      singleMeasure(prepareMeasures(ruptures, [measure])),
  });
}

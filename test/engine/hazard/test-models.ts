import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { shiftedMotion } from '../../../api/engine/motion/shifted-motion.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  PreparedMotion,
  RuptureContext,
} from '../../../api/engine/motion/types.ts';
import type { TectonicSetting } from '../../../api/engine/model.ts';

/**
 * Test scaffolding for logic-tree arithmetic: Cornell et al. (1979) with its median multiplied
 * by `factor`, under another name and setting. Not a published model; every expected value
 * built on it is the Cornell closed form with ln(factor) added. Both of Cornell's ways in are
 * scaled: predict() and the fast path's hook (GroundMotionModel.prepare), which spreading
 * cornell79 would otherwise hand on unscaled.
 */
export function scaledCornell(
  name: string,
  factor: number,
  setting: TectonicSetting = 'crustal',
): GroundMotionModel {
  const lnFactor = Math.log(factor);
  return {
    ...cornell79,
    name,
    settings: [setting],
    predict(input: GmmInput, measure: Measure): GmmPrediction {
      const p = cornell79.predict(input, measure);
      return { ...p, lnMedian: p.lnMedian + lnFactor };
    },
    prepare(ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion {
      return shiftedMotion(cornell79.prepare!(ruptures, measure), lnFactor);
    },
  };
}

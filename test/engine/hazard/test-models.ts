import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import type { GmmInput, GmmPrediction, GroundMotionModel } from '../../../api/engine/motion/types.ts';
import type { TectonicSetting } from '../../../api/engine/model.ts';

/**
 * Test scaffolding for logic-tree arithmetic: Cornell et al. (1979) with its median multiplied
 * by `factor`, under another name and setting. Not a published model; every expected value
 * built on it is the Cornell closed form with ln(factor) added.
 */
export function scaledCornell(name: string, factor: number, setting: TectonicSetting = 'crustal'): GroundMotionModel {
  return {
    ...cornell79,
    name,
    settings: [setting],
    predict(input: GmmInput, measure: Measure): GmmPrediction {
      const p = cornell79.predict(input, measure);
      return { ...p, lnMedian: p.lnMedian + Math.log(factor) };
    },
  };
}

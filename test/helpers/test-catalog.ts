import { createModelCatalog, type ModelCatalog } from '../../api/engine/motion/catalog.ts';
import type { GroundMotionModel } from '../../api/engine/motion/types.ts';

/**
 * Catalog entries for validation tests: they describe what a model covers; loading never
 * predicts, so predict() refuses loudly if a test reaches it by mistake.
 */
function descriptor(
  name: string,
  settings: GroundMotionModel['settings'],
  periodsS: number[],
  hasPgv: boolean,
): GroundMotionModel {
  return {
    name,
    citation: 'validation-test descriptor',
    settings,
    distanceMetric: 'rjb',
    periodsS,
    hasPga: true,
    hasPgv,
    validity: { magnitude: [3, 8.5], distanceKm: [0, 400], vs30: [150, 1500] },
    predict() {
      throw new Error(`${name} is a validation-test descriptor and does not predict`);
    },
  };
}

export const testCatalog: ModelCatalog = createModelCatalog(
  [
    descriptor('CRUSTAL-A', ['crustal'], [0.01, 0.1, 0.2, 0.5, 1, 2, 3, 10], true),
    descriptor('CRUSTAL-B', ['crustal'], [0.01, 0.1, 0.2, 0.5, 1, 2, 3, 10], true),
    descriptor('SUBDUCTION-A', ['interface', 'intraslab'], [0.02, 0.2, 0.5, 1, 3, 10], false),
    descriptor('PGA-ONLY', ['crustal'], [], false),
  ],
  {
    crustal: [{ model: 'CRUSTAL-A', weight: 1 }],
    interface: [{ model: 'SUBDUCTION-A', weight: 1 }],
    intraslab: [{ model: 'SUBDUCTION-A', weight: 1 }],
  },
);

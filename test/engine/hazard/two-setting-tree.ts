import type { HazardMeasure } from '../../../api/engine/hazard/hazard-types.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import { expectRelative } from '../../helpers/close.ts';
import { pointRuptures } from './point-ruptures.ts';
import { scaledCornell } from './test-models.ts';

/*
 * A logic tree over two settings, for hand computations: a crustal rupture (M 6.5, 10 km,
 * 0.01/yr) under two branches, Cornell et al. (1979) (0.6) and the same × 1.5 (0.4); an
 * interface rupture (M 8, 250 km, 0.001/yr) under one branch, Cornell × 2. PGA at 0.05 and 0.3 g.
 */
export const TWO_SETTING_RUPTURES = pointRuptures([
  {
    magnitude: 6.5,
    annualRate: 0.01,
    repiKm: 10,
    setting: 'crustal',
    sourceIndex: 0,
    sourceId: 'ridge-fault',
  },
  {
    magnitude: 8,
    annualRate: 0.001,
    repiKm: 250,
    setting: 'interface',
    sourceIndex: 1,
    sourceId: 'trench',
  },
]);

export const TWO_SETTING_BRANCHES = {
  crustal: [
    { model: cornell79, weight: 0.6 },
    { model: scaledCornell('Scaled', 1.5), weight: 0.4 },
  ],
  interface: [{ model: scaledCornell('Trench2x', 2, 'interface'), weight: 1 }],
};

export const TWO_SETTING_MEASURES: HazardMeasure[] = [
  { key: 'PGA', measure: { kind: 'PGA' }, levels: [0.05, 0.3] },
];

/**
 * Checks the per-branch curves at 0.3 g against the hand computation λc Q(ε) + λi Q(εi) for each
 * crustal branch, the interface branch added (untruncated; worked in site-hazard.test.ts).
 */
export function expectTwoSettingBranchRatesAt03g(
  branches: readonly { annualRate: readonly number[] }[],
  tolerance: number,
): void {
  expectRelative(
    branches[0]!.annualRate[1]!,
    0.0065400181466918296,
    tolerance,
    'hand computation, crustal=Cornell79 branch',
  );
  expectRelative(
    branches[1]!.annualRate[1]!,
    0.008661259605819887,
    tolerance,
    'hand computation, crustal=Scaled branch',
  );
}

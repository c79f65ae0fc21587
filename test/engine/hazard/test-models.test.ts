import { describe, it } from 'vitest';
import { createFastHazard, fastSiteHazard } from '../../../api/engine/hazard/fast-site-hazard.ts';
import { ruptureTable } from '../../../api/engine/hazard/rupture-table-builder.ts';
import { expectRelative } from '../../helpers/close.ts';
import { checkPreparedModel } from '../motion/prepared-checks.ts';
import { ROCK_SITE } from './point-ruptures.ts';
import { scaledCornell } from './test-models.ts';
import {
  TWO_SETTING_BRANCHES,
  TWO_SETTING_MEASURES,
  TWO_SETTING_RUPTURES,
  expectTwoSettingBranchRatesAt03g,
} from './two-setting-tree.ts';

/*
 * The scaled Cornell et al. (1979) scaffolding on the fast path: its hook must scale the median
 * as its predict() does. The logic tree is site-hazard.test.ts's (a crustal rupture, M 6.5 at
 * 10 km, 0.01/yr, under Cornell (0.6) and Cornell × 1.5 (0.4); an interface rupture, M 8 at
 * 250 km, 0.001/yr, under Cornell × 2), and so are the expected rates: the hand computation
 * 0.6 λc Q(ε₁) + 0.4 λc Q(ε₂) + λi Q(εi), untruncated, from the printed equation.
 */
const { ruptures } = TWO_SETTING_RUPTURES;

describe('scaledCornell (test scaffolding) on the fast path', () => {
  it("its hook gives its predict()'s numbers pair by pair", () => {
    checkPreparedModel(scaledCornell('Scaled', 1.5), [{ kind: 'PGA' }], ['crustal'], 50);
  });

  it('a fast-path screening gives the hand-computed mean and branch curves', () => {
    const fast = createFastHazard({
      table: ruptureTable(ruptures),
      branches: TWO_SETTING_BRANCHES,
      measures: TWO_SETTING_MEASURES,
      truncationSigma: Infinity,
      maxDistanceKm: 300,
    });
    const curve = fastSiteHazard(fast, { point: { x: 0, y: 0 }, site: ROCK_SITE }).curves.PGA!;
    // 1e-9: the fast path's √ for Math.hypot and its order of sums, nothing else (the exceedance is exact when untruncated).
    expectRelative(
      curve.annualRate[0]!,
      0.010688258634279083,
      1e-9,
      'hand computation at 0.05 g (site-hazard.test.ts)',
    );
    expectRelative(
      curve.annualRate[1]!,
      0.007388514730343052,
      1e-9,
      'hand computation at 0.3 g (site-hazard.test.ts)',
    );
    expectTwoSettingBranchRatesAt03g(curve.branches!, 1e-9);
  });
});

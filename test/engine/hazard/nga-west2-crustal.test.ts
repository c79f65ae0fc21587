import { describe, expect, it } from 'vitest';
import type { Study } from '../../../api/engine/model.ts';
import { screenStudy } from '../../../api/engine/screen-study.ts';
import { referenceScreening } from '../../helpers/reference-hazard/reference-screening.ts';
import { expectScreeningMatches } from '../fast-path-checks.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';

// ASK14 and CY14 have no precomputation hooks: the fast path evaluates them pair by pair through
// predict() (prepared-motion.ts), so the screening must match the reference sum (test/helpers/reference-hazard).
describe('ASK14 and CY14 in a screening', () => {
  it('match the reference sum with the same numbers, beside BSSA14 and CB14', () => {
    const base = allKindsStudy({ measures: ['PGA', 'SA(1.0)', 'PGV'] });
    const crustal = [
      { model: 'BSSA14', weight: 0.25 },
      { model: 'CB14', weight: 0.25 },
      { model: 'ASK14', weight: 0.25 },
      { model: 'CY14', weight: 0.25 },
    ];
    const study: Study = { ...base, groundMotion: { ...base.groundMotion, crustal } };
    const fast = screenStudy(study);
    expectScreeningMatches(fast, referenceScreening(study));
    for (const community of fast.communities) {
      for (const curve of Object.values(community.curves)) {
        for (const rate of curve.annualRate) expect(Number.isFinite(rate) && rate >= 0).toBe(true);
      }
    }
  });
});

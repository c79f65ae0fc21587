import { describe, expect, it } from 'vitest';
import { StudyTooLarge } from '../../api/engine/errors.ts';
import { DEFAULT_LEVEL_COUNT } from '../../api/engine/hazard/hazard-levels.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { checkWorkBudget, studyWork } from '../../api/operations/work-budget.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { smallStudy } from '../service/helpers/small-study.ts';

const load = (raw: unknown) => {
  const result = loadStudy(raw, { models: modelCatalog });
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.study;
};

describe('studyWork', () => {
  it('multiplies communities, ruptures and the levels of every measure computed', () => {
    const study = load(smallStudy());
    expect(studyWork(study, 40)).toEqual({
      communities: 1,
      ruptures: 40,
      variantRuptures: 0,
      extraPlanes: 0,
      measures: 1,
      measureLevels: 3,
      size: 120,
      detail: '1 community x 40 ruptures x 3 levels (over 1 measure)',
    });
  });

  it('counts PGA (added by the engine for intensity) and default levels where none are given', () => {
    const raw = smallStudy();
    raw.groundMotion = { crustal: [{ model: 'BSSA14', weight: 1 }] };
    raw.settings = { measures: ['SA(1.0)', 'PGV'] };
    const work = studyWork(load(raw), 10);
    expect(work.measures).toBe(3);
    expect(work.measureLevels).toBe(3 * DEFAULT_LEVEL_COUNT);
    expect(work.size).toBe(10 * 3 * DEFAULT_LEVEL_COUNT);
  });
});

describe('studyWork of a measured rupture table', () => {
  it('adds the per-variant sums to the ruptures and one term per extra plane (a contoured fault mesh cells)', () => {
    const study = load(smallStudy());
    const work = studyWork(study, { ruptures: 40, variantRuptures: 80, extraPlanes: 1000 });
    // 1 community x ((40 + 80) x 3 levels + 1000 planes)
    expect(work.size).toBe(1 * ((40 + 80) * 3 + 1000));
    expect(work.detail).toBe(
      "1 community x (40 ruptures + 80 per-variant sums) x 3 levels (over 1 measure) + 1 community x 1000 planes beyond each rupture's first",
    );
  });

  it('refuses a study whose contoured fault cells alone go over the budget', () => {
    const study = load(smallStudy());
    expect(() =>
      checkWorkBudget(study, { ruptures: 40, variantRuptures: 0, extraPlanes: 1 }, 120),
    ).toThrow(StudyTooLarge);
  });
});

describe('checkWorkBudget', () => {
  it('passes at the budget and refuses one over it, naming the size and the budget', () => {
    const study = load(smallStudy());
    expect(checkWorkBudget(study, 40, 120).size).toBe(120);
    const error = (() => {
      try {
        checkWorkBudget(study, 41, 120);
      } catch (e) {
        return e;
      }
      return undefined;
    })();
    expect(error).toBeInstanceOf(StudyTooLarge);
    expect((error as StudyTooLarge).size).toBe(123);
    expect((error as StudyTooLarge).budget).toBe(120);
    expect((error as StudyTooLarge).message).toBe(
      'study is too large: 1 community x 41 ruptures x 3 levels (over 1 measure) = 123, over the budget of 120',
    );
  });
});

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

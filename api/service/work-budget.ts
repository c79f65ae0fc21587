import { StudyTooLarge } from '../engine/errors.ts';
import { levelsFor } from '../engine/hazard/hazard-levels.ts';
import { INTENSITY_MEASURE } from '../engine/intensity/site-intensity.ts';
import type { Study } from '../engine/model.ts';
import { parseMeasure } from '../engine/motion/measure.ts';

/**
 * Most work one screening may ask for, counted as communities x ruptures x measure levels.
 * The demo study is about 7.5e7 and takes a few minutes on one core, so the budget admits
 * studies several times its size (tens of minutes on a core) and refuses those that would
 * hold a worker for hours. TREMORA_WORK_BUDGET overrides it.
 */
export const DEFAULT_WORK_BUDGET = 500_000_000;

export interface StudyWork {
  readonly communities: number;
  readonly ruptures: number;
  readonly measures: number;
  /** Hazard-curve levels summed over the measures computed. */
  readonly measureLevels: number;
  /** communities x ruptures x measureLevels. */
  readonly size: number;
  /** The product spelled out, for messages. */
  readonly detail: string;
}

/**
 * The work of screening `study` with `ruptureCount` ruptures: every community against every
 * rupture for every level of every measure computed. Measures are those of the settings plus
 * PGA when absent (the engine adds it for intensity), with the settings' levels or the defaults.
 */
export function studyWork(study: Study, ruptureCount: number): StudyWork {
  const keys = study.settings.measures.includes(INTENSITY_MEASURE) ? study.settings.measures : [...study.settings.measures, INTENSITY_MEASURE];
  const measureLevels = keys.reduce((n, key) => n + levelsFor(study.settings.levels, key, parseMeasure(key)).length, 0);
  const communities = study.communities.length;
  return {
    communities,
    ruptures: ruptureCount,
    measures: keys.length,
    measureLevels,
    size: communities * ruptureCount * measureLevels,
    detail: `${communities} communities x ${ruptureCount} ruptures x ${measureLevels} levels (over ${keys.length} measures)`,
  };
}

/** Throws StudyTooLarge when the work exceeds `budget`; returns the work otherwise. */
export function checkWorkBudget(study: Study, ruptureCount: number, budget: number): StudyWork {
  const work = studyWork(study, ruptureCount);
  if (work.size > budget) throw new StudyTooLarge(work.size, budget, work.detail);
  return work;
}

import { StudyTooLarge } from '../engine/errors.ts';
import { levelsFor } from '../engine/hazard/hazard-levels.ts';
import type { RuptureWork } from '../engine/hazard/rupture-work.ts';
import { INTENSITY_MEASURE, intensityMeasureOf } from '../engine/intensity/site-intensity.ts';
import type { Study } from '../engine/model.ts';
import { parseMeasure } from '../engine/motion/measure.ts';

/**
 * Most work one screening or map may ask for, counted as communities (or map points) x
 * ruptures x levels. Measured on the fast path on a 2-core machine (npm run bench, README
 * Performance): the demo study, 7.5e7, takes about 1.2 s, and the 10,000-point demo map,
 * 4.8e9, about 61 s; both run at 6e7 to 8e7 units a second. The budget, 2e10, admits about
 * four to five minutes of such a machine and refuses what would hold its threads for much longer.
 * TREMORA_WORK_BUDGET overrides it.
 */
export const DEFAULT_WORK_BUDGET = 20_000_000_000;

export interface StudyWork {
  readonly communities: number;
  readonly ruptures: number;
  /** Ruptures summed again per variant of the source-model logic tree (engine/hazard/rupture-work.ts). */
  readonly variantRuptures: number;
  /** Planes beyond the first of each rupture (a contoured fault's mesh cells). */
  readonly extraPlanes: number;
  readonly measures: number;
  /** Hazard-curve levels summed over the measures computed. */
  readonly measureLevels: number;
  /** communities x ((ruptures + variantRuptures) x measureLevels + extraPlanes). */
  readonly size: number;
  /** The product spelled out, for messages. */
  readonly detail: string;
}

/** "1 community", "11 communities". */
const count = (n: number, one: string, many: string): string => `${n} ${n === 1 ? one : many}`;

/**
 * The work of screening `study` whose rupture table is `measured` (or holds that many ruptures,
 * each of one plane, without logic-tree alternatives): every community against every rupture
 * for every level of every measure computed, again for each variant of a source with
 * alternatives (its per-variant sums), and one term per plane beyond a rupture's first (a
 * distance each; a contoured fault's rupture has one plane per mesh cell, which would otherwise
 * slip past the budget). Measures are those of the settings plus PGA and the intensity measure
 * when absent (the engine adds them for intensity), with the settings' levels or the defaults.
 */
export function studyWork(study: Study, measured: RuptureWork | number): StudyWork {
  const { ruptures, variantRuptures, extraPlanes } =
    typeof measured === 'number'
      ? { ruptures: measured, variantRuptures: 0, extraPlanes: 0 }
      : measured;
  const keys = [
    ...new Set([...study.settings.measures, INTENSITY_MEASURE, intensityMeasureOf(study.settings)]),
  ];
  const measureLevels = keys.reduce(
    (n, key) => n + levelsFor(study.settings.levels, key, parseMeasure(key)).length,
    0,
  );
  const communities = study.communities.length;
  const sums =
    variantRuptures > 0
      ? `(${count(ruptures, 'rupture', 'ruptures')} + ${variantRuptures} per-variant sums)`
      : count(ruptures, 'rupture', 'ruptures');
  const planes =
    extraPlanes > 0
      ? ` + ${count(communities, 'community', 'communities')} x ${count(extraPlanes, 'plane', 'planes')} beyond each rupture's first`
      : '';
  return {
    communities,
    ruptures,
    variantRuptures,
    extraPlanes,
    measures: keys.length,
    measureLevels,
    size: communities * ((ruptures + variantRuptures) * measureLevels + extraPlanes),
    detail: `${count(communities, 'community', 'communities')} x ${sums} x ${count(measureLevels, 'level', 'levels')} (over ${count(keys.length, 'measure', 'measures')})${planes}`,
  };
}

/** Throws StudyTooLarge when the work exceeds `budget`; returns the work otherwise. */
export function checkWorkBudget(
  study: Study,
  measured: RuptureWork | number,
  budget: number,
): StudyWork {
  const work = studyWork(study, measured);
  if (work.size > budget) throw new StudyTooLarge(work.size, budget, work.detail);
  return work;
}

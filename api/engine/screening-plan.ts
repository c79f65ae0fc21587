import type { CommunityHazard, ScreeningMeasures } from './community-result.ts';
import { InvalidInput } from './errors.ts';
import type { LocalFrame } from './geometry/projection.ts';
import { fastDeaggregate } from './hazard/fast-deaggregation.ts';
import { createFastHazard, fastSiteHazard, type FastHazard } from './hazard/fast-site-hazard.ts';
import { levelsFor } from './hazard/hazard-levels.ts';
import type { RuptureTable } from './hazard/rupture-table.ts';
import type { HazardBranch, HazardMeasure } from './hazard/hazard-types.ts';
import { studyFrameAndTable } from './hazard/study-rupture-table.ts';
import { DEFAULT_FRACTILES } from './hazard/fractiles.ts';
import { sourceTree } from './hazard/source-tree.ts';
import { treeSummary } from './hazard/tree-summary.ts';
import { INTENSITY_MEASURE, intensityMeasureOf } from './intensity/site-intensity.ts';
import { INTENSITY_CONVERSIONS } from './intensity/worden2012.ts';
import { TECTONIC_SETTINGS } from './model.ts';
import type { Community, Study, TectonicSetting } from './model.ts';
import type { ModelCatalog } from './motion/catalog.ts';
import { parseMeasure } from './motion/measure.ts';
import { PGV_FROM_SA_NOTE, withPgvFromSa } from './motion/pgv-from-sa.ts';
import { modelCatalog } from './motion/registry.ts';

/** Logic-tree weights of a setting must sum to 1 within this (as the study schema requires). */
const WEIGHT_SUM_TOLERANCE = 1e-6;

/** Everything about a screening that does not depend on the community. */
export interface ScreeningPlan {
  readonly study: Study;
  readonly measures: ScreeningMeasures;
  readonly branches: Readonly<Partial<Record<TectonicSetting, HazardBranch[]>>>;
  readonly branchCount: number;
  /** Study-level warnings found while planning (PGV derived from SA). */
  readonly warnings: readonly string[];
  readonly frame: LocalFrame;
  readonly ruptureCount: number;
  /** The ruptures as a table, e.g. to hand to worker threads. */
  readonly table: RuptureTable;
  /** One community's hazard; `afterBranch` after each branch (it may throw to stop). */
  hazardAt(community: Community, afterBranch: () => void): CommunityHazard;
}

export interface ScreeningPlanOptions {
  /** The models studies may name; the registry's by default. */
  readonly models?: ModelCatalog;
  /** The study's rupture table, already built: the study is not discretised again. */
  readonly table?: RuptureTable;
}

/** A screening's measures and branches, resolved and checked, with the warnings that found. */
export type ScreeningSetup = Pick<
  ScreeningPlan,
  'study' | 'measures' | 'branches' | 'branchCount' | 'warnings'
>;

/** Resolves and checks a study's measures and branches, without touching its ruptures. */
export function screeningSetup(study: Study, models: ModelCatalog = modelCatalog): ScreeningSetup {
  const measures = hazardMeasures(study);
  const warnings: string[] = [];
  const branches = resolveBranches(study, measures, models, warnings);
  const branchCount = Object.values(branches).reduce((n, list) => n + list.length, 0);
  return { study, measures, branches, branchCount, warnings };
}

/** Resolves a study's measures and branches and lays out its ruptures in a table. */
export function planScreening(study: Study, options: ScreeningPlanOptions = {}): ScreeningPlan {
  const setup = screeningSetup(study, options.models);
  const { measures, branches } = setup;
  const { settings } = study;
  const sourceNames = study.sources.map((s) => s.name);

  const { frame, table } = studyFrameAndTable(study, options.table);
  // Built when the first community asks: a thread that only hands communities to others needs none.
  let fast: FastHazard | undefined;
  let tree: ReturnType<typeof sourceTree> | undefined;
  const intensityKey = intensityMeasureOf(settings);
  const intensityIndex = measures.all.findIndex((m) => m.key === intensityKey);
  const treeBranches = Object.fromEntries(
    Object.entries(branches).map(([setting, list]) => [
      setting,
      list.map((b) => ({ model: b.model.name, weight: b.weight })),
    ]),
  );
  return {
    ...setup,
    frame,
    ruptureCount: table.count,
    table,
    hazardAt(community, afterBranch) {
      tree ??= sourceTree(study, table, frame);
      fast ??= createFastHazard({
        table,
        branches,
        measures: measures.all,
        truncationSigma: settings.truncationSigma,
        maxDistanceKm: settings.maxDistanceKm,
        keepFirstMeasure: true,
        sourceTree: tree,
      });
      const site = { vs30: community.vs30, vs30Measured: community.vs30Basis === 'measured' };
      const hazard = fastSiteHazard(
        fast,
        { point: frame.toLocal([community.lon, community.lat]), site },
        afterBranch,
      );
      const summary = treeSummary({
        nodes: tree,
        branches: treeBranches,
        curves: hazard.treeCurves!,
        levelCounts: measures.all.map((m) => m.levels.length),
        fractiles: settings.fractiles ?? DEFAULT_FRACTILES,
        intensity: {
          index: intensityIndex,
          levels: measures.all[intensityIndex]!.levels,
          conversion: INTENSITY_CONVERSIONS[intensityKey],
        },
      });
      return {
        curves: hazard.curves,
        tree: {
          fractiles: Object.fromEntries(measures.all.map((m, i) => [m.key, summary.fractiles[i]!])),
          robustness: summary.robustness,
        },
        validity: hazard.validity,
        deaggregate: (measure, level, returnPeriodYears) =>
          fastDeaggregate({
            measure: measure.key,
            level,
            returnPeriodYears,
            table,
            branches: hazard.firstMeasure,
            sourceNames,
            exceedance: fast!.exceedance,
          }),
      };
    },
  };
}

/** The study's measures with their levels; PGA is added (not reported) when missing, for intensity. */
export function hazardMeasures(study: Study): ScreeningMeasures {
  const toHazardMeasure = (key: string): HazardMeasure => {
    const measure = parseMeasure(key);
    return { key, measure, levels: levelsFor(study.settings.levels, key, measure) };
  };
  const reported = study.settings.measures.map(toHazardMeasure);
  if (reported.length === 0)
    throw new InvalidInput([
      { path: 'settings.measures', message: 'expected at least one measure' },
    ]);
  const all = [...reported];
  for (const key of new Set([INTENSITY_MEASURE, intensityMeasureOf(study.settings)]))
    if (!all.some((m) => m.key === key)) all.push(toHazardMeasure(key));
  return { reported, all };
}

/**
 * Models for each setting that has sources; PGV derived from SA(0.5 s) where a model lacks it
 * (a study-level warning is added to `warnings` then).
 */
export function resolveBranches(
  study: Study,
  measures: Pick<ScreeningMeasures, 'all'>,
  models: ModelCatalog,
  warnings: string[],
): Partial<Record<TectonicSetting, HazardBranch[]>> {
  const wantsPgv = measures.all.some((m) => m.measure.kind === 'PGV');
  const out: Partial<Record<TectonicSetting, HazardBranch[]>> = {};
  for (const setting of TECTONIC_SETTINGS) {
    if (!study.sources.some((s) => s.setting === setting)) continue;
    const given = study.groundMotion[setting];
    const path = `groundMotion.${setting}`;
    if (given.length === 0)
      throw new InvalidInput([
        { path, message: `expected at least one branch: the study has ${setting} sources` },
      ]);
    const weightSum = given.reduce((s, b) => s + b.weight, 0);
    if (Math.abs(weightSum - 1) > WEIGHT_SUM_TOLERANCE) {
      throw new InvalidInput([
        { path, message: `expected branch weights summing to 1, got ${weightSum}` },
      ]);
    }
    out[setting] = given.map((branch) => {
      let model = models.get(branch.model);
      if (wantsPgv && !model.hasPgv) {
        model = withPgvFromSa(model);
        const warning = `${branch.model} (${setting}): ${PGV_FROM_SA_NOTE}; a screening estimate with the sigma of SA(0.5 s)`;
        if (!warnings.includes(warning)) warnings.push(warning);
      }
      return { model, weight: branch.weight };
    });
  }
  return out;
}

import { Cancelled, InvalidInput } from './errors.ts';
import { ruptureDistances } from './geometry/distances.ts';
import { nearestFaults } from './geometry/nearest-faults.ts';
import { levelAtReturnPeriod } from './hazard/curve-interpolation.ts';
import { deaggregate } from './hazard/deaggregation.ts';
import { levelsFor } from './hazard/hazard-levels.ts';
import { MAX_BRANCH_COMBINATIONS } from './hazard/logic-tree.ts';
import { poissonProbability } from './hazard/poisson.ts';
import { siteHazard } from './hazard/site-hazard.ts';
import type { HazardBranch, HazardMeasure, SiteHazard } from './hazard/site-hazard.ts';
import { INTENSITY_MEASURE, siteIntensity } from './intensity/site-intensity.ts';
import { TECTONIC_SETTINGS } from './model.ts';
import type { Community, Study, TectonicSetting } from './model.ts';
import type { ModelCatalog } from './motion/catalog.ts';
import { parseMeasure } from './motion/measure.ts';
import { PGV_FROM_SA_NOTE, withPgvFromSa } from './motion/pgv-from-sa.ts';
import { modelCatalog } from './motion/registry.ts';
import type { DistanceContext } from './motion/types.ts';
import type { CommunityResult, Deaggregation, ReturnPeriodStatus, StudyResult } from './results.ts';
import type { DiscretisedStudy } from './ruptures/discretise.ts';
import { discretiseStudy } from './ruptures/discretise.ts';
import type { Rupture } from './ruptures/rupture.ts';

/** A screening's results; the caller adds the provenance (it needs the clock and a hash). */
export type ScreeningOutput = Omit<StudyResult, 'provenance'>;

/** Each community's list of nearest faults holds this many. */
export const NEAREST_FAULT_COUNT = 3;

/** Logic-tree weights of a setting must sum to 1 within this (as the study schema requires). */
const WEIGHT_SUM_TOLERANCE = 1e-6;

export interface ScreenStudyOptions {
  /** Called with the share of the work done, in (0, 1], after each community's branches. */
  readonly onProgress?: (shareDone: number) => void;
  /** Polled between units of work; returning true stops the run with Cancelled. */
  readonly shouldStop?: () => boolean;
  /** The models studies may name; the registry's by default. */
  readonly models?: ModelCatalog;
}

/**
 * Screens every community of a validated study: hazard curves for each measure (mean and
 * per-branch), levels at the return periods, Poisson chances over the horizons, intensity,
 * deaggregation, nearest faults, band and warnings. Pure and deterministic: the same study
 * gives the same numbers.
 */
export function screenStudy(study: Study, options: ScreenStudyOptions = {}): ScreeningOutput {
  const measures = hazardMeasures(study);
  const studyWarnings: string[] = [];
  const branches = resolveBranches(study, measures, options.models ?? modelCatalog, studyWarnings);
  const branchCount = Object.values(branches).reduce((n, list) => n + list.length, 0);

  let shareDone = 0;
  const checkStop = (): void => {
    if (options.shouldStop?.()) throw new Cancelled(shareDone);
  };
  checkStop();
  const discretised = discretiseStudy(study);
  checkStop();

  const communities = study.communities.map((community, c) => {
    let branchesDone = 0;
    const afterBranch = (): void => {
      branchesDone++;
      shareDone = (c + branchesDone / Math.max(1, branchCount)) / study.communities.length;
      options.onProgress?.(shareDone);
      if (shareDone < 1) checkStop();
    };
    const result = screenCommunity(study, community, discretised, branches, measures, afterBranch);
    if (branchCount === 0) afterBranch();
    return result;
  });

  if (discretised.ruptures.length === 0) studyWarnings.push('the study has no earthquake ruptures; every curve is zero');
  const combinations = TECTONIC_SETTINGS.reduce((n, s) => n * Math.max(1, branches[s]?.length ?? 0), 1);
  if (combinations > MAX_BRANCH_COMBINATIONS) {
    studyWarnings.push(
      `the logic tree has ${combinations} branch combinations, more than the ${MAX_BRANCH_COMBINATIONS} listed; only mean curves are given`,
    );
  }
  return { studyName: study.name, communities, warnings: studyWarnings };
}

/** The study's measures with their levels; PGA is added (not reported) when missing, for intensity. */
function hazardMeasures(study: Study): { reported: HazardMeasure[]; all: HazardMeasure[] } {
  const toHazardMeasure = (key: string): HazardMeasure => {
    const measure = parseMeasure(key);
    return { key, measure, levels: levelsFor(study.settings.levels, key, measure) };
  };
  const reported = study.settings.measures.map(toHazardMeasure);
  if (reported.length === 0) throw new InvalidInput([{ path: 'settings.measures', message: 'expected at least one measure' }]);
  const all = reported.some((m) => m.key === INTENSITY_MEASURE) ? reported : [...reported, toHazardMeasure(INTENSITY_MEASURE)];
  return { reported, all };
}

/** Models for each setting that has sources; PGV derived from SA(0.5 s) where a model lacks it. */
function resolveBranches(
  study: Study,
  measures: { all: readonly HazardMeasure[] },
  models: ModelCatalog,
  warnings: string[],
): Partial<Record<TectonicSetting, HazardBranch[]>> {
  const wantsPgv = measures.all.some((m) => m.measure.kind === 'PGV');
  const out: Partial<Record<TectonicSetting, HazardBranch[]>> = {};
  for (const setting of TECTONIC_SETTINGS) {
    if (!study.sources.some((s) => s.setting === setting)) continue;
    const given = study.groundMotion[setting];
    const path = `groundMotion.${setting}`;
    if (given.length === 0) throw new InvalidInput([{ path, message: `expected at least one branch: the study has ${setting} sources` }]);
    const weightSum = given.reduce((s, b) => s + b.weight, 0);
    if (Math.abs(weightSum - 1) > WEIGHT_SUM_TOLERANCE) {
      throw new InvalidInput([{ path, message: `expected branch weights summing to 1, got ${weightSum}` }]);
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

function screenCommunity(
  study: Study,
  community: Community,
  { frame, ruptures }: DiscretisedStudy,
  branches: Partial<Record<TectonicSetting, HazardBranch[]>>,
  measures: { reported: readonly HazardMeasure[]; all: readonly HazardMeasure[] },
  afterBranch: () => void,
): CommunityResult {
  const { settings } = study;
  const lonLat = [community.lon, community.lat] as const;
  const siteXY = frame.toLocal(lonLat);
  const distances = ruptures.map((r) => ruptureDistances(r.surface, siteXY));
  const hazard = siteHazard({
    ruptures,
    distances,
    site: { vs30: community.vs30, vs30Measured: community.vs30Basis === 'measured' },
    branches,
    measures: measures.all,
    truncationSigma: settings.truncationSigma,
    maxDistanceKm: settings.maxDistanceKm,
    afterBranch,
  });
  const warnings: string[] = hazard.validity.map(
    (v) =>
      `${v.model}: ${v.outside} of ${v.evaluated} rupture predictions within ${settings.maxDistanceKm} km are outside its validity range ` +
      `(for example, ${v.firstNote})`,
  );

  const curves: CommunityResult['curves'] = Object.fromEntries(measures.reported.map((m) => [m.key, hazard.curves[m.key]!]));
  const atReturnPeriod: Record<string, Record<string, number | null>> = {};
  const returnPeriodStatus: Record<string, Record<string, ReturnPeriodStatus>> = {};
  for (const years of settings.returnPeriodsYears) {
    const levels: Record<string, number | null> = {};
    const statuses: Record<string, ReturnPeriodStatus> = {};
    for (const m of measures.reported) {
      const curve = hazard.curves[m.key]!;
      const { level, status } = levelAtReturnPeriod(curve.levels, curve.annualRate, years);
      levels[m.key] = level;
      statuses[m.key] = status;
    }
    atReturnPeriod[String(years)] = levels;
    returnPeriodStatus[String(years)] = statuses;
  }

  const chanceOfExceeding: Record<string, Record<string, number[]>> = {};
  for (const years of settings.horizonsYears) {
    chanceOfExceeding[String(years)] = Object.fromEntries(
      measures.reported.map((m) => [m.key, hazard.curves[m.key]!.annualRate.map((rate) => poissonProbability(rate, years))]),
    );
  }

  const pga = hazard.curves[INTENSITY_MEASURE]!;
  const intensity = siteIntensity({
    levels: pga.levels,
    annualRate: pga.annualRate,
    returnPeriodsYears: settings.returnPeriodsYears,
    horizonsYears: settings.horizonsYears,
  });
  warnings.push(...intensity.warnings);

  const deaggregation = deaggregateAtReturnPeriods(study, ruptures, distances, hazard, measures.reported[0]!, warnings);

  return {
    communityId: community.id,
    name: community.name,
    curves,
    atReturnPeriod,
    returnPeriodStatus,
    chanceOfExceeding,
    intensity: intensity.intensity,
    deaggregation,
    nearestFaults: nearestFaults(study.sources, frame, lonLat, NEAREST_FAULT_COUNT),
    band: intensity.band,
    warnings,
  };
}

const WHY_NO_LEVEL: Readonly<Record<ReturnPeriodStatus, string>> = {
  ok: 'is exceeded by no rupture',
  'below-lowest-level': 'is below the lowest computed level',
  'above-highest-level': 'is above the highest computed level',
};

/** Deaggregation of the first measure at each return period whose level is on the curve. */
function deaggregateAtReturnPeriods(
  study: Study,
  ruptures: readonly Rupture[],
  distances: readonly DistanceContext[],
  hazard: SiteHazard,
  measure: HazardMeasure,
  warnings: string[],
): Record<string, Deaggregation> {
  const measureIndex = 0;
  const curve = hazard.curves[measure.key]!;
  const sourceNames = study.sources.map((s) => s.name);
  const out: Record<string, Deaggregation> = {};
  for (const years of study.settings.returnPeriodsYears) {
    const { level, status } = levelAtReturnPeriod(curve.levels, curve.annualRate, years);
    const result =
      level === null
        ? null
        : deaggregate({
            measure: measure.key,
            level,
            returnPeriodYears: years,
            ruptures,
            distances,
            branches: hazard.branches.map((b) => ({ weight: b.weight, predictions: b.predictions[measureIndex]! })),
            sourceNames,
            truncationSigma: study.settings.truncationSigma,
          });
    if (result) out[String(years)] = result;
    else warnings.push(`no deaggregation at ${years} years: the ${years}-year ${measure.key} ${WHY_NO_LEVEL[status]}`);
  }
  return out;
}

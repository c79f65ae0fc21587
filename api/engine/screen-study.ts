import { zoneDepthReport } from './ruptures/zone-depth-report.ts';
import { communityResult } from './community-result.ts';
import { Cancelled } from './errors.ts';
import { MAX_BRANCH_COMBINATIONS } from './hazard/logic-tree.ts';
import { TECTONIC_SETTINGS } from './model.ts';
import type { Study } from './model.ts';
import type { ModelCatalog } from './motion/catalog.ts';
import type { CommunityResult, StudyDiagnostics, StudyResult } from './results.ts';
import { planScreening, type ScreeningPlan } from './screening-plan.ts';

/** A screening's results; the caller adds the provenance (it needs the clock and a hash). */
export type ScreeningOutput = Omit<StudyResult, 'provenance' | 'diagnostics'> & {
  readonly diagnostics: StudyDiagnostics;
};

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
 * gives the same numbers. The plain sum of test/helpers/reference-hazard/ gives the same
 * numbers to within rounding and the tabulated exceedance (test/engine/screen-study.test.ts
 * runs its checks on both).
 */
export function screenStudy(study: Study, options: ScreenStudyOptions = {}): ScreeningOutput {
  let shareDone = 0;
  const checkStop = (): void => {
    if (options.shouldStop?.()) throw new Cancelled(shareDone);
  };
  checkStop();
  const plan = planScreening(study, { models: options.models });
  checkStop();
  const indices = study.communities.map((_, c) => c);
  const communities = screenCommunities(plan, indices, {
    onProgress: (share) => {
      shareDone = share;
      options.onProgress?.(share);
      if (share < 1) checkStop();
    },
  });
  return finishScreening(plan, communities);
}

/** What screening a community needs of a plan. */
export type CommunityPlan = Pick<
  ScreeningPlan,
  'study' | 'frame' | 'measures' | 'branchCount' | 'hazardAt'
>;

export interface ScreenCommunitiesOptions {
  /** Share of these communities' work done, in (0, 1], after each branch of each community. */
  readonly onProgress?: (shareDone: number) => void;
}

/**
 * The results of the communities at `indices` of the plan's study, in that order: the unit of
 * work a worker thread takes (the whole study's screening is this over every community).
 */
export function screenCommunities(
  plan: CommunityPlan,
  indices: readonly number[],
  options: ScreenCommunitiesOptions = {},
): CommunityResult[] {
  const { study } = plan;
  return indices.map((c, position) => {
    const community = study.communities[c];
    if (!community)
      throw new RangeError(
        `expected a community index below ${study.communities.length}, got ${c}`,
      );
    let branchesDone = 0;
    const afterBranch = (): void => {
      branchesDone++;
      options.onProgress?.(
        (position + branchesDone / Math.max(1, plan.branchCount)) / indices.length,
      );
    };
    const result = communityResult(
      study,
      community,
      plan.frame,
      plan.measures,
      plan.hazardAt(community, afterBranch),
    );
    if (plan.branchCount === 0) afterBranch();
    return result;
  });
}

/** The study's results from its communities' (in study order), with the study-level warnings. */
export function finishScreening(
  plan: Pick<ScreeningPlan, 'study' | 'warnings' | 'ruptureCount' | 'branches'>,
  communities: readonly CommunityResult[],
): ScreeningOutput {
  const warnings = [...plan.warnings];
  if (plan.ruptureCount === 0)
    warnings.push('the study has no earthquake ruptures; every curve is zero');
  const combinations = TECTONIC_SETTINGS.reduce(
    (n, s) => n * Math.max(1, plan.branches[s]?.length ?? 0),
    1,
  );
  if (combinations > MAX_BRANCH_COMBINATIONS) {
    warnings.push(
      `the logic tree has ${combinations} branch combinations, more than the ${MAX_BRANCH_COMBINATIONS} listed; only mean curves are given`,
    );
  }
  return {
    studyName: plan.study.name,
    communities: [...communities],
    warnings,
    diagnostics: { zoneDepths: zoneDepthReport(plan.study) },
  };
}

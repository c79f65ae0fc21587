import type { CommunityHazard } from '../../../api/engine/community-result.ts';
import { cellUsedAt } from '../../../api/engine/geometry/cell-refinement.ts';
import { ruptureDistances } from '../../../api/engine/geometry/distances.ts';
import type { LocalFrame } from '../../../api/engine/geometry/projection.ts';
import type { Community, Study } from '../../../api/engine/model.ts';
import type { ModelCatalog } from '../../../api/engine/motion/catalog.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import { discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import {
  finishScreening,
  screenCommunities,
  type ScreeningOutput,
} from '../../../api/engine/screen-study.ts';
import { screeningSetup, type ScreeningSetup } from '../../../api/engine/screening-plan.ts';
import { deaggregate } from './deaggregation.ts';
import { siteHazard } from './site-hazard.ts';

/**
 * The oracle the engine's screening is checked against: the hazard integral summed the plain
 * way (classical PSHA, Cornell 1968; λ(IM > x) = Σ rate × P(IM > x | rupture, site)), one
 * rupture object, one distance context and one model call at a time (site-hazard.ts,
 * exceedance-curve.ts, deaggregation.ts), with the production setup, intensity and result
 * assembly around it. Slow and plain on purpose: tests and the benchmark only.
 */
export function referenceScreening(
  study: Study,
  options: { readonly models?: ModelCatalog } = {},
): ScreeningOutput {
  const setup = screeningSetup(study, options.models);
  const { frame, ruptures } = discretiseStudy(study);
  const plan = {
    ...setup,
    frame,
    ruptureCount: ruptures.length,
    hazardAt: (community: Community, afterBranch: () => void) =>
      referenceHazard(ruptures, frame, community, setup, afterBranch),
  };
  const communities = screenCommunities(
    plan,
    study.communities.map((_, c) => c),
  );
  return finishScreening(plan, communities);
}

/** One community's hazard from every rupture's distances, site-hazard.ts and deaggregation.ts. */
function referenceHazard(
  all: readonly Rupture[],
  frame: LocalFrame,
  community: Community,
  setup: ScreeningSetup,
  afterBranch: () => void,
): CommunityHazard {
  const { settings } = setup.study;
  const siteXY = frame.toLocal([community.lon, community.lat]);
  const ruptures = rupturesUsedAt(all, siteXY);
  const distances = ruptures.map((r) => ruptureDistances(r.surface, siteXY));
  const hazard = siteHazard({
    ruptures,
    distances,
    site: { vs30: community.vs30, vs30Measured: community.vs30Basis === 'measured' },
    branches: setup.branches,
    measures: setup.measures.all,
    truncationSigma: settings.truncationSigma,
    maxDistanceKm: settings.maxDistanceKm,
    afterBranch,
  });
  const sourceNames = setup.study.sources.map((s) => s.name);
  return {
    curves: hazard.curves,
    validity: hazard.validity,
    deaggregate: (measure, level, returnPeriodYears) =>
      deaggregate({
        measure: measure.key,
        level,
        returnPeriodYears,
        ruptures,
        distances,
        // The first measure is first in measures.all, so its predictions are at index 0.
        branches: hazard.branches.map((b) => ({
          weight: b.weight,
          predictions: b.predictions[0]!,
        })),
        sourceNames,
        truncationSigma: settings.truncationSigma,
      }),
  };
}

/**
 * The ruptures that count at a site (local km): a refined zone cell counts as itself or as its
 * squares by the site's distance (geometry/cell-refinement.ts).
 */
export function rupturesUsedAt(
  all: readonly Rupture[],
  siteXY: { readonly x: number; readonly y: number },
): Rupture[] {
  return all.filter(
    (r) =>
      !r.cellUse ||
      cellUsedAt(
        r.cellUse.near,
        r.cellUse.centre.x,
        r.cellUse.centre.y,
        r.cellUse.radiusKm,
        siteXY.x,
        siteXY.y,
      ),
  );
}

import type {
  HazardIntegralOptions,
  HazardMeasure,
  ValiditySummary,
} from '../../../api/engine/hazard/hazard-types.ts';
import { MAX_BRANCH_COMBINATIONS, treeHazardCurve } from '../../../api/engine/hazard/logic-tree.ts';
import type { SettingBranchCurve } from '../../../api/engine/hazard/logic-tree.ts';
import { TECTONIC_SETTINGS } from '../../../api/engine/model.ts';
import type { TectonicSetting } from '../../../api/engine/model.ts';
import type { DistanceContext, SiteContext } from '../../../api/engine/motion/types.ts';
import type { HazardCurve } from '../../../api/engine/results.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import { exceedanceCurve } from './exceedance-curve.ts';
import type { RupturePredictions } from './rupture-predictions.ts';
import { predictRuptures, selectRuptures } from './rupture-predictions.ts';

/** One setting's branch at one site: its predictions and curve for each measure (same order). */
export interface SiteBranchHazard {
  readonly setting: TectonicSetting;
  readonly model: string;
  readonly weight: number;
  readonly predictions: readonly RupturePredictions[];
  readonly annualRate: readonly (readonly number[])[];
}

export interface SiteHazard {
  /** Mean curve (with per-branch curves unless omitted) by measure key. */
  readonly curves: Readonly<Record<string, HazardCurve>>;
  readonly branches: readonly SiteBranchHazard[];
  /** True when the branch combinations exceeded the cap and only means were kept. */
  readonly branchCurvesOmitted: boolean;
  readonly validity: readonly ValiditySummary[];
}

export interface SiteHazardOptions extends HazardIntegralOptions {
  readonly ruptures: readonly Rupture[];
  /** One per rupture, for this site. */
  readonly distances: readonly DistanceContext[];
  readonly site: SiteContext;
  /** Called after each branch is done; may throw to stop (cancellation). */
  readonly afterBranch?: () => void;
}

/**
 * Hazard curves at one site for every measure: each setting's branches integrated over that
 * setting's ruptures (one model evaluation per rupture and measure), then combined over the
 * logic tree (logic-tree.ts). Predictions are kept for deaggregation.
 */
export function siteHazard(options: SiteHazardOptions): SiteHazard {
  const { ruptures, distances, site, measures, truncationSigma } = options;
  const branches: SiteBranchHazard[] = [];
  const validity = new Map<string, { outside: number; evaluated: number; firstNote: string }>();

  for (const setting of TECTONIC_SETTINGS) {
    const settingBranches = options.branches[setting];
    if (!settingBranches || settingBranches.length === 0) continue;
    const selected = selectRuptures(ruptures, distances, setting, options.maxDistanceKm);
    for (const { model, weight } of settingBranches) {
      const predictions = measures.map((m) =>
        predictRuptures(model, m.measure, ruptures, distances, site, selected),
      );
      const annualRate = predictions.map((p, i) =>
        exceedanceCurve(p, ruptures, (measures[i] as HazardMeasure).levels, truncationSigma),
      );
      branches.push({ setting, model: model.name, weight, predictions, annualRate });
      const summary = validity.get(model.name) ?? { outside: 0, evaluated: 0, firstNote: '' };
      for (const p of predictions) {
        summary.evaluated += p.ruptureIndex.length;
        summary.outside += p.outsideValidity;
        if (!summary.firstNote && p.firstNote) summary.firstNote = p.firstNote;
      }
      validity.set(model.name, summary);
      options.afterBranch?.();
    }
  }

  const cap = options.maxBranchCombinations ?? MAX_BRANCH_COMBINATIONS;
  let branchCurvesOmitted = false;
  const curves: Record<string, HazardCurve> = {};
  measures.forEach((m, i) => {
    const settingCurves: SettingBranchCurve[] = branches.map((b) => ({
      setting: b.setting,
      model: b.model,
      weight: b.weight,
      annualRate: b.annualRate[i] as number[],
    }));
    // The weighted mean and the branch combinations are the engine's (logic-tree.ts, with its
    // own tests): this oracle checks each branch's curve, summed rupture by rupture above.
    const { curve, branchesOmitted } = treeHazardCurve(settingCurves, m.levels, cap);
    if (branchesOmitted) branchCurvesOmitted = true;
    curves[m.key] = curve;
  });

  return {
    curves,
    branches,
    branchCurvesOmitted,
    validity: [...validity.entries()]
      .filter(([, s]) => s.outside > 0)
      .map(([model, s]) => ({ model, ...s })),
  };
}

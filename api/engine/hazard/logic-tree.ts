import { TECTONIC_SETTINGS } from '../model.ts';
import type { TectonicSetting } from '../model.ts';
import type { BranchCurve, HazardCurve } from '../results.ts';
import { compensatedSum } from '../summation.ts';

/** The exceedance rates of one setting's sources under one of its branches (not yet weighted). */
export interface SettingBranchCurve {
  readonly setting: TectonicSetting;
  readonly model: string;
  readonly weight: number;
  readonly annualRate: readonly number[];
}

/**
 * Per-branch curves are listed for at most this many combinations of the settings' branches
 * (e.g. 4 crustal × 4 interface × 4 intraslab = 64): enough to show the spread, small enough
 * for results and pages. Beyond it only the mean is kept (the mean does not need them).
 */
export const MAX_BRANCH_COMBINATIONS = 64;

/**
 * Mean hazard over the logic tree. Rates from different settings add, so the weighted mean over
 * all combinations equals Σ over settings and their branches of weight × rate (each setting's
 * weights summing to 1); no combination needs building for it.
 */
export function meanHazard(curves: readonly SettingBranchCurve[], levelCount: number): number[] {
  return Array.from({ length: levelCount }, (_, j) =>
    compensatedSum(curves.map((c) => c.weight * (c.annualRate[j] as number))),
  );
}

/** Settings present in `curves`, in the fixed order of TECTONIC_SETTINGS, with their branches. */
function bySetting(curves: readonly SettingBranchCurve[]): SettingBranchCurve[][] {
  return TECTONIC_SETTINGS.map((s) => curves.filter((c) => c.setting === s)).filter(
    (group) => group.length > 0,
  );
}

/** How many branch combinations `curves` make (the product of each setting's branch count). */
export function branchCombinationCount(curves: readonly SettingBranchCurve[]): number {
  return bySetting(curves).reduce((n, group) => n * group.length, 1);
}

/**
 * One curve per combination of branches (one branch from each setting present), labelled
 * "crustal=BSSA14, interface=AGA16", weighted by the product of the branch weights; first
 * setting's branch varying slowest. Null when there are more than `maxCombinations`.
 */
export function branchCombinationCurves(
  curves: readonly SettingBranchCurve[],
  levelCount: number,
  maxCombinations = MAX_BRANCH_COMBINATIONS,
): BranchCurve[] | null {
  if (curves.length === 0) return [];
  if (branchCombinationCount(curves) > maxCombinations) return null;
  let combinations: SettingBranchCurve[][] = [[]];
  for (const group of bySetting(curves)) {
    combinations = combinations.flatMap((chosen) => group.map((branch) => [...chosen, branch]));
  }
  return combinations.map((chosen) => ({
    label: chosen.map((c) => `${c.setting}=${c.model}`).join(', '),
    weight: chosen.reduce((w, c) => w * c.weight, 1),
    annualRate: Array.from({ length: levelCount }, (_, j) =>
      compensatedSum(chosen.map((c) => c.annualRate[j] as number)),
    ),
  }));
}

/** One measure's curve over the logic tree, and whether its per-branch curves were left out. */
export interface TreeHazardCurve {
  readonly curve: HazardCurve;
  readonly branchesOmitted: boolean;
}

/**
 * The mean curve of one measure over the logic tree with, when `maxCombinations` is not null,
 * the per-branch curves if there are at most that many combinations. Null `maxCombinations`:
 * the per-branch curves are not wanted (they count as left out).
 */
export function treeHazardCurve(
  curves: readonly SettingBranchCurve[],
  levels: readonly number[],
  maxCombinations: number | null,
): TreeHazardCurve {
  const annualRate = meanHazard(curves, levels.length);
  const combinations =
    maxCombinations === null
      ? null
      : branchCombinationCurves(curves, levels.length, maxCombinations);
  return combinations === null
    ? { curve: { levels: [...levels], annualRate }, branchesOmitted: true }
    : {
        curve: { levels: [...levels], annualRate, branches: combinations },
        branchesOmitted: false,
      };
}

import { describe, expect, it } from 'vitest';
import {
  branchCombinationCount,
  branchCombinationCurves,
  meanHazard,
  treeHazardCurve,
} from '../../../api/engine/hazard/logic-tree.ts';
import type { SettingBranchCurve } from '../../../api/engine/hazard/logic-tree.ts';
import { expectClose } from '../../helpers/close.ts';

// Small made-up curves: the checks are the logic-tree arithmetic itself (weighted sums), by hand.
const curves: SettingBranchCurve[] = [
  { setting: 'interface', model: 'I1', weight: 1, annualRate: [0.1, 0.01] },
  { setting: 'crustal', model: 'C1', weight: 0.7, annualRate: [0.02, 0.002] },
  { setting: 'crustal', model: 'C2', weight: 0.3, annualRate: [0.04, 0.004] },
];

describe('logic tree', () => {
  it('mean = Σ weight × rate over settings and branches: 0.1 + 0.7 × 0.02 + 0.3 × 0.04 = 0.126 (hand computation)', () => {
    const mean = meanHazard(curves, 2);
    expectClose(mean[0]!, 0.126, 1e-15, 'hand computation');
    expectClose(mean[1]!, 0.0126, 1e-16, 'hand computation');
  });

  it('one curve per combination, labelled in setting order, weight the product, rates the sum', () => {
    const combos = branchCombinationCurves(curves, 2)!;
    expect(combos.map((c) => c.label)).toEqual([
      'crustal=C1, interface=I1',
      'crustal=C2, interface=I1',
    ]);
    expect(combos.map((c) => c.weight)).toEqual([0.7, 0.3]);
    expectClose(combos[0]!.annualRate[0]!, 0.12, 1e-15, '0.02 + 0.1');
    expectClose(combos[1]!.annualRate[1]!, 0.014, 1e-16, '0.004 + 0.01');
  });

  it('the weighted mean of the combinations is the mean hazard (total probability)', () => {
    const combos = branchCombinationCurves(curves, 2)!;
    const mean = meanHazard(curves, 2);
    for (let j = 0; j < 2; j++) {
      expectClose(
        combos.reduce((s, c) => s + c.weight * c.annualRate[j]!, 0),
        mean[j]!,
        1e-15,
        'Σ weight × combination',
      );
    }
  });

  it('counts combinations as the product of branch counts and stops listing them above the cap', () => {
    expect(branchCombinationCount(curves)).toBe(2);
    expect(branchCombinationCurves(curves, 2, 1)).toBeNull();
    expect(branchCombinationCurves([], 2)).toEqual([]);
  });

  it('the tree curve of a measure keeps its levels and the mean, with the branch curves only when wanted and within the cap', () => {
    const levels = [0.1, 0.2];
    const within = treeHazardCurve(curves, levels, 2);
    expect(within.branchesOmitted).toBe(false);
    expect(within.curve.levels).toEqual(levels);
    expect(within.curve.annualRate).toEqual(meanHazard(curves, 2));
    expect(within.curve.branches).toEqual(branchCombinationCurves(curves, 2));
    for (const cap of [1, null]) {
      const omitted = treeHazardCurve(curves, levels, cap);
      expect(omitted.branchesOmitted).toBe(true);
      expect(omitted.curve).toEqual({ levels, annualRate: meanHazard(curves, 2) });
    }
  });
});

import { describe, expect, it } from 'vitest';
import { siteHazard } from './site-hazard.ts';
import { ROCK_SITE } from '../../engine/hazard/point-ruptures.ts';
import {
  TWO_SETTING_BRANCHES,
  TWO_SETTING_MEASURES,
  TWO_SETTING_RUPTURES,
  expectTwoSettingBranchRatesAt03g,
} from '../../engine/hazard/two-setting-tree.ts';
import { expectRelative } from '../close.ts';

/*
 * Two settings: a crustal rupture (M 6.5, 10 km, 0.01/yr) under two branches, Cornell et al.
 * (1979) (0.6) and the same × 1.5 (0.4); an interface rupture (M 8, 250 km, 0.001/yr) under one
 * branch, Cornell × 2. Expected: the closed forms 0.01 Q(ε) and 0.001 Q(ε) (untruncated),
 * weighted and summed by hand.
 */
const { ruptures, distances } = TWO_SETTING_RUPTURES;
const measures = TWO_SETTING_MEASURES;
const branches = TWO_SETTING_BRANCHES;

describe('siteHazard: logic tree over two settings (hand computation)', () => {
  const input = {
    ruptures,
    distances,
    site: ROCK_SITE,
    branches,
    measures,
    truncationSigma: Infinity,
    maxDistanceKm: 300,
  };
  const result = siteHazard(input);
  const curve = result.curves.PGA!;

  it('mean curve = 0.6 λc Q(ε₁) + 0.4 λc Q(ε₂) + λi Q(εi)', () => {
    expectRelative(curve.annualRate[0]!, 0.010688258634279083, 1e-12, 'hand computation at 0.05 g');
    expectRelative(curve.annualRate[1]!, 0.007388514730343052, 1e-12, 'hand computation at 0.3 g');
  });

  it('per-branch curves: one per crustal branch, each with the interface branch added', () => {
    expect(curve.branches!.map((b) => [b.label, b.weight])).toEqual([
      ['crustal=Cornell79, interface=Trench2x', 0.6],
      ['crustal=Scaled, interface=Trench2x', 0.4],
    ]);
    expectTwoSettingBranchRatesAt03g(curve.branches!, 1e-12);
  });

  it("summarises ruptures outside a model's validity (the interface rupture is at 250 km, past 200 km)", () => {
    expect(result.validity.map((v) => [v.model, v.outside, v.evaluated])).toEqual([
      ['Trench2x', 1, 1],
    ]);
    expect(result.validity[0]!.firstNote).toMatch(/distance 250 km/);
  });

  it('keeps predictions for deaggregation, one set per branch and measure', () => {
    expect(
      result.branches.map((b) => [b.setting, b.model, b.predictions[0]!.ruptureIndex.length]),
    ).toEqual([
      ['crustal', 'Cornell79', 1],
      ['crustal', 'Scaled', 1],
      ['interface', 'Trench2x', 1],
    ]);
  });

  it('omits the per-branch curves above the combination cap but keeps the same mean', () => {
    const capped = siteHazard({ ...input, maxBranchCombinations: 1 });
    expect(capped.branchCurvesOmitted).toBe(true);
    expect(capped.curves.PGA!.branches).toBeUndefined();
    expect(capped.curves.PGA!.annualRate).toEqual(curve.annualRate);
  });

  it('is deterministic: the same inputs give identical numbers', () => {
    const again = siteHazard(input);
    expect(again.curves).toEqual(result.curves);
  });
});

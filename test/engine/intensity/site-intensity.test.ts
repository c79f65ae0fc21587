import { describe, expect, it } from 'vitest';
import { siteIntensity } from '../../../api/engine/intensity/site-intensity.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

/*
 * A power-law PGA curve λ = 1e-4 x^−2.5 (straight on log–log axes, so log–log reading is exact)
 * and Worden et al. (2012) Table 1 (from memory). Hand computation: the 475-year PGA is
 * (1e-4 × 475)^(1/2.5) = 0.295582 g → MMI −1.60 + 3.70 log10(289.87) = 7.510133; the MMI VI
 * threshold 0.115487 g has rate 1e-4 × 0.115487^−2.5 = 0.0220631 → 1 − e^(−50 × 0.0220631) = 0.668177.
 */
const k = 1e-4;
const levels = [0.01, 0.03, 0.1, 0.3, 1];
const annualRate = levels.map((x) => k * x ** -2.5);

describe('siteIntensity', () => {
  const result = siteIntensity({ levels, annualRate, returnPeriodsYears: [475, 2475], horizonsYears: [50] });

  it('MMI at 475 years = 7.510133 (VII), at 2475 years = 8.571118 (VIII)', () => {
    const at475 = result.intensity.atReturnPeriod['475']!;
    expectClose(at475.mmi!, 7.510133041880696, 1e-9, 'hand computation');
    expect([at475.roman, at475.fromMeasure]).toEqual(['VII', 'PGA']);
    expectClose(result.intensity.atReturnPeriod['2475']!.mmi!, 8.571117800474884, 1e-9, 'hand computation');
  });

  it('chance of reaching VI, VII, VIII in 50 years: 0.668177, 0.207679, 0.047936', () => {
    const c = result.intensity.chanceOfReaching['50']!;
    expectRelative(c.VI, 0.6681774867988599, 1e-9, 'hand computation');
    expectRelative(c.VII, 0.20767859671321684, 1e-9, 'hand computation');
    expectRelative(c.VIII, 0.04793601637324276, 1e-9, 'hand computation');
  });

  it('bands from the 475-year MMI: 7.51 is refer-soon', () => {
    expect(result.band.id).toBe('refer-soon');
    expectClose(result.band.mmi475!, 7.510133041880696, 1e-9, 'hand computation');
    expect(result.warnings).toEqual([]);
  });

  it('a curve too low to reach the 475-year rate gives null MMI and the inform band', () => {
    const low = siteIntensity({ levels, annualRate: annualRate.map((r) => r * 1e-4), returnPeriodsYears: [475], horizonsYears: [50] });
    expect(low.intensity.atReturnPeriod['475']).toEqual({ mmi: null, roman: null, fromMeasure: 'PGA' });
    expect(low.band).toEqual({ id: 'inform', label: 'Inform', mmi475: null });
  });

  it('a curve above its highest level at 475 years bands from that level (a lower bound) and says so', () => {
    const high = siteIntensity({ levels: [0.01, 0.05], annualRate: [0.5, 0.1], returnPeriodsYears: [475], horizonsYears: [50] });
    expect(high.band.mmi475).toBeNull();
    expect(high.band.id).toBe('inform'); // MMI at 0.05 g is 4.7: a lower bound only
    expect(high.warnings.some((w) => w.includes('475-year'))).toBe(true);
    expect(high.warnings.filter((w) => w.includes('upper bound')).length).toBe(3);
  });
});

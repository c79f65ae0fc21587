import { describe, expect, it } from 'vitest';
import {
  siteIntensity,
  type SiteIntensity,
  type SiteIntensityOptions,
} from '../../../api/engine/intensity/site-intensity.ts';
import { INTENSITY_CONVERSIONS } from '../../../api/engine/intensity/worden2012.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

/*
 * A power-law PGA curve λ = 1e-4 x^−2.5 (straight on log–log axes, so log–log reading is exact)
 * and Worden et al. (2012) Table 1 (from memory). Hand computation: the 475-year PGA is
 * (1e-4 × 475)^(1/2.5) = 0.295582 g → MMI −1.60 + 3.70 log10(289.87) = 7.510133.
 *
 * Chances with the conversion's scatter: on the upper segment MMI = c3 + c4 log10(Y) is linear
 * in ln Y, so a normal scatter σ in MMI is a lognormal scatter β = σ ln 10 / c4 in Y, and a
 * power-law hazard k y^−a convolved with it gives λ(MMI ≥ m) = k y_m^−a exp(a² β² / 2), y_m the
 * motion whose median MMI is m (Cornell, Jalayer, Hamburger & Foutch 2002, J. Struct. Eng.
 * 128(4), 526–533, their closed form for a power-law hazard and lognormal demand; from memory).
 * For MMI VIII (m = 7.5): y_m = 10^(9.1/3.7) cm/s² = 0.294277 g, β = 0.73 × 2.302585 / 3.7 =
 * 0.454294, factor exp(6.25 × 0.206383 / 2) = 1.906235.
 */
const k = 1e-4;
const levels = [0.01, 0.03, 0.1, 0.3, 1];
const annualRate = levels.map((x) => k * x ** -2.5);

/** A curve read at 475 years, chances over 50 years unless `over` says otherwise. */
const at475Years = (
  curveLevels: number[],
  curveRates: number[],
  over: Partial<SiteIntensityOptions> = {},
): SiteIntensity =>
  siteIntensity({
    levels: curveLevels,
    annualRate: curveRates,
    returnPeriodsYears: [475],
    horizonsYears: [50],
    ...over,
  });
const atYears = (r: SiteIntensity, returnPeriodYears: string) =>
  r.intensity.atReturnPeriod[returnPeriodYears]!;

describe('siteIntensity', () => {
  const result = siteIntensity({
    levels,
    annualRate,
    returnPeriodsYears: [475, 2475],
    horizonsYears: [50],
  });

  it('MMI at 475 years = 7.510133 (VII), at 2475 years = 8.571118 (IX, rounded)', () => {
    const at475 = atYears(result, '475');
    expectClose(at475.mmi!, 7.510133041880696, 1e-9, 'hand computation');
    expect([at475.roman, at475.fromMeasure]).toEqual(['VIII', 'PGA']);
    expectClose(atYears(result, '2475').mmi!, 8.571117800474884, 1e-9, 'hand computation');
    expect(atYears(result, '2475').roman).toBe('IX');
  });

  it('the rate of reaching MMI VIII with the scatter matches the closed form for a power-law curve', () => {
    // Levels 0.04–20 g on the upper segment, 60 per decade: the sum over the curve against the closed form.
    const wide = Array.from({ length: 163 }, (_, i) => 0.04 * 10 ** (i / 60));
    const wideRates = wide.map((x) => k * x ** -2.5);
    const high = at475Years(wide, wideRates, { horizonsYears: [1] });
    const yM = 10 ** (9.1 / 3.7) / 980.665;
    const beta = (0.73 * Math.LN10) / 3.7;
    const expected = k * yM ** -2.5 * Math.exp((6.25 * beta * beta) / 2);
    expectRelative(
      -Math.log1p(-high.intensity.chanceOfReaching['1']!.VIII),
      expected,
      0.005,
      'Cornell et al. 2002 closed form (from memory)',
    );
  });

  it('the scatter raises every chance above the median-only chance, and the record names the conversion', () => {
    const c = result.intensity.chanceOfReaching['50']!;
    const medianOnly = (m: number) =>
      -Math.expm1(-50 * k * (10 ** ((m + 1.6) / 3.7) / 980.665) ** -2.5);
    expect(c.VI).toBeGreaterThan(medianOnly(5.5));
    expect(c.VII).toBeGreaterThan(medianOnly(6.5));
    expect(c.VIII).toBeGreaterThan(medianOnly(7.5));
    expect(c.VI).toBeGreaterThan(c.VII);
    expect(c.VII).toBeGreaterThan(c.VIII);
    expect(result.intensity.conversion).toEqual({
      measure: 'PGA',
      relation: 'Worden et al. (2012)',
      sigmaMmi: 0.73,
    });
  });

  it('from PGV: the PGV relation and its σ 0.65, recorded', () => {
    const pgvLevels = [1, 3, 10, 30, 100, 300];
    const pgvRates = pgvLevels.map((v) => 1e-2 * v ** -2);
    const pgv = at475Years(pgvLevels, pgvRates, { conversion: INTENSITY_CONVERSIONS.PGV });
    // 475-year PGV = (1e-2 × 475)^(1/2) = 2.179449 cm/s: log10 = 0.338347 <= t1, MMI = 3.78 + 1.47 × 0.338347 = 4.277370.
    expectClose(
      atYears(pgv, '475').mmi!,
      4.27737,
      1e-5,
      'Worden 2012 PGV relation, hand computation',
    );
    expect(atYears(pgv, '475').fromMeasure).toBe('PGV');
    expect(pgv.intensity.conversion?.sigmaMmi).toBe(0.65);
  });

  it('bands from the 475-year MMI: 7.51 is refer-soon', () => {
    expect(result.band.id).toBe('refer-soon');
    expectClose(result.band.mmi475!, 7.510133041880696, 1e-9, 'hand computation');
  });

  it('a curve too low to reach the 475-year rate gives null MMI and the inform band', () => {
    const lowRates = annualRate.map((r) => r * 1e-4);
    const low = at475Years(levels, lowRates);
    expect(low.intensity.atReturnPeriod['475']).toEqual({
      mmi: null,
      roman: null,
      fromMeasure: 'PGA',
    });
    expect(low.band).toEqual({ id: 'inform', label: 'Inform', mmi475: null });
  });

  it('a curve above its highest level at 475 years bands from that level (a lower bound) and says so', () => {
    const high = at475Years([0.01, 0.05], [0.5, 0.1]);
    expect(high.band.mmi475).toBeNull();
    expect(high.band.id).toBe('inform'); // MMI at 0.05 g is 4.7: a lower bound only
    expect(high.warnings.some((w) => w.includes('475-year'))).toBe(true);
  });
});

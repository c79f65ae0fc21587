import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { exceedanceCurve } from './exceedance-curve.ts';
import { predictRuptures, selectRuptures } from './rupture-predictions.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import { compensatedSum } from '../../../api/engine/summation.ts';
import { pointRuptures, ROCK_SITE } from '../../engine/hazard/point-ruptures.ts';
import type { PointRuptureSpec } from '../../engine/hazard/point-ruptures.ts';
import { expectRelative } from '../close.ts';

const PGA = { kind: 'PGA' } as const;

function curve(
  specs: readonly PointRuptureSpec[],
  levels: readonly number[],
  truncationSigma: number,
  maxDistanceKm = 300,
): number[] {
  const { ruptures, distances } = pointRuptures(specs);
  const selected = selectRuptures(ruptures, distances, 'crustal', maxDistanceKm);
  return exceedanceCurve(
    predictRuptures(cornell79, PGA, ruptures, distances, ROCK_SITE, selected),
    ruptures,
    levels,
    truncationSigma,
  );
}

/*
 * Baker (2008), "An introduction to probabilistic seismic hazard analysis", white paper v1.3,
 * section 3 example calculations (from memory; page not checked): one rupture of M 6.5 at
 * R = 10 km occurring 0.01 times a year, ground motion by Cornell et al. (1979).
 * The expected rates below are our hand computation from that set-up and the printed equation:
 * μ = −0.9787926, σ = 0.57, λ(PGA > x) = 0.01 Q((ln x − μ) / σ), Q from a reference erfc.
 * They are not numbers read from the paper.
 */
describe('exceedanceCurve: one rupture (Baker 2008 single-scenario example set-up, from memory)', () => {
  const scenario = [{ magnitude: 6.5, annualRate: 0.01, repiKm: 10 }];
  const levels = [0.1, 0.2, 0.3, 0.5, 1.0];

  it('untruncated: λ(PGA > 0.1, 0.2, 0.3, 0.5, 1 g) = 0.01 × (0.98990, 0.86572, 0.65360, 0.30814, 0.04297) (hand computation)', () => {
    const expected = [
      0.009898954541949763, 0.008657222844156154, 0.006535981385028097, 0.003081390307182214,
      0.0004297315155098654,
    ];
    curve(scenario, levels, Infinity).forEach((rate, i) =>
      expectRelative(
        rate,
        expected[i] as number,
        1e-12,
        `Baker (2008) set-up, hand computation at ${levels[i]} g`,
      ),
    );
  });

  it('truncated at 3σ: renormalised two-sided (hand computation)', () => {
    const expected = [
      0.00991221652478526, 0.008667123329284045, 0.006540139447445181, 0.0030761964298771103,
      0.0004173593202433224,
    ];
    curve(scenario, levels, 3).forEach((rate, i) =>
      expectRelative(rate, expected[i] as number, 1e-12, `3σ truncation at ${levels[i]} g`),
    );
  });
});

describe('exceedanceCurve: two ruptures add (total probability over ruptures; Baker 2008 eq. for λ)', () => {
  it('M 6.5 at 10 km (0.01/yr) plus M 7.5 at 30 km (0.002/yr): λ(PGA > 0.2 g) = 0.010420696 (hand computation)', () => {
    // 0.01 Q((ln 0.2 + 0.9787926)/0.57) + 0.002 Q((ln 0.2 + 0.9347217)/0.57)
    const [rate] = curve(
      [
        { magnitude: 6.5, annualRate: 0.01, repiKm: 10 },
        { magnitude: 7.5, annualRate: 0.002, repiKm: 30 },
      ],
      [0.2],
      Infinity,
    );
    expectRelative(
      rate as number,
      0.010420695992860838,
      1e-12,
      'sum over two ruptures, hand computation',
    );
  });
});

/*
 * A truncated Gutenberg–Richter source at one distance: b = 1, M 5–8, 0.05 events a year of
 * M >= 5, R = 10 km, Cornell et al. (1979). The expected values are the continuous integral
 * ν ∫ f(m) P(PGA > x | m) dm with the truncated-exponential density f (Cosentino et al. 1977, from memory;
 * Baker 2008 eq. for the bounded G-R density), by composite Simpson's rule with 60 000 intervals,
 * computed outside this code. The engine sums 300 magnitude bins 0.01 wide at their centres
 * (midpoint rule), whose error here is about (0.01)² β² / 24 ≈ 2e-5 relative: tolerance 1e-4.
 */
describe('exceedanceCurve: Gutenberg–Richter source (independent numerical integral)', () => {
  const beta = Math.LN10;
  const norm = 1 - Math.exp(-beta * 3);
  const specs: PointRuptureSpec[] = Array.from({ length: 300 }, (_, i) => {
    const lo = 5 + i * 0.01;
    const rate = (0.05 * (Math.exp(-beta * (lo - 5)) - Math.exp(-beta * (lo + 0.01 - 5)))) / norm;
    return { magnitude: lo + 0.005, annualRate: rate, repiKm: 10 };
  });
  const levels = [0.01, 0.1, 0.3, 1.0];

  it('untruncated', () => {
    const expected = [
      0.049999738720433805, 0.036098773228173946, 0.0073834162624877775, 0.0003255471562728128,
    ];
    curve(specs, levels, Infinity).forEach((rate, i) =>
      expectRelative(rate, expected[i] as number, 1e-4, `Simpson integral at ${levels[i]} g`),
    );
  });

  it('truncated at 3σ', () => {
    const expected = [
      0.04999999999999966, 0.036128358534134875, 0.007335726325962092, 0.0003013181525552821,
    ];
    curve(specs, levels, 3).forEach((rate, i) =>
      expectRelative(rate, expected[i] as number, 1e-4, `Simpson integral at ${levels[i]} g, 3σ`),
    );
  });
});

const rupturesArb = fc.array(
  fc.record({
    magnitude: fc.double({ min: 4.5, max: 8, noNaN: true }),
    annualRate: fc.double({ min: 1e-7, max: 0.1, noNaN: true }),
    repiKm: fc.double({ min: 0, max: 290, noNaN: true }),
    depthKm: fc.double({ min: 0, max: 20, noNaN: true }),
  }),
  { minLength: 1, maxLength: 30 },
);
const levels = [0.001, 0.003, 0.01, 0.03, 0.1, 0.2, 0.3, 0.5, 1, 2, 3];

describe('exceedanceCurve: properties', () => {
  it('is non-increasing in level (property)', () => {
    fc.assert(
      fc.property(rupturesArb, fc.constantFrom(0, 1, 2, 3, Infinity), (specs, n) => {
        const rates = curve(specs, levels, n);
        rates.slice(1).forEach((r, i) => expect(r).toBeLessThanOrEqual(rates[i] as number));
      }),
    );
  });

  it('two identical sources give twice the rate (to the rounding of the sum, 1e-14 relative)', () => {
    fc.assert(
      fc.property(rupturesArb, (specs) => {
        const once = curve(specs, levels, 3);
        const twice = curve([...specs, ...specs.map((s) => ({ ...s, sourceIndex: 1 }))], levels, 3);
        twice.forEach((r, i) => {
          if (once[i] === 0) expect(r).toBe(0);
          else expectRelative(r, 2 * (once[i] as number), 1e-14, 'rates add over sources');
        });
      }),
    );
  });

  it('truncation 0 equals the median-only step function: Σ rates of ruptures whose median exceeds the level', () => {
    fc.assert(
      fc.property(rupturesArb, (specs) => {
        const { ruptures, distances } = pointRuptures(specs);
        const medians = ruptures.map(
          (r, i) =>
            cornell79.predict({ ...r.context, ...distances[i]!, ...ROCK_SITE }, PGA).lnMedian,
        );
        const step = levels.map((x) =>
          compensatedSum(
            ruptures.filter((_, i) => medians[i]! > Math.log(x)).map((r) => r.annualRate),
          ),
        );
        expect(curve(specs, levels, 0)).toEqual(step);
      }),
    );
  });

  it('a rupture beyond maxDistanceKm (Rjb) changes nothing; one at exactly maxDistanceKm counts', () => {
    fc.assert(
      fc.property(rupturesArb, (specs) => {
        const base = curve(specs, levels, 3, 300);
        expect(
          curve([...specs, { magnitude: 8, annualRate: 1, repiKm: 300.001 }], levels, 3, 300),
        ).toEqual(base);
      }),
    );
    const atLimit = curve([{ magnitude: 8, annualRate: 1, repiKm: 300 }], [0.001], 3, 300);
    expect(atLimit[0]).toBeGreaterThan(0);
    // The cut-off is on Rjb: a deep rupture with Rjb 299 km and Rrup 300.5 km still counts.
    const deep = curve(
      [{ magnitude: 8, annualRate: 1, repiKm: 299, depthKm: 30 }],
      [0.001],
      3,
      300,
    );
    expect(deep[0]).toBeGreaterThan(0);
  });

  it('ruptures of another setting are not integrated with crustal models', () => {
    const rates = curve(
      [{ magnitude: 7, annualRate: 0.1, repiKm: 10, setting: 'interface' }],
      levels,
      3,
    );
    expect(rates.every((r) => r === 0)).toBe(true);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deaggregate } from './deaggregation.ts';
import { expectSharesSumToOne } from '../deaggregation-checks.ts';
import type { DeaggregationBranch } from './deaggregation.ts';
import {
  distanceBin,
  distanceBinRange,
  epsilonBin,
  epsilonBinRange,
  magnitudeBin,
  magnitudeBinRange,
} from '../../../api/engine/hazard/deaggregation-bins.ts';
import { predictRuptures, selectRuptures } from './rupture-predictions.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import type { GroundMotionModel } from '../../../api/engine/motion/types.ts';
import { pointRuptures, ROCK_SITE } from '../../engine/hazard/point-ruptures.ts';
import type { PointRuptureSpec } from '../../engine/hazard/point-ruptures.ts';
import { scaledCornell } from '../../engine/hazard/test-models.ts';
import { expectClose } from '../close.ts';

const PGA = { kind: 'PGA' } as const;

function deagg(
  specs: readonly PointRuptureSpec[],
  level: number,
  truncationSigma: number,
  models: readonly [GroundMotionModel, number][] = [[cornell79, 1]],
) {
  const { ruptures, distances } = pointRuptures(specs);
  const selected = selectRuptures(ruptures, distances, 'crustal', 300);
  const branches: DeaggregationBranch[] = models.map(([model, weight]) => ({
    weight,
    predictions: predictRuptures(model, PGA, ruptures, distances, ROCK_SITE, selected),
  }));
  return deaggregate({
    measure: 'PGA',
    level,
    returnPeriodYears: 475,
    ruptures,
    distances,
    branches,
    sourceNames: ['Near fault', 'Far fault'],
    truncationSigma,
  });
}

/*
 * Two ruptures with Cornell et al. (1979), PGA > 0.2 g, untruncated: contributions
 * 0.01 Q(ε₁) and 0.002 Q(ε₂) with ε₁ = −1.1063954, ε₂ = −1.1837126 (hand computation from the
 * printed equation; set-up after Baker's (2008) deaggregation examples, from memory).
 */
describe('deaggregate: two ruptures (hand computation)', () => {
  const specs: PointRuptureSpec[] = [
    { magnitude: 6.5, annualRate: 0.01, repiKm: 10, sourceIndex: 0, sourceId: 'near' },
    { magnitude: 7.5, annualRate: 0.002, repiKm: 30, sourceIndex: 1, sourceId: 'far' },
  ];
  const d = deagg(specs, 0.2, Infinity)!;

  it('shares by source: 0.83077 and 0.16923', () => {
    expect(d.bySource.map((s) => s.sourceId)).toEqual(['near', 'far']);
    expect(d.bySource.map((s) => s.name)).toEqual(['Near fault', 'Far fault']);
    expectClose(d.bySource[0]!.share, 0.8307720376918365, 1e-12, 'hand computation');
    expectClose(d.bySource[1]!.share, 1 - 0.8307720376918365, 1e-12, 'hand computation');
  });

  it('means: M 6.66923, Rrup 13.38456 km, ε −1.11948', () => {
    expectClose(
      d.mean.magnitude,
      6.669227962308164,
      1e-12,
      'contribution-weighted mean M, hand computation',
    );
    expectClose(
      d.mean.distanceKm,
      13.38455924616327,
      1e-11,
      'contribution-weighted mean R, hand computation',
    );
    expectClose(
      d.mean.epsilon,
      -1.1194796016747246,
      1e-12,
      'contribution-weighted mean ε, hand computation',
    );
  });

  it('bins: M 6.5–7, R 10–20 km, ε −2…−1 holds the near rupture; the mode is that bin', () => {
    expect(d.bins.map((b) => [b.magnitude, b.distanceKm, b.epsilon])).toEqual([
      [
        [6.5, 7],
        [10, 20],
        [-2, -1],
      ],
      [
        [7.5, 8],
        [20, 40],
        [-2, -1],
      ],
    ]);
    expectClose(d.bins[0]!.share, 0.8307720376918365, 1e-12, 'hand computation');
    expectClose(d.mode.magnitude, 6.5, 1e-12, 'modal bin holds only M 6.5');
    expectClose(d.mode.distanceKm, 10, 1e-12, 'modal bin holds only R 10 km');
    expectClose(
      d.mode.epsilon,
      -1.1063953641555926,
      1e-12,
      'ε of the near rupture, hand computation',
    );
    expect([d.level, d.measure, d.returnPeriodYears]).toEqual([0.2, 'PGA', 475]);
  });
});

describe("deaggregate: over a logic tree, weighted by each branch's contribution", () => {
  it('Cornell79 (0.6) and Cornell79 × 1.5 (0.4), one rupture, PGA > 0.3 g: mean ε = −0.72863 (hand computation)', () => {
    // ε₁ = (ln 0.3 + 0.9787926)/0.57 = −0.3950531; ε₂ = ε₁ − ln 1.5/0.57 = −1.1063954;
    // weights 0.6 × 0.01 Q(ε₁) and 0.4 × 0.01 Q(ε₂).
    const d = deagg([{ magnitude: 6.5, annualRate: 0.01, repiKm: 10 }], 0.3, Infinity, [
      [cornell79, 0.6],
      [scaledCornell('Scaled', 1.5), 0.4],
    ])!;
    expectClose(d.mean.epsilon, -0.7286310847243446, 1e-12, 'hand computation');
    expect(d.bins.length).toBe(2);
    expectClose(
      d.bins.reduce((s, b) => s + b.share, 0),
      1,
      1e-12,
      'shares sum to 1',
    );
  });
});

const specsArb = fc.array(
  fc.record({
    magnitude: fc.double({ min: 4.5, max: 8.5, noNaN: true }),
    annualRate: fc.double({ min: 1e-8, max: 0.1, noNaN: true }),
    repiKm: fc.double({ min: 0, max: 299, noNaN: true }),
    depthKm: fc.double({ min: 0, max: 40, noNaN: true }),
    sourceIndex: fc.integer({ min: 0, max: 4 }),
  }),
  { minLength: 1, maxLength: 60 },
);

describe('deaggregate: properties', () => {
  it("shares by source and by bin each sum to 1 within 1e-9; means lie within the ruptures' range", () => {
    fc.assert(
      fc.property(
        specsArb,
        fc.double({ min: 0.001, max: 2, noNaN: true }),
        fc.constantFrom(0, 2, 3, Infinity),
        (raw, level, n) => {
          const specs = raw.map((s) => ({ ...s, sourceId: `s${s.sourceIndex}` }));
          const d = deagg(specs, level, n);
          if (d === null) return;
          expectSharesSumToOne(d);
          const ms = specs.map((s) => s.magnitude);
          expect(d.mean.magnitude).toBeGreaterThanOrEqual(Math.min(...ms) - 1e-9);
          expect(d.mean.magnitude).toBeLessThanOrEqual(Math.max(...ms) + 1e-9);
          for (const b of d.bins) {
            expect(b.share).toBeGreaterThan(0);
            expect(b.epsilon[0]).toBeLessThan(b.epsilon[1]);
          }
        },
      ),
    );
  });

  it('is null when no rupture can exceed the level', () => {
    expect(deagg([{ magnitude: 5, annualRate: 0.01, repiKm: 200 }], 3, 3)).toBeNull();
  });
});

describe('deaggregation bins (stated edges)', () => {
  it('magnitude bins are 0.5 wide on multiples of 0.5; an edge goes to the bin above', () => {
    expect(magnitudeBinRange(magnitudeBin(6.5))).toEqual([6.5, 7]);
    expect(magnitudeBinRange(magnitudeBin(6.49))).toEqual([6, 6.5]);
    expect(magnitudeBinRange(magnitudeBin(5 + 15 * 0.1))).toEqual([6.5, 7]);
  });
  it('distance edges 0–10–20–40–60–100–150–200–300–500–1000 km, then 500 km steps', () => {
    expect(distanceBinRange(distanceBin(0))).toEqual([0, 10]);
    expect(distanceBinRange(distanceBin(10))).toEqual([10, 20]);
    expect(distanceBinRange(distanceBin(299.9))).toEqual([200, 300]);
    expect(distanceBinRange(distanceBin(999))).toEqual([500, 1000]);
    expect(distanceBinRange(distanceBin(1200))).toEqual([1000, 1500]);
  });
  it('ε edges −2, −1, 0, 1, 2; outer bins closed by the extremes seen, at least ±3', () => {
    expect(epsilonBinRange(epsilonBin(-2.5), -2.5, 1)).toEqual([-3, -2]);
    expect(epsilonBinRange(epsilonBin(-4.2), -4.2, 1)).toEqual([-5, -2]);
    expect(epsilonBinRange(epsilonBin(0), -1, 1)).toEqual([0, 1]);
    expect(epsilonBinRange(epsilonBin(2.9), -1, 2.9)).toEqual([2, 3]);
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  exceedanceProbability,
  standardisedLevel,
} from '../../../api/engine/hazard/truncated-exceedance.ts';
import { expectClose } from '../../helpers/close.ts';

// Q(1) and Q(3) from Abramowitz & Stegun (1964), Table 26.1 (from memory): 0.1586552539, 0.0013498980.
const Q1 = 0.1586552539;
const Q3 = 0.001349898;

describe('exceedanceProbability (truncated lognormal)', () => {
  it('untruncated: P(ε > 1) = Q(1) and P(ε > 3) = Q(3) (A&S 1964 Table 26.1, from memory)', () => {
    expectClose(exceedanceProbability(1, Infinity), Q1, 1e-10, 'A&S Table 26.1 (from memory)');
    expectClose(exceedanceProbability(3, Infinity), Q3, 1e-10, 'A&S Table 26.1 (from memory)');
  });

  it('truncated at 3σ: P = (Q(ε) − Q(3)) / (1 − 2Q(3)); at ε = 1 that is 0.157731198 (hand computation from A&S values)', () => {
    // (0.1586552539 − 0.0013498980) / (1 − 2 × 0.0013498980) = 0.1573053559 / 0.9973002040 = 0.1577311980
    expectClose(
      exceedanceProbability(1, 3),
      0.157731198,
      1e-9,
      'renormalised two-sided truncation, hand computation',
    );
    expectClose(exceedanceProbability(-1, 3), 1 - 0.157731198, 1e-9, 'same, by symmetry');
  });

  it('is exactly 1/2 at the median for any symmetric truncation (symmetry)', () => {
    for (const n of [0.5, 1, 2, 3, 6, Infinity])
      expectClose(exceedanceProbability(0, n), 0.5, 1e-15, `truncation ${n}: symmetry`);
  });

  it('is 0 at and beyond +n and 1 at and beyond −n (definition of the truncation)', () => {
    expect(exceedanceProbability(3, 3)).toBe(0);
    expect(exceedanceProbability(3.0001, 3)).toBe(0);
    expect(exceedanceProbability(-3, 3)).toBe(1);
    expect(exceedanceProbability(-7, 3)).toBe(1);
  });

  it('truncation 0 is the median-only step: 1 below the median, 0 at and above it', () => {
    expect(exceedanceProbability(-1e-12, 0)).toBe(1);
    expect(exceedanceProbability(0, 0)).toBe(0);
    expect(exceedanceProbability(2, 0)).toBe(0);
  });

  it('is continuous at the truncation points (renormalisation makes P reach 0 and 1 there)', () => {
    expectClose(exceedanceProbability(3 - 1e-9, 3), 0, 1e-11, 'P → 0 as ε → n');
    expectClose(exceedanceProbability(-3 + 1e-9, 3), 1, 1e-11, 'P → 1 as ε → −n');
  });

  it('is non-increasing in ε and inside [0, 1] (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -8, max: 8, noNaN: true }),
        fc.double({ min: 1e-9, max: 4, noNaN: true }),
        fc.constantFrom(0, 1, 2, 3, 4, Infinity),
        (epsilon, step, n) => {
          const p = exceedanceProbability(epsilon, n);
          expect(p >= 0 && p <= 1).toBe(true);
          expect(exceedanceProbability(epsilon + step, n)).toBeLessThanOrEqual(p + 2.3e-16);
        },
      ),
    );
  });
});

describe('standardisedLevel', () => {
  it('is (ln level − ln median) / σ', () => {
    expectClose(
      standardisedLevel(Math.log(0.2), Math.log(0.1), 0.5),
      Math.log(2) / 0.5,
      1e-15,
      'definition of ε',
    );
  });
  it('treats σ = 0 as the median-only case, matching truncation 0', () => {
    expect(exceedanceProbability(standardisedLevel(-1, 0, 0), 3)).toBe(1);
    expect(exceedanceProbability(standardisedLevel(0, 0, 0), 3)).toBe(0);
    expect(exceedanceProbability(standardisedLevel(1, 0, 0), Infinity)).toBe(0);
  });
});

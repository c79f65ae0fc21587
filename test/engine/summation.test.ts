import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  accumulate,
  accumulatedTotals,
  compensatedSum,
  createLevelAccumulator,
} from '../../api/engine/summation.ts';

/** 2^-30: terms are whole multiples of it, so their exact sum is a BigInt count of it. */
const QUANTUM = 2 ** -30;

describe('compensated summation (Neumaier 1974)', () => {
  it('keeps the small terms that plain summation drops (the usual illustration of Neumaier 1974: 1, 1e100, 1, -1e100 gives 2; from memory)', () => {
    expect(compensatedSum([1, 1e100, 1, -1e100])).toBe(2);
  });

  it('adds a million rates of 1e-7 onto 1 to within one ulp of 1.1', () => {
    const values = [1, ...Array.from({ length: 1_000_000 }, () => 1e-7)];
    expect(Math.abs(compensatedSum(values) - 1.1)).toBeLessThanOrEqual(2.3e-16);
  });

  it('equals the exact sum, rounded once, for terms of very different sizes (property, exact BigInt reference)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.bigInt({ min: -(2n ** 60n), max: 2n ** 60n }), { maxLength: 200 }),
        (counts) => {
          const exact = counts.reduce((a, b) => a + b, 0n);
          const got = compensatedSum(counts.map((k) => Number(k) * QUANTUM));
          const want = Number(exact) * QUANTUM;
          // Number(k) rounds each term once (|k| < 2^61); the reference rounds only the total.
          // Allow the relative rounding of each term, 2^-53 of the largest, summed.
          const slack = counts.reduce((a, k) => a + Math.abs(Number(k)), 0) * QUANTUM * 2 ** -52;
          expect(Math.abs(got - want)).toBeLessThanOrEqual(slack);
        },
      ),
    );
  });

  it('keeps one running sum per level, each equal to summing that level alone', () => {
    // Column 2 is 1, 1e-16, 1e-16, -1: plain summation returns 0, the exact sum is 2e-16.
    const rows = [
      [1, 1, 3],
      [1e100, 1e-16, -3],
      [1, 1e-16, 1e-20],
      [-1e100, -1, 0],
    ];
    const acc = createLevelAccumulator(3);
    for (const row of rows) row.forEach((v, j) => accumulate(acc, j, v));
    expect(accumulatedTotals(acc)).toEqual([2, 2e-16, 1e-20]);
  });
});

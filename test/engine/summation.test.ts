import { describe, expect, it } from 'vitest';
import { compensatedSum } from '../../api/engine/summation.ts';

describe('compensatedSum', () => {
  it('keeps the small terms that plain summation drops (Neumaier 1974 example: 1, 1e100, 1, -1e100)', () => {
    expect(compensatedSum([1, 1e100, 1, -1e100])).toBe(2);
  });
  it('adds a million rates of 1e-7 onto 1 to within one ulp of 1.1', () => {
    const values = [1, ...Array.from({ length: 1_000_000 }, () => 1e-7)];
    expect(Math.abs(compensatedSum(values) - 1.1)).toBeLessThanOrEqual(2.3e-16);
  });
});

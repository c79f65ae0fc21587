import { describe, expect, it } from 'vitest';
import {
  annualRateAtLevel,
  levelAtAnnualRate,
  levelAtReturnPeriod,
} from '../../../api/engine/hazard/curve-interpolation.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

// A power-law curve, λ = k x^−b, is a straight line on log–log axes, so log–log interpolation
// between its levels must be exact (to rounding): the check is the closed form.
const k = 1e-4;
const b = 2.5;
const levels = [0.01, 0.03, 0.1, 0.3, 1];
const rates = levels.map((x) => k * x ** -b);

describe('levelAtAnnualRate (log–log interpolation)', () => {
  it('is exact on a power-law curve between levels (closed form x = (k/λ)^(1/b))', () => {
    for (const target of [3e-1, 1e-2, 2.1e-3, 1.3e-4]) {
      const { level, status } = levelAtAnnualRate(levels, rates, target);
      expect(status).toBe('ok');
      expectRelative(level as number, (k / target) ** (1 / b), 1e-12, 'power law, closed form');
    }
  });

  it('returns a level exactly when the rate is on a level', () => {
    expect(levelAtAnnualRate(levels, rates, rates[2] as number)).toEqual({
      level: 0.1,
      status: 'ok',
    });
    expect(levelAtAnnualRate(levels, rates, rates[0] as number)).toEqual({
      level: 0.01,
      status: 'ok',
    });
  });

  it('says which side of the curve a rate falls off', () => {
    expect(levelAtAnnualRate(levels, rates, (rates[0] as number) * 1.01)).toEqual({
      level: null,
      status: 'below-lowest-level',
    });
    expect(levelAtAnnualRate(levels, rates, (rates[4] as number) * 0.99)).toEqual({
      level: null,
      status: 'above-highest-level',
    });
  });

  it('reads the 475-year level of a curve as the level at rate 1/475', () => {
    const byRate = levelAtAnnualRate(levels, rates, 1 / 475);
    expect(levelAtReturnPeriod(levels, rates, 475)).toEqual(byRate);
    expectRelative(byRate.level as number, (k * 475) ** (1 / b), 1e-12, 'power law, closed form');
  });

  it('where the curve drops to 0 inside a segment, takes the rate linear in ln level there (stated choice)', () => {
    const { level } = levelAtAnnualRate([0.1, 0.4], [1e-3, 0], 5e-4);
    expectClose(level as number, 0.2, 1e-15, 'midpoint in ln level: √(0.1 × 0.4) = 0.2');
  });
});

describe('annualRateAtLevel', () => {
  it('is exact on a power-law curve (closed form λ = k x^−b)', () => {
    for (const x of [0.015, 0.05, 0.2, 0.7]) {
      const { annualRate, status } = annualRateAtLevel(levels, rates, x);
      expect(status).toBe('ok');
      expectRelative(annualRate, k * x ** -b, 1e-12, 'power law, closed form');
    }
  });

  it('gives the curve value on a level and bounds off the curve', () => {
    expect(annualRateAtLevel(levels, rates, 0.3)).toEqual({ annualRate: rates[3], status: 'ok' });
    expect(annualRateAtLevel(levels, rates, 0.001)).toEqual({
      annualRate: rates[0],
      status: 'below-lowest-level',
    });
    expect(annualRateAtLevel(levels, rates, 2)).toEqual({
      annualRate: rates[4],
      status: 'above-highest-level',
    });
  });

  it('is 0 past the point where the curve reaches 0', () => {
    expect(annualRateAtLevel([0.1, 0.2, 0.4], [1e-3, 0, 0], 0.3).annualRate).toBe(0);
    expectClose(
      annualRateAtLevel([0.1, 0.4], [1e-3, 0], 0.2).annualRate,
      5e-4,
      1e-18,
      'linear in ln level on the last segment',
    );
  });
});

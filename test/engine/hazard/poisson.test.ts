import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import {
  annualRateForProbability,
  poissonProbability,
  returnPeriodForProbability,
} from '../../../api/engine/hazard/poisson.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

describe('Poisson probability of exceedance', () => {
  it('10% in 50 years is the 475-year return period to 0.1% (EN 1998-1:2004 §2.1 and ASCE 7-16 state 475 years; from memory)', () => {
    expectRelative(
      returnPeriodForProbability(0.1, 50),
      475,
      1e-3,
      'EN 1998-1 / ASCE 7-16: 10% in 50 years ↔ 475 years (from memory)',
    );
  });

  it('2% in 50 years is the 2475-year return period to 0.1% (ASCE 7-16 MCE definition; from memory)', () => {
    expectRelative(
      returnPeriodForProbability(0.02, 50),
      2475,
      1e-3,
      'ASCE 7-16: 2% in 50 years ↔ 2475 years (from memory)',
    );
  });

  it('the 475-year level has a 10% chance in 50 years back again (to 0.1%, same sources)', () => {
    expectRelative(
      poissonProbability(1 / 475, 50),
      0.1,
      1e-3,
      'EN 1998-1 / ASCE 7-16 (from memory)',
    );
  });

  it('rate 0.01 per year over 50 years: 1 − e^−0.5 = 0.3934693403 (hand computation, Poisson model)', () => {
    expectClose(
      poissonProbability(0.01, 50),
      0.3934693403,
      1e-10,
      '1 − exp(−0.5), hand computation',
    );
  });

  it('keeps the digits of small rates (P ≈ λt − (λt)²/2, Taylor series)', () => {
    const lt = 5e-11;
    expectRelative(
      poissonProbability(1e-12, 50),
      lt - (lt * lt) / 2,
      1e-15,
      'Taylor series of 1 − e^−x',
    );
  });

  it('is 0 for a zero rate and 1 for an overwhelming one', () => {
    expect(poissonProbability(0, 50)).toBe(0);
    expect(poissonProbability(1e6, 50)).toBe(1);
  });

  it('inverts: rate → probability → rate (property; λt <= 10, beyond which P rounds to 1)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-9, max: 0.05, noNaN: true }),
        fc.double({ min: 1, max: 200, noNaN: true }),
        (rate, years) => {
          expectRelative(
            annualRateForProbability(poissonProbability(rate, years), years),
            rate,
            1e-9,
            'round trip',
          );
        },
      ),
    );
  });

  it('refuses bad input naming the field', () => {
    expect(() => poissonProbability(-1, 50)).toThrow(InvalidInput);
    expect(() => poissonProbability(0.1, 0)).toThrow(/years/);
    expect(() => annualRateForProbability(1, 50)).toThrow(/probability/);
  });
});

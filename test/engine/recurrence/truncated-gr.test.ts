import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import {
  rateAboveMinimum,
  truncatedExponentialBinProbabilities,
} from '../../../api/engine/recurrence/truncated-gr.ts';
import { expectRelative } from '../../helpers/close.ts';

describe('truncated exponential bin probabilities', () => {
  it('mMin 5, mMax 8, b 1, unit bins: 0.9/0.999, 0.09/0.999, 0.009/0.999', () => {
    // The doubly truncated exponential (Cosentino et al. 1977; Baker 2008, An Introduction to
    // PSHA, section on magnitude distributions, from memory), evaluated by hand: with b = 1 the
    // bin masses are differences of powers of ten. Not a printed worked example: none was at
    // hand to read, so these are a hand evaluation of the published formula.
    const p = truncatedExponentialBinProbabilities([5, 6, 7, 8], 5, 8, 1);
    expectRelative(p[0] ?? NaN, 0.9 / 0.999, 1e-12, 'P(5 <= M < 6)');
    expectRelative(p[1] ?? NaN, 0.09 / 0.999, 1e-12, 'P(6 <= M < 7)');
    expectRelative(p[2] ?? NaN, 0.009 / 0.999, 1e-12, 'P(7 <= M <= 8)');
  });

  it('b 0.8 in 0.1 bins sums to 1 (1e-12), and a bin outside [mMin, mMax] carries nothing', () => {
    const edges = Array.from({ length: 41 }, (_, k) => 4 + k * 0.1);
    const p = truncatedExponentialBinProbabilities(edges, 4.5, 7.5, 0.8);
    expectRelative(
      p.reduce((s, x) => s + x, 0),
      1,
      1e-12,
      'total probability',
    );
    expect(p[0]).toBe(0);
    expect(p[39]).toBe(0);
  });

  it('ratio of neighbouring bins is 10^-b (the Gutenberg–Richter slope)', () => {
    const p = truncatedExponentialBinProbabilities([5, 5.1, 5.2, 5.3], 5, 7, 1.2);
    expectRelative(
      (p[1] ?? NaN) / (p[0] ?? NaN),
      10 ** -0.12,
      1e-12,
      'Gutenberg & Richter (1944): log-linear with slope -b',
    );
  });

  it('rate of M >= mMin from aValue is 10^(a - b mMin), or the given rate', () => {
    expectRelative(
      rateAboveMinimum({ aValue: 3.2, bValue: 0.9, mMin: 4.5 }),
      10 ** (3.2 - 4.05),
      1e-12,
      'DESIGN.md section 2 definition',
    );
    expect(rateAboveMinimum({ rate: 0.2, bValue: 1, mMin: 5 })).toBe(0.2);
    expect(() => rateAboveMinimum({ bValue: 1, mMin: 5 })).toThrow(InvalidInput);
  });

  it('refuses b <= 0', () => {
    expect(() => truncatedExponentialBinProbabilities([5, 6], 5, 6, 0)).toThrow(/b-value/);
  });
});

import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import type { Recurrence } from '../../../api/engine/model.ts';
import { magnitudeBins, magnitudeEdges } from '../../../api/engine/recurrence/magnitude-bins.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

/* Binning rules are ours (common practice): bins of magnitudeStep from mMin, centres as magnitudes. */
describe('magnitudeEdges', () => {
  it('5.0–7.6 by 0.1: 26 bins, centres 5.05 … 7.55', () => {
    const { magnitudes, edges } = magnitudeBins(
      { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.6, aValue: 4 },
      { magnitudeStep: 0.1 },
    );
    expect(edges.length).toBe(27);
    expect(magnitudes.length).toBe(26);
    expect(magnitudes[0]).toBe(5.05);
    expect(magnitudes[25]).toBe(7.55);
    expect(edges[26]).toBe(7.6);
  });
  it('5.0–7.55 by 0.1: the last bin is 7.5–7.55, centred at 7.525', () => {
    const edges = magnitudeEdges(5, 7.55, 0.1);
    expect(edges.length).toBe(27);
    expect(edges[25]).toBe(7.5);
    expect(edges[26]).toBe(7.55);
    const { magnitudes } = magnitudeBins(
      { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.55, rate: 1 },
      { magnitudeStep: 0.1 },
    );
    expect(magnitudes[25]).toBe(7.525);
  });
  it('refuses a step that is not positive and mMax <= mMin', () => {
    expect(() => magnitudeEdges(5, 7, 0)).toThrow(InvalidInput);
    expect(() => magnitudeEdges(7, 7, 0.1)).toThrow(/mMax/);
  });
});

describe('magnitudeBins', () => {
  it('fixed: one bin at its magnitude with its rate', () => {
    const bins = magnitudeBins(
      { type: 'fixed', magnitude: 6.5, rate: 0.01 },
      { magnitudeStep: 0.1 },
    );
    expect(bins.magnitudes).toEqual([6.5]);
    expect(bins.annualRates).toEqual([0.01]);
  });
  const sums: { title: string; recurrence: Recurrence; total: number; source: string }[] = [
    {
      title: 'Gutenberg–Richter from aValue: bin rates sum to 10^(a - b mMin) (1e-9 relative)',
      recurrence: { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.5, aValue: 4 },
      total: 0.1,
      source: 'rate of M >= 5 = 10^(4 - 5) (DESIGN.md section 2)',
    },
    {
      title: 'Gutenberg–Richter from rate, with an uneven last bin: rates still sum to the rate',
      recurrence: { type: 'gutenberg-richter', bValue: 0.9, mMin: 4.5, mMax: 7.33, rate: 0.37 },
      total: 0.37,
      source: 'rate of M >= mMin as given',
    },
  ];
  for (const { title, recurrence, total, source } of sums)
    it(title, () => {
      const bins = magnitudeBins(recurrence, { magnitudeStep: 0.1 });
      expectRelative(
        bins.annualRates.reduce((s, r) => s + r, 0),
        total,
        1e-9,
        source,
      );
    });
  it('the rate above 6.0 follows the bounded Gutenberg–Richter law (Kramer 1996 eq. 4.x, from memory; evaluated by hand)', () => {
    // N(m) = N0 (10^(-b(m - mMin)) - 10^(-b(mMax - mMin))) / (1 - 10^(-b(mMax - mMin)))
    const bins = magnitudeBins(
      { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.5, aValue: 4 },
      { magnitudeStep: 0.1 },
    );
    const above6 = bins.annualRates.slice(10).reduce((s, r) => s + r, 0);
    expectRelative(
      above6,
      (0.1 * (10 ** -1 - 10 ** -2.5)) / (1 - 10 ** -2.5),
      1e-9,
      'N(M >= 6) = 0.0097145',
    );
    expectClose(bins.edges[10] ?? NaN, 6, 1e-12, 'edge 10 is 6.0');
  });
});

import { describe, expect, it } from 'vitest';
import { MS_PER_YEAR } from '../../../api/engine/catalog/event.ts';
import {
  frequencyMagnitude,
  type FrequencyMagnitude,
} from '../../../api/engine/catalog/frequency-magnitude.ts';
import { expectClose } from '../../helpers/close.ts';
import { catalogEvent as event } from '../fixtures/catalog-builders.ts';

describe('frequency–magnitude distribution', () => {
  // Hand-made: 4.0 three times, 4.1 twice, 4.3 once, over 10 Julian years; an ML event left out.
  const events = [
    event('a', 1, 4.0),
    event('b', 2, 4.0),
    event('c', 3, 4.0),
    event('d', 4, 4.1),
    event('e', 5, 4.1),
    event('f', 6, 4.3),
    event('g', 7, 4.2, 'ML'),
  ];
  /** The span from `startYear` to year 10; M >= 4.0 complete from `m40FromYear`, M >= 4.2 from year 0. */
  const withTwoPeriods = (startYear: number, m40FromYear: number) =>
    frequencyMagnitude(events, {
      startMs: startYear * MS_PER_YEAR,
      endMs: 10 * MS_PER_YEAR,
      periods: [
        { magnitude: 4.0, startMs: m40FromYear * MS_PER_YEAR },
        { magnitude: 4.2, startMs: 0 },
      ],
    });
  const binYears = (fmd: FrequencyMagnitude) =>
    fmd.bins.map((b) => [b.magnitude, b.count, b.years]);

  it('counts per bin and cumulatively, with annual rates', () => {
    const fmd = frequencyMagnitude(events, { startMs: 0, endMs: 10 * MS_PER_YEAR });
    expect(fmd.excludedNonMoment).toBe(1);
    // Hand count: incremental 3, 2, 0, 1; cumulative 6, 3, 1, 1; rates / 10.
    expect(fmd.bins.map((b) => [b.magnitude, b.count, b.cumulativeCount])).toEqual([
      [4.0, 3, 6],
      [4.1, 2, 3],
      [4.2, 0, 1],
      [4.3, 1, 1],
    ]);
    const rates = fmd.bins.map((b) => [b.annualRate, b.cumulativeAnnualRate]);
    [
      [0.3, 0.6],
      [0.2, 0.3],
      [0, 0.1],
      [0.1, 0.1],
    ].forEach(([r, c], i) => {
      expectClose(rates[i]?.[0] ?? NaN, r as number, 1e-12, 'hand count over 10 years');
      expectClose(rates[i]?.[1] ?? NaN, c as number, 1e-12, 'hand count over 10 years, cumulative');
    });
    expect(fmd.bins.map((b) => b.lowerEdge)).toEqual([3.95, 4.05, 4.15, 4.25]);
    expect(fmd.fittedLine).toBeUndefined();
  });

  it('puts a fitted line beside the bins', () => {
    // log10 N = 5 − 1.0 M at the lower edges (the cumulative counts' magnitudes, Utsu 1965):
    // 10^(5 − 3.95) = 11.2202, 10^(5 − 4.05) = 8.91251 ... (hand computation).
    const fmd = frequencyMagnitude(events, {
      startMs: 0,
      endMs: 10 * MS_PER_YEAR,
      fit: { aValue: 5, bValue: 1, referenceMagnitude: 4.05 },
    });
    expect(fmd.bins[0]?.fittedCumulativeAnnualRate).toBeUndefined();
    expectClose(
      fmd.bins[1]?.fittedCumulativeAnnualRate ?? NaN,
      8.91251,
      1e-5,
      'hand computation of 10^(a − b M)',
    );
    expectClose(
      fmd.bins[3]?.fittedCumulativeAnnualRate ?? NaN,
      5.62341,
      1e-5,
      'hand computation of 10^(a − b M)',
    );
    expect(fmd.fittedLine?.map((p) => p.magnitude)).toEqual([4.05, 4.35]);
    expectClose(
      fmd.fittedLine?.[1]?.cumulativeAnnualRate ?? NaN,
      4.46684,
      1e-5,
      'hand computation of 10^(5 − 4.35)',
    );
  });

  it("uses each bin's own years under completeness periods", () => {
    // M >= 4.0 from year 5, M >= 4.2 from year 0: bins 4.0 and 4.1 hold only e (year 5),
    // observed 5 years; 4.3 holds f, observed 10 years (hand count).
    const fmd = withTwoPeriods(0, 5);
    expect(binYears(fmd)).toEqual([
      [4.1, 1, 5],
      [4.2, 0, 10],
      [4.3, 1, 10],
    ]);
    expectClose(
      fmd.bins[0]?.cumulativeAnnualRate ?? NaN,
      0.2 + 0 + 0.1,
      1e-12,
      'sum of per-bin rates',
    );
  });

  it('with periods, observes each bin from its period start even when the span starts later (as Weichert 1980 counts it)', () => {
    // The span runs from the first event (year 1) to year 10, but M >= 4.2 is complete from
    // year 0 and M >= 4.0 from year 0.5: a bin's years are from its period's start (hand count),
    // not from the first event, so the plotted rates sit on the line fitted with the same years.
    const fmd = withTwoPeriods(1, 0.5);
    expect(binYears(fmd)).toEqual([
      [4.0, 3, 9.5],
      [4.1, 2, 9.5],
      [4.2, 0, 10],
      [4.3, 1, 10],
    ]);
  });

  it('refuses a backwards span', () => {
    expect(() => frequencyMagnitude(events, { startMs: 10, endMs: 0 })).toThrow(
      /endMs after startMs/,
    );
  });
});

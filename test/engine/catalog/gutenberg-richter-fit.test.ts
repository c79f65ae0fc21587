import { describe, expect, it } from 'vitest';
import { MS_PER_YEAR } from '../../../api/engine/catalog/event.ts';
import {
  annualRateAbove,
  fitGutenbergRichter,
  fitGutenbergRichterWeichert,
  truncatedRateAbove,
} from '../../../api/engine/catalog/gutenberg-richter-fit.ts';
import { syntheticCatalog } from '../../../api/engine/catalog/synthetic-catalog.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { SQUARE_ZONE, catalogEvent as event } from '../fixtures/catalog-builders.ts';

describe('fitGutenbergRichter (Aki–Utsu over one span)', () => {
  // The six magnitudes of the Aki–Utsu hand computation over exactly 10 Julian years, with an
  // ML event that must be left out and one below Mc.
  const events = [4.0, 4.0, 4.1, 4.3, 4.6, 5.0].map((m, i) => event(`e${i}`, i + 1, m));
  events.push(event('ml', 3, 4.4, 'ML'), event('small', 4, 3.8));

  it('gives b, the rate at Mc − ΔM/2 and the a-value', () => {
    const fit = fitGutenbergRichter(events, { mc: 4.0, startMs: 0, endMs: 10 * MS_PER_YEAR });
    // b = 1.132942 (hand computation, see aki-utsu.test.ts); 6 events in 10 years from
    // 3.95 = 4.0 − 0.1/2 (Utsu 1965): 0.6 a year, Poisson σ sqrt(6) / 10 = 0.244949;
    // a = log10(0.6) + 1.132942 · 3.95 = 4.253273 (hand computation).
    expectClose(fit.bValue, 1.132942, 1e-6, 'hand computation of Aki (1965) / Utsu (1965)');
    expectClose(fit.referenceMagnitude, 3.95, 1e-12, 'Mc − ΔM/2 (Utsu 1965)');
    expectClose(fit.rateAtReference, 0.6, 1e-12, '6 events in 10 years');
    expectClose(fit.sigmaRate, 0.244949, 1e-6, 'Poisson: sqrt(n) / T');
    expectClose(fit.aValue, 4.253273, 1e-6, 'hand computation of the a-value');
    expect(fit.excludedNonMoment).toBe(1);
    expect(fit.notes).toEqual([]);
    // 10^(4.253273 − 1.132942 · 5) = 0.0387759 a year of M >= 5 (hand computation).
    expectRelative(annualRateAbove(fit, 5.0), 0.0387759, 1e-5, 'hand computation of 10^(a − b M)');
    // Truncated at 7: 0.6 (10^(−b · 1.05) − 10^(−b · 3.05)) / (1 − 10^(−b · 3.05)) = 0.0385792
    // (hand computation of the renormalised truncated form, Cornell & Vanmarcke 1969, from memory).
    expectRelative(
      truncatedRateAbove(fit, 5.0, 7.0),
      0.0385792,
      1e-5,
      'hand computation, truncated Gutenberg–Richter',
    );
    expectClose(
      truncatedRateAbove(fit, 3.95, 7.0),
      0.6,
      1e-12,
      'rate kept at the reference magnitude',
    );
    expect(truncatedRateAbove(fit, 7.0, 7.0)).toBe(0);
  });

  it('reads all magnitude types on request, and says when the span came from the events', () => {
    const fit = fitGutenbergRichter(events, { mc: 4.0, magnitudes: 'all' });
    expect(fit.eventCount).toBe(7);
    expect(fit.excludedNonMoment).toBe(0);
    expectClose(fit.observationYears, 5, 1e-12, 'first event at year 1, last at year 6');
    expect(fit.notes.join(' ')).toMatch(/observation start and end taken from the events/);
  });

  it('refuses a span that ends before it starts', () => {
    expect(() => fitGutenbergRichter(events, { mc: 4.0, startMs: 10, endMs: 5 })).toThrow(
      /endMs after startMs/,
    );
  });
});

describe('fitGutenbergRichterWeichert (unequal completeness periods)', () => {
  // 100 years of b = 1 seismicity from M 3.95, 15 events a year at random (seed 31); the first
  // 60 years only M >= 5 were recorded (events below are dropped, as an early network misses
  // them). Completeness: M >= 4.0 from year 60, M >= 5.0 from year 0.
  const all = syntheticCatalog({
    random: createRandom(31),
    bValue: 1,
    mMin: 3.95,
    mMax: 8.45,
    annualRate: 15,
    rings: SQUARE_ZONE,
    depthKm: [5, 15],
    startMs: 0,
    endMs: 100 * MS_PER_YEAR,
    magnitudeStep: 0.1,
  });
  const recorded = all.filter((e) => e.timeMs >= 60 * MS_PER_YEAR || e.magnitude >= 5.0 - 1e-9);
  const periods = [
    { magnitude: 4.0, startMs: 60 * MS_PER_YEAR },
    { magnitude: 5.0, startMs: 0 },
  ];

  it('recovers b and the rate where one span would not', () => {
    const fit = fitGutenbergRichterWeichert(recorded, {
      periods,
      endMs: 100 * MS_PER_YEAR,
      upperMagnitude: 8.4,
    });
    expect(fit.method).toBe('weichert');
    // True b = 1 and true rate 15 a year of M >= 3.95 (the synthetic catalog's own parameters):
    // within two Weichert (1980) standard errors.
    expectClose(
      fit.bValue,
      1,
      2 * fit.sigmaB,
      'true b of the synthetic catalog, within 2σ (Weichert 1980)',
    );
    expectClose(
      fit.rateAtReference,
      15,
      2 * fit.sigmaRate,
      'true rate of the synthetic catalog, within 2σ',
    );
    // Ignoring the periods (one span of 100 years from Mc 4.0) the missing early small events
    // pull b well below the truth: a check that the periods matter.
    const naive = fitGutenbergRichter(recorded, { mc: 4.0, startMs: 0, endMs: 100 * MS_PER_YEAR });
    expect(naive.bValue).toBeLessThan(1 - 3 * naive.sigmaB);
  });

  it('refuses an empty list of periods', () => {
    expect(() => fitGutenbergRichterWeichert(recorded, { periods: [] })).toThrow(
      /at least one completeness period/,
    );
  });
});

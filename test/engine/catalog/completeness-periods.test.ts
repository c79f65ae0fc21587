import { describe, expect, it } from 'vitest';
import { observationBins } from '../../../api/engine/catalog/completeness-periods.ts';
import type { CatalogEvent } from '../../../api/engine/catalog/event.ts';
import { expectClose } from '../../helpers/close.ts';

const event = (id: string, year: number, magnitude: number): CatalogEvent => ({
  id,
  timeMs: Date.UTC(year, 6, 1),
  lon: -150,
  lat: -47,
  depthKm: 10,
  magnitude,
  magnitudeType: 'Mw',
});

describe('observation bins from completeness periods', () => {
  // M >= 4.0 complete from 2000, M >= 5.0 from 1950; catalog ends 2020-01-01.
  const periods = [
    { magnitude: 4.0, startMs: Date.UTC(2000, 0, 1) },
    { magnitude: 5.0, startMs: Date.UTC(1950, 0, 1) },
  ];
  const endMs = Date.UTC(2020, 0, 1);
  const events = [
    event('a', 1990, 4.0), // before its period: not counted
    event('b', 2005, 4.0),
    event('c', 2010, 4.1),
    event('d', 1940, 5.2), // before 1950: not counted
    event('e', 1960, 5.2),
    event('f', 1960, 6.0),
    event('g', 2019, 3.9), // below every period
    event('h', 2021, 4.5), // after the end
  ];

  it('count each bin over its own period', () => {
    const bins = observationBins(events, { periods, endMs, magnitudeStep: 0.1 });
    expect(bins.map((b) => b.magnitude)).toEqual([
      4.0, 4.1, 4.2, 4.3, 4.4, 4.5, 4.6, 4.7, 4.8, 4.9, 5.0, 5.1, 5.2, 5.3, 5.4, 5.5, 5.6, 5.7, 5.8,
      5.9, 6.0,
    ]);
    expect(bins.map((b) => b.count)).toEqual([
      1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0, 0, 0, 0, 1,
    ]);
    // 2000-01-01 to 2020-01-01 is 7305 days = 20 Julian years; 1950-01-01 to 2020-01-01 is
    // 70 · 365 + 17 leap days = 25567 days = 69.998631 Julian years (calendar arithmetic).
    expectClose(bins[0]?.years ?? NaN, 20, 1e-12, 'calendar: 7305 days');
    expectClose(bins[9]?.years ?? NaN, 20, 1e-12, 'calendar: 7305 days');
    expectClose(bins[10]?.years ?? NaN, 25567 / 365.25, 1e-12, 'calendar: 25567 days');
    expectClose(bins[20]?.years ?? NaN, 25567 / 365.25, 1e-12, 'calendar: 25567 days');
  });

  it('extend to an upper magnitude with empty bins', () => {
    // 0.5-wide bins: 4.0 holds [3.75, 4.25), so the 3.9 of 2019 joins b and c;
    // 5.0 holds the 5.2 of 1960 (the 1940 one is before its period).
    const bins = observationBins(events, {
      periods,
      endMs,
      magnitudeStep: 0.5,
      upperMagnitude: 7.5,
    });
    expect(bins.map((b) => [b.magnitude, b.count])).toEqual([
      [4.0, 3],
      [4.5, 0],
      [5.0, 1],
      [5.5, 0],
      [6.0, 1],
      [6.5, 0],
      [7.0, 0],
      [7.5, 0],
    ]);
  });

  it('refuse missing or impossible periods', () => {
    expect(() => observationBins(events, { periods: [], endMs, magnitudeStep: 0.1 })).toThrow(
      /at least one completeness period/,
    );
    expect(() =>
      observationBins(events, {
        periods: [{ magnitude: 4, startMs: endMs + 1 }],
        endMs,
        magnitudeStep: 0.1,
      }),
    ).toThrow(/periods\[0\]\.startMs/);
  });
});

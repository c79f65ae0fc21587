import { describe, expect, it } from 'vitest';
import {
  completenessOverTime,
  maxCurvatureMc,
  proposePeriods,
} from '../../../api/engine/catalog/completeness.ts';
import type { CatalogEvent } from '../../../api/engine/catalog/event.ts';
import { expectClose } from '../../helpers/close.ts';

/** Magnitudes repeated as a histogram says: [[magnitude, count], ...]. */
const fromHistogram = (h: readonly (readonly [number, number])[]): number[] =>
  h.flatMap(([m, n]) => Array<number>(n).fill(m));

describe('maximum curvature (Wiemer & Wyss 2000) with the +0.2 correction (Woessner & Wiemer 2005)', () => {
  // A hand-made histogram rising to a peak at 2.3 and falling off: the peak bin is where the
  // non-cumulative count is largest, so Mc = 2.3 + 0.2 = 2.5.
  const histogram: [number, number][] = [
    [2.0, 3],
    [2.1, 8],
    [2.2, 15],
    [2.3, 22],
    [2.4, 18],
    [2.5, 14],
    [2.6, 11],
    [2.7, 8],
    [2.9, 4],
  ];

  it('finds the peak of a hand-made histogram and adds 0.2', () => {
    const r = maxCurvatureMc(fromHistogram(histogram));
    expectClose(r.peakMagnitude, 2.3, 1e-12, 'peak of the hand-made histogram');
    expectClose(r.mc, 2.5, 1e-12, 'maximum curvature + 0.2 (Woessner & Wiemer 2005, from memory)');
    expect(r.eventCount).toBe(103);
    // Every bin from lowest to highest, the empty 2.8 included.
    expect(r.histogram.map((b) => [b.magnitude, b.count])).toEqual([
      ...histogram.slice(0, 8),
      [2.8, 0],
      [2.9, 4],
    ]);
  });

  it('takes the correction and the bin width as options', () => {
    expectClose(
      maxCurvatureMc(fromHistogram(histogram), { correction: 0 }).mc,
      2.3,
      1e-12,
      'maximum curvature without correction',
    );
    // 0.2-wide bins centred on 2.0, 2.2, 2.4 ...: edges round up, so 2.2 holds 2.1 and 2.2
    // (8 + 15 = 23) and 2.4 holds 2.3 and 2.4 (22 + 18 = 40), the peak; Mc = 2.4 + 0.2 = 2.6
    // (hand count).
    expectClose(
      maxCurvatureMc(fromHistogram(histogram), { magnitudeStep: 0.2 }).mc,
      2.6,
      1e-12,
      'hand count of 0.2-wide bins',
    );
  });

  it('takes the lower bin on a tie', () => {
    const r = maxCurvatureMc(
      fromHistogram([
        [3.0, 5],
        [3.1, 9],
        [3.2, 9],
        [3.3, 4],
      ]),
    );
    expectClose(r.peakMagnitude, 3.1, 1e-12, 'lower of two tied peaks (our stated choice)');
  });

  it('refuses an empty catalog', () => {
    expect(() => maxCurvatureMc([])).toThrow(/at least one event/);
  });
});

describe('completeness over time', () => {
  // Two eras, hand-made, with one histogram of 50 events falling from its peak bin (20, 12, 8,
  // 5, 3, 2 events in bins of 0.1): before 1950 it peaks at 4.0 (Mc 4.2), from 1950 at 3.0
  // (Mc 3.2). Two windows of 50 events in each era.
  const fallingFrom = (peak: number): [number, number][] =>
    [20, 12, 8, 5, 3, 2].map((count, i) => [Math.round(peak * 10 + i) / 10, count]);
  const early = fallingFrom(4.0);
  const late = fallingFrom(3.0);
  const events: CatalogEvent[] = [];
  const windowStarts = [
    Date.UTC(1900, 0, 1),
    Date.UTC(1925, 0, 1),
    Date.UTC(1950, 0, 1),
    Date.UTC(1975, 0, 1),
  ];
  windowStarts.forEach((start, w) => {
    fromHistogram(w < 2 ? early : late).forEach((magnitude, i) => {
      events.push({
        id: `w${w}-${i}`,
        timeMs: start + i * 86_400_000,
        lon: -150,
        lat: -47,
        depthKm: 10,
        magnitude,
        magnitudeType: 'Mw',
      });
    });
  });

  it('finds Mc per window and proposes the periods', () => {
    const r = completenessOverTime(events, { eventsPerWindow: 50 });
    expect(r.windows.map((w) => w.mc)).toEqual([4.2, 4.2, 3.2, 3.2]);
    expect(r.windows.map((w) => w.startMs)).toEqual(windowStarts);
    // Walking back from the newest window: M >= 3.2 complete since 1950, M >= 4.2 since 1900.
    expect(r.periods).toEqual([
      { magnitude: 3.2, startMs: Date.UTC(1950, 0, 1) },
      { magnitude: 4.2, startMs: Date.UTC(1900, 0, 1) },
    ]);
  });

  it('lets a later window with a higher Mc hold the period back', () => {
    const windows = [
      { startMs: 0, endMs: 1, eventCount: 100, mc: 3.0 },
      { startMs: 2, endMs: 3, eventCount: 100, mc: 3.5 },
      { startMs: 4, endMs: 5, eventCount: 100, mc: 3.0 },
    ];
    // M >= 3.0 only from the last window (the middle one is worse); M >= 3.5 from the first.
    expect(proposePeriods(windows)).toEqual([
      { magnitude: 3.0, startMs: 4 },
      { magnitude: 3.5, startMs: 0 },
    ]);
  });

  it('refuses too few events or a tiny window', () => {
    expect(() => completenessOverTime(events.slice(0, 20), { eventsPerWindow: 50 })).toThrow(
      /at least 50 events/,
    );
    expect(() => completenessOverTime(events, { eventsPerWindow: 5 })).toThrow(/eventsPerWindow/);
  });
});

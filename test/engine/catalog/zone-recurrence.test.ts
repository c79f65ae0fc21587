import { describe, expect, it } from 'vitest';
import { akiUtsuBValue } from '../../../api/engine/catalog/aki-utsu.ts';
import { MS_PER_YEAR, type CatalogEvent } from '../../../api/engine/catalog/event.ts';
import { syntheticCatalog } from '../../../api/engine/catalog/synthetic-catalog.ts';
import { zoneRecurrence } from '../../../api/engine/catalog/zone-recurrence.ts';
import type { LonLat } from '../../../api/engine/model.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { boxRing } from '../../helpers/box-ring.ts';
import { SQUARE_ZONE } from '../fixtures/catalog-builders.ts';

const NEIGHBOUR: readonly (readonly LonLat[])[] = [boxRing(-147, -48, -145, -46)];
const END = 50 * MS_PER_YEAR;

// Inside the zone: b = 1, 4 events a year of M >= 3.95 for 50 years (seed 41). Next door a
// b = 0.7 zone (seed 42) whose events must not leak in; and deep events in the zone (seed 43)
// that a depth range must keep out.
const inside = syntheticCatalog({
  random: createRandom(41),
  bValue: 1,
  mMin: 3.95,
  mMax: 7.45,
  annualRate: 4,
  rings: SQUARE_ZONE,
  depthKm: [0, 20],
  startMs: 0,
  endMs: END,
  magnitudeStep: 0.1,
});
const outside = syntheticCatalog({
  random: createRandom(42),
  bValue: 0.7,
  mMin: 3.95,
  mMax: 7.45,
  annualRate: 4,
  rings: NEIGHBOUR,
  depthKm: [0, 20],
  startMs: 0,
  endMs: END,
  magnitudeStep: 0.1,
  idPrefix: 'next-',
});
const deep = syntheticCatalog({
  random: createRandom(43),
  bValue: 0.7,
  mMin: 3.95,
  mMax: 7.45,
  annualRate: 2,
  rings: SQUARE_ZONE,
  depthKm: [60, 100],
  startMs: 0,
  endMs: END,
  magnitudeStep: 0.1,
  idPrefix: 'deep-',
});
const catalog = [...inside, ...outside, ...deep];

describe('zoneRecurrence', () => {
  const z = zoneRecurrence(catalog, {
    rings: SQUARE_ZONE,
    completeness: { mc: 4.0, startMs: 0, endMs: END },
    mMax: 7.5,
    depthKm: [0, 30],
  });

  it('counts events without a depth when no depth range is asked for, and leaves them out of one', () => {
    const undated = inside.map((e) => ({ ...e, depthKm: null }));
    const options = {
      rings: SQUARE_ZONE,
      completeness: { mc: 4.0, startMs: 0, endMs: END },
      mMax: 7.5,
    };
    expect(zoneRecurrence(undated, options).eventsInZone).toBe(inside.length);
    // None left in a depth range: too few events to fit, said so.
    expect(() => zoneRecurrence(undated, { ...options, depthKm: [0, 30] })).toThrow(
      /expected at least 2 events at or above Mc 4; got 0/,
    );
  });

  it('fits only the events inside the zone and depth range', () => {
    expect(z.eventsInZone).toBe(inside.length);
    expect(z.eventCount).toBe(inside.length);
    const direct = akiUtsuBValue(
      inside.map((e) => e.magnitude),
      4.0,
      0.1,
    );
    expectClose(z.bValue, direct.bValue, 1e-12, "Aki–Utsu on the zone's own events");
  });

  it("recovers the zone's b and rate within their stated uncertainties", () => {
    // The synthetic zone's own parameters: b = 1, rate 4 a year of M >= 3.95.
    expectClose(z.bValue, 1, 2 * z.sigmaB, 'true b, within 2 Shi & Bolt (1982) standard errors');
    expectClose(z.rate, 4, 2 * z.sigmaRate, 'true rate, within 2 Poisson standard errors');
    expectRelative(z.sigmaRate, z.rate / Math.sqrt(z.eventCount), 1e-12, 'Poisson: rate / sqrt(n)');
  });

  it('gives a gutenberg-richter recurrence ready for a zone source', () => {
    expect(z.recurrence).toEqual({
      type: 'gutenberg-richter',
      bValue: z.bValue,
      mMin: 3.95,
      mMax: 7.5,
      rate: z.rate,
    });
    expect(z.summary).toMatch(
      /^b = \d\.\d\d ± \d\.\d\d; .* events a year of M 3\.95 or more \(from \d+ events, aki-utsu\)$/,
    );
  });

  it('moves the rate to another mMin along the truncated line', () => {
    const at5 = zoneRecurrence(catalog, {
      rings: SQUARE_ZONE,
      completeness: { mc: 4.0, startMs: 0, endMs: END },
      mMax: 7.5,
      mMin: 5,
      depthKm: [0, 30],
    });
    // Truncated form: N0 (10^(−b (5 − 3.95)) − 10^(−b (7.5 − 3.95))) / (1 − 10^(−b (7.5 − 3.95)))
    // (Cornell & Vanmarcke 1969, from memory), evaluated here with the fitted b.
    const tail = 10 ** (-z.bValue * 3.55);
    expectRelative(
      at5.rate,
      (z.rate * (10 ** (-z.bValue * 1.05) - tail)) / (1 - tail),
      1e-12,
      'truncated Gutenberg–Richter',
    );
    expectRelative(
      at5.sigmaRate / at5.rate,
      1 / Math.sqrt(z.eventCount),
      1e-12,
      'relative Poisson error kept',
    );
  });

  it('uses Weichert with completeness periods', () => {
    const w = zoneRecurrence(catalog, {
      rings: SQUARE_ZONE,
      completeness: { periods: [{ magnitude: 4.0, startMs: 0 }], endMs: END },
      mMax: 7.5,
      depthKm: [0, 30],
    });
    expect(w.fit.method).toBe('weichert');
    expectClose(w.bValue, 1, 2 * w.sigmaB, 'true b, within 2 Weichert (1980) standard errors');
  });

  it('leaves out non-moment magnitudes by default and says so', () => {
    const withMl = [
      ...catalog,
      { ...(inside[0] as CatalogEvent), id: 'ml-1', magnitudeType: 'ML' },
    ];
    const r = zoneRecurrence(withMl, {
      rings: SQUARE_ZONE,
      completeness: { mc: 4.0, startMs: 0, endMs: END },
      mMax: 7.5,
      depthKm: [0, 30],
    });
    expect(r.eventCount).toBe(inside.length);
    expect(r.notes.join(' ')).toMatch(/1 event in the zone was left out: not moment magnitudes/);
  });

  it('refuses an mMax at or below mMin', () => {
    expect(() =>
      zoneRecurrence(catalog, {
        rings: SQUARE_ZONE,
        completeness: { mc: 4.0, startMs: 0, endMs: END },
        mMax: 3.9,
      }),
    ).toThrow(/mMax/);
  });
});

import { describe, expect, it } from 'vitest';
import { MS_PER_YEAR } from '../../../api/engine/catalog/event.ts';
import {
  syntheticCatalog,
  type SyntheticCatalogOptions,
} from '../../../api/engine/catalog/synthetic-catalog.ts';
import type { LonLat } from '../../../api/engine/model.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectClose } from '../../helpers/close.ts';
import { boxRing } from '../../helpers/box-ring.ts';

// An L-shaped test zone in open ocean: the square [-150, -148] x [-48, -46] without its
// north-east quarter.
const L_ZONE: readonly (readonly LonLat[])[] = [
  [
    [-150, -48],
    [-148, -48],
    [-148, -47],
    [-149, -47],
    [-149, -46],
    [-150, -46],
    [-150, -48],
  ],
];

const base = (seed: number): SyntheticCatalogOptions => ({
  random: createRandom(seed),
  bValue: 1,
  mMin: 4,
  mMax: 6,
  eventCount: 5000,
  rings: L_ZONE,
  depthKm: [2, 18],
  startMs: Date.UTC(2000, 0, 1),
  endMs: Date.UTC(2010, 0, 1),
});

describe('syntheticCatalog', () => {
  it('is reproducible from its seed', () => {
    expect(syntheticCatalog(base(5))).toEqual(syntheticCatalog(base(5)));
    expect(syntheticCatalog(base(5))).not.toEqual(syntheticCatalog(base(6)));
  });

  it('keeps events inside the zone, depth range, magnitude range and span, in time order', () => {
    const o = base(1);
    const events = syntheticCatalog(o);
    expect(events).toHaveLength(5000);
    expect(events[0]?.id).toBe('synthetic-0001');
    expect(new Set(events.map((e) => e.id)).size).toBe(5000);
    let bad = 0;
    for (const [i, e] of events.entries()) {
      const inNotch = e.lon > -149 && e.lat > -47;
      const inSquare = e.lon >= -150 && e.lon <= -148 && e.lat >= -48 && e.lat <= -46;
      if (
        inNotch ||
        !inSquare ||
        e.depthKm === null ||
        e.depthKm < 2 ||
        e.depthKm > 18 ||
        e.magnitude < 4 ||
        e.magnitude >= 6
      )
        bad++;
      if (
        e.timeMs < o.startMs ||
        e.timeMs >= o.endMs ||
        (i > 0 && e.timeMs < (events[i - 1]?.timeMs ?? 0))
      )
        bad++;
      if (e.magnitudeType !== 'Mw') bad++;
    }
    expect(bad).toBe(0);
  });

  it('draws magnitudes from the truncated Gutenberg–Richter distribution', () => {
    // Mean of the truncated exponential (β = b ln 10, Δ = mMax − mMin; e.g. Cornell & Vanmarcke
    // 1969, from memory): mMin + 1/β − Δ e^(−βΔ) / (1 − e^(−βΔ)). For b = 1 on [4, 6]:
    // 4 + 0.434294 − 2 · 0.01 / 0.99 = 4.414092; standard deviation 0.38445 (hand computation),
    // so 5000 draws have a standard error of 0.00544 on the mean; tolerance 4 of those.
    const events = syntheticCatalog(base(2));
    const mean = events.reduce((s, e) => s + e.magnitude, 0) / events.length;
    expectClose(
      mean,
      4.414092,
      4 * 0.00544,
      'mean of the truncated exponential magnitude distribution',
    );
    // Share at or above 5: (10^-1 − 10^-2) / (1 − 10^-2) = 0.090909; binomial standard error
    // sqrt(0.0909 · 0.9091 / 5000) = 0.00407; tolerance 4 of those.
    const share = events.filter((e) => e.magnitude >= 5).length / events.length;
    expectClose(share, 0.090909, 4 * 0.00407, 'truncated Gutenberg–Richter share of M >= 5');
  });

  it('spreads epicentres uniformly in area, not in latitude', () => {
    // On a sphere the area between two parallels is proportional to the difference of the sines
    // of their latitudes (Archimedes' hat-box theorem). For a band from 60° S to the equator
    // the poleward half (south of 30° S) holds (sin 60° − sin 30°) / sin 60° = 0.42265 of the
    // area (0.5 if latitudes were uniform); binomial standard error over 5000 events 0.0070,
    // tolerance 4 of those.
    const band: readonly (readonly LonLat[])[] = [boxRing(-130, -60, -120, 0)];
    const events = syntheticCatalog({ ...base(3), rings: band });
    const share = events.filter((e) => e.lat < -30).length / events.length;
    expectClose(
      share,
      0.42265,
      4 * 0.007,
      "share of area poleward of 30° S (Archimedes' hat-box theorem)",
    );
  });

  it('draws a Poisson number of events from an annual rate', () => {
    // 15 a year for 100 years: Poisson mean 1500, standard deviation sqrt(1500) = 38.7;
    // tolerance 4 standard deviations.
    const { eventCount: _, ...rest } = base(4);
    const events = syntheticCatalog({
      ...rest,
      annualRate: 15,
      startMs: 0,
      endMs: 100 * MS_PER_YEAR,
    });
    expectClose(events.length, 1500, 4 * Math.sqrt(1500), 'Poisson count, mean rate × years');
    expect(syntheticCatalog({ ...rest, annualRate: 0, startMs: 0, endMs: MS_PER_YEAR })).toEqual(
      [],
    );
  });

  it('rounds magnitudes to bins when asked', () => {
    const events = syntheticCatalog({ ...base(8), mMin: 3.95, magnitudeStep: 0.1 });
    const offGrid = events.filter(
      (e) => Math.abs(e.magnitude * 10 - Math.round(e.magnitude * 10)) > 1e-9,
    ).length;
    expect(offGrid).toBe(0);
    expect(Math.min(...events.map((e) => e.magnitude))).toBe(4.0);
  });

  it('refuses options it cannot honour, naming them', () => {
    expect(() => syntheticCatalog({ ...base(1), bValue: 0 })).toThrow(/bValue/);
    expect(() => syntheticCatalog({ ...base(1), mMax: 3 })).toThrow(/mMax/);
    expect(() => syntheticCatalog({ ...base(1), annualRate: 2 })).toThrow(
      /exactly one of eventCount and annualRate/,
    );
    expect(() => syntheticCatalog({ ...base(1), depthKm: [10, 5] })).toThrow(/depthKm/);
    expect(() => syntheticCatalog({ ...base(1), eventCount: 2_000_000 })).toThrow(/too large/);
    expect(() =>
      syntheticCatalog({
        ...base(1),
        rings: [
          [
            [-150, -48],
            [-148, -48],
          ],
        ],
      }),
    ).toThrow(/rings\[0\]/);
  });
});

import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import type { CatalogEvent } from '../../../api/engine/catalog/event.ts';
import { MS_PER_DAY } from '../../../api/engine/catalog/event.ts';
import {
  declusterGardnerKnopoff,
  gardnerKnopoffWindow,
} from '../../../api/engine/catalog/gardner-knopoff.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

/** Each row [M, km, days]: the window's distance and time within the relative tolerances. */
function expectWindows(
  rows: readonly (readonly [number, number, number])[],
  tolerance: { readonly km: number; readonly days: number },
  source: (what: 'distance' | 'time', m: number) => string,
): void {
  for (const [m, km, days] of rows) {
    const w = gardnerKnopoffWindow(m);
    expectRelative(w.distanceKm, km, tolerance.km, source('distance', m));
    expectRelative(w.days, days, tolerance.days, source('time', m));
  }
}

describe('Gardner & Knopoff (1974) windows', () => {
  it('follow the fitted form at M 5, 6 and 7', () => {
    // Hand computation (calculator) of L = 10^(0.1238 M + 0.983) km and
    // T = 10^(0.5409 M − 0.547) days (M < 6.5) or 10^(0.032 M + 2.7389) days (M >= 6.5),
    // the fitted form of Gardner & Knopoff's (1974) table as given by van Stiphout, Zhuang &
    // Marsan (2012, CORSSA); coefficients from memory.
    const expected: [number, number, number][] = [
      [5, 39.9945, 143.714],
      [6, 53.1863, 499.344],
      [7, 70.7294, 918.121],
    ];
    expectWindows(
      expected,
      { km: 1e-5, days: 1e-5 },
      (what, m) => `fitted Gardner & Knopoff ${what} window at M ${m}`,
    );
  });

  it('switch time branch at M 6.5', () => {
    // Fitted form, upper branch from M 6.5: 10^(0.032 · 6.5 + 2.7389) = 884.912 days; the lower
    // branch would give 930.786 (hand computation; the fitted form is not continuous there).
    expectRelative(
      gardnerKnopoffWindow(6.5).days,
      884.912,
      1e-5,
      'fitted Gardner & Knopoff time window, M >= 6.5 branch',
    );
    expectRelative(
      gardnerKnopoffWindow(6.4999).days,
      930.786,
      1e-3,
      'fitted Gardner & Knopoff time window, M < 6.5 branch',
    );
  });

  it('stay close to the original table', () => {
    // Gardner & Knopoff (1974) table, from memory: M 5.0: 40 km, 155 days; M 6.0: 54 km,
    // 510 days; M 7.0: 70 km, 915 days. The fitted form reproduces the distances within 2% and
    // the times within 8% (the fit's own scatter: at M 5 it gives 144 days against 155).
    const table: [number, number, number][] = [
      [5, 40, 155],
      [6, 54, 510],
      [7, 70, 915],
    ];
    expectWindows(
      table,
      { km: 0.02, days: 0.08 },
      (what, m) => `Gardner & Knopoff (1974) table ${what} at M ${m} (from memory)`,
    );
  });
});

const WGS84 = geodesic.Geodesic.WGS84;
const T0 = Date.UTC(2000, 0, 1);
const ORIGIN = { lon: -150, lat: -47 };

/** An event placed at a geodesic distance and azimuth from the origin, `days` after T0. */
function at(
  id: string,
  magnitude: number,
  distanceKm: number,
  azimuthDeg: number,
  days: number,
  magnitudeType = 'Mw',
): CatalogEvent {
  const p = WGS84.Direct(ORIGIN.lat, ORIGIN.lon, azimuthDeg, distanceKm * 1000);
  return {
    id,
    timeMs: T0 + days * MS_PER_DAY,
    lon: p.lon2 ?? NaN,
    lat: p.lat2 ?? NaN,
    depthKm: 10,
    magnitude,
    magnitudeType,
  };
}

describe('declusterGardnerKnopoff', () => {
  // The M 6.0 mainshock's window is 53.19 km and 499.3 days (fitted form above).
  const events: CatalogEvent[] = [
    at('main', 6.0, 0, 0, 0),
    at('after-near', 4.5, 20, 45, 10),
    at('after-edge', 4.0, 52, 200, 400),
    at('far', 4.0, 80, 90, 10),
    at('late', 4.2, 5, 0, 600),
    at('fore', 4.8, 10, 300, -1),
    at('other-main', 5.0, 300, 180, 30),
    at('other-after', 3.5, 300, 180, 31),
  ];

  it('keeps mainshocks and removes events inside their windows', () => {
    const d = declusterGardnerKnopoff(events);
    expect(d.mainshocks.map((e) => e.id)).toEqual(['main', 'far', 'other-main', 'late']);
    expect(d.removed.map((r) => [r.event.id, r.mainshockId])).toEqual([
      ['fore', 'main'],
      ['after-near', 'main'],
      ['other-after', 'other-main'],
      ['after-edge', 'main'],
    ]);
    expect(d.clusterCount).toBe(2);
    const fore = d.removed.find((r) => r.event.id === 'fore');
    expectClose(fore?.daysFromMainshock ?? NaN, -1, 1e-9, 'foreshock placed one day before');
    // Placed with GeographicLib's direct problem (Karney 2013); the inverse returns it.
    expectClose(
      d.removed.find((r) => r.event.id === 'after-near')?.distanceKm ?? NaN,
      20,
      1e-6,
      'geodesic distance of the placed aftershock',
    );
  });

  it('keeps foreshocks when asked', () => {
    const d = declusterGardnerKnopoff(events, { removeForeshocks: false });
    // The M 4.8 now stands alone; its own window (37.8 km, 112 days) reaches the M 4.5
    // aftershock, but that one already belongs to the larger M 6.0.
    expect(d.mainshocks.map((e) => e.id)).toEqual(['fore', 'main', 'far', 'other-main', 'late']);
    expect(d.removed.map((r) => r.event.id)).toEqual(['after-near', 'other-after', 'after-edge']);
  });

  it('does not chain windows', () => {
    // An event inside a removed aftershock's window but outside the mainshock's stays
    // (the window method assigns by the mainshock's window only).
    const chain = [at('m', 5.5, 0, 0, 0), at('a', 5.0, 40, 90, 100), at('b', 3.0, 75, 90, 110)];
    const d = declusterGardnerKnopoff(chain);
    // M 5.5: L = 10^(0.1238 · 5.5 + 0.983) = 46.1 km, T = 10^(0.5409 · 5.5 − 0.547) = 268.3 days.
    expect(d.removed.map((r) => r.event.id)).toEqual(['a']);
    expect(d.mainshocks.map((e) => e.id)).toEqual(['m', 'b']);
  });

  it('uses moment magnitudes only unless told otherwise', () => {
    const mixed = [
      at('main', 6.0, 0, 0, 0),
      at('ml-after', 4.5, 10, 0, 5, 'ML'),
      at('mw-after', 4.0, 10, 90, 6, 'Mwr'),
    ];
    const moment = declusterGardnerKnopoff(mixed);
    expect(moment.excludedNonMoment).toBe(1);
    expect(moment.removed.map((r) => r.event.id)).toEqual(['mw-after']);
    const all = declusterGardnerKnopoff(mixed, { magnitudes: 'all' });
    expect(all.excludedNonMoment).toBe(0);
    expect(all.removed.map((r) => r.event.id)).toEqual(['ml-after', 'mw-after']);
  });

  it('refuses repeated ids', () => {
    expect(() => declusterGardnerKnopoff([at('x', 5, 0, 0, 0), at('x', 4, 1, 0, 1)])).toThrow(
      /unique event ids; "x"/,
    );
  });
});

import geodesic from 'geographiclib-geodesic';
import { describe, expect, it } from 'vitest';
import type { CatalogEvent } from '../../../api/engine/catalog/event.ts';
import { compassPoint, feltHistory } from '../../../api/engine/catalog/felt-history.ts';
import type { Study } from '../../../api/engine/model.ts';
import { expectClose } from '../../helpers/close.ts';
import { testSettings } from '../../helpers/test-settings.ts';

const WGS84 = geodesic.Geodesic.WGS84;

// An invented community in open ocean, and a study whose crustal branch is Cornell79 alone:
// its one-line equation lets the intensities be checked by hand.
const study: Study = {
  name: 'felt-history test',
  communities: [
    {
      id: 'test-village',
      name: 'Test Village',
      lon: -150,
      lat: -47,
      vs30: 760,
      vs30Basis: 'measured',
      coastal: false,
    },
  ],
  sources: [],
  groundMotion: {
    crustal: [{ model: 'Cornell79', weight: 1 }],
    interface: [{ model: 'AGA16', weight: 1 }],
    intraslab: [{ model: 'AGA16', weight: 1 }],
  },
  settings: testSettings(),
};

/** An event at a geodesic distance and azimuth from the village. */
function at(
  id: string,
  magnitude: number,
  distanceKm: number,
  azimuthDeg: number,
  depthKm: number | null,
  isoDay: string,
  magnitudeType = 'Mw',
): CatalogEvent {
  const p = WGS84.Direct(-47, -150, azimuthDeg, distanceKm * 1000);
  return {
    id,
    timeMs: Date.parse(`${isoDay}T00:00:00Z`),
    lon: p.lon2 ?? NaN,
    lat: p.lat2 ?? NaN,
    depthKm,
    magnitude,
    magnitudeType,
  };
}

describe('feltHistory', () => {
  const events = [
    at('near-strong', 6.5, 5, 135, 10, '2003-04-05'),
    at('moderate', 6.0, 30, 0, 10, '2001-02-03'),
    at('small-far', 4.0, 100, 270, 10, '2002-01-01'),
    at('beyond', 7.0, 400, 90, 10, '2004-01-01'),
    at('ml', 6.0, 10, 0, 10, '2005-01-01', 'ML'),
    at('deep-big', 7.0, 60, 200, 80, '2006-01-01'),
    at('deep-small', 5.0, 60, 200, 80, '2007-01-01'),
  ];
  const history = feltHistory(study, events);
  const village = history.communities[0];
  const byId = new Map(village?.estimates.map((e) => [e.eventId, e]));

  it('estimates crustal intensities from the median PGA', () => {
    // Cornell et al. (1979) as given in Baker (2008): ln PGA = −0.152 + 0.859 M − 1.803 ln(R + 25),
    // R hypocentral; then Worden et al. (2012) MMI = 1.78 + 1.55 log10(PGA cm/s²) up to
    // log10 = 1.57, −1.60 + 3.70 log10 above (coefficients from memory, as in
    // intensity/worden2012.ts). Hand computation (calculator):
    //   M 6.0, Repi 30 km, depth 10 km: R = 31.623 km, PGA 0.102730 g, MMI 5.8119;
    //   M 6.5, Repi 5 km, depth 10 km: R = 11.180 km, PGA 0.353952 g, MMI 7.7997;
    //   M 4.0, Repi 100 km, depth 10 km: R = 100.499 km, PGA 0.00438911 g, MMI 2.7625.
    const cases: [string, number, number][] = [
      ['moderate', 0.10273, 5.8119],
      ['near-strong', 0.353952, 7.7997],
      ['small-far', 0.00438911, 2.7625],
    ];
    for (const [id, pga, mmi] of cases) {
      const e = byId.get(id);
      expect(e?.setting).toBe('crustal');
      expectClose(
        e?.pgaG ?? NaN,
        pga,
        pga * 1e-4,
        `Cornell et al. (1979) median PGA, hand computation (${id})`,
      );
      expectClose(
        e?.mmi ?? NaN,
        mmi,
        1e-3,
        `Worden et al. (2012) MMI from that PGA, hand computation (${id})`,
      );
    }
    expect(byId.get('near-strong')?.roman).toBe('VIII'); // 7.80 rounds to VIII
  });

  it('lists the events likely felt and strongly felt, with date, distance and direction', () => {
    expect(village?.felt.map((e) => e.eventId)).toEqual(
      expect.arrayContaining(['moderate', 'near-strong']),
    );
    expect(village?.felt.map((e) => e.eventId)).not.toContain('small-far');
    expect(village?.stronglyFelt.map((e) => e.eventId)).toContain('near-strong');
    expect(village?.stronglyFelt.map((e) => e.eventId)).not.toContain('moderate');
    const moderate = byId.get('moderate');
    expect(moderate?.date).toBe('2001-02-03');
    // Placed with GeographicLib's direct problem (Karney 2013): the inverse returns its distance and azimuth.
    expectClose(moderate?.distanceKm ?? NaN, 30, 1e-6, 'geodesic distance of the placed event');
    expectClose(moderate?.bearingDeg ?? NaN, 0, 1e-6, 'due north of the village');
    expect(moderate?.compass).toBe('N');
    expect(byId.get('near-strong')?.compass).toBe('SE');
    // Time order.
    expect(village?.estimates.map((e) => e.eventId).slice(0, 3)).toEqual([
      'moderate',
      'small-far',
      'near-strong',
    ]);
  });

  it('uses the intraslab branches for deep events', () => {
    // Wiring check, not a published value: events at 80 km (below the 35 km default) go to the
    // intraslab branch (AGA16 here), and the larger event is the stronger.
    const big = byId.get('deep-big');
    const small = byId.get('deep-small');
    expect(big?.setting).toBe('intraslab');
    expect(small?.setting).toBe('intraslab');
    expect((big?.mmi ?? 0) > (small?.mmi ?? 0)).toBe(true);
    expect(Number.isFinite(big?.mmi)).toBe(true);
  });

  it('skips events beyond the study distance and non-moment magnitudes, and says so', () => {
    expect(byId.has('beyond')).toBe(false);
    expect(byId.has('ml')).toBe(false);
    expect(history.excludedNonMoment).toBe(1);
    expect(history.notes).toContain('1 event left out: not moment magnitude');
  });

  it('names the eight compass points', () => {
    expect([0, 44, 46, 90, 135, 180, 225, 270, 315, 337.6, 359].map(compassPoint)).toEqual([
      'N',
      'NE',
      'NE',
      'E',
      'SE',
      'S',
      'SW',
      'W',
      'NW',
      'N',
      'N',
    ]);
  });
});

describe('feltHistory of events without a depth', () => {
  it('leaves them out (no distance to the hypocentre), counts them and says so', () => {
    const history = feltHistory(study, [
      at('with-depth', 6.0, 30, 0, 10, '2001-02-03'),
      at('no-depth', 6.5, 5, 135, null, '2003-04-05'),
    ]);
    expect(history.communities[0]?.estimates.map((e) => e.eventId)).toEqual(['with-depth']);
    expect(history.eventCount).toBe(1);
    expect(history.excludedWithoutDepth).toBe(1);
    expect(history.notes).toContain('1 event left out: no depth, so no distance to the hypocentre');
  });
});

import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import type { Community, Recurrence, Study } from '../../../api/engine/model.ts';
import { discretiseSource, discretiseStudy } from '../../../api/engine/ruptures/discretise.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { FIXED_M7, FRAME, SETTINGS, faultKm, pointKm, zoneKm } from '../geometry/km-fixtures.ts';
import { boxRing } from '../../helpers/box-ring.ts';

const sumRates = (ruptures: readonly Rupture[]): number =>
  ruptures.reduce((s, r) => s + r.annualRate, 0);
const GR: Recurrence = { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.5, aValue: 3.5 };

describe('discretiseSource: a hand-made vertical strike-slip fault, 100 km x 15 km, M 7.0 at 0.01/yr', () => {
  // Wells & Coppersmith 1994 Table 2A strike-slip (from memory): RA = 10^2.88 = 758.58 km²,
  // RW = 10^1.13 = 13.49 km (< 15 km), so L = 56.23 km. At 5 km spacing, midpoint rule: along
  // strike 43.77 km of room -> 9 intervals -> 9 positions; down dip 1.51 km of room -> 1
  // interval -> 1 row, its top 0.755 km down.
  const fault = faultKm(
    [
      [0, 0],
      [0, 100],
    ],
    { dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 15, recurrence: FIXED_M7 },
  );
  const ruptures = discretiseSource(fault, 0, FRAME, SETTINGS);

  it('has 9 x 1 = 9 ruptures of 0.01 / 9 per year each', () => {
    expect(ruptures.length).toBe(9);
    for (const r of ruptures)
      expectRelative(r.annualRate, 0.01 / 9, 1e-12, 'equal share of the bin rate');
    expectRelative(sumRates(ruptures), 0.01, 1e-12, 'rates sum to the source rate');
  });

  it('fills the rupture context from the rupture, hypocentre at its centre (common practice)', () => {
    const top = ruptures[0];
    const last = ruptures[8];
    expect(top?.context.magnitude).toBe(7);
    expect(top?.context.mechanism).toBe('strike-slip');
    expect(top?.context.dipDeg).toBe(90);
    expectRelative(top?.context.widthKm ?? NaN, 13.48963, 1e-6, 'RW at M 7');
    expectClose(
      top?.context.ztorKm ?? NaN,
      (15 - 13.48963) / 2,
      1e-5,
      'the one row in the middle of the 1.51 km of room',
    );
    expectClose(
      top?.context.hypoDepthKm ?? NaN,
      7.5,
      1e-5,
      'centre of the row, mid-depth of the fault',
    );
    expectClose(last?.context.ztorKm ?? NaN, (15 - 13.48963) / 2, 1e-5, 'same row');
    expect(top?.surface.kind).toBe('planes');
  });
});

describe('discretiseSource: rates per source sum to the source total', () => {
  it('Gutenberg–Richter fault: 10^(3.5 - 5) per year', () => {
    const fault = faultKm(
      [
        [0, 0],
        [20, 60],
        [20, 120],
      ],
      {
        dipDeg: 45,
        dipDirectionDeg: 110,
        upperDepthKm: 1,
        lowerDepthKm: 16,
        recurrence: GR,
        mechanism: 'reverse',
      },
    );
    expectRelative(
      sumRates(discretiseSource(fault, 0, FRAME, SETTINGS)),
      10 ** -1.5,
      1e-9,
      'rate of M >= mMin (DESIGN.md section 2)',
    );
  });

  it('moment-balanced fault: the ruptures release μ x length x width x slip rate', () => {
    const recurrence: Recurrence = {
      type: 'moment-balanced',
      slipRateMmYr: 2,
      bValue: 1,
      mMin: 5,
      mMax: 7.4,
      shape: 'characteristic',
      shearModulusPa: 3e10,
    };
    const fault = faultKm(
      [
        [0, 0],
        [0, 100],
      ],
      { dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 15, recurrence },
    );
    const ruptures = discretiseSource(fault, 0, FRAME, SETTINGS);
    const released = ruptures.reduce(
      (s, r) => s + r.annualRate * 10 ** (1.5 * r.context.magnitude + 9.05),
      0,
    );
    expectRelative(
      released,
      3e10 * 1500e6 * 2e-3,
      1e-6,
      'Hanks & Kanamori 1979 moments against μ A s (area 100 km x 15 km)',
    );
  });

  // 25 bins of 0.1 from M 5: the 15 below M 6.5 as points, the 10 from M 6.55 up as virtual
  // ruptures, one per zone cell, eight per point source (ruptures/virtual-ruptures.ts).
  it('zone with a hole: 84 cells x 25 bins, rates summing to 10^(3.5 - 5)', () => {
    const zone = zoneKm([boxRing(0, 0, 100, 100), boxRing(30, 30, 70, 70)], GR, 12);
    const ruptures = discretiseSource(zone, 3, FRAME, SETTINGS);
    expect(ruptures.length).toBe(84 * 25);
    expectRelative(sumRates(ruptures), 10 ** -1.5, 1e-9, 'rate of M >= mMin');
    const first = ruptures[0];
    expect(first?.surface.kind).toBe('point');
    expect(first?.surface.hypocentre.z).toBe(12);
    expect(first?.context.hypoDepthKm).toBe(12);
    expect(first?.sourceIndex).toBe(3);
  });

  it('point source: one rupture per bin below M 6.5, eight from M 6.5, at its location and depth', () => {
    const point = pointKm(-20, 35, GR, 8);
    const ruptures = discretiseSource(point, 0, FRAME, SETTINGS);
    expect(ruptures.length).toBe(15 + 10 * 8);
    expectRelative(sumRates(ruptures), 10 ** -1.5, 1e-9, 'rate of M >= mMin');
    expectClose(ruptures[0]?.surface.hypocentre.x ?? NaN, -20, 1e-6, 'projected location x');
    expectClose(ruptures[0]?.surface.hypocentre.y ?? NaN, 35, 1e-6, 'projected location y');
    expect(ruptures[0]?.context.dipDeg).toBe(40);
  });
});

describe('discretiseStudy', () => {
  const community: Community = {
    id: 'c',
    name: 'C',
    lon: -150,
    lat: -47,
    vs30: 400,
    vs30Basis: 'measured',
    coastal: false,
  };
  const study: Study = {
    name: 'test',
    communities: [community],
    sources: [
      faultKm(
        [
          [0, 0],
          [0, 60],
        ],
        { dipDeg: 60, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 12, recurrence: GR },
      ),
      pointKm(10, 10, FIXED_M7),
    ],
    groundMotion: { crustal: [], interface: [], intraslab: [] },
    settings: SETTINGS,
  };

  it('is deterministic and ordered by source, then magnitude', () => {
    const a = discretiseStudy(study);
    const b = discretiseStudy(study);
    expect(a.ruptures).toEqual(b.ruptures);
    for (let i = 1; i < a.ruptures.length; i++) {
      const p = a.ruptures[i - 1] as Rupture;
      const q = a.ruptures[i] as Rupture;
      expect(
        q.sourceIndex > p.sourceIndex ||
          (q.sourceIndex === p.sourceIndex && q.context.magnitude >= p.context.magnitude),
      ).toBe(true);
    }
    const last = a.ruptures[a.ruptures.length - 1];
    expect(last?.sourceId).toBe('test-point');
  });

  it('names the bad field by its path in the study', () => {
    const bad = {
      ...study,
      sources: [
        study.sources[1],
        {
          ...faultKm(
            [
              [0, 0],
              [0, 60],
            ],
            { dipDeg: 0, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 12 },
          ),
        },
      ],
    } as Study;
    try {
      discretiseStudy(bad);
      expect.unreachable('expected InvalidInput');
    } catch (error) {
      expect(error).toBeInstanceOf(InvalidInput);
      expect((error as InvalidInput).issues[0]?.path).toBe('sources.features[1].properties.dip');
    }
  });
});

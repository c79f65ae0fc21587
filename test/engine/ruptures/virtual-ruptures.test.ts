import { describe, expect, it } from 'vitest';
import { ruptureDistances } from '../../../api/engine/geometry/distances.ts';
import { levelAtReturnPeriod } from '../../../api/engine/hazard/curve-interpolation.ts';
import type { Community, PointSource, Recurrence, Study } from '../../../api/engine/model.ts';
import { treeMagnitudeBins } from '../../../api/engine/recurrence/tree-magnitude-bins.ts';
import { discretiseSource } from '../../../api/engine/ruptures/discretise.ts';
import { placeRuptures, prepareSource } from '../../../api/engine/ruptures/placement.ts';
import { pointRuptureContext } from '../../../api/engine/ruptures/point-rupture.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import {
  cellStrikeIndex,
  FINITE_RUPTURE_MIN_MAGNITUDE,
  VIRTUAL_STRIKE_COUNT,
  virtualRupturesAt,
  virtualStrikesDeg,
} from '../../../api/engine/ruptures/virtual-ruptures.ts';
import { screeningSetup } from '../../../api/engine/screening-plan.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { siteHazard } from '../../helpers/reference-hazard/site-hazard.ts';
import { FRAME, SETTINGS, pointKm, zoneKm } from '../geometry/km-fixtures.ts';
import { boxRing } from '../../helpers/box-ring.ts';

const GR: Recurrence = { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.5, rate: 0.05 };

/** A crustal point source at the frame's origin (invented test scaffolding). */
const point = (
  mechanism: PointSource['mechanism'],
  depthKm: number,
  recurrence: Recurrence,
  layer: { upperDepthKm?: number; lowerDepthKm?: number } = {},
): PointSource => ({
  ...pointKm(0, 0, recurrence, depthKm),
  mechanism,
  rakeDeg: mechanism === 'reverse' ? 90 : mechanism === 'normal' ? -90 : 0,
  ...layer,
});

/**
 * The ruptures of a point source built bin by bin as discretise.ts builds them, with
 * `strikes` virtual ruptures per point (or none: points at every magnitude).
 */
function rupturesOf(source: PointSource, strikes: number | 'points'): Rupture[] {
  const prepared = prepareSource(source, 0, FRAME, SETTINGS);
  const bins = treeMagnitudeBins(source.recurrence, SETTINGS);
  const out: Rupture[] = [];
  bins.magnitudes.forEach((magnitude, i) => {
    const binRate = bins.annualRates[i] as number;
    const spread =
      strikes === 'points'
        ? null
        : virtualRupturesAt(
            source,
            magnitude,
            i,
            (d) => pointRuptureContext(source, magnitude, d),
            strikes,
          );
    for (const placed of placeRuptures(prepared, magnitude)) {
      const each: (typeof placed)[] = [];
      if (spread) spread(placed, each);
      else each.push(placed);
      for (const { share, ...p } of each) out.push({ ...p, annualRate: binRate * share });
    }
  });
  return out;
}

const site = (x: number, y: number): Community => {
  const [lon, lat] = FRAME.toLonLat({ x, y });
  return { id: 's', name: 's', lon, lat, vs30: 400, vs30Basis: 'measured', coastal: false };
};

const CRUSTAL = ['BSSA14', 'CB14'].map((model) => ({ model, weight: 0.5 }));
const SUBDUCTION = [{ model: 'AGA16', weight: 1 }];

/** The mean PGA (g) at `returnPeriodYears` at (x, y) km from `ruptures`, BSSA14 and CB14 equally weighted. */
function pgaAt(ruptures: readonly Rupture[], x: number, y: number, returnPeriodYears: number) {
  const study: Study = {
    name: 'virtual ruptures',
    communities: [site(x, y)],
    sources: [point('reverse', 10, GR)],
    groundMotion: { crustal: CRUSTAL, interface: SUBDUCTION, intraslab: SUBDUCTION },
    settings: SETTINGS,
  };
  const setup = screeningSetup(study);
  const hazard = siteHazard({
    ruptures,
    distances: ruptures.map((r) => ruptureDistances(r.surface, { x, y })),
    site: { vs30: 400, vs30Measured: true },
    branches: setup.branches,
    measures: setup.measures.all,
    truncationSigma: 3,
    maxDistanceKm: 300,
  });
  const curve = hazard.curves.PGA!;
  return levelAtReturnPeriod(curve.levels, curve.annualRate, returnPeriodYears).level ?? NaN;
}

describe('virtual ruptures of large point earthquakes', () => {
  it('below the threshold nothing changes: the same point ruptures, object for object', () => {
    const small: Recurrence = {
      type: 'gutenberg-richter',
      bValue: 1,
      mMin: 4.5,
      mMax: 6.5,
      rate: 1,
    };
    const source = point('reverse', 10, small);
    const ruptures = discretiseSource(source, 0, FRAME, SETTINGS);
    expect(ruptures.every((r) => r.context.magnitude < FINITE_RUPTURE_MIN_MAGNITUDE)).toBe(true);
    expect(ruptures).toEqual(rupturesOf(source, 'points'));
  });

  it('above it, each point is split into VIRTUAL_STRIKE_COUNT ruptures of exactly an eighth of its rate each', () => {
    const source = point('reverse', 10, GR);
    const points = rupturesOf(source, 'points');
    const finite = discretiseSource(source, 0, FRAME, SETTINGS);
    expect(finite).toEqual(rupturesOf(source, VIRTUAL_STRIKE_COUNT));
    let k = 0;
    for (const p of points) {
      if (p.context.magnitude < FINITE_RUPTURE_MIN_MAGNITUDE) {
        expect(finite[k++]).toEqual(p);
        continue;
      }
      for (let s = 0; s < VIRTUAL_STRIKE_COUNT; s++) {
        const v = finite[k++]!;
        expect(v.surface.kind).toBe('planes');
        expect(v.context.magnitude).toBe(p.context.magnitude);
        // A share divided by a power of two is exact, so the parts add back to the whole.
        expect(v.annualRate * VIRTUAL_STRIKE_COUNT).toBe(p.annualRate);
      }
    }
    expect(k).toBe(finite.length);
  });

  it('a zone keeps one rupture per cell and depth: one strike each, its whole share, its rate conserved', () => {
    const zone = zoneKm([boxRing(0, 0, 40, 30)], GR);
    const prepared = prepareSource(zone, 0, FRAME, SETTINGS);
    const bins = treeMagnitudeBins(zone.recurrence, SETTINGS);
    const points = bins.magnitudes.flatMap((m, i) =>
      placeRuptures(prepared, m).map((p) => ({ ...p, annualRate: p.share * bins.annualRates[i]! })),
    );
    const ruptures = discretiseSource(zone, 0, FRAME, SETTINGS);
    expect(ruptures.length).toBe(points.length);
    const strikesSeen = new Map<number, Set<string>>();
    ruptures.forEach((r, k) => {
      const p = points[k]!;
      expect(r.surface.hypocentre).toEqual(p.surface.hypocentre);
      expect(r.context.magnitude).toBe(p.context.magnitude);
      expect(r.annualRate).toBe(p.annualRate);
      expect(r.surface.kind).toBe(
        r.context.magnitude < FINITE_RUPTURE_MIN_MAGNITUDE ? 'point' : 'planes',
      );
      if (r.surface.kind !== 'planes') return;
      // The strike of the top edge, from its start to its end, degrees clockwise from north.
      const [a, b] = r.surface.planes[0]!.corners;
      const strikeDeg = ((Math.atan2(b.x - a.x, b.y - a.y) * 180) / Math.PI + 360) % 360;
      const seen = strikesSeen.get(r.context.magnitude) ?? new Set<string>();
      seen.add(strikeDeg.toFixed(6));
      strikesSeen.set(r.context.magnitude, seen);
    });
    // 12 cells of 10 km: every magnitude's cells take all eight strikes of a vertical rupture.
    expect(strikesSeen.size).toBe(10);
    for (const seen of strikesSeen.values())
      expect([...seen].sort()).toEqual(
        virtualStrikesDeg(90)
          .map((d) => d.toFixed(6))
          .sort(),
      );
    const total = ruptures.reduce((sum, r) => sum + r.annualRate, 0);
    expectRelative(total, 0.05, 1e-12, 'rate of M >= 5 of the recurrence');
  });

  it('a cell takes strike (column + 3 row + magnitude index) mod 8: every 3 x 3 block of cells holds all eight', () => {
    for (let column = -5; column < 5; column++)
      for (let row = -5; row < 5; row++)
        for (let m = 0; m < 3; m++) {
          const held = new Set<number>();
          for (let dc = 0; dc < 3; dc++)
            for (let dr = 0; dr < 3; dr++)
              held.add(cellStrikeIndex({ column: column + dc, row: row + dr }, m));
          expect(held.size).toBe(VIRTUAL_STRIKE_COUNT);
        }
    expect(cellStrikeIndex({ column: 2, row: 1 }, 4)).toBe(1);
    expect(cellStrikeIndex({ column: -1, row: -1 }, 0)).toBe(4);
  });

  it('spreads strikes evenly: over 0–180° for a vertical rupture, 0–360° for a dipping one', () => {
    expect(virtualStrikesDeg(90, 4)).toEqual([0, 45, 90, 135]);
    expect(virtualStrikesDeg(40, 4)).toEqual([0, 90, 180, 270]);
  });
});

describe('an M 7 point source under a site', () => {
  const M7: Recurrence = { type: 'fixed', magnitude: 7, rate: 0.01 };

  it('strike-slip at 10 km in a 0–15 km layer: the plane of the scaled area and width; Rjb = 0 and Rrup = the top depth, for every strike', () => {
    // Wells & Coppersmith (1994) Table 2A, strike-slip: log10 RA = -3.42 + 0.90 M and
    // log10 RW = -0.76 + 0.27 M. At M 7: RA = 10^2.88 = 758.6 km², RW = 10^1.13 = 13.49 km, so
    // the plane is 758.6 / 13.49 = 56.2 km long, vertical. Centred on 10 km it would reach
    // 16.74 km; moved up into the layer, its top is at 15 - 13.49 = 1.51 km, under the site.
    const areaKm2 = 10 ** (-3.42 + 0.9 * 7);
    const widthKm = 10 ** (-0.76 + 0.27 * 7);
    expectClose(areaKm2, 758.6, 0.05, 'hand calculation: 10^2.88');
    expectClose(widthKm, 13.49, 0.005, 'hand calculation: 10^1.13');
    const ruptures = discretiseSource(
      point('strike-slip', 10, M7, { upperDepthKm: 0, lowerDepthKm: 15 }),
      0,
      FRAME,
      SETTINGS,
    );
    expect(ruptures.length).toBe(VIRTUAL_STRIKE_COUNT);
    for (const r of ruptures) {
      if (r.surface.kind !== 'planes') throw new Error('expected a plane');
      const [a, b, c, d] = r.surface.planes[0]!.corners;
      const lengthKm = Math.hypot(b.x - a.x, b.y - a.y, b.z - a.z);
      expectClose(lengthKm, areaKm2 / widthKm, 1e-9, 'top edge: RA / RW = 56.2 km');
      expectClose(Math.hypot(c.x - b.x, c.y - b.y, c.z - b.z), widthKm, 1e-9, 'down-dip edge: RW');
      expectClose(d.z - a.z, widthKm, 1e-9, 'vertical: the width is all depth');
      const d0 = ruptureDistances(r.surface, { x: 0, y: 0 });
      expectClose(d0.rjbKm, 0, 1e-9, 'the epicentre lies on the vertical rupture');
      expectClose(d0.rrupKm, 15 - widthKm, 1e-9, 'hand calculation: the top depth');
      expectClose(r.context.ztorKm, 15 - widthKm, 1e-9, 'Ztor in the context');
      expectClose(r.context.widthKm, widthKm, 1e-9, 'width');
      expect(r.context.hypoDepthKm).toBe(10);
    }
  });

  it('reverse at 15 km without a lower bound: Rrup to the top edge up dip (hand calculation)', () => {
    // Wells & Coppersmith (1994) Table 2A reverse (from memory): RW = 10^(-1.61 + 0.41 x 7) =
    // 18.20 km at the dip of 40° (Kaklamanos et al. 2011, from memory). Centred on the
    // hypocentre: Ztor = 15 - W sin 40° / 2; the top edge lies (15 - Ztor) / tan 40° up dip of
    // the epicentre. The perpendicular from the site meets the plane's extension 15 sin 40° =
    // 9.64 km up dip of the hypocentre, beyond its half-width (9.10 km), so the nearest point is
    // on the top edge: Rrup = √(Ztor² + offset²).
    const widthKm = 10 ** (-1.61 + 0.41 * 7);
    const dip = (40 * Math.PI) / 180;
    const ztorKm = 15 - (widthKm * Math.sin(dip)) / 2;
    const offsetKm = (15 - ztorKm) / Math.tan(dip);
    for (const r of discretiseSource(point('reverse', 15, M7), 0, FRAME, SETTINGS)) {
      const d = ruptureDistances(r.surface, { x: 0, y: 0 });
      expectClose(d.rjbKm, 0, 1e-9, 'the epicentre lies over the rupture');
      expectClose(d.rrupKm, Math.hypot(ztorKm, offsetKm), 1e-9, 'hand calculation');
    }
  });
});

/*
 * The 36-strike reference: the same virtual ruptures every 10° (this source dips), finely
 * enough that the integral over strike is converged. Sites from over the source to 30 km away,
 * where finite ruptures matter most. Measured (mean of BSSA14 and CB14, Vs30 400 m/s, finite
 * from M 6.5): eight strikes within 0.00, 0.01, 0.13, 0.12% of 36 at 475 years and 0.00,
 * 0.01, 0.12, 0.76% at 2475 years; four strikes were up to 0.95% off.
 */
describe('eight strikes against 36', () => {
  const source = point('reverse', 10, GR);
  const eight = rupturesOf(source, VIRTUAL_STRIKE_COUNT);
  const fine = rupturesOf(source, 36);
  for (const [x, y] of [
    [0, 0],
    [7, 3],
    [15, 0],
    [0, -30],
  ] as const)
    it(`475- and 2475-year PGA within 1.5% at (${x}, ${y}) km`, () => {
      for (const years of [475, 2475])
        expectRelative(pgaAt(eight, x, y, years), pgaAt(fine, x, y, years), 0.015, `${years} yr`);
    });
});

/*
 * Far away the finite ruptures approach the points: their nearest part is closer than the
 * epicentre by up to half their length, which matters less and less against the distance
 * (the excess falls roughly as that half-length over the distance). Measured, the mean
 * 475-year PGA of the finite ruptures (from M 6.5) over that of the points: +9.8% at 20 km,
 * +5.6% at 50 km, +4.1% at 100 km, +3.4% at 150 km, +3.0% at 200 km, +2.5% at 250 km; at
 * 2475 years +26%, +15%, +12%, +10%, +9%, +8%. The slow approach is the large magnitudes'
 * length (an M 7.5 reverse rupture is 78 km long), which is why points understated the hazard.
 */
describe('far away, finite ruptures give what points give', () => {
  const source = point('reverse', 10, GR);
  const finite = rupturesOf(source, VIRTUAL_STRIKE_COUNT);
  const points = rupturesOf(source, 'points');
  it('the 475-year PGA excess over points falls with distance, to within 3% at 250 km', () => {
    const excess = [20, 50, 100, 150, 200, 250].map(
      (x) => pgaAt(finite, x, 0, 475) / pgaAt(points, x, 0, 475) - 1,
    );
    for (let i = 1; i < excess.length; i++) {
      expect(excess[i]).toBeGreaterThan(0);
      expect(excess[i]).toBeLessThan(excess[i - 1]!);
    }
    expectRelative(
      pgaAt(finite, 250, 0, 475),
      pgaAt(points, 250, 0, 475),
      0.03,
      'points at 250 km',
    );
  });
});

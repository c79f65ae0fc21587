import { describe, expect, it } from 'vitest';
import { ruptureDistances } from '../../../api/engine/geometry/distances.ts';
import { faultSurface, wholeSurface } from '../../../api/engine/geometry/fault-surface.ts';
import type { Settings } from '../../../api/engine/model.ts';
import { magnitudeBins } from '../../../api/engine/recurrence/magnitude-bins.ts';
import { momentNm } from '../../../api/engine/recurrence/seismic-moment.ts';
import { discretiseSource } from '../../../api/engine/ruptures/discretise.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { FRAME, contouredKm, faultKm } from './km-fixtures.ts';
import { testSettings } from '../../helpers/test-settings.ts';

const SETTINGS: Settings = testSettings();

const DIP_DEG = 35;
const TAN_DIP = Math.tan((DIP_DEG * Math.PI) / 180);
const GR = { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.2, rate: 0.02 } as const;

/** A line north from y = 0 to y = 60 km at the x where the 35° plane below x = 0 reaches `depthKm`. */
const contourAt = (depthKm: number): [number, number][] => [
  [(depthKm - 1) / TAN_DIP, 0],
  [(depthKm - 1) / TAN_DIP, 60],
];

describe('a planar fault given as depth contours', () => {
  // The same plane two ways: trace, dip and depths; and its contours at 1, 8 and 16 km (the
  // plane's horizontal offset at depth d is (d − 1)/tan(dip), plain trigonometry). Invented
  // test scaffolding; the check is that the two give the same ruptures to 1e-6 km.
  const planar = faultKm(
    [
      [0, 0],
      [0, 60],
    ],
    { dipDeg: DIP_DEG, dipDirectionDeg: 90, upperDepthKm: 1, lowerDepthKm: 16, recurrence: GR },
  );
  const contoured = contouredKm([contourAt(1), contourAt(8), contourAt(16)], [1, 8, 16], {
    dipDeg: DIP_DEG,
    dipDirectionDeg: 90,
    recurrence: GR,
  });
  const sites = [
    { x: 12, y: 30 },
    { x: 6, y: 58 },
    { x: -10, y: 5 },
    { x: 30, y: -10 },
    { x: 5, y: 75 },
  ];

  it('has the plane’s length, width, area and dip', () => {
    const a = faultSurface(planar, FRAME);
    const b = faultSurface(contoured, FRAME);
    expectClose(b.lengthKm, a.lengthKm, 1e-6, 'plane length (trace length)');
    expectClose(b.widthKm, a.widthKm, 1e-6, 'plane width (15 km / sin 35°)');
    expectRelative(b.areaKm2, a.areaKm2, 1e-9, 'plane area, length × width');
    expectClose(b.dipDeg, DIP_DEG, 1e-6, 'dip of the plane');
  });

  it('gives every floating rupture the same Rjb, Rrup, Rx, Ry0, Ztor, width and dip within 1e-6 km', () => {
    const a = discretiseSource(planar, 0, FRAME, SETTINGS);
    const b = discretiseSource(contoured, 0, FRAME, SETTINGS);
    expect(b.length).toBe(a.length);
    a.forEach((ra, i) => {
      const rb = b[i]!;
      expectRelative(rb.annualRate, ra.annualRate, 1e-9, `rate of rupture ${i}`);
      expectClose(rb.context.ztorKm, ra.context.ztorKm, 1e-6, `Ztor of rupture ${i}`);
      expectClose(rb.context.widthKm, ra.context.widthKm, 1e-6, `width of rupture ${i}`);
      expectClose(rb.context.dipDeg, ra.context.dipDeg, 1e-6, `dip of rupture ${i}`);
      expectClose(rb.context.hypoDepthKm, ra.context.hypoDepthKm, 1e-6, `hypocentre ${i}`);
      for (const site of sites) {
        const da = ruptureDistances(ra.surface, site);
        const db = ruptureDistances(rb.surface, site);
        for (const key of ['rjbKm', 'rrupKm', 'rxKm', 'ry0Km'] as const)
          expectClose(db[key], da[key], 1e-6, `${key} of rupture ${i} at (${site.x}, ${site.y})`);
      }
    });
  });
});

describe('a surface bent along a cylinder', () => {
  // The cross-section is a circle of radius R = 100 km about an axis along y (north) at x = 0,
  // 105 km deep: the point at angle φ from straight up is x = R sin φ, depth 105 − R cos φ, so
  // its dip is φ and it steepens with depth, as a slab does. Contours every 1 km of depth from
  // 10 to 50 km lie exactly on it; between them the mesh is a chord, at most the sagitta
  // R(1 − cos(Δφ/2)) inside the circle. Distances below are hand calculations on the circle
  // (plain geometry: a site outside a circle is |site − centre| − R from it where the ray to
  // the centre crosses the arc, else nearest at an end of the arc). Invented test scaffolding.
  const R = 100;
  const ZC = 105;
  const depths = Array.from({ length: 41 }, (_, k) => 10 + k);
  const phiAt = (depthKm: number) => Math.acos((ZC - depthKm) / R);
  const xAt = (depthKm: number) => R * Math.sin(phiAt(depthKm));
  const lines = depths.map((d): [number, number][] => [
    [xAt(d), -100],
    [xAt(d), 100],
  ]);
  const cylinder = contouredKm(lines, depths, {
    dipDeg: 40,
    dipDirectionDeg: 90,
    meshSpacingKm: 1,
    recurrence: {
      type: 'moment-balanced',
      slipRateMmYr: 30,
      bValue: 1,
      mMin: 6,
      mMax: 8.5,
      shape: 'gutenberg-richter',
      shearModulusPa: 3e10,
    },
    setting: 'interface',
    mechanism: 'reverse',
  });
  const sagittaKm = Math.max(
    ...depths.slice(1).map((d, k) => R * (1 - Math.cos((phiAt(d) - phiAt(depths[k]!)) / 2))),
  );
  const whole = wholeSurface(faultSurface(cylinder, FRAME));

  it('gives Rrup and Rjb of the circle at sites above, before and beyond it', () => {
    const xTop = xAt(10);
    const xBottom = xAt(50);
    // Above the arc: the ray from the axis to (60, 0) crosses it at tan φ = 60 / 105.
    const above = ruptureDistances(whole, { x: 60, y: 0 });
    const phi = Math.atan(60 / ZC);
    expect(phi > phiAt(10) && phi < phiAt(50)).toBe(true);
    expectClose(
      above.rrupKm,
      Math.hypot(60, ZC) - R,
      sagittaKm,
      'Rrup over the arc, |site − axis| − R',
    );
    expect(above.rrupKm).toBeGreaterThanOrEqual(Math.hypot(60, ZC) - R - 1e-9);
    expectClose(above.rjbKm, 0, 1e-9, 'Rjb above the arc');
    // Trenchward: nearest at the top edge, 10 km deep at x = R sin φ(10).
    const before = ruptureDistances(whole, { x: 0, y: 0 });
    expectClose(before.rrupKm, Math.hypot(xTop, 10), 1e-6, 'Rrup to the top edge');
    expectClose(before.rjbKm, xTop, 1e-6, 'Rjb to the top edge’s projection');
    expectClose(before.rxKm, -xTop, 1e-6, 'Rx: the top edge is a straight line x = R sin φ(10)');
    // Beyond the bottom edge (50 km deep): the ray to (200, 0) passes below the arc's end.
    const beyond = ruptureDistances(whole, { x: 200, y: 0 });
    expect(Math.atan(200 / ZC) > phiAt(50)).toBe(true);
    expectClose(beyond.rrupKm, Math.hypot(200 - xBottom, 50), 1e-6, 'Rrup to the bottom edge');
    expectClose(beyond.rjbKm, 200 - xBottom, 1e-6, 'Rjb to the bottom edge’s projection');
    // Past the north end, beside the arc: Ry0 is the distance past the end.
    const past = ruptureDistances(whole, { x: 60, y: 130 });
    expectClose(past.ry0Km, 30, 1e-6, 'Ry0 past the north end');
    expectClose(past.rjbKm, 30, 1e-6, 'Rjb past the north end');
  });

  it('has the cylinder’s area, and balances moment over it within 0.5%', () => {
    // Area of the bent strip: arc length R (φ₂ − φ₁) times its 200 km along strike.
    const trueAreaKm2 = R * (phiAt(50) - phiAt(10)) * 200;
    const surface = faultSurface(cylinder, FRAME);
    expectRelative(surface.areaKm2, trueAreaKm2, 1e-4, 'area of a cylinder strip, R Δφ L');
    const bins = magnitudeBins(cylinder.recurrence, SETTINGS, surface.areaKm2);
    const released = bins.magnitudes.reduce(
      (sum, m, i) => sum + bins.annualRates[i]! * momentNm(m),
      0,
    );
    // Moment rate μ A s (Brune 1968; Hanks & Kanamori 1979 moments): N·m per year.
    const expected = 3e10 * trueAreaKm2 * 1e6 * 0.03;
    expectRelative(released, expected, 0.005, 'μ × true area × slip rate');
  });
});

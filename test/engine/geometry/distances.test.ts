import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  faultSurface,
  surfacePatch,
  wholeSurface,
} from '../../../api/engine/geometry/fault-surface.ts';
import { ruptureDistances } from '../../../api/engine/geometry/distances.ts';
import type { RuptureSurface } from '../../../api/engine/ruptures/rupture.ts';
import { expectClose } from '../../helpers/close.ts';
import { FRAME, faultKm, bentFaultSurface } from './km-fixtures.ts';

/*
 * Hand-worked distances to a planar rupture (definitions of Rjb, Rrup, Rx, Ry0 as in the
 * NGA-West2 flatfile, Ancheta et al. 2014, from memory; the geometry is plain trigonometry).
 * The trace runs north along x = 0 from y = -50 to y = 50 km and dips east, so the hanging
 * wall is x > 0. Tolerance 1e-6 km: the trace goes through [lon, lat] and back (~1e-9 km).
 */
const TOL = 1e-6;
const rad = (deg: number): number => (deg * Math.PI) / 180;

function plane(dipDeg: number, upperDepthKm: number, widthKm: number): RuptureSurface {
  const lowerDepthKm = upperDepthKm + widthKm * Math.sin(rad(dipDeg));
  return wholeSurface(
    faultSurface(
      faultKm(
        [
          [0, -50],
          [0, 50],
        ],
        { dipDeg, dipDirectionDeg: 90, upperDepthKm, lowerDepthKm },
      ),
      FRAME,
    ),
  );
}

describe('ruptureDistances on a dipping plane reaching the surface (dip 30°, W = 20 km)', () => {
  const delta = rad(30);
  const surface = plane(30, 0, 20);

  it('hanging-wall sites within W cos δ: Rjb = 0, Rrup = d sin δ, Rx = d', () => {
    for (const d of [1, 5, 17]) {
      const r = ruptureDistances(surface, { x: d, y: 0 });
      expectClose(r.rjbKm, 0, TOL, `Rjb above the plane, d = ${d}`);
      expectClose(r.rrupKm, d * Math.sin(delta), TOL, `Rrup = d sin δ, d = ${d} (hand geometry)`);
      expectClose(r.rxKm, d, TOL, `Rx = d, d = ${d}`);
      expectClose(r.ry0Km, 0, TOL, 'Ry0 = 0 alongside');
    }
  });

  it('hanging-wall site past the bottom edge: Rjb = d - W cos δ, Rrup to the bottom edge', () => {
    const d = 30; // d cos δ = 25.98 > W, so the perpendicular's foot is off the plane
    const r = ruptureDistances(surface, { x: d, y: 0 });
    expectClose(r.rjbKm, d - 20 * Math.cos(delta), TOL, 'Rjb beyond the surface projection');
    expectClose(
      r.rrupKm,
      Math.hypot(d - 20 * Math.cos(delta), 20 * Math.sin(delta)),
      TOL,
      'Rrup to the bottom edge (hand geometry)',
    );
  });

  it('footwall sites: Rjb = Rrup = d, Rx = -d', () => {
    for (const d of [0.5, 8, 40]) {
      const r = ruptureDistances(surface, { x: -d, y: 0 });
      expectClose(r.rjbKm, d, TOL, `footwall Rjb, d = ${d}`);
      expectClose(r.rrupKm, d, TOL, `footwall Rrup, d = ${d}`);
      expectClose(r.rxKm, -d, TOL, `footwall Rx, d = ${d}`);
    }
  });

  it('zero distance on the trace', () => {
    const r = ruptureDistances(surface, { x: 0, y: 10 });
    for (const [name, value] of [
      ['Rjb', r.rjbKm],
      ['Rrup', r.rrupKm],
      ['Rx', r.rxKm],
      ['Ry0', r.ry0Km],
    ] as const) {
      expectClose(value, 0, TOL, `${name} on the trace`);
    }
  });

  it('sites off the ends: Ry0 is the distance past the end along strike', () => {
    const north = ruptureDistances(surface, { x: 3, y: 60 });
    expectClose(north.ry0Km, 10, TOL, 'Ry0 10 km past the northern end');
    expectClose(north.rjbKm, 10, TOL, 'Rjb: straight north of the projection');
    expectClose(north.rxKm, 3, TOL, 'Rx keeps measuring across strike');
    const south = ruptureDistances(surface, { x: -4, y: -58 });
    expectClose(south.ry0Km, 8, TOL, 'Ry0 8 km past the southern end');
    expectClose(south.rjbKm, Math.hypot(4, 8), TOL, 'Rjb to the corner');
    expectClose(south.rrupKm, Math.hypot(4, 8), TOL, 'Rrup to the corner at the surface');
  });

  it('hypocentre at the centre: Repi and Rhypo', () => {
    const r = ruptureDistances(surface, { x: 0, y: 0 });
    expectClose(r.repiKm, 10 * Math.cos(delta), TOL, 'epicentre 10 km down dip, 8.66 km east');
    expectClose(r.rhypoKm, 10, TOL, 'hypocentre 10 km down dip from the trace');
  });
});

describe('ruptureDistances on a buried dipping plane (dip 40°, top at 5 km, W = 18 km)', () => {
  const delta = rad(40);
  const z = 5;
  const surface = plane(40, z, 18);

  it('hanging wall, d < z tan δ: Rrup = sqrt(d² + z²) to the top edge', () => {
    for (const d of [0, 1, 4]) {
      expect(d).toBeLessThan(z * Math.tan(delta));
      expectClose(
        ruptureDistances(surface, { x: d, y: 0 }).rrupKm,
        Math.hypot(d, z),
        TOL,
        `Rrup to the top edge, d = ${d}`,
      );
    }
  });

  it('hanging wall, foot of the perpendicular on the plane: Rrup = d sin δ + z cos δ', () => {
    for (const d of [6, 12, 20]) {
      expect(d * Math.cos(delta) - z * Math.sin(delta)).toBeLessThanOrEqual(18);
      const r = ruptureDistances(surface, { x: d, y: 0 });
      expectClose(
        r.rrupKm,
        d * Math.sin(delta) + z * Math.cos(delta),
        TOL,
        `Rrup = d sin δ + z cos δ, d = ${d}`,
      );
      expectClose(r.rjbKm, Math.max(0, d - 18 * Math.cos(delta)), TOL, `Rjb, d = ${d}`);
    }
  });

  it('footwall: Rjb = d, Rrup = sqrt(d² + z²)', () => {
    const r = ruptureDistances(surface, { x: -7, y: 0 });
    expectClose(r.rjbKm, 7, TOL, 'footwall Rjb');
    expectClose(r.rrupKm, Math.hypot(7, z), TOL, 'footwall Rrup to the buried top edge');
  });
});

describe('ruptureDistances on a vertical strike-slip plane (0–15 km)', () => {
  const surface = plane(90, 0, 15);
  it('Rjb = Rrup = |x|, Rx signed by the right-hand side of the trace', () => {
    for (const x of [-12, -0.3, 0.3, 7]) {
      const r = ruptureDistances(surface, { x, y: 20 });
      expectClose(r.rjbKm, Math.abs(x), TOL, `vertical plane Rjb, x = ${x}`);
      expectClose(r.rrupKm, Math.abs(x), TOL, `vertical plane Rrup, x = ${x}`);
      expectClose(r.rxKm, x, TOL, `vertical plane Rx, x = ${x}`);
    }
  });
  it('buried at 3 km: Rrup = sqrt(x² + 3²)', () => {
    const buried = plane(90, 3, 12);
    expectClose(
      ruptureDistances(buried, { x: 7, y: 0 }).rrupKm,
      Math.hypot(7, 3),
      TOL,
      'buried vertical plane',
    );
  });
});

describe('ruptureDistances invariants', () => {
  const surface = plane(35, 2, 16);
  it('Rx changes sign across the trace; Rjb <= Rrup <= Rhypo and Rjb <= Repi', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -80, max: 80, noNaN: true }),
        fc.double({ min: -80, max: 80, noNaN: true }),
        (x, y) => {
          const r = ruptureDistances(surface, { x, y });
          if (Math.abs(x) > 1e-6) expect(Math.sign(r.rxKm)).toBe(Math.sign(x));
          expect(r.rjbKm).toBeLessThanOrEqual(r.rrupKm + 1e-9);
          expect(r.rrupKm).toBeLessThanOrEqual(r.rhypoKm + 1e-9);
          expect(r.rjbKm).toBeLessThanOrEqual(r.repiKm + 1e-9);
          expect(r.ry0Km).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });
});

describe('ruptureDistances on several planes', () => {
  it('a straight trace cut into two segments gives the distances of the uncut one (GC2 property, Spudich & Chiou 2015, from memory)', () => {
    const cut = faultSurface(
      faultKm(
        [
          [0, -50],
          [0, 10],
          [0, 50],
        ],
        { dipDeg: 50, dipDirectionDeg: 90, upperDepthKm: 1, lowerDepthKm: 14 },
      ),
      FRAME,
    );
    const whole = faultSurface(
      faultKm(
        [
          [0, -50],
          [0, 50],
        ],
        { dipDeg: 50, dipDirectionDeg: 90, upperDepthKm: 1, lowerDepthKm: 14 },
      ),
      FRAME,
    );
    for (const site of [
      { x: 12, y: 3 },
      { x: -20, y: 70 },
      { x: 5, y: -66 },
      { x: 0.2, y: 10 },
    ]) {
      const a = ruptureDistances(wholeSurface(cut), site);
      const b = ruptureDistances(wholeSurface(whole), site);
      for (const key of ['rjbKm', 'rrupKm', 'rxKm', 'ry0Km'] as const)
        expectClose(a[key], b[key], 1e-6, `${key} at (${site.x}, ${site.y})`);
    }
  });

  it('Rjb and Rrup are the minima over the planes of a bent trace; Rx varies smoothly past the bend', () => {
    // North 40 km, then east 40 km; vertical, so every distance is to the trace.
    const s = bentFaultSurface(40, 90);
    const surface = wholeSurface(s);
    const inside = ruptureDistances(surface, { x: 10, y: 30 });
    expectClose(inside.rjbKm, 10, TOL, 'nearest is the northward segment');
    const outside = ruptureDistances(surface, { x: -6, y: 48 });
    expectClose(outside.rjbKm, 10, TOL, 'nearest is the bend vertex (6-8-10 triangle)');
    expectClose(outside.rrupKm, 10, TOL, 'vertical plane from the surface: Rrup = Rjb');
    // By symmetry a site on the bisector outside the bend weighs both segments equally, so
    // T is its common offset -8/√2 from both lines and U the trace's midpoint (GC2 weights,
    // Spudich & Chiou 2015, from memory; symmetry by hand).
    const h = 8 / Math.SQRT2;
    const bisector = ruptureDistances(surface, { x: -h, y: 40 + h });
    expectClose(bisector.rxKm, -h, TOL, 'GC2 T on the bisector of a symmetric bend');
    expectClose(bisector.ry0Km, 0, TOL, 'GC2 U at mid-trace on the bisector');
    // Walking across the bisector outside the bend, 8 km from the vertex, Rx has no jumps.
    let previous = ruptureDistances(surface, { x: -h - 10, y: 40 + h - 10 }).rxKm;
    for (let k = 1; k <= 400; k++) {
      const t = (20 * k) / 400;
      const rx = ruptureDistances(surface, { x: -h - 10 + t, y: 40 + h - 10 + t }).rxKm;
      expect(Math.abs(rx - previous), `Rx step near the bend at ${t} km`).toBeLessThan(0.2);
      expect(rx).toBeLessThan(0);
      previous = rx;
    }
  });

  it('a patch across the joint is two planes whose top edges add to its length', () => {
    const s = bentFaultSurface(50, 90);
    const planes = surfacePatch(s, [30, 70], [0, 12]);
    expect(planes.length).toBe(2);
    const lengths = planes.map((p) =>
      Math.hypot(p.corners[1].x - p.corners[0].x, p.corners[1].y - p.corners[0].y),
    );
    expectClose(lengths[0] ?? NaN, 20, TOL, '20 km before the joint');
    expectClose(lengths[1] ?? NaN, 20, TOL, '20 km after the joint');
  });
});

describe('ruptureDistances for a point rupture (common practice)', () => {
  it('Rjb = Repi, Rrup = Rhypo, Rx = -Repi, Ry0 = 0', () => {
    const r = ruptureDistances(
      { kind: 'point', hypocentre: { x: 3, y: 4, z: 12 } },
      { x: 0, y: 0 },
    );
    expectClose(r.repiKm, 5, 1e-12, '3-4-5');
    expectClose(r.rhypoKm, 13, 1e-12, '5-12-13');
    expectClose(r.rjbKm, 5, 1e-12, 'Rjb = Repi');
    expectClose(r.rrupKm, 13, 1e-12, 'Rrup = Rhypo');
    expectClose(r.rxKm, -5, 1e-12, 'Rx = -Repi (footwall)');
    expect(r.ry0Km).toBe(0);
  });
});

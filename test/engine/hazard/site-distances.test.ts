import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ruptureDistances } from '../../../api/engine/geometry/distances.ts';
import { ruptureTable } from '../../../api/engine/hazard/rupture-table-builder.ts';
import { settingRuptures } from '../../../api/engine/hazard/rupture-table.ts';
import { ruptureGeometry } from '../../../api/engine/hazard/rupture-geometry.ts';
import { createPairBuffer, siteDistances } from '../../../api/engine/hazard/site-distances.ts';
import { DISTANCE_NAMES, type DistanceName } from '../../../api/engine/motion/types.ts';
import { discretiseSource } from '../../../api/engine/ruptures/discretise.ts';
import type { Rupture } from '../../../api/engine/ruptures/rupture.ts';
import { expectClose } from '../../helpers/close.ts';
import { FRAME, SETTINGS, contouredKm, faultKm, pointKm, zoneKm } from '../geometry/km-fixtures.ts';
import { BENT_TRACE_KM } from '../fixtures/all-kinds-study.ts';
import { boxRing } from '../../helpers/box-ring.ts';

/*
 * The fast path's distances against geometry/distances.ts (the reference, itself checked by hand
 * in test/engine/geometry/distances.test.ts), for ruptures of hand-made sources (test scaffolding):
 * a bent dipping reverse fault, a vertical strike-slip fault, a zone, a point and a bent surface
 * given by depth contours (whose ruptures are rows of mesh cells, only the top row's edges
 * making the GC2 trace), plus planes that
 * are not rectangles, which take the general path. Tolerance 1e-9 km: the two differ only in
 * rounding (√ for Math.hypot, a rectangle's own axes for the quadrilateral tests).
 */
const TOLERANCE_KM = 1e-9;
const M6: { type: 'fixed'; magnitude: number; rate: number } = {
  type: 'fixed',
  magnitude: 6.5,
  rate: 0.01,
};
const ruptures: Rupture[] = [
  ...discretiseSource(
    faultKm(BENT_TRACE_KM, {
      dipDeg: 35,
      dipDirectionDeg: 110,
      upperDepthKm: 1,
      lowerDepthKm: 18,
      mechanism: 'reverse',
      recurrence: M6,
    }),
    0,
    FRAME,
    SETTINGS,
  ),
  ...discretiseSource(
    faultKm(
      [
        [-40, -20],
        [-40, 60],
      ],
      { dipDeg: 90, dipDirectionDeg: 90, upperDepthKm: 0, lowerDepthKm: 14, recurrence: M6 },
    ),
    1,
    FRAME,
    SETTINGS,
  ),
  ...discretiseSource(zoneKm([boxRing(50, 50, 90, 90)], M6, 9), 2, FRAME, SETTINGS),
  ...discretiseSource(pointKm(-10, 70, M6, 12), 3, FRAME, SETTINGS),
  ...discretiseSource(
    contouredKm(
      [0, 8, 20].map((eastKm): [number, number][] => [
        [100 + eastKm, 100],
        [120 + eastKm, 130 + eastKm / 4],
        [118 + eastKm, 160],
      ]),
      [2, 10, 22],
      { dipDeg: 40, dipDirectionDeg: 90, mechanism: 'reverse', recurrence: M6 },
    ),
    4,
    FRAME,
    SETTINGS,
  ),
];
// A skewed quadrilateral and a trapezoid (not rectangles): corners in RupturePlane order.
const skewed: Rupture = {
  ...ruptures[0]!,
  surface: {
    kind: 'planes',
    hypocentre: { x: 5, y: 5, z: 8 },
    planes: [
      {
        corners: [
          { x: 0, y: 0, z: 2 },
          { x: 10, y: 3, z: 2 },
          { x: 13, y: 9, z: 12 },
          { x: 2, y: 7, z: 12 },
        ],
      },
      {
        corners: [
          { x: 10, y: 3, z: 2 },
          { x: 20, y: 2, z: 2 },
          { x: 19, y: 10, z: 12 },
          { x: 13, y: 9, z: 12 },
        ],
      },
    ],
  },
};
const all = [...ruptures, skewed];
const table = ruptureTable(all);
const geometry = ruptureGeometry(table);
const everyDistance = new Set<DistanceName>(DISTANCE_NAMES);
const indices = Int32Array.from(all, (_, i) => i);
// Site coordinates, km; denormal ones are left out: there both paths' GC2 divides ∞ by ∞ (a limit case of geometry/gc2.ts).
const coordinate = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true }).filter((v) => v === 0 || Math.abs(v) > 1e-6);

describe('siteDistances (the fast path) against ruptureDistances (the reference)', () => {
  it('gives every distance of every rupture within 1e-9 km, at generated sites near and far', () => {
    // The contoured source's ruptures have rows below their top row.
    expect(
      all.some(
        (r) =>
          r.surface.kind === 'planes' &&
          (r.surface.tracePlanes ?? Infinity) < r.surface.planes.length,
      ),
    ).toBe(true);
    const buffer = createPairBuffer(all.length);
    fc.assert(
      fc.property(coordinate(-150, 200), coordinate(-150, 250), (x, y) => {
        siteDistances(
          {
            geometry,
            ruptures: indices,
            site: { x, y },
            maxDistanceKm: Infinity,
            distances: everyDistance,
          },
          buffer,
        );
        expect(buffer.count).toBe(all.length);
        for (let k = 0; k < buffer.count; k++) {
          const expected = ruptureDistances(all[buffer.rupture[k]!]!.surface, { x, y });
          for (const name of everyDistance)
            expectClose(
              buffer[name][k]!,
              expected[name],
              TOLERANCE_KM,
              `${name} of rupture ${k} at (${x}, ${y}) km, geometry/distances.ts`,
            );
        }
      }),
      { numRuns: 200, seed: 7 },
    );
  });

  it('keeps exactly the ruptures with Rjb within the cut-off, in order, whatever the bounding circles drop early', () => {
    const buffer = createPairBuffer(all.length);
    for (const site of [
      { x: 0, y: 0 },
      { x: 140, y: -60 },
      { x: -120, y: 200 },
    ]) {
      for (const cutoffKm of [0, 20, 60, 150]) {
        siteDistances(
          { geometry, ruptures: indices, site, maxDistanceKm: cutoffKm, distances: new Set() },
          buffer,
        );
        const expected = all.flatMap((r, i) =>
          ruptureDistances(r.surface, site).rjbKm <= cutoffKm ? [i] : [],
        );
        expect(Array.from(buffer.rupture.subarray(0, buffer.count))).toEqual(expected);
      }
    }
  });

  it('gives Rrup within 1e-9 km over, beside and far from a contoured mesh and over warped planes, where planes are passed over by their boxes', () => {
    const buffer = createPairBuffer(all.length);
    // The contoured source spans about x 100–142, y 100–160 km; the warped planes x 0–20, y 0–10.
    const sites = [
      ...[100, 108, 115, 125, 135, 142].flatMap((x) =>
        [100, 120, 131, 145, 160].map((y) => ({ x, y })),
      ),
      { x: 90, y: 130 },
      { x: 160, y: 130 },
      { x: 120, y: 80 },
      { x: 118, y: 185 },
      { x: 400, y: 130 },
      { x: 120, y: -200 },
      { x: 5, y: 5 },
      { x: 12, y: 6 },
      { x: 16, y: 5 },
      { x: 19, y: 9 },
    ];
    for (const site of sites) {
      siteDistances(
        {
          geometry,
          ruptures: indices,
          site,
          maxDistanceKm: Infinity,
          distances: new Set<DistanceName>(['rrupKm']),
        },
        buffer,
      );
      expect(buffer.count).toBe(all.length);
      for (let k = 0; k < buffer.count; k++)
        expectClose(
          buffer.rrupKm[k]!,
          ruptureDistances(all[k]!.surface, site).rrupKm,
          TOLERANCE_KM,
          `Rrup of rupture ${k} at (${site.x}, ${site.y}) km, geometry/distances.ts`,
        );
    }
  });

  it('holds every corner of every plane in its box', () => {
    const { planeBox } = geometry;
    const corners = table.planeCorners;
    for (let p = 0; p < corners.length / 12; p++)
      for (let k = 0; k < 4; k++)
        for (let axis = 0; axis < 3; axis++) {
          const v = corners[12 * p + 3 * k + axis]!;
          expect(v).toBeGreaterThan(planeBox[6 * p + axis]!);
          expect(v).toBeLessThan(planeBox[6 * p + 3 + axis]!);
        }
  });

  it("pairs a subset by its own indices (one setting's ruptures)", () => {
    const crustal = settingRuptures(table, 'crustal');
    const subset = crustal.subarray(0, 5);
    const buffer = createPairBuffer(subset.length);
    siteDistances(
      {
        geometry,
        ruptures: subset,
        site: { x: 3, y: 4 },
        maxDistanceKm: Infinity,
        distances: everyDistance,
      },
      buffer,
    );
    expect(Array.from(buffer.rupture.subarray(0, buffer.count))).toEqual([0, 1, 2, 3, 4]);
    expectClose(
      buffer.rrupKm[4]!,
      ruptureDistances(all[subset[4]!]!.surface, { x: 3, y: 4 }).rrupKm,
      TOLERANCE_KM,
      'Rrup of the fifth',
    );
  });
});

import { describe, expect, it } from 'vitest';
import { ON_LINE_KM, ry0FromU, traceCoordinates } from '../../../api/engine/geometry/gc2.ts';
import type { PointXY } from '../../../api/engine/geometry/projection.ts';
import { expectClose } from '../../helpers/close.ts';

/*
 * GC2 coordinates (Spudich & Chiou 2015, from memory) at and next to a trace: on the trace the
 * strike-normal coordinate T is 0 and the strike-parallel U is the distance along the trace from
 * its first vertex, and both are continuous there. The bent trace is test scaffolding: 10 km
 * east, then 11.18 km to the east-north-east (a vertex at (10, 0)).
 */
const TRACE: readonly (readonly [PointXY, PointXY])[] = [
  [
    { x: 0, y: 0 },
    { x: 10, y: 0 },
  ],
  [
    { x: 10, y: 0 },
    { x: 20, y: 5 },
  ],
];
const LENGTH_KM = 10 + Math.hypot(10, 5);
const VERTICES: readonly { readonly at: PointXY; readonly alongKm: number }[] = [
  { at: { x: 0, y: 0 }, alongKm: 0 },
  { at: { x: 10, y: 0 }, alongKm: 10 },
  { at: { x: 20, y: 5 }, alongKm: LENGTH_KM },
];
// From the vertex itself out to past ON_LINE_KM, with the offsets whose reciprocals overflow (1e-300 and a denormal).
const OFFSETS_KM = [0, 5e-324, 1e-310, 1e-300, 1e-15, 1e-12, 1e-10, 5e-10, 1e-9, 2e-9, 1e-8, 1e-6];
const DIRECTIONS = Array.from({ length: 48 }, (_, k) => (k * Math.PI) / 24);

describe('traceCoordinates at and next to the trace', () => {
  it("is finite within about 1e-9 km of every vertex, in every direction (no ∞/∞), with T → 0 and U → the vertex's distance along the trace", () => {
    for (const { at, alongKm } of VERTICES) {
      for (const offsetKm of OFFSETS_KM) {
        for (const angle of DIRECTIONS) {
          const site = {
            x: at.x + offsetKm * Math.cos(angle),
            y: at.y + offsetKm * Math.sin(angle),
          };
          const { tKm, uKm, lengthKm } = traceCoordinates(TRACE, site);
          const where = `site ${offsetKm} km from (${at.x}, ${at.y}) at ${angle.toFixed(3)} rad`;
          expect(Number.isFinite(tKm), `${where}: T = ${tKm}`).toBe(true);
          expect(Number.isFinite(uKm), `${where}: U = ${uKm}`).toBe(true);
          // Continuity: the coordinates move about as far as the site does (the other segment's pull adds a
          // share of the offset, so twice it is allowed, plus 1e-12 km of rounding).
          expectClose(
            tKm,
            0,
            2 * offsetKm + 1e-12,
            `${where}: T on the trace is 0 (Spudich & Chiou 2015, from memory)`,
          );
          expectClose(
            uKm,
            alongKm,
            2 * offsetKm + 1e-12,
            `${where}: U at a vertex is its distance along the trace`,
          );
          expectClose(lengthKm, LENGTH_KM, 1e-12, 'trace length');
          expect(Number.isFinite(ry0FromU(uKm, lengthKm))).toBe(true);
        }
      }
    }
  });

  it('on the trace between vertices: T = 0 and U = distance along the trace; Ry0 = 0', () => {
    for (const fraction of [0, 0.25, 0.5, 0.999999]) {
      const first = traceCoordinates(TRACE, { x: 10 * fraction, y: 0 });
      expectClose(first.tKm, 0, 1e-12, `T on the first segment at ${fraction} of it`);
      expectClose(first.uKm, 10 * fraction, 1e-12, `U on the first segment at ${fraction} of it`);
      const second = traceCoordinates(TRACE, { x: 10 + 10 * fraction, y: 5 * fraction });
      expectClose(second.tKm, 0, 1e-12, `T on the second segment at ${fraction} of it`);
      expectClose(
        second.uKm,
        10 + Math.hypot(10, 5) * fraction,
        1e-12,
        `U on the second segment at ${fraction} of it`,
      );
      expect(ry0FromU(second.uKm, second.lengthKm)).toBe(0);
    }
  });

  it("a site within ON_LINE_KM of a segment's line, just past its end, counts as on the trace", () => {
    const past = traceCoordinates(
      [
        [
          { x: 0, y: 0 },
          { x: 10, y: 0 },
        ],
      ],
      { x: 10 + ON_LINE_KM / 2, y: ON_LINE_KM / 4 },
    );
    expect(past.tKm).toBe(0);
    expectClose(past.uKm, 10, ON_LINE_KM, 'U at the end of the trace');
    // Farther along the line than the slack, it is off the end: T = 0 and U past the end (the t → 0 limit).
    const beyond = traceCoordinates(
      [
        [
          { x: 0, y: 0 },
          { x: 10, y: 0 },
        ],
      ],
      { x: 12, y: 0 },
    );
    expectClose(beyond.tKm, 0, 1e-12, 'T on the line past the end');
    expectClose(
      ry0FromU(beyond.uKm, beyond.lengthKm),
      2,
      1e-9,
      'Ry0 = distance past the end along strike',
    );
  });
});

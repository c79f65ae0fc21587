import * as turf from '@turf/turf';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crossesItself } from '../../api/study/self-crossing.ts';

/**
 * crossesItself against turf's kinks (which compares every pair of segments): the same answer
 * on generated lines and rings, small integer grids included so that touching ends, shared
 * vertices and collinear overlaps come up often.
 */
const position = (span: number) =>
  fc.tuple(fc.integer({ min: 0, max: span }), fc.integer({ min: 0, max: span }));
const kinked = (geometry: Parameters<typeof turf.kinks>[0]) =>
  turf.kinks(geometry).features.length > 0;

describe('crossesItself', () => {
  it('agrees with turf kinks on generated lines (3 to 12 vertices, on grids of 3 to 40)', () => {
    fc.assert(
      fc.property(
        fc
          .integer({ min: 3, max: 40 })
          .chain((span) => fc.array(position(span), { minLength: 3, maxLength: 12 })),
        (points) => {
          expect(crossesItself([points])).toBe(kinked(turf.lineString(points)));
        },
      ),
      { numRuns: 400 },
    );
  });

  it('agrees with turf kinks on generated polygons with a hole (rings of 3 to 8 vertices)', () => {
    const ring = (span: number) =>
      fc
        .array(position(span), { minLength: 3, maxLength: 8 })
        .map((points) => [...points, points[0] as [number, number]]);
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 20 }).chain((span) => fc.tuple(ring(span), ring(span))),
        ([outer, hole]) => {
          expect(crossesItself([outer, hole])).toBe(kinked(turf.polygon([outer, hole])));
        },
      ),
      { numRuns: 400 },
    );
  });

  it('a zig-zag of 5,000 vertices does not cross itself; one that turns back under itself does', () => {
    const zigZag = Array.from({ length: 5000 }, (_, i) => [
      -140.5 + i * 0.01,
      -47.5 + (i % 2) * 0.01,
    ]);
    expect(crossesItself([zigZag])).toBe(false);
    // Back from the last vertex to below the middle: it crosses the zig-zag near its end.
    const looped = [...zigZag, [-140.5 + 2500 * 0.01, -47.6]];
    expect(crossesItself([looped])).toBe(true);
    // The same shape over 400 vertices, where turf's every-pair comparison is quick.
    const short = [...zigZag.slice(0, 400), [-140.5 + 200 * 0.01, -47.6]];
    expect(crossesItself([short])).toBe(kinked(turf.lineString(short)));
    expect(crossesItself([zigZag.slice(0, 400)])).toBe(
      kinked(turf.lineString(zigZag.slice(0, 400))),
    );
  });
});

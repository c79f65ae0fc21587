import { describe, expect, it } from 'vitest';
import { planTrip, type TripStop } from '../../../api/engine/trip/visit-order.ts';
import { expectClose } from '../../helpers/close.ts';

/** Plane distance with lon and lat read as x and y, so the best orders can be worked by hand. */
const plane = (a: TripStop, b: TripStop): number => Math.hypot(a.lon - b.lon, a.lat - b.lat);
const at = (id: string, x: number, y = 0): TripStop => ({ id, lon: x, lat: y });

describe('planTrip', () => {
  it('mends the nearest-neighbour detour on a line (best order worked by hand)', () => {
    // From 0 the six orders of {1, -2, 4} cost 10, 10, 8, 11, 10, 13: the best is -2, 1, 4 (8).
    // Nearest neighbour alone goes 1, -2, 4 (10); one 2-opt reversal gives the best.
    const plan = planTrip([at('o', 0), at('p', 1), at('m', -2), at('q', 4)], {
      distanceKm: plane,
    });
    expect(plan.stops.map((s) => s.id)).toEqual(['o', 'm', 'p', 'q']);
    expect(plan.legsKm).toEqual([2, 3, 3]);
    expect(plan.totalKm).toBe(8);
  });

  it('starts from the chosen stop and, on a return trip, walks the square without crossing', () => {
    // Unit square: the best closed tour is the perimeter, 4; a crossing tour costs 2 + 2√2.
    const stops = [at('a', 0, 0), at('c', 1, 1), at('b', 1, 0), at('d', 0, 1)];
    const plan = planTrip(stops, { startId: 'c', returnToStart: true, distanceKm: plane });
    expect(plan.stops[0]?.id).toBe('c');
    expect(plan.legsKm).toHaveLength(4);
    expectClose(plan.totalKm, 4, 1e-12, 'by hand: the unit square perimeter');
  });

  it('measures great-circle distance by default', () => {
    // One degree of longitude on the equator: 6371.0088 km · π / 180 = 111.1951 km (IUGG mean
    // Earth radius, turf's default; from memory).
    const plan = planTrip([at('x', 0), at('y', 1)]);
    expectClose(plan.totalKm, 111.1951, 1e-4, 'sphere R = 6371.0088 km, 1° of arc');
  });

  it('handles one stop and no stops', () => {
    expect(planTrip([at('x', 0)], { returnToStart: true })).toEqual({
      stops: [at('x', 0)],
      legsKm: [],
      totalKm: 0,
    });
    expect(planTrip([]).totalKm).toBe(0);
  });
});

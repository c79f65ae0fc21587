import { distance } from '@turf/turf';

/**
 * A visiting order for a trip: nearest neighbour from the chosen start, then improved by 2-opt
 * (reverse a stretch of the route whenever that shortens it, until no reversal does). Both are
 * the textbook construction and improvement heuristics for the travelling-salesman problem
 * (Lin 1965 for 2-opt; common practice); for the handful of villages of one trip the result is
 * usually the shortest order or close to it, but it is not guaranteed to be.
 */

export interface TripStop {
  readonly id: string;
  readonly lon: number;
  readonly lat: number;
}

export interface TripPlanOptions {
  /** The stop the trip starts from (default: the first given). */
  readonly startId?: string;
  /** Whether the trip comes back to its start (the last leg is then counted). */
  readonly returnToStart?: boolean;
  /**
   * Distance between two stops, km. Default: the great-circle distance on a sphere of radius
   * 6371.0088 km (turf's distance, the haversine formula), straight line, not by road or boat.
   */
  readonly distanceKm?: (a: TripStop, b: TripStop) => number;
}

export interface TripPlan {
  /** The stops in visiting order, the start first. */
  readonly stops: readonly TripStop[];
  /** Leg i goes from stop i to stop i + 1 (and, on a return trip, the last leg back to the start), km. */
  readonly legsKm: readonly number[];
  readonly totalKm: number;
}

const greatCircleKm = (a: TripStop, b: TripStop): number =>
  distance([a.lon, a.lat], [b.lon, b.lat], { units: 'kilometers' });

/** Improvements smaller than this (km) are rounding, not a shorter route; it also ends the loop. */
const IMPROVEMENT_KM = 1e-9;

/** Orders `stops` for a trip (see the file comment). An unknown `startId` starts from the first stop. */
export function planTrip(stops: readonly TripStop[], options: TripPlanOptions = {}): TripPlan {
  const measure = options.distanceKm ?? greatCircleKm;
  const closed = options.returnToStart ?? false;
  const n = stops.length;
  if (n === 0) return { stops: [], legsKm: [], totalKm: 0 };
  const d = stops.map((a) => stops.map((b) => measure(a, b)));
  const dist = (i: number, j: number): number => d[i]?.[j] ?? 0;
  const start = Math.max(
    0,
    stops.findIndex((s) => s.id === options.startId),
  );

  // Nearest neighbour: ties go to the stop given first.
  const order = [start];
  const left = new Set(stops.map((_, i) => i).filter((i) => i !== start));
  while (left.size > 0) {
    const from = order.at(-1) ?? start;
    let best = -1;
    for (const i of left) if (best < 0 || dist(from, i) < dist(from, best)) best = i;
    order.push(best);
    left.delete(best);
  }

  // 2-opt with the start fixed: reversing order[i..k] swaps the legs into i and out of k.
  const at = (k: number): number | undefined => (k < n ? order[k] : closed ? order[0] : undefined);
  let improved = n > 2;
  while (improved) {
    improved = false;
    for (let i = 1; i < n - 1; i++) {
      for (let k = i + 1; k < n; k++) {
        const before = order[i - 1] as number;
        const first = order[i] as number;
        const last = order[k] as number;
        const after = at(k + 1);
        const outOld = after === undefined ? 0 : dist(last, after);
        const outNew = after === undefined ? 0 : dist(first, after);
        const gain = dist(before, first) + outOld - dist(before, last) - outNew;
        if (gain > IMPROVEMENT_KM) {
          const reversed = order.slice(i, k + 1).reverse();
          order.splice(i, reversed.length, ...reversed);
          improved = true;
        }
      }
    }
  }

  const legsKm = order.slice(1).map((j, m) => dist(order[m] as number, j));
  if (closed && n > 1) legsKm.push(dist(order.at(-1) as number, start));
  return {
    stops: order.map((i) => stops[i] as TripStop),
    legsKm,
    totalKm: legsKm.reduce((sum, km) => sum + km, 0),
  };
}

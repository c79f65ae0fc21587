import type { PointXY } from './projection.ts';

/**
 * Strike-normal and strike-parallel coordinates of a site relative to a (possibly bent) top
 * trace: the generalized coordinate system GC2 of Spudich & Chiou (2015), "Strike-parallel and
 * strike-normal coordinate system around geometrically complicated rupture traces — use by
 * NGA-West2 and further improvements", USGS Open-File Report 2015-1028 (formulas from memory).
 *
 * Each segment i has a local strike-normal coordinate t_i (positive to the right of the trace,
 * the hanging-wall side) and strike-parallel u_i from its start. The weight of a segment is the
 * integral of 1/r² along it, w_i = (1/t_i) [atan((l_i - u_i)/t_i) - atan(-u_i/t_i)], and
 * T = Σ w_i t_i / Σ w_i, U = Σ w_i (u_i + s_i) / Σ w_i with s_i the trace length before
 * segment i. On a single straight trace T and U are exactly the usual Rx and along-strike
 * coordinate; across a bend they vary smoothly where nearest-segment rules jump.
 */
export interface TraceCoordinates {
  /** Strike-normal coordinate T, km; positive on the hanging-wall side (Rx). */
  readonly tKm: number;
  /** Strike-parallel coordinate U from the trace's first vertex, km. */
  readonly uKm: number;
  /** Length of the trace, km. */
  readonly lengthKm: number;
}

/**
 * A site this close to a segment's line (1 µm) is on it: the weight's 1/t limit is taken. The
 * same slack past either end of the segment counts as on it too: there the limit's weight
 * 1/(u − l) − 1/u grows past any bound (1/u overflows to ∞ for |u| below about 1e-308 km, and
 * T = ∞/∞), while the site is, to this slack, on the trace's vertex.
 */
export const ON_LINE_KM = 1e-9;

/**
 * Running sums of GC2 over a trace's segments, added in trace order by addGc2Segment: the one
 * implementation of the weights, shared by traceCoordinates and the rupture table's distances
 * (hazard/site-distances.ts), which reuses one of these from rupture to rupture.
 */
export interface Gc2Sums {
  weightSum: number;
  tSum: number;
  uSum: number;
  /** Length of the segments added so far (s_i of the next segment), km. */
  lengthKm: number;
  /** U of the first segment the site lies on (within ON_LINE_KM), km; NaN while there is none. */
  onTraceUKm: number;
}

export const createGc2Sums = (): Gc2Sums => ({ weightSum: 0, tSum: 0, uSum: 0, lengthKm: 0, onTraceUKm: Number.NaN });

export function resetGc2Sums(sums: Gc2Sums): void {
  sums.weightSum = 0;
  sums.tSum = 0;
  sums.uSum = 0;
  sums.lengthKm = 0;
  sums.onTraceUKm = Number.NaN;
}

/**
 * Adds one segment, starting at (ax, ay) with unit strike vector (sx, sy) and length l km
 * (l > 0), seen from the site (px, py).
 */
export function addGc2Segment(sums: Gc2Sums, ax: number, ay: number, sx: number, sy: number, l: number, px: number, py: number): void {
  const dx = px - ax;
  const dy = py - ay;
  const u = dx * sx + dy * sy;
  const t = dx * sy - dy * sx;
  let w: number;
  if (Math.abs(t) > ON_LINE_KM) {
    w = (Math.atan((l - u) / t) - Math.atan(-u / t)) / t;
  } else if (u >= -ON_LINE_KM && u <= l + ON_LINE_KM) {
    if (Number.isNaN(sums.onTraceUKm)) sums.onTraceUKm = sums.lengthKm + u;
    w = 0;
  } else {
    // ∫ dx / (x - u)² over the segment, the t -> 0 limit off its ends (|u| and |u − l| > ON_LINE_KM: finite).
    w = 1 / (u - l) - 1 / u;
  }
  sums.weightSum += w;
  sums.tSum += w * t;
  sums.uSum += w * (u + sums.lengthKm);
  sums.lengthKm += l;
}

/** T of the segments added, km: 0 on the trace, and 0 when no segment has weight. */
export const gc2TKm = (sums: Gc2Sums): number => (!Number.isNaN(sums.onTraceUKm) || !(sums.weightSum > 0) ? 0 : sums.tSum / sums.weightSum);

/** U of the segments added, km. */
export const gc2UKm = (sums: Gc2Sums): number =>
  !Number.isNaN(sums.onTraceUKm) ? sums.onTraceUKm : sums.weightSum > 0 ? sums.uSum / sums.weightSum : 0;

/**
 * GC2 coordinates of `site` (local km) relative to the trace made of `segments`, each a
 * [start, end] pair in trace order (they need not join: a floating rupture's top edges part
 * below a bend).
 */
export function traceCoordinates(segments: readonly (readonly [PointXY, PointXY])[], site: PointXY): TraceCoordinates {
  const sums = createGc2Sums();
  for (const [a, b] of segments) {
    const l = Math.hypot(b.x - a.x, b.y - a.y);
    if (l === 0) continue;
    addGc2Segment(sums, a.x, a.y, (b.x - a.x) / l, (b.y - a.y) / l, l, site.x, site.y);
  }
  return { tKm: gc2TKm(sums), uKm: gc2UKm(sums), lengthKm: sums.lengthKm };
}

/** Distance off the ends of the trace along strike: 0 beside it (Ry0, km). */
export const ry0FromU = (uKm: number, lengthKm: number): number => (uKm < 0 ? -uKm : uKm > lengthKm ? uKm - lengthKm : 0);

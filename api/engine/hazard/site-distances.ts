import {
  addGc2Segment,
  createGc2Sums,
  gc2TKm,
  gc2UKm,
  resetGc2Sums,
  ry0FromU,
  type Gc2Sums,
} from '../geometry/gc2.ts';
import type { PointXY } from '../geometry/projection.ts';
import type { DistanceName, PairDistances } from '../motion/types.ts';
import { ruptureUsedAt } from './rupture-table.ts';
import {
  CORNERS,
  EDGE,
  EDGE_LENGTH_SQ,
  EDGE_LENGTH_SQ_XY,
  EDGE_NORMAL,
  NORMAL,
  ORIGIN,
  PLANE_FIELDS,
  RECT,
  RECT_XY,
  TOP,
  type RuptureGeometry,
} from './rupture-geometry.ts';

/**
 * Source-to-site distances over a rupture table: the definitions and arithmetic of
 * geometry/distances.ts (Rjb and Rrup as minima over a rupture's planes, Rx and Ry0 from the
 * GC2 coordinates of its top edges, geometry/gc2.ts), with the per-plane numbers that do not
 * depend on the site worked out once (RuptureGeometry); √(a² + b²) in place of Math.hypot
 * (on Node 20 Math.hypot costs about 70 ns against 4 ns, measured on the project's machine;
 * distances in km are far from where a² overflows, and the two differ by an ulp or two); only
 * the distances the models ask for; and a bounding circle per rupture so ruptures beyond the
 * cut-off are dropped before any plane is looked at. Checked against ruptureDistances in
 * test/engine/hazard/site-distances.test.ts.
 */

/**
 * Slack on the bounding-circle test, km: a rupture is dropped early only when even its circle
 * lies farther than the cut-off by more than rounding could explain; the exact Rjb decides the rest.
 */
const BOUND_SLACK_KM = 1e-6;

/** PairDistances with room for `capacity` pairs; `count` is set by siteDistances. */
export interface PairBuffer extends PairDistances {
  count: number;
}

export function createPairBuffer(capacity: number): PairBuffer {
  const column = () => new Float64Array(capacity);
  return {
    count: 0,
    rupture: new Int32Array(capacity),
    rjbKm: column(),
    rrupKm: column(),
    rxKm: column(),
    ry0Km: column(),
    rhypoKm: column(),
    repiKm: column(),
  };
}

export interface SiteDistancesOptions {
  readonly geometry: RuptureGeometry;
  /** The ruptures to pair with the site (table indices, e.g. one setting's). */
  readonly ruptures: Int32Array;
  readonly site: PointXY;
  /** Pairs with Rjb above this (km) are left out, as selectRuptures leaves them out. */
  readonly maxDistanceKm: number;
  /**
   * Distances to fill. Rjb decides the cut-off whether asked for or not, but a planar rupture
   * whose bounding circle lies wholly within the cut-off is kept without it unless it is asked for.
   */
  readonly distances: ReadonlySet<DistanceName>;
}

/**
 * Squared distance (km²) from the site (px, py, 0) to plane p's box (RuptureGeometry.planeBox),
 * or with `depth` false from its surface projection to the box's: no point the plane's Rrup
 * (or Rjb) is measured to is nearer.
 */
function boxDistanceSq(
  box: Float64Array,
  p: number,
  px: number,
  py: number,
  depth: boolean,
): number {
  const at = 6 * p;
  const dx = Math.max((box[at] as number) - px, 0, px - (box[at + 3] as number));
  const dy = Math.max((box[at + 1] as number) - py, 0, py - (box[at + 4] as number));
  const dz = depth ? Math.max(box[at + 2] as number, 0) : 0;
  return dx * dx + dy * dy + dz * dz;
}

/** The plane of first .. last − 1 with the nearest box (boxDistanceSq): measured first, the others are then passed over the more often. */
function nearestBoxPlane(
  box: Float64Array,
  first: number,
  last: number,
  px: number,
  py: number,
  depth: boolean,
): number {
  let nearest = first;
  if (last - first > 1) {
    let nearestSq = Infinity;
    for (let p = first; p < last; p++) {
      const sq = boxDistanceSq(box, p, px, py, depth);
      if (sq < nearestSq) {
        nearestSq = sq;
        nearest = p;
      }
    }
  }
  return nearest;
}

/**
 * Squared distance (km²) from the site (px, py, 0) to a plane: to its surface projection for
 * Rjb, to the plane for Rrup. `at` is the plane's offset in g.planes, `q` its offset in g.quads
 * (RuptureGeometry.quadStart), −1 for a rectangle.
 */
type PlaneDistanceSq = (
  g: RuptureGeometry,
  at: number,
  q: number,
  px: number,
  py: number,
) => number;

/**
 * The smallest `planeSq` of planes first .. last − 1 (km²): the plane with the nearest box
 * first, then each other plane whose box (boxDistanceSq, with `depth` for Rrup) is not farther
 * than the nearest plane so far: a farther box could not hold the minimum, so the result is the
 * one every plane's distance would give. Nothing is nearer than 0, so the scan stops there.
 */
function nearestPlaneSq(
  g: RuptureGeometry,
  first: number,
  last: number,
  px: number,
  py: number,
  depth: boolean,
  planeSq: PlaneDistanceSq,
): number {
  const { planeBox, quadStart } = g;
  const nearest = nearestBoxPlane(planeBox, first, last, px, py, depth);
  let best = planeSq(g, nearest * PLANE_FIELDS, quadStart[nearest] as number, px, py);
  for (let p = first; p < last && best > 0; p++) {
    if (p === nearest || boxDistanceSq(planeBox, p, px, py, depth) > best) continue;
    best = Math.min(best, planeSq(g, p * PLANE_FIELDS, quadStart[p] as number, px, py));
  }
  return best;
}

/** Squared Rjb of a plane (km²): 0 inside its projection, else to the nearest edge. */
const rjbPlaneSq: PlaneDistanceSq = (g, at, q, px, py) => {
  const { planes, quads } = g;
  if (q < 0) {
    const dx = px - (planes[at] as number),
      dy = py - (planes[at + 1] as number);
    const s = dx * (planes[at + RECT_XY + 1] as number) + dy * (planes[at + RECT_XY + 2] as number);
    const t = dx * (planes[at + RECT_XY + 3] as number) + dy * (planes[at + RECT_XY + 4] as number);
    const length = planes[at + RECT_XY + 5] as number,
      width = planes[at + RECT_XY + 6] as number;
    const ds = s < 0 ? s : s > length ? s - length : 0;
    const dt = t < 0 ? t : t > width ? t - width : 0;
    return ds * ds + dt * dt;
  }
  let positive = 0;
  let negative = 0;
  for (let k = 0; k < 4; k++) {
    const ax = quads[q + CORNERS + 3 * k] as number,
      ay = quads[q + CORNERS + 3 * k + 1] as number;
    const side =
      (quads[q + EDGE + 3 * k] as number) * (py - ay) -
      (quads[q + EDGE + 3 * k + 1] as number) * (px - ax);
    if (side > 0) positive++;
    else if (side < 0) negative++;
  }
  if (positive === 4 || negative === 4) return 0;
  let best = Infinity;
  for (let k = 0; k < 4; k++) {
    const ax = quads[q + CORNERS + 3 * k] as number,
      ay = quads[q + CORNERS + 3 * k + 1] as number;
    const ex = quads[q + EDGE + 3 * k] as number,
      ey = quads[q + EDGE + 3 * k + 1] as number;
    const lengthSq = quads[q + EDGE_LENGTH_SQ_XY + k] as number;
    const t =
      lengthSq === 0 ? 0 : Math.min(1, Math.max(0, ((px - ax) * ex + (py - ay) * ey) / lengthSq));
    const dx = px - (ax + ex * t),
      dy = py - (ay + ey * t);
    best = Math.min(best, dx * dx + dy * dy);
  }
  return best;
};

/** Squared Rrup of a plane (km²), for a site at the surface. */
const rrupPlaneSq: PlaneDistanceSq = (g, at, q, px, py) => {
  const { planes, quads } = g;
  if (q < 0) {
    const wx = px - (planes[at] as number),
      wy = py - (planes[at + 1] as number),
      wz = -(planes[at + 2] as number);
    const s =
      wx * (planes[at + RECT + 1] as number) +
      wy * (planes[at + RECT + 2] as number) +
      wz * (planes[at + RECT + 3] as number);
    const t =
      wx * (planes[at + RECT + 4] as number) +
      wy * (planes[at + RECT + 5] as number) +
      wz * (planes[at + RECT + 6] as number);
    const d =
      wx * (planes[at + RECT + 7] as number) +
      wy * (planes[at + RECT + 8] as number) +
      wz * (planes[at + RECT + 9] as number);
    const length = planes[at + RECT + 10] as number,
      width = planes[at + RECT + 11] as number;
    const ds = s < 0 ? s : s > length ? s - length : 0;
    const dt = t < 0 ? t : t > width ? t - width : 0;
    return ds * ds + dt * dt + d * d;
  }
  const normalLength = quads[q + NORMAL + 3] as number;
  if (normalLength > 0) {
    let positive = 0;
    for (let k = 0; k < 4; k++) {
      const m = q + EDGE_NORMAL + 3 * k;
      const a = q + CORNERS + 3 * k;
      const dot =
        (px - (quads[a] as number)) * (quads[m] as number) +
        (py - (quads[a + 1] as number)) * (quads[m + 1] as number) -
        (quads[a + 2] as number) * (quads[m + 2] as number);
      if (dot > 0) positive++;
    }
    if (positive === 4) {
      const d =
        Math.abs(
          (px - (quads[q] as number)) * (quads[q + NORMAL] as number) +
            (py - (quads[q + 1] as number)) * (quads[q + NORMAL + 1] as number) -
            (quads[q + 2] as number) * (quads[q + NORMAL + 2] as number),
        ) / normalLength;
      return d * d;
    }
  }
  let best = Infinity;
  for (let k = 0; k < 4; k++) {
    const a = q + CORNERS + 3 * k;
    const ax = quads[a] as number,
      ay = quads[a + 1] as number,
      az = quads[a + 2] as number;
    const ex = quads[q + EDGE + 3 * k] as number,
      ey = quads[q + EDGE + 3 * k + 1] as number,
      ez = quads[q + EDGE + 3 * k + 2] as number;
    const lengthSq = quads[q + EDGE_LENGTH_SQ + k] as number;
    const t =
      lengthSq === 0
        ? 0
        : Math.min(1, Math.max(0, ((px - ax) * ex + (py - ay) * ey - az * ez) / lengthSq));
    const dx = px - (ax + ex * t),
      dy = py - (ay + ey * t),
      dz = az + ez * t;
    best = Math.min(best, dx * dx + dy * dy + dz * dz);
  }
  return best;
};

/** Rjb of a rupture's planes (km). */
const rjbKm = (g: RuptureGeometry, first: number, last: number, px: number, py: number): number =>
  Math.sqrt(nearestPlaneSq(g, first, last, px, py, false, rjbPlaneSq));

/** Rrup of a rupture's planes for a site at the surface (km). */
const rrupKm = (g: RuptureGeometry, first: number, last: number, px: number, py: number): number =>
  Math.sqrt(nearestPlaneSq(g, first, last, px, py, true, rrupPlaneSq));

/** GC2 T (Rx) and Ry0 of the top edges of planes first .. last − 1 (geometry/gc2.ts); written to out at k. */
function gc2(
  planes: Float64Array,
  first: number,
  last: number,
  px: number,
  py: number,
  sums: Gc2Sums,
  out: PairBuffer,
  k: number,
): void {
  resetGc2Sums(sums);
  for (let p = first; p < last; p++) {
    const at = p * PLANE_FIELDS;
    const l = planes[at + TOP] as number;
    if (l === 0) continue;
    addGc2Segment(
      sums,
      planes[at + ORIGIN] as number,
      planes[at + ORIGIN + 1] as number,
      planes[at + TOP + 1] as number,
      planes[at + TOP + 2] as number,
      l,
      px,
      py,
    );
  }
  out.rxKm[k] = gc2TKm(sums);
  out.ry0Km[k] = ry0FromU(gc2UKm(sums), sums.lengthKm);
}

/**
 * The pairs of `options.ruptures` with the site that lie within the cut-off, in rupture order,
 * written to `out` (out.rupture[k] indexes options.ruptures). Point ruptures: Rjb = Repi,
 * Rrup = Rhypo, Rx = −Repi, Ry0 = 0, as geometry/distances.ts sets them.
 */
export function siteDistances(options: SiteDistancesOptions, out: PairBuffer): void {
  const { geometry, ruptures, maxDistanceKm, distances } = options;
  const { table, planes, bounds } = geometry;
  const { planeStart, traceEnd, hypocentre, cellRule } = table;
  const {
    rupture,
    rjbKm: rjbOut,
    rrupKm: rrupOut,
    rxKm: rxOut,
    ry0Km: ry0Out,
    rhypoKm: rhypoOut,
    repiKm: repiOut,
  } = out;
  const px = options.site.x,
    py = options.site.y;
  const wantRrup = distances.has('rrupKm'),
    wantGc2 = distances.has('rxKm') || distances.has('ry0Km');
  const wantRhypo = distances.has('rhypoKm'),
    wantRepi = distances.has('repiKm'),
    wantRjb = distances.has('rjbKm');
  const maxSq = maxDistanceKm * maxDistanceKm;
  const sums = createGc2Sums();
  let count = 0;
  for (let local = 0; local < ruptures.length; local++) {
    const i = ruptures[local] as number;
    if (cellRule[i] !== 0 && !ruptureUsedAt(table, i, px, py)) continue;
    const first = planeStart[i] as number;
    const last = planeStart[i + 1] as number;
    const hx = hypocentre[3 * i] as number,
      hy = hypocentre[3 * i + 1] as number,
      hz = hypocentre[3 * i + 2] as number;
    const ex = px - hx,
      ey = py - hy;
    if (first === last) {
      const repiSq = ex * ex + ey * ey;
      if (!(repiSq <= maxSq)) continue;
      const repi = Math.sqrt(repiSq);
      // Only the columns asked for: a pair is written for every rupture within the cut-off.
      rupture[count] = local;
      rjbOut[count] = repi;
      if (wantRepi) repiOut[count] = repi;
      if (wantRhypo || wantRrup) {
        const rhypo = Math.sqrt(repiSq + hz * hz);
        rhypoOut[count] = rhypo;
        rrupOut[count] = rhypo;
      }
      if (wantGc2) {
        rxOut[count] = -repi;
        ry0Out[count] = 0;
      }
      count++;
      continue;
    }
    // Beyond the cut-off even from the nearest point of the bounding circle: (d − radius)² > max² with d > radius.
    const cx = px - (bounds[3 * i] as number),
      cy = py - (bounds[3 * i + 1] as number);
    const radius = bounds[3 * i + 2] as number;
    const reach = maxDistanceKm + BOUND_SLACK_KM + radius;
    const centreSq = cx * cx + cy * cy;
    if (centreSq > reach * reach) continue;
    // Within the cut-off even from the far side of the circle: Rjb is then needed only if a model reads it.
    const within = maxDistanceKm - BOUND_SLACK_KM - radius;
    if (wantRjb || !(within > 0 && centreSq < within * within)) {
      const rjb = rjbKm(geometry, first, last, px, py);
      if (!(rjb <= maxDistanceKm)) continue;
      rjbOut[count] = rjb;
    }
    rupture[count] = local;
    if (wantRrup) rrupOut[count] = rrupKm(geometry, first, last, px, py);
    if (wantGc2) gc2(planes, first, traceEnd[i] as number, px, py, sums, out, count);
    if (wantRhypo || wantRepi) {
      const repiSq = ex * ex + ey * ey;
      repiOut[count] = Math.sqrt(repiSq);
      rhypoOut[count] = Math.sqrt(repiSq + hz * hz);
    }
    count++;
  }
  out.count = count;
}

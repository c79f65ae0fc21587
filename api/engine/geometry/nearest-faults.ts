import { bearing } from '@turf/turf';
import type { FaultSource, LonLat, Source } from '../model.ts';
import type { NearestFault } from '../results.ts';
import { normaliseAzimuthDeg } from '../units.ts';
import { ruptureDistances } from './distances.ts';
import { faultSurface, wholeSurface } from './fault-surface.ts';
import { depthBelowPlaneKm } from './depth-below.ts';
import { closestPointOnProjection } from './plane-distance.ts';
import type { LocalFrame, PointXY } from './projection.ts';

/** Closest point of segment a-b to p in the plane. */
function closestOnLine(p: PointXY, a: PointXY, b: PointXY): PointXY {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const lengthSq = dx * dx + dy * dy;
  const t =
    lengthSq === 0 ? 0 : Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.y - a.y) * dy) / lengthSq));
  return { x: a.x + dx * t, y: a.y + dy * t };
}

function nearestOf(
  fault: FaultSource,
  frame: LocalFrame,
  site: LonLat,
  siteXY: PointXY,
): NearestFault {
  const surface = faultSurface(fault, frame);
  const whole = wholeSurface(surface);
  const rrupKm = ruptureDistances(whole, siteXY).rrupKm;
  let best = { point: siteXY, distanceKm: Infinity };
  let depthBelowKm: number | undefined;
  if (whole.kind === 'planes') {
    for (const plane of whole.planes) {
      const candidate = closestPointOnProjection(plane, siteXY);
      if (candidate.distanceKm < best.distanceKm) best = candidate;
      const depth = depthBelowPlaneKm(plane, siteXY);
      if (depth !== undefined && (depthBelowKm === undefined || depth < depthBelowKm))
        depthBelowKm = depth;
    }
  }
  const below = best.distanceKm === 0 && depthBelowKm !== undefined ? { depthBelowKm } : {};
  let target = best.point;
  if (best.distanceKm === 0) {
    // Above the fault: point to where it reaches its top edge instead.
    let traceKm = Infinity;
    for (const segment of surface.segments) {
      const q = closestOnLine(siteXY, segment.start, segment.end);
      const d = Math.hypot(q.x - siteXY.x, q.y - siteXY.y);
      if (d < traceKm) {
        traceKm = d;
        target = q;
      }
    }
    if (traceKm === 0) {
      return {
        sourceId: fault.id,
        name: fault.name,
        distanceKm: 0,
        bearingDeg: normaliseAzimuthDeg(fault.dipDirectionDeg),
        rrupKm,
        ...below,
      };
    }
  }
  const targetLonLat = frame.toLonLat(target);
  const bearingDeg = normaliseAzimuthDeg(
    bearing([site[0], site[1]], [targetLonLat[0], targetLonLat[1]]),
  );
  return {
    sourceId: fault.id,
    name: fault.name,
    distanceKm: best.distanceKm,
    bearingDeg,
    rrupKm,
    ...below,
  };
}

/**
 * The `count` fault sources nearest to `site` ([lon, lat], degrees), nearest first by the
 * shortest distance to each whole fault surface through the ground (Rrup, km, in `frame`; ties
 * by source order), so that a fault deep below comes after one near the surface beside the
 * place. Each gives the Joyner-Boore distance (km), the depth of the fault straight below a
 * site that stands above it, and
 * the bearing from the site to the closest point of its surface projection (degrees clockwise
 * from north in [0, 360), turf's spherical initial great-circle bearing). A site above a
 * dipping fault (distance 0) gets the bearing to the nearest point of the fault's top trace,
 * the line to look for; a site on that trace gets the dip direction.
 */
export function nearestFaults(
  sources: readonly Source[],
  frame: LocalFrame,
  site: LonLat,
  count: number,
): NearestFault[] {
  const siteXY = frame.toLocal(site);
  const found = sources
    .filter((s): s is FaultSource => s.kind === 'fault')
    .map((fault) => nearestOf(fault, frame, site, siteXY));
  return found
    .map((entry, order) => ({ entry, order }))
    .sort((a, b) => a.entry.rrupKm - b.entry.rrupKm || a.order - b.order)
    .map(({ entry }) => entry)
    .slice(0, Math.max(0, count));
}

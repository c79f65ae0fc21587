import * as turf from '@turf/turf';
import type { LonLat } from '../engine/model.ts';
import { describeValue } from './fields.ts';
import type { IssueList } from './issues.ts';
import { crossesItself } from './self-crossing.ts';

/** Most vertices one source geometry may have (a screening trace, not a survey). */
export const MAX_VERTICES = 5000;
/**
 * Most vertices all of a study's sources may have together (and, separately, its outline).
 * The self-intersection test costs time growing as the square of a geometry's vertices and
 * runs on the service's request thread: 5000 vertices take about 0.3 s, so a 5 MiB body of 48
 * such traces held every answer for 13 s. At this total it is at most about 1.5 s.
 */
export const MAX_STUDY_VERTICES = 20_000;

/** Positions in a raw GeoJSON geometry's coordinates (Point, LineString, Polygon, MultiPolygon); 0 for anything else. */
export function vertexCount(geometry: unknown): number {
  const count = (x: unknown): number =>
    !Array.isArray(x)
      ? 0
      : typeof x[0] === 'number'
        ? 1
        : x.reduce((n: number, y) => n + count(y), 0);
  const coordinates = (geometry as { coordinates?: unknown } | null)?.coordinates;
  return count(coordinates);
}
/** Consecutive vertices closer than this are a duplicated point, km (about 1 m). */
const DUPLICATE_VERTEX_KM = 0.001;
/** A trace shorter than this, or a zone smaller than this, is degenerate. */
const MIN_TRACE_KM = 0.5;
const MIN_ZONE_KM2 = 1;

/** [lon, lat] in degrees; mutable here because turf's helpers take plain arrays. */
type Position = [number, number];

export type SourceGeometry =
  | { readonly kind: 'fault'; readonly trace: Position[] }
  | { readonly kind: 'zone'; readonly rings: Position[][] }
  | { readonly kind: 'point'; readonly location: Position };

function readPosition(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): Position | undefined {
  if (
    !Array.isArray(raw) ||
    raw.length < 2 ||
    raw.length > 3 ||
    !raw.every((v) => typeof v === 'number' && Number.isFinite(v))
  ) {
    issues.add(path, `expected a position [lon, lat] in degrees, got ${describeValue(raw)}`);
    return undefined;
  }
  const [lon, lat] = raw as number[];
  let ok = true;
  if ((lon as number) < -180 || (lon as number) > 180) {
    issues.add([...path, 0], `expected a longitude in [-180, 180] degrees, got ${lon}`);
    ok = false;
  }
  if ((lat as number) < -90 || (lat as number) > 90) {
    issues.add([...path, 1], `expected a latitude in [-90, 90] degrees, got ${lat}`);
    ok = false;
  }
  return ok ? [lon as number, lat as number] : undefined;
}

function readPositions(
  raw: unknown,
  minCount: number,
  issues: IssueList,
  path: readonly PropertyKey[],
): Position[] | undefined {
  if (!Array.isArray(raw) || raw.length < minCount) {
    issues.add(path, `expected at least ${minCount} positions, got ${describeValue(raw)}`);
    return undefined;
  }
  if (raw.length > MAX_VERTICES) {
    issues.add(path, `expected at most ${MAX_VERTICES} vertices, got ${raw.length}`);
    return undefined;
  }
  const out: Position[] = [];
  raw.forEach((p, i) => {
    const pos = readPosition(p, issues, [...path, i]);
    if (pos) out.push(pos);
  });
  if (out.length !== raw.length) return undefined;
  for (let i = 1; i < out.length; i++) {
    const a = out[i - 1] as Position;
    const b = out[i] as Position;
    if (Math.abs(b[0] - a[0]) > 180) {
      issues.add(
        [...path, i],
        'the line crosses the 180° meridian; expected a geometry that stays on one side (split it into two sources)',
      );
      return undefined;
    }
    if (turf.distance(a, b, { units: 'kilometers' }) < DUPLICATE_VERTEX_KM) {
      issues.add(
        [...path, i],
        `repeats the previous vertex; expected consecutive vertices at least ${DUPLICATE_VERTEX_KM * 1000} m apart`,
      );
      return undefined;
    }
  }
  return out;
}

/**
 * Validates a source's GeoJSON geometry (LineString fault, Polygon zone, Point), reporting
 * out-of-range positions, degenerate and self-intersecting shapes. turf's length and area are
 * spherical; they only gate degeneracy here.
 */
export function readSourceGeometry(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): SourceGeometry | undefined {
  const type = (raw as { type?: unknown } | null)?.type;
  const coordinates = (raw as { coordinates?: unknown } | null)?.coordinates;
  if (
    typeof raw !== 'object' ||
    raw === null ||
    !['LineString', 'Polygon', 'Point'].includes(type as string)
  ) {
    issues.add(
      [...path, 'type'],
      `expected "LineString" (fault), "Polygon" (zone) or "Point", got ${describeValue(typeof raw === 'object' && raw ? type : raw)}`,
    );
    return undefined;
  }
  const coordPath = [...path, 'coordinates'];
  if (type === 'Point') {
    const location = readPosition(coordinates, issues, coordPath);
    return location ? { kind: 'point', location } : undefined;
  }
  if (type === 'LineString') {
    const trace = readPositions(coordinates, 2, issues, coordPath);
    if (!trace) return undefined;
    const line = turf.lineString(trace);
    if (turf.length(line, { units: 'kilometers' }) < MIN_TRACE_KM) {
      issues.add(
        coordPath,
        `the trace is degenerate; expected a length of at least ${MIN_TRACE_KM} km`,
      );
      return undefined;
    }
    if (crossesItself([trace])) {
      issues.add(coordPath, 'the trace crosses itself; expected a simple line');
      return undefined;
    }
    return { kind: 'fault', trace };
  }
  if (!Array.isArray(coordinates) || coordinates.length < 1) {
    issues.add(
      coordPath,
      `expected a list of rings (outer ring first), got ${describeValue(coordinates)}`,
    );
    return undefined;
  }
  const rings: Position[][] = [];
  for (const [r, rawRing] of coordinates.entries()) {
    const ringPath = [...coordPath, r];
    const ring = readPositions(rawRing, 4, issues, ringPath);
    if (!ring) return undefined;
    const first = ring[0] as Position;
    const last = ring[ring.length - 1] as Position;
    if (first[0] !== last[0] || first[1] !== last[1]) {
      issues.add(
        ringPath,
        'the ring is not closed; expected its last position to repeat its first',
      );
      return undefined;
    }
    rings.push(ring);
  }
  const polygon = turf.polygon(rings);
  if (crossesItself(rings)) {
    issues.add(coordPath, 'the polygon crosses itself; expected simple rings');
    return undefined;
  }
  if (turf.area(polygon) / 1e6 < MIN_ZONE_KM2) {
    issues.add(
      coordPath,
      `the polygon is degenerate; expected an area of at least ${MIN_ZONE_KM2} km²`,
    );
    return undefined;
  }
  return { kind: 'zone', rings };
}

/**
 * Dip direction by the right-hand rule: 90° clockwise of the trace's overall strike (azimuth
 * from its first to its last vertex), so the fault dips to the right when walking the trace.
 */
export function rightHandDipDirectionDeg(trace: readonly LonLat[]): number {
  const first = trace[0] as LonLat;
  const last = trace[trace.length - 1] as LonLat;
  const strike = turf.bearing([first[0], first[1]], [last[0], last[1]]);
  return (((strike + 90) % 360) + 360) % 360;
}

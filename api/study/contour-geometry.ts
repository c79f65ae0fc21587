import * as turf from '@turf/turf';
import { describeValue } from './fields.ts';
import type { IssueList } from './issues.ts';
import { MAX_VERTICES, readPositions } from './source-geometry.ts';

/**
 * A surface given by depth contours: a GeoJSON MultiLineString whose lines are the contours in
 * order down dip (engine/geometry/contour-mesh.ts meshes between them). Checked here: at least
 * two lines of at least two points each, all running the way the first does, no line crossing
 * itself or another; every refusal names the line and the point.
 */

/** [lon, lat] in degrees; mutable because turf's helpers take plain arrays. */
type Position = [number, number];

/** Most contours one source may have. */
const MAX_CONTOURS = 100;

/** Overall direction of a line (first to last point), in km east and north (equirectangular, enough for a sign). */
function chord(line: readonly Position[]): Position {
  const a = line[0] as Position;
  const b = line[line.length - 1] as Position;
  const cosLat = Math.cos((((a[1] + b[1]) / 2) * Math.PI) / 180);
  return [(b[0] - a[0]) * cosLat, b[1] - a[1]];
}

/** Index of the segment of `line` nearest `point` (its start point's index). */
function segmentNear(line: readonly Position[], point: Position): number {
  let best = 0;
  let bestKm = Infinity;
  for (let k = 1; k < line.length; k++) {
    const d = turf.pointToLineDistance(
      point,
      turf.lineString([line[k - 1], line[k]] as Position[]),
      {
        units: 'kilometers',
      },
    );
    if (d < bestKm) {
      bestKm = d;
      best = k - 1;
    }
  }
  return best;
}

const round = (v: number): number => Math.round(v * 1e5) / 1e5;

/** Validates the coordinates of a contoured source's MultiLineString; the lines, or undefined. */
export function readContourLines(
  coordinates: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): Position[][] | undefined {
  if (!Array.isArray(coordinates) || coordinates.length < 2 || coordinates.length > MAX_CONTOURS) {
    issues.add(
      path,
      `expected 2 to ${MAX_CONTOURS} depth contours (lines in order down dip), got ${describeValue(coordinates)}`,
    );
    return undefined;
  }
  const lines: Position[][] = [];
  for (const [i, raw] of coordinates.entries()) {
    if (!Array.isArray(raw) || raw.length < 2) {
      issues.add(
        [...path, i],
        `line ${i} has ${Array.isArray(raw) ? raw.length : 'no'} point${Array.isArray(raw) && raw.length === 1 ? '' : 's'}; expected at least 2 points per contour`,
      );
      return undefined;
    }
    const line = readPositions(raw, 2, issues, [...path, i]);
    if (!line) return undefined;
    lines.push(line);
  }
  if (lines.reduce((n, line) => n + line.length, 0) > MAX_VERTICES) {
    issues.add(path, `expected at most ${MAX_VERTICES} points over all contours`);
    return undefined;
  }
  const [fx, fy] = chord(lines[0] as Position[]);
  for (const [i, line] of lines.entries()) {
    const [x, y] = chord(line);
    if (i > 0 && x * fx + y * fy < 0) {
      issues.add(
        [...path, i],
        `line ${i} runs backwards (from point 0 at [${line[0]?.join(', ')}] the opposite way to line 0); expected every contour to run the same way as the first`,
      );
      return undefined;
    }
    const kinks = turf.kinks(turf.lineString(line)).features;
    if (kinks.length > 0) {
      const at = kinks[0]?.geometry.coordinates as Position;
      issues.add(
        [...path, i, segmentNear(line, at)],
        `line ${i} crosses itself near [${round(at[0])}, ${round(at[1])}] (point ${segmentNear(line, at)}); expected a simple line`,
      );
      return undefined;
    }
  }
  for (let i = 0; i < lines.length; i++) {
    for (let j = i + 1; j < lines.length; j++) {
      const a = lines[i] as Position[];
      const b = lines[j] as Position[];
      const hit = turf.lineIntersect(turf.lineString(a), turf.lineString(b)).features[0];
      if (!hit) continue;
      const at = hit.geometry.coordinates as Position;
      const k = segmentNear(b, at);
      issues.add(
        [...path, j, k],
        `line ${j} crosses line ${i} near [${round(at[0])}, ${round(at[1])}] (between points ${k} and ${k + 1} of line ${j}, ${segmentNear(a, at)} and ${segmentNear(a, at) + 1} of line ${i}); expected contours that never meet`,
      );
      return undefined;
    }
  }
  return lines;
}

/**
 * Validates `contourDepthsKm`: one depth per line (km, 0–700), increasing down dip; the
 * depths, or undefined.
 */
export function readContourDepths(
  raw: unknown,
  lineCount: number,
  issues: IssueList,
  path: readonly PropertyKey[],
): number[] | undefined {
  if (!Array.isArray(raw) || raw.length !== lineCount) {
    issues.add(
      path,
      `expected one depth in km per contour line (${lineCount}), got ${describeValue(raw)}`,
    );
    return undefined;
  }
  for (const [i, depth] of raw.entries()) {
    if (typeof depth !== 'number' || !Number.isFinite(depth) || depth < 0 || depth > 700) {
      issues.add(
        [...path, i],
        `expected line ${i}'s depth in [0, 700] km, got ${describeValue(depth)}`,
      );
      return undefined;
    }
    const above = raw[i - 1] as number | undefined;
    if (above !== undefined && !(depth > above)) {
      issues.add(
        [...path, i],
        `line ${i}'s depth ${depth} km is not below line ${i - 1}'s ${above} km; expected depths increasing down dip`,
      );
      return undefined;
    }
  }
  return raw as number[];
}

/**
 * The outline a contoured fault keeps for what needs only that (engine/model.ts FaultSource):
 * its mean dip, degrees, from the depth range over the horizontal distance from the first
 * line's middle to the last line (turf's spherical distance), and the azimuth it dips towards.
 */
export function contourOutline(
  lines: readonly Position[][],
  depthsKm: readonly number[],
): { dipDeg: number; dipDirectionDeg: number } {
  const top = turf.lineString(lines[0] as Position[]);
  const bottom = turf.lineString(lines[lines.length - 1] as Position[]);
  const middle = turf.along(top, turf.length(top) / 2);
  const nearest = turf.nearestPointOnLine(bottom, middle);
  const horizontalKm = turf.distance(middle, nearest, { units: 'kilometers' });
  const dropKm = (depthsKm[depthsKm.length - 1] as number) - (depthsKm[0] as number);
  const dipDeg = Math.min(90, (Math.atan2(dropKm, horizontalKm) * 180) / Math.PI);
  const bearing = turf.bearing(middle, nearest);
  return { dipDeg, dipDirectionDeg: ((bearing % 360) + 360) % 360 };
}

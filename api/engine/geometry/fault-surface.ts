import { InvalidInput } from '../errors.ts';
import type { FaultSource } from '../model.ts';
import type { PointKm, RupturePlane, RuptureSurface } from '../ruptures/rupture.ts';
import { toRadians } from '../units.ts';
import { contourMesh, type ContourMesh } from './contour-mesh.ts';
import { meanDipDeg, meshPatch, pointOnMesh, type MeshPatch } from './mesh-patch.ts';
import type { LocalFrame, PointXY } from './projection.ts';

/** One straight piece of the top trace, in the local frame. */
export interface TraceSegment {
  readonly start: PointXY;
  readonly end: PointXY;
  /** Unit horizontal vector along strike, start to end. */
  readonly strike: PointXY;
  /** Unit horizontal vector perpendicular to strike, to its right: the way the plane dips. */
  readonly downDip: PointXY;
  readonly lengthKm: number;
  /** Distance along the top trace from its first vertex to this segment's start, km. */
  readonly startKm: number;
}

/**
 * A fault's surface in the local frame: one planar rectangle per trace segment, all with the
 * same dip and depth range. The trace is walked so the fault dips to the right of it (the
 * right-hand rule of ruptures/rupture.ts), reversed from the input when the dip direction lies
 * to the left.
 *
 * Each segment dips perpendicular to its own strike, not along dipDirectionDeg: a plane then has
 * a true dip equal to dipDeg and a width equal to the fault's down-dip width, so the rupture
 * width and Rx that ground-motion models take keep their meaning on every segment. The price is
 * a wedge-shaped gap (convex side of a bend) or overlap (concave side) below each bend, which
 * grows with depth. dipDirectionDeg only says which side of the trace the fault dips to, judged
 * against the trace's overall strike (first to last vertex, as the right-hand-rule default of
 * the study schema is), so all segments dip to the same side even where the trace zig-zags.
 */
export interface FaultSurface {
  readonly sourceId: string;
  readonly segments: readonly TraceSegment[];
  readonly dipDeg: number;
  readonly upperDepthKm: number;
  readonly lowerDepthKm: number;
  /** Length of the top trace in the local frame, km. */
  readonly lengthKm: number;
  /** Down-dip width (lowerDepthKm - upperDepthKm) / sin(dip), km. */
  readonly widthKm: number;
  /** lengthKm x widthKm, km². */
  readonly areaKm2: number;
  /** Whether the trace was walked last vertex first to put the dip on its right. */
  readonly reversed: boolean;
  /** sin and cos of the dip, worked out once: every corner of every floating rupture needs them. */
  readonly sinDip: number;
  readonly cosDip: number;
  /**
   * A contoured fault's mesh (contour-mesh.ts): then the surface is the mesh, lengthKm and
   * widthKm are its along-strike and down-dip extents, areaKm2 the sum of its cells, dipDeg
   * their area-weighted mean, and segments its top row.
   */
  readonly mesh?: ContourMesh;
}

/**
 * Below this |cos| between the dip direction and the normal of the trace's overall strike the
 * dip direction runs along the trace and names no side (about 0.06° off parallel).
 */
const SIDE_COS_MIN = 1e-3;
/** Segments shorter than this (1 µm) are repeated vertices, skipped. */
const MIN_SEGMENT_KM = 1e-9;

const fieldError = (fault: FaultSource, field: string, message: string): InvalidInput =>
  new InvalidInput([{ path: field, message: `source "${fault.id}": ${message}` }]);

/** The straight pieces of a trace (local km), repeated vertices skipped. */
function traceSegments(points: readonly PointXY[]): TraceSegment[] {
  const segments: TraceSegment[] = [];
  let startKm = 0;
  for (let i = 1; i < points.length; i++) {
    const start = points[i - 1] as PointXY;
    const end = points[i] as PointXY;
    const lengthKm = Math.hypot(end.x - start.x, end.y - start.y);
    if (lengthKm < MIN_SEGMENT_KM) continue;
    const strike = { x: (end.x - start.x) / lengthKm, y: (end.y - start.y) / lengthKm };
    segments.push({
      start,
      end,
      strike,
      downDip: { x: strike.y, y: -strike.x },
      lengthKm,
      startKm,
    });
    startKm += lengthKm;
  }
  return segments;
}

const centroid = (points: readonly PointXY[]): PointXY => ({
  x: points.reduce((s, p) => s + p.x, 0) / points.length,
  y: points.reduce((s, p) => s + p.y, 0) / points.length,
});

/**
 * The mesh surface of a contoured fault. The contours are walked so the surface dips to the
 * right of them (the right-hand rule of ruptures/rupture.ts): all reversed when the last
 * contour lies to the left of the first one's overall strike (first to last point).
 */
function contouredSurface(
  fault: FaultSource,
  contours: NonNullable<FaultSource['contours']>,
  frame: LocalFrame,
): FaultSurface {
  let lines = contours.lines.map((line) => line.map((p) => frame.toLocal(p)));
  const top = lines[0] as PointXY[];
  const first = top[0] as PointXY;
  const last = top[top.length - 1] as PointXY;
  const towards = centroid(lines[lines.length - 1] as PointXY[]);
  const from = centroid(top);
  const side =
    (towards.x - from.x) * (last.y - first.y) - (towards.y - from.y) * (last.x - first.x);
  const reversed = side < 0;
  if (reversed) lines = lines.map((line) => [...line].reverse());
  const mesh = contourMesh(
    lines.map((points, i) => ({ points, depthKm: contours.depthsKm[i] as number })),
    contours.meshSpacingKm,
  );
  const topRow = mesh.nodes.slice(0, mesh.columnCount);
  const dipDeg = meanDipDeg(meshPatch(mesh, [0, Infinity], [0, Infinity]).planes);
  const dipRad = toRadians(dipDeg);
  const lengthKm = mesh.alongKm[mesh.columnCount - 1] as number;
  const widthKm = mesh.downDipKm[mesh.rowCount - 1] as number;
  return {
    sourceId: fault.id,
    segments: traceSegments(topRow),
    dipDeg,
    upperDepthKm: contours.depthsKm[0] as number,
    lowerDepthKm: contours.depthsKm[contours.depthsKm.length - 1] as number,
    lengthKm,
    widthKm,
    areaKm2: mesh.areaKm2,
    reversed,
    sinDip: Math.sin(dipRad),
    cosDip: Math.cos(dipRad),
    mesh,
  };
}

/** The surface of a fault source in `frame` (km; depths km, dip degrees). */
export function faultSurface(fault: FaultSource, frame: LocalFrame): FaultSurface {
  if (fault.contours) return contouredSurface(fault, fault.contours, frame);
  const { dipDeg, upperDepthKm, lowerDepthKm } = fault;
  if (!(dipDeg > 0 && dipDeg <= 90))
    throw fieldError(fault, 'dip', `expected a dip in (0, 90] degrees, got ${dipDeg}`);
  if (!(upperDepthKm >= 0 && lowerDepthKm > upperDepthKm)) {
    throw fieldError(
      fault,
      'lowerDepthKm',
      `expected 0 <= upperDepthKm < lowerDepthKm, got ${upperDepthKm} and ${lowerDepthKm} km`,
    );
  }
  let points = fault.trace.map((p) => frame.toLocal(p));
  const first = points[0];
  const last = points[points.length - 1];
  if (points.length < 2 || first === undefined || last === undefined) {
    throw fieldError(
      fault,
      'coordinates',
      `expected a trace of at least 2 vertices, got ${points.length}`,
    );
  }
  const chordX = last.x - first.x;
  const chordY = last.y - first.y;
  const chordKm = Math.hypot(chordX, chordY);
  if (chordKm < MIN_SEGMENT_KM)
    throw fieldError(
      fault,
      'coordinates',
      'expected a trace whose ends are apart, got ends at the same place',
    );
  const dipRad = toRadians(dipDeg);
  const dipAzRad = toRadians(fault.dipDirectionDeg);
  // Right of the chord is (chordY, -chordX) in x-east, y-north coordinates.
  const side = (Math.sin(dipAzRad) * chordY - Math.cos(dipAzRad) * chordX) / chordKm;
  if (Math.abs(side) < SIDE_COS_MIN && dipDeg < 90) {
    throw fieldError(
      fault,
      'dipDirection',
      `expected a dip direction to one side of the trace, got ${fault.dipDirectionDeg}° along it`,
    );
  }
  const reversed = side < 0;
  if (reversed) points = [...points].reverse();

  const segments = traceSegments(points);
  const startKm = segments.reduce((sum, segment) => sum + segment.lengthKm, 0);
  const widthKm = (lowerDepthKm - upperDepthKm) / Math.sin(dipRad);
  const sinDip = Math.sin(dipRad);
  return {
    sourceId: fault.id,
    segments,
    dipDeg,
    upperDepthKm,
    lowerDepthKm,
    lengthKm: startKm,
    widthKm,
    areaKm2: startKm * widthKm,
    reversed,
    sinDip,
    cosDip: Math.cos(dipRad),
  };
}

function segmentAt(surface: FaultSurface, alongKm: number): TraceSegment {
  const segments = surface.segments;
  for (const segment of segments) if (alongKm <= segment.startKm + segment.lengthKm) return segment;
  return segments[segments.length - 1] as TraceSegment;
}

function pointOnSegment(
  surface: FaultSurface,
  segment: TraceSegment,
  alongKm: number,
  downDipKm: number,
): PointKm {
  const u = alongKm - segment.startKm;
  const h = downDipKm * surface.cosDip;
  return {
    x: segment.start.x + segment.strike.x * u + segment.downDip.x * h,
    y: segment.start.y + segment.strike.y * u + segment.downDip.y * h,
    z: surface.upperDepthKm + downDipKm * surface.sinDip,
  };
}

/** The point `alongKm` along the top trace and `downDipKm` down dip from it (km). */
export function pointOnSurface(surface: FaultSurface, alongKm: number, downDipKm: number): PointKm {
  if (surface.mesh) return pointOnMesh(surface.mesh, alongKm, downDipKm);
  return pointOnSegment(surface, segmentAt(surface, alongKm), alongKm, downDipKm);
}

/**
 * The part of the surface between `alongKm` and `downDipKm` intervals (km, measured along the
 * top trace and down dip from it): one plane per trace segment it covers, in trace order.
 */
export function surfacePatch(
  surface: FaultSurface,
  alongKm: readonly [from: number, to: number],
  downDipKm: readonly [from: number, to: number],
): RupturePlane[] {
  const [a0, a1] = alongKm;
  const [b0, b1] = downDipKm;
  const planes: RupturePlane[] = [];
  for (const segment of surface.segments) {
    const u0 = Math.max(a0, segment.startKm);
    const u1 = Math.min(a1, segment.startKm + segment.lengthKm);
    if (u1 - u0 < MIN_SEGMENT_KM) continue;
    planes.push({
      corners: [
        pointOnSegment(surface, segment, u0, b0),
        pointOnSegment(surface, segment, u1, b0),
        pointOnSegment(surface, segment, u1, b1),
        pointOnSegment(surface, segment, u0, b1),
      ],
    });
  }
  return planes;
}

/**
 * The part of any fault surface between `alongKm` and `downDipKm` (km): surfacePatch's planes
 * on a planar fault (each spanning the part's width, so all make its top trace), the cut cells
 * of a contoured fault's mesh (mesh-patch.ts).
 */
export function surfacePiece(
  surface: FaultSurface,
  alongKm: readonly [from: number, to: number],
  downDipKm: readonly [from: number, to: number],
): MeshPatch {
  if (surface.mesh) return meshPatch(surface.mesh, alongKm, downDipKm);
  const planes = surfacePatch(surface, alongKm, downDipKm);
  return { planes, tracePlanes: planes.length };
}

/** The whole fault surface as a rupture surface, hypocentre at its centre. */
export function wholeSurface(surface: FaultSurface): RuptureSurface {
  const { planes, tracePlanes } = surfacePiece(
    surface,
    [0, surface.lengthKm],
    [0, surface.widthKm],
  );
  const hypocentre = pointOnSurface(surface, surface.lengthKm / 2, surface.widthKm / 2);
  return tracePlanes === planes.length
    ? { kind: 'planes', planes, hypocentre }
    : { kind: 'planes', planes, hypocentre, tracePlanes };
}

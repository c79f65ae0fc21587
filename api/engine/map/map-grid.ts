import { InvalidInput, StudyTooLarge } from '../errors.ts';
import type { LocalFrame, PointXY } from '../geometry/projection.ts';
import type { LonLat, Study } from '../model.ts';
import { studyPoints } from '../geometry/study-points.ts';

/** Most points one hazard map may have (a 1 km grid over a region about 450 km square). */
export const MAX_MAP_POINTS = 250_000;

/**
 * Points taken along each edge of the box to find its extent in the local frame: a parallel
 * bows there, and between samples 1/32 of the edge apart its bow is under a metre for boxes of
 * a few hundred km (checked in test/engine/map/map-grid.test.ts).
 */
const EDGE_SAMPLES = 32;

/** A box in WGS84 degrees: west, south, east, north (GeoJSON's bbox order). */
export type LonLatBounds = readonly [west: number, south: number, east: number, north: number];

/**
 * A square grid in the study's local frame (km): `columns` × `rows` points `spacingKm` apart,
 * row by row from the south-west corner (x0, y0). Point i is at column i mod columns, row
 * ⌊i / columns⌋; its position is computed when asked for, so a grid of any size costs nothing
 * to hold.
 */
export interface MapGrid {
  readonly spacingKm: number;
  readonly x0: number;
  readonly y0: number;
  readonly columns: number;
  readonly rows: number;
  readonly count: number;
}

export interface MapGridOptions {
  /** Distance between neighbouring points, km (> 0). */
  readonly spacingKm: number;
  /** The box to cover; by default the study area (studyBounds). */
  readonly bounds?: LonLatBounds;
  readonly maxPoints?: number;
}

/**
 * The study area: the box, in WGS84 degrees, around the communities, every coordinate of the
 * sources (fault traces, zone rings, points) and the outline; the extent the study's local
 * frame is centred on (geometry/projection.ts, frameForStudy), with the outline added.
 * Longitudes are unwrapped around the first point, as frameForStudy does.
 */
export function studyBounds(
  study: Pick<Study, 'communities' | 'sources' | 'outline'>,
): LonLatBounds {
  const points = studyPoints(study);
  const first = points[0];
  if (!first)
    throw new InvalidInput([
      { path: 'communities', message: 'expected at least one community or source to map around' },
    ]);
  const wrap = (lon: number): number =>
    first[0] + ((((lon - first[0] + 180) % 360) + 360) % 360) - 180;
  let west = Infinity,
    east = -Infinity,
    south = Infinity,
    north = -Infinity;
  for (const [lon, lat] of points) {
    const x = wrap(lon);
    west = Math.min(west, x);
    east = Math.max(east, x);
    south = Math.min(south, lat);
    north = Math.max(north, lat);
  }
  return [west, south, east, north];
}

/**
 * The grid that covers `bounds` (the study area by default) in the local frame: the extent of
 * the bounds' edges projected, with the first point at its south-west corner and enough columns
 * and rows that the last ones reach or pass its far edges.
 */
export function mapGrid(
  study: Pick<Study, 'communities' | 'sources' | 'outline'>,
  frame: LocalFrame,
  options: MapGridOptions,
): MapGrid {
  const { spacingKm } = options;
  if (!(spacingKm > 0 && Number.isFinite(spacingKm))) {
    throw new InvalidInput([
      { path: 'spacingKm', message: `expected a grid spacing above 0 km, got ${spacingKm}` },
    ]);
  }
  const [west, south, east, north] = options.bounds ?? studyBounds(study);
  if (!(west <= east && south <= north && south >= -90 && north <= 90)) {
    throw new InvalidInput([
      {
        path: 'bounds',
        message: `expected [west, south, east, north] in degrees with west <= east and south <= north, got [${west}, ${south}, ${east}, ${north}]`,
      },
    ]);
  }
  // The box's edges are curves in the local frame (parallels bow): EDGE_SAMPLES points along each.
  const edge: LonLat[] = [];
  for (let k = 0; k <= EDGE_SAMPLES; k++) {
    const f = k / EDGE_SAMPLES;
    const lon = west + (east - west) * f;
    const lat = south + (north - south) * f;
    edge.push([lon, south], [lon, north], [west, lat], [east, lat]);
  }
  const local = edge.map((p) => frame.toLocal(p));
  const x0 = Math.min(...local.map((p) => p.x));
  const y0 = Math.min(...local.map((p) => p.y));
  const columns = Math.ceil((Math.max(...local.map((p) => p.x)) - x0) / spacingKm) + 1;
  const rows = Math.ceil((Math.max(...local.map((p) => p.y)) - y0) / spacingKm) + 1;
  const count = columns * rows;
  const maxPoints = options.maxPoints ?? MAX_MAP_POINTS;
  if (count > maxPoints)
    throw new StudyTooLarge(count, maxPoints, `map grid points at ${spacingKm} km spacing`);
  return { spacingKm, x0, y0, columns, rows, count };
}

/** Point `index` of the grid in the local frame, km. */
export function gridPoint(grid: MapGrid, index: number): PointXY {
  const column = index % grid.columns;
  const row = (index - column) / grid.columns;
  return { x: grid.x0 + column * grid.spacingKm, y: grid.y0 + row * grid.spacingKm };
}

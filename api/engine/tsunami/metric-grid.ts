import type { LocalFrame, PointXY } from '../geometry/projection.ts';
import {
  elevationAt,
  gridCoordinates,
  gridOutline,
  type ElevationGrid,
} from '../terrain/elevation-grid.ts';

/**
 * An elevation grid resampled onto square cells of the study's local frame (x east, y north,
 * km), so that the eikonal solver works in true distances whatever the terrain file's CRS.
 * Cell (c, r) has its centre at (westKm + (c + ½) spacingKm, northKm − (r + ½) spacingKm);
 * `elevationM` is the bilinear sample of the terrain there, NaN off the terrain or on no data.
 */
export interface MetricGrid {
  readonly columns: number;
  readonly rows: number;
  readonly westKm: number;
  readonly northKm: number;
  readonly spacingKm: number;
  readonly elevationM: Float32Array;
}

/** Cells between exact projections when resampling (interpolated between them). */
const LATTICE_STRIDE = 8;

/** Cells one solve may have: about a second of fast marching on one core. */
export const MAX_METRIC_CELLS = 1_000_000;

/** The bounding box of the terrain's cell centres in the local frame, km. */
export function terrainExtentKm(
  grid: ElevationGrid,
  frame: LocalFrame,
): { west: number; east: number; south: number; north: number } {
  let west = Infinity,
    east = -Infinity,
    south = Infinity,
    north = -Infinity;
  for (const lonLat of gridOutline(grid)) {
    const { x, y } = frame.toLocal(lonLat);
    west = Math.min(west, x);
    east = Math.max(east, x);
    south = Math.min(south, y);
    north = Math.max(north, y);
  }
  return { west, east, south, north };
}

/** The side of one terrain cell in km near the grid's middle: the shorter of its two sides. */
export function nativeCellKm(grid: ElevationGrid, frame: LocalFrame): number {
  const extent = terrainExtentKm(grid, frame);
  return Math.min(
    (extent.east - extent.west) / (grid.columns - 1),
    (extent.north - extent.south) / (grid.rows - 1),
  );
}

/**
 * The terrain resampled at `spacingKm` over its whole extent in `frame` (widened to keep within
 * MAX_METRIC_CELLS).
 */
export function metricGrid(grid: ElevationGrid, frame: LocalFrame, spacingKm: number): MetricGrid {
  const extent = terrainExtentKm(grid, frame);
  const widthKm = extent.east - extent.west,
    heightKm = extent.north - extent.south;
  const spacing = Math.max(spacingKm, Math.sqrt((widthKm * heightKm) / MAX_METRIC_CELLS));
  const columns = Math.max(2, Math.floor(widthKm / spacing));
  const rows = Math.max(2, Math.floor(heightKm / spacing));
  const toGrid = gridCoordinates(grid);
  // The exact projection at every LATTICE_STRIDE-th cell, interpolated between: both maps are
  // smooth, and over a few tens of km their curvature moves a point by well under a metre.
  const latticeColumns = Math.ceil(columns / LATTICE_STRIDE) + 1;
  const latticeRows = Math.ceil(rows / LATTICE_STRIDE) + 1;
  const lattice = new Float64Array(2 * latticeColumns * latticeRows);
  for (let lr = 0; lr < latticeRows; lr += 1) {
    for (let lc = 0; lc < latticeColumns; lc += 1) {
      const [x, y] = toGrid(
        frame.toLonLat({
          x: extent.west + (lc * LATTICE_STRIDE + 0.5) * spacing,
          y: extent.north - (lr * LATTICE_STRIDE + 0.5) * spacing,
        }),
      );
      lattice[2 * (lr * latticeColumns + lc)] = x;
      lattice[2 * (lr * latticeColumns + lc) + 1] = y;
    }
  }
  const elevationM = new Float32Array(columns * rows);
  for (let r = 0; r < rows; r += 1) {
    const lr = Math.floor(r / LATTICE_STRIDE),
      fr = (r % LATTICE_STRIDE) / LATTICE_STRIDE;
    for (let c = 0; c < columns; c += 1) {
      const lc = Math.floor(c / LATTICE_STRIDE),
        fc = (c % LATTICE_STRIDE) / LATTICE_STRIDE;
      const k00 = 2 * (lr * latticeColumns + lc),
        k01 = k00 + 2,
        k10 = k00 + 2 * latticeColumns,
        k11 = k10 + 2;
      const at = (o: number) =>
        (1 - fr) * ((1 - fc) * (lattice[k00 + o] as number) + fc * (lattice[k01 + o] as number)) +
        fr * ((1 - fc) * (lattice[k10 + o] as number) + fc * (lattice[k11 + o] as number));
      elevationM[r * columns + c] = elevationAt(grid, at(0), at(1)) ?? NaN;
    }
  }
  return {
    columns,
    rows,
    westKm: extent.west,
    northKm: extent.north,
    spacingKm: spacing,
    elevationM,
  };
}

export const cellCentre = (m: MetricGrid, index: number): PointXY => {
  const c = index % m.columns;
  const r = (index - c) / m.columns;
  return { x: m.westKm + (c + 0.5) * m.spacingKm, y: m.northKm - (r + 0.5) * m.spacingKm };
};

/** The index of the cell holding `point`, or −1 off the grid. */
export function cellIndexAt(m: MetricGrid, point: PointXY): number {
  const c = Math.floor((point.x - m.westKm) / m.spacingKm);
  const r = Math.floor((m.northKm - point.y) / m.spacingKm);
  return c < 0 || r < 0 || c >= m.columns || r >= m.rows ? -1 : r * m.columns + c;
}

/** Indices of the cells whose centres lie within `radiusKm` of `point`. */
export function cellsWithin(m: MetricGrid, point: PointXY, radiusKm: number): number[] {
  const cells: number[] = [];
  const c0 = Math.max(0, Math.floor((point.x - radiusKm - m.westKm) / m.spacingKm));
  const c1 = Math.min(m.columns - 1, Math.floor((point.x + radiusKm - m.westKm) / m.spacingKm));
  const r0 = Math.max(0, Math.floor((m.northKm - point.y - radiusKm) / m.spacingKm));
  const r1 = Math.min(m.rows - 1, Math.floor((m.northKm - point.y + radiusKm) / m.spacingKm));
  for (let r = r0; r <= r1; r += 1) {
    for (let c = c0; c <= c1; c += 1) {
      const i = r * m.columns + c;
      const centre = cellCentre(m, i);
      if (Math.hypot(centre.x - point.x, centre.y - point.y) <= radiusKm) cells.push(i);
    }
  }
  return cells;
}

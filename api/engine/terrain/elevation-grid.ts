import proj4 from 'proj4';
import { InvalidInput } from '../errors.ts';
import type { LonLat } from '../model.ts';
import { wrapDeg180 } from '../units.ts';

/**
 * The coordinate reference system of a grid's cell coordinates:
 * - `lonlat`: WGS84 longitude and latitude in degrees (x = lon, y = lat);
 * - `projected`: x east, y north in the units of a proj4 definition (`proj4`, e.g. a UTM zone in
 *   metres), named by `name` (an EPSG code or the file's own label) for messages.
 */
export type GridCrs =
  | { readonly kind: 'lonlat' }
  | { readonly kind: 'projected'; readonly name: string; readonly proj4: string };

/**
 * A georeferenced raster of elevation, metres above sea level (negative below: bathymetry).
 * North-up, axis-aligned cells of `cellWidth` × `cellHeight` in the CRS's units; `values` holds
 * `rows` rows of `columns` values, the northernmost row first, NaN where the file has no data.
 * The value of a cell belongs to its centre, as in both formats Tremora reads (api/terrain/).
 */
export interface ElevationGrid {
  /** The file it was read from, for messages. */
  readonly label: string;
  readonly crs: GridCrs;
  readonly columns: number;
  readonly rows: number;
  /** x of the grid's west edge and y of its north edge, CRS units. */
  readonly west: number;
  readonly north: number;
  readonly cellWidth: number;
  readonly cellHeight: number;
  readonly elevationM: Float32Array;
}

export type ElevationGridInit = Omit<ElevationGrid, 'elevationM'> & {
  readonly elevationM: ArrayLike<number>;
};

/**
 * Checks a grid's shape and georeferencing and builds it; every problem named with the file.
 * A grid needs a size, a finite origin and positive cell sizes, and a lon/lat grid must lie on
 * the globe: anything else is a grid without usable georeferencing.
 */
export function createElevationGrid(init: ElevationGridInit): ElevationGrid {
  const { label, columns, rows, west, north, cellWidth, cellHeight, crs } = init;
  const problems: string[] = [];
  if (!(Number.isInteger(columns) && columns >= 2 && Number.isInteger(rows) && rows >= 2))
    problems.push(`expected at least 2 × 2 cells, got ${columns} × ${rows}`);
  if (!(Number.isFinite(west) && Number.isFinite(north)))
    problems.push(`expected a finite origin, got west ${west}, north ${north}`);
  if (!(
    cellWidth > 0 &&
    cellHeight > 0 &&
    Number.isFinite(cellWidth) &&
    Number.isFinite(cellHeight)
  )) {
    problems.push(`expected positive cell sizes, got ${cellWidth} × ${cellHeight}`);
  }
  if (init.elevationM.length !== columns * rows)
    problems.push(
      `expected ${columns * rows} values (${columns} columns × ${rows} rows), got ${init.elevationM.length}`,
    );
  if (problems.length === 0 && crs.kind === 'lonlat') {
    const east = west + columns * cellWidth;
    const south = north - rows * cellHeight;
    if (
      west < -540 ||
      east > 540 ||
      south < -90 - 1e-9 ||
      north > 90 + 1e-9 ||
      columns * cellWidth > 360 + 1e-9
    ) {
      problems.push(
        `a longitude/latitude grid must lie within ±90° latitude and span at most 360°, got lon ${west} to ${east}, lat ${south} to ${north}`,
      );
    }
  }
  if (problems.length > 0)
    throw new InvalidInput(
      problems.map((message) => ({ path: label, message })),
      'unusable terrain grid',
    );
  return {
    label,
    crs,
    columns,
    rows,
    west,
    north,
    cellWidth,
    cellHeight,
    elevationM: Float32Array.from(init.elevationM),
  };
}

/** WGS84 [lon, lat] to the grid's own x, y. */
export type ToGridCoordinates = (lonLat: LonLat) => readonly [x: number, y: number];

/** The conversion from WGS84 to the grid's CRS (proj4 for a projected grid). */
export function gridCoordinates(grid: ElevationGrid): ToGridCoordinates {
  const { crs } = grid;
  if (crs.kind === 'lonlat') {
    // Longitudes are brought to the grid's own 360° window, so a grid given in 0–360° works.
    const middle = grid.west + (grid.columns * grid.cellWidth) / 2;
    return ([lon, lat]) => [lon + 360 * Math.round((middle - lon) / 360), lat];
  }
  const converter = proj4('EPSG:4326', crs.proj4);
  return (lonLat) => converter.forward([lonLat[0], lonLat[1]]) as [number, number];
}

/**
 * Elevation at grid coordinates (x, y) by bilinear interpolation between the four nearest cell
 * centres, metres; null outside the centres' extent or where one of the four has no data (a
 * value half from missing data would be invented).
 */
export function elevationAt(grid: ElevationGrid, x: number, y: number): number | null {
  const u = (x - grid.west) / grid.cellWidth - 0.5;
  const v = (grid.north - y) / grid.cellHeight - 0.5;
  if (!(u >= 0 && v >= 0 && u <= grid.columns - 1 && v <= grid.rows - 1)) return null;
  const c0 = Math.min(Math.floor(u), grid.columns - 2);
  const r0 = Math.min(Math.floor(v), grid.rows - 2);
  const fu = u - c0;
  const fv = v - r0;
  const i = r0 * grid.columns + c0;
  const z = grid.elevationM;
  const z00 = z[i] as number,
    z01 = z[i + 1] as number,
    z10 = z[i + grid.columns] as number,
    z11 = z[i + grid.columns + 1] as number;
  const value = (1 - fv) * ((1 - fu) * z00 + fu * z01) + fv * ((1 - fu) * z10 + fu * z11);
  return Number.isNaN(value) ? null : value;
}

/** A sampler from WGS84 [lon, lat] to elevation (bilinear, null off the grid or on missing data). */
export function elevationSampler(grid: ElevationGrid): (lonLat: LonLat) => number | null {
  const toGrid = gridCoordinates(grid);
  return (lonLat) => {
    const [x, y] = toGrid(lonLat);
    return elevationAt(grid, x, y);
  };
}

/** The grid's own x, y back to WGS84 [lon, lat]. */
export function gridToLonLat(grid: ElevationGrid): (x: number, y: number) => LonLat {
  const { crs } = grid;
  if (crs.kind === 'lonlat') return (x, y) => [wrapDeg180(x), y];
  const converter = proj4('EPSG:4326', crs.proj4);
  return (x, y) => converter.inverse([x, y]) as unknown as LonLat;
}

/** Points along the edge of the grid's cell-centre extent, WGS84, `perSide` to a side. */
export function gridOutline(grid: ElevationGrid, perSide = 24): LonLat[] {
  const toLonLat = gridToLonLat(grid);
  const x0 = grid.west + grid.cellWidth / 2,
    x1 = grid.west + (grid.columns - 0.5) * grid.cellWidth;
  const y0 = grid.north - grid.cellHeight / 2,
    y1 = grid.north - (grid.rows - 0.5) * grid.cellHeight;
  const points: LonLat[] = [];
  for (let k = 0; k < perSide; k += 1) {
    const f = k / perSide;
    points.push(
      toLonLat(x0 + f * (x1 - x0), y0),
      toLonLat(x1, y0 + f * (y1 - y0)),
      toLonLat(x1 - f * (x1 - x0), y1),
      toLonLat(x0, y1 - f * (y1 - y0)),
    );
  }
  return points;
}

import { firstAtLeast } from '../sorted-search.ts';
import { DEG_TO_RAD } from '../units.ts';

/**
 * Epicentres filed in space so a search for those within some kilometres of a point visits its
 * neighbourhood rather than the whole catalog.
 *
 * Each epicentre is placed at its point on the WGS84 ellipsoid in Earth-centred Cartesian
 * coordinates (km; e.g. Hofmann-Wellenhof, Lichtenegger & Wasle 2008, "GNSS", eq. 2.6 —
 * from memory) and filed in a cube cell of side `cellKm`. The straight chord between two points
 * is never longer than any path between them on the surface, the geodesic included, so every
 * epicentre within D km (geodesic) lies in a cell within D km (chord) of the point: a search
 * visits only those cells, skips members whose chord is longer than D, and leaves the exact
 * geodesic test to the caller. Cells work the same at the poles and across the antimeridian.
 *
 * A cell keeps its members in ascending index, so a caller that numbers events in time order
 * can ask for an index range, which is a time range.
 */

/** WGS84 semi-major axis (km) and first eccentricity squared (NIMA TR8350.2, 2000, table 3.1). */
const WGS84_A_KM = 6378.137;
const WGS84_E2 = 0.00669437999014;

/**
 * Smallest cell side. Cells are counted on a fixed lattice of 2048 per axis, which covers the
 * Earth (diameter 12,757 km) at any side of 10 km or more; smaller cells would also make a
 * wide search count very many empty cells.
 */
export const MIN_CELL_KM = 10;
const LATTICE = 2048;
const LATTICE_HALF = LATTICE / 2;

/**
 * Chords are compared with D scaled by this much more than rounding could move them (the
 * coordinates carry about 1e-12 km of rounding): a chord test may keep a far member for the
 * geodesic to reject, never drop a near one.
 */
const CHORD_SLACK = 1e-9;

export interface EpicentreGrid {
  readonly cellKm: number;
  /** Earth-centred coordinates of each epicentre, km, by index. */
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly z: Float64Array;
  /** Members of each occupied cell, ascending index. */
  readonly cells: ReadonlyMap<number, Int32Array>;
}

/** Files epicentres (WGS84 degrees; index = position in the arrays) in cells of `cellKm`. */
export function epicentreGrid(
  lons: ArrayLike<number>,
  lats: ArrayLike<number>,
  cellKm: number,
): EpicentreGrid {
  if (!(cellKm >= MIN_CELL_KM))
    throw new RangeError(`expected a cell side of at least ${MIN_CELL_KM} km; got ${cellKm}`);
  const n = lons.length;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const z = new Float64Array(n);
  const keys = new Float64Array(n);
  const counts = new Map<number, number>();
  for (let i = 0; i < n; i++) {
    const lat = (lats[i] as number) * DEG_TO_RAD;
    const lon = (lons[i] as number) * DEG_TO_RAD;
    const sinLat = Math.sin(lat);
    const cosLat = Math.cos(lat);
    const primeVerticalKm = WGS84_A_KM / Math.sqrt(1 - WGS84_E2 * sinLat * sinLat);
    x[i] = primeVerticalKm * cosLat * Math.cos(lon);
    y[i] = primeVerticalKm * cosLat * Math.sin(lon);
    z[i] = primeVerticalKm * (1 - WGS84_E2) * sinLat;
    const key = cellKey(
      cellOf(x[i] as number, cellKm),
      cellOf(y[i] as number, cellKm),
      cellOf(z[i] as number, cellKm),
    );
    keys[i] = key;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  const cells = new Map<number, Int32Array>();
  const filled = new Map<number, number>();
  for (const [key, count] of counts) {
    cells.set(key, new Int32Array(count));
    filled.set(key, 0);
  }
  for (let i = 0; i < n; i++) {
    const key = keys[i] as number;
    const at = filled.get(key) as number;
    (cells.get(key) as Int32Array)[at] = i;
    filled.set(key, at + 1);
  }
  return { cellKm, x, y, z, cells };
}

/**
 * Calls `visit(j)` for every member j in [fromIndex, toIndex) whose chord from member `i` is at
 * most `distanceKm` (plus rounding slack); the caller applies the exact distance. Order of
 * visits: by cell, ascending index within a cell.
 */
export function visitNear(
  grid: EpicentreGrid,
  i: number,
  distanceKm: number,
  fromIndex: number,
  toIndex: number,
  visit: (j: number) => void,
): void {
  const { cellKm, x, y, z, cells } = grid;
  const px = x[i] as number;
  const py = y[i] as number;
  const pz = z[i] as number;
  const reachKm = distanceKm * (1 + CHORD_SLACK) + CHORD_SLACK;
  const reach2 = reachKm * reachKm;
  const x0 = cellOf(px - reachKm, cellKm);
  const x1 = cellOf(px + reachKm, cellKm);
  const y0 = cellOf(py - reachKm, cellKm);
  const y1 = cellOf(py + reachKm, cellKm);
  const z0 = cellOf(pz - reachKm, cellKm);
  const z1 = cellOf(pz + reachKm, cellKm);
  for (let cx = x0; cx <= x1; cx++) {
    for (let cy = y0; cy <= y1; cy++) {
      for (let cz = z0; cz <= z1; cz++) {
        const members = cells.get(cellKey(cx, cy, cz));
        if (members === undefined) continue;
        for (let m = firstAtLeast(members, fromIndex); m < members.length; m++) {
          const j = members[m] as number;
          if (j >= toIndex) break;
          const dx = (x[j] as number) - px;
          const dy = (y[j] as number) - py;
          const dz = (z[j] as number) - pz;
          if (dx * dx + dy * dy + dz * dz <= reach2) visit(j);
        }
      }
    }
  }
}

const cellOf = (km: number, cellKm: number): number => Math.floor(km / cellKm);

const cellKey = (cx: number, cy: number, cz: number): number =>
  ((cx + LATTICE_HALF) * LATTICE + (cy + LATTICE_HALF)) * LATTICE + (cz + LATTICE_HALF);

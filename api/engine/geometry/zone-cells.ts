import { InvalidInput } from '../errors.ts';
import type { ZoneSource } from '../model.ts';
import { compensatedSum } from '../summation.ts';
import type { LocalFrame, PointXY } from './projection.ts';

/** One square cell of a zone: where its seismicity is put and its share of the zone's rate. */
export interface ZoneCell {
  /** Centroid of the part of the cell inside the zone, local km. */
  readonly centre: PointXY;
  /** Area of the cell inside the zone, km². */
  readonly areaKm2: number;
  /** areaKm2 / the zone's area: the cell's share of the zone's rate. */
  readonly share: number;
  /** The square the cell was cut with: west, south, east, north edges, local km. */
  readonly box: CellBox;
  /** Where the square lies on the zone's own grid. */
  readonly lattice: CellLattice;
}

/**
 * A cell's column (west to east) and row (south to north) on its zone's grid, counted from the
 * grid's anchor (the zone's first vertex, so they do not move with the study's frame); the
 * squares of a refined cell count on a grid as many times finer as the cell is cut.
 */
export interface CellLattice {
  readonly column: number;
  readonly row: number;
}

export type CellBox = readonly [x0: number, y0: number, x1: number, y1: number];

type Vertex = readonly [x: number, y: number];

/**
 * Parts of a cell smaller than this fraction of it are slivers left where a polygon edge runs
 * along a grid line and projection rounding (about 1e-9 km) puts it a hair across; dropped.
 */
const SLIVER_FRACTION = 1e-6;

/** Signed shoelace area (counter-clockwise positive, km²) and first moments of an open ring. */
function ringMoments(ring: readonly Vertex[]): { area: number; mx: number; my: number } {
  let twiceArea = 0;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < ring.length; i++) {
    const [x0, y0] = ring[i] as Vertex;
    const [x1, y1] = ring[(i + 1) % ring.length] as Vertex;
    const crossed = x0 * y1 - x1 * y0;
    twiceArea += crossed;
    mx += (x0 + x1) * crossed;
    my += (y0 + y1) * crossed;
  }
  return { area: twiceArea / 2, mx: mx / 6, my: my / 6 };
}

/**
 * One ring clipped to the half-plane where `inside` holds, the boundary crossing placed by
 * `cross` (Sutherland & Hodgman 1974). A concave ring may come out with zero-width bridges
 * along the boundary; they add nothing to its area or moments, which is all that is used.
 */
function clipHalfPlane(
  ring: readonly Vertex[],
  inside: (v: Vertex) => boolean,
  cross: (a: Vertex, b: Vertex) => Vertex,
): Vertex[] {
  const out: Vertex[] = [];
  for (let i = 0; i < ring.length; i++) {
    const current = ring[i] as Vertex;
    const previous = ring[(i + ring.length - 1) % ring.length] as Vertex;
    if (inside(current)) {
      if (!inside(previous)) out.push(cross(previous, current));
      out.push(current);
    } else if (inside(previous)) {
      out.push(cross(previous, current));
    }
  }
  return out;
}

const atX =
  (x: number) =>
  (a: Vertex, b: Vertex): Vertex => [x, a[1] + ((x - a[0]) * (b[1] - a[1])) / (b[0] - a[0])];
const atY =
  (y: number) =>
  (a: Vertex, b: Vertex): Vertex => [a[0] + ((y - a[1]) * (b[0] - a[0])) / (b[1] - a[1]), y];

function clipToBox(
  ring: readonly Vertex[],
  x0: number,
  y0: number,
  x1: number,
  y1: number,
): Vertex[] {
  let r = clipHalfPlane(ring, (v) => v[0] >= x0, atX(x0));
  r = clipHalfPlane(r, (v) => v[0] <= x1, atX(x1));
  r = clipHalfPlane(r, (v) => v[1] >= y0, atY(y0));
  return clipHalfPlane(r, (v) => v[1] <= y1, atY(y1));
}

/** A zone's rings in the local frame, each ring's sign (outer adds, holes subtract) and its area. */
interface ZoneRings {
  readonly rings: readonly Vertex[][];
  readonly signs: readonly number[];
}

function zoneRings(zone: ZoneSource, frame: LocalFrame): ZoneRings & { areaKm2: number } {
  const rings = zone.rings.map((ring) => {
    const open = ring.map((p): Vertex => {
      const { x, y } = frame.toLocal(p);
      return [x, y];
    });
    const [fx, fy] = open[0] ?? [NaN, NaN];
    const [lx, ly] = open[open.length - 1] ?? [NaN, NaN];
    if (open.length > 1 && fx === lx && fy === ly) open.pop();
    return open;
  });
  // Outer ring adds, holes subtract, whatever way each ring winds.
  const signs = rings.map((ring, r) => (r === 0 ? 1 : -1) * Math.sign(ringMoments(ring).area));
  const areaKm2 = rings.reduce(
    (sum, ring, r) => sum + (signs[r] as number) * ringMoments(ring).area,
    0,
  );
  if (!(areaKm2 > 0))
    throw new InvalidInput([
      {
        path: 'coordinates',
        message: `zone "${zone.id}": expected a polygon with area, got ${areaKm2} km²`,
      },
    ]);
  return { rings, signs, areaKm2 };
}

/** The part of the zone inside one box: its area (km²) and centroid, or null for nothing or a sliver. */
function boxPart(zone: ZoneRings, box: CellBox): { centre: PointXY; areaKm2: number } | null {
  const [x0, y0, x1, y1] = box;
  let area = 0;
  let mx = 0;
  let my = 0;
  zone.rings.forEach((ring, r) => {
    const clipped = clipToBox(ring, x0, y0, x1, y1);
    if (clipped.length < 3) return;
    const m = ringMoments(clipped);
    const sign = zone.signs[r] as number;
    area += sign * m.area;
    mx += sign * m.mx;
    my += sign * m.my;
  });
  return area > SLIVER_FRACTION * (x1 - x0) * (y1 - y0)
    ? { centre: { x: mx / area, y: my / area }, areaKm2: area }
    : null;
}

/** How far past an edge's reach (as a share of the cell) cells are still taken as touched by it. */
const EDGE_MARGIN = 1e-6;

/** The grid of zoneCells: anchored at (ax, ay), `cellKm` squares, rows row0 to row1 - 1. */
interface CellGrid {
  readonly ax: number;
  readonly ay: number;
  readonly cellKm: number;
  readonly row0: number;
  readonly row1: number;
}

/**
 * For each row of the grid, the columns (west to east, each once) of the cells that may hold
 * part of the zone; every other cell of the bounding box holds none. A cell holds part of the
 * zone only if a ring edge passes through it (or along its sides) or it lies wholly inside;
 * the first are found edge by edge over the rows each edge spans, the second between pairs of
 * ring crossings along the row's middle line (even–odd rule, so holes count as outside), as a
 * scanline fill does (Foley et al. 1990, Computer Graphics: Principles and Practice, section
 * 3.6). The work is the edges' length in cells plus the cells inside, not the bounding box.
 */
function candidateColumns(rings: readonly (readonly Vertex[])[], grid: CellGrid): number[][] {
  const { ax, ay, cellKm, row0, row1 } = grid;
  const rowCount = row1 - row0;
  const touched: Set<number>[] = Array.from({ length: rowCount }, () => new Set<number>());
  const crossings: number[][] = Array.from({ length: rowCount }, () => []);
  // A coordinate on a grid line, or within rounding of one, belongs to the cells on both sides
  // of it; a cell taken in excess costs one clip and gives nothing.
  const margin = EDGE_MARGIN * cellKm;
  const firstIndex = (v: number) => Math.ceil((v - margin) / cellKm) - 1;
  const lastIndex = (v: number) => Math.floor((v + margin) / cellKm);
  for (const ring of rings) {
    for (let i = 0; i < ring.length; i++) {
      const [xa, ya] = ring[i] as Vertex;
      const [xb, yb] = ring[(i + 1) % ring.length] as Vertex;
      const yLow = Math.min(ya, yb);
      const yHigh = Math.max(ya, yb);
      const rowFirst = Math.max(row0, firstIndex(yLow - ay));
      const rowLast = Math.min(row1 - 1, lastIndex(yHigh - ay));
      for (let row = rowFirst; row <= rowLast; row++) {
        const bandLow = ay + row * cellKm;
        const bandHigh = bandLow + cellKm;
        // The x reached by the edge within the row's band [bandLow, bandHigh].
        const xAt = (y: number) => (yb === ya ? xa : xa + ((y - ya) * (xb - xa)) / (yb - ya));
        const xIn =
          yb === ya ? [xa, xb] : [xAt(Math.max(yLow, bandLow)), xAt(Math.min(yHigh, bandHigh))];
        const cells = touched[row - row0] as Set<number>;
        const colLast = lastIndex(Math.max(...xIn) - ax);
        for (let col = firstIndex(Math.min(...xIn) - ax); col <= colLast; col++) cells.add(col);
        // Half-open in y, so a vertex on the middle line is crossed once, not twice.
        const yMiddle = bandLow + cellKm / 2;
        if (Math.min(ya, yb) <= yMiddle && yMiddle < Math.max(ya, yb))
          (crossings[row - row0] as number[]).push(xAt(yMiddle));
      }
    }
  }
  return touched.map((cells, r) => {
    const xs = (crossings[r] as number[]).sort((a, b) => a - b);
    for (let k = 0; k + 1 < xs.length; k += 2) {
      // Cells whose middle lies between a pair of crossings; the rest of an inside run is
      // touched by the edges at its ends, found above.
      const colLast = Math.floor(((xs[k + 1] as number) - ax) / cellKm - 0.5);
      for (let col = Math.ceil(((xs[k] as number) - ax) / cellKm - 0.5); col <= colLast; col++)
        cells.add(col);
    }
    return [...cells].sort((a, b) => a - b);
  });
}

/**
 * The zone's polygon cut into squares of `cellKm` (km) aligned with the local frame's axes,
 * on a grid anchored to the zone itself (grid lines through the first vertex of its outer
 * ring), so the cells do not move when anything else in the study (a community, another
 * source) moves the frame's origin; south row first, west to east. A cell keeps the part
 * inside the polygon (holes removed): its share of the zone's rate is that part's area over the
 * zone's, and its seismicity sits at that part's centroid. Ring edges are straight lines in the
 * local frame between the projected vertices; areas are planar there (not turf's spherical
 * area). Each ring is clipped to each cell on its own, outer rings adding and holes
 * subtracting, which is exact for holes inside the outer ring as GeoJSON requires; a general
 * polygon-clipping library was tried and failed on edges lying a hair off grid lines.
 */
export function zoneCells(zone: ZoneSource, frame: LocalFrame, cellKm: number): ZoneCell[] {
  if (!(cellKm > 0))
    throw new InvalidInput([
      { path: 'settings.zoneCellKm', message: `expected a cell size > 0 km, got ${cellKm}` },
    ]);
  const prepared = zoneRings(zone, frame);
  const outer = prepared.rings[0] ?? [];
  const [ax, ay] = outer[0] ?? [0, 0];
  const ys = outer.map((v) => v[1]);
  const row0 = Math.floor((Math.min(...ys) - ay) / cellKm);
  const row1 = Math.ceil((Math.max(...ys) - ay) / cellKm);

  const grid: CellGrid = { ax, ay, cellKm, row0, row1 };
  const candidates = candidateColumns(prepared.rings, grid);
  const parts: { centre: PointXY; areaKm2: number; box: CellBox; lattice: CellLattice }[] = [];
  for (let row = row0; row < row1; row++) {
    for (const col of candidates[row - row0] ?? []) {
      const box: CellBox = [
        ax + col * cellKm,
        ay + row * cellKm,
        ax + (col + 1) * cellKm,
        ay + (row + 1) * cellKm,
      ];
      const part = boxPart(prepared, box);
      if (part) parts.push({ ...part, box, lattice: { column: col, row } });
    }
  }
  // Shares over the sum of the parts, so they add to 1 whatever the rounding.
  const total = compensatedSum(parts.map((p) => p.areaKm2));
  return parts.map((p) => ({
    centre: p.centre,
    areaKm2: p.areaKm2,
    share: p.areaKm2 / total,
    box: p.box,
    lattice: p.lattice,
  }));
}

/**
 * One cell of zoneCells cut into `parts` × `parts` equal squares, each keeping the part of the
 * zone inside it as zoneCells does. Their shares are the cell's share split by area, so they add
 * to the cell's share whatever the rounding.
 */
export function subdivideZoneCell(
  zone: ZoneSource,
  frame: LocalFrame,
  cell: ZoneCell,
  parts: number,
): ZoneCell[] {
  const prepared = zoneRings(zone, frame);
  const [x0, y0, x1, y1] = cell.box;
  const dx = (x1 - x0) / parts;
  const dy = (y1 - y0) / parts;
  const pieces: { centre: PointXY; areaKm2: number; box: CellBox; lattice: CellLattice }[] = [];
  for (let row = 0; row < parts; row++) {
    for (let col = 0; col < parts; col++) {
      const box: CellBox = [
        x0 + col * dx,
        y0 + row * dy,
        col === parts - 1 ? x1 : x0 + (col + 1) * dx,
        row === parts - 1 ? y1 : y0 + (row + 1) * dy,
      ];
      const part = boxPart(prepared, box);
      const lattice = {
        column: cell.lattice.column * parts + col,
        row: cell.lattice.row * parts + row,
      };
      if (part) pieces.push({ ...part, box, lattice });
    }
  }
  const total = compensatedSum(pieces.map((p) => p.areaKm2));
  return pieces.map((p) => ({
    centre: p.centre,
    areaKm2: p.areaKm2,
    share: (cell.share * p.areaKm2) / total,
    box: p.box,
    lattice: p.lattice,
  }));
}

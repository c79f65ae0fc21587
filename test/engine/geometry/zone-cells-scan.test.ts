import { describe, expect, it } from 'vitest';
import { zoneCells, type ZoneCell } from '../../../api/engine/geometry/zone-cells.ts';
import type { ZoneSource } from '../../../api/engine/model.ts';
import { expectClose } from '../../helpers/close.ts';
import { everyBoxCell } from '../../helpers/zone-cells-by-box.ts';
import { FIXED_M7, FRAME, zoneKm } from './km-fixtures.ts';

/**
 * zoneCells visits only the cells a scanline finds along the zone (candidateColumns). These
 * tests cut the same zones the plain way, every cell of the bounding box clipped in turn (as
 * subdivideZoneCell does for one square holding the whole zone), and expect the same cells:
 * the same squares, areas, centroids and shares. Every skipped cell must have held nothing.
 */
type Ring = [number, number][];

/**
 * The two cuttings cell by cell. The plain way places its squares by division of one large
 * square rather than by multiples of the cell size, so coordinates agree to rounding
 * (1e-9 km on boxes of up to a few hundred km) rather than bit for bit.
 */
function expectSameCells(zone: ZoneSource, cellKm: number): number {
  const scanned = zoneCells(zone, FRAME, cellKm);
  const plain = everyBoxCell(zone, FRAME, cellKm);
  expect(scanned.length).toBe(plain.length);
  scanned.forEach((cell, i) => {
    const other = plain[i] as ZoneCell;
    const what = `cell ${i} of ${zone.id}`;
    cell.box.forEach((edge, k) => expectClose(edge, other.box[k] as number, 1e-9, `${what} box`));
    expectClose(cell.areaKm2, other.areaKm2, 1e-9 * cellKm * cellKm, `${what} area`);
    expectClose(cell.centre.x, other.centre.x, 1e-9, `${what} centre x`);
    expectClose(cell.centre.y, other.centre.y, 1e-9, `${what} centre y`);
    expectClose(cell.share, other.share, 1e-12, `${what} share`);
  });
  return scanned.length;
}

const zone = (id: string, rings: Ring[]): ZoneSource => ({ ...zoneKm(rings, FIXED_M7), id });

describe('zoneCells along the zone only', () => {
  it('a thin diagonal strip (2 km across in x, 280 km long) at 1 km cells: the same cells as the whole box', () => {
    const strip: Ring = [
      [0, 0],
      [2, 0],
      [200, 198],
      [200, 200],
      [198, 200],
      [0, 2],
      [0, 0],
    ];
    const count = expectSameCells(zone('strip', [strip]), 1);
    // A band 2 km across in x over 200 km of y (shoelace: 400 km²) needs at least 400 cells of
    // 1 km², plus those the edges cut: far fewer than the 40,000 cells of the bounding box.
    expect(count).toBeGreaterThan(400);
    expect(count).toBeLessThan(2_000);
  });

  it('a square with a square hole, the hole off the grid', () => {
    const outer: Ring = [
      [0, 0],
      [100, 0],
      [100, 100],
      [0, 100],
      [0, 0],
    ];
    const hole: Ring = [
      [23.5, 31.2],
      [23.5, 68.7],
      [71.3, 68.7],
      [71.3, 31.2],
      [23.5, 31.2],
    ];
    expectSameCells(zone('holed', [outer, hole]), 7);
  });

  it('a diagonal ring with a diagonal hole, edges through grid corners', () => {
    const outer: Ring = [
      [0, 0],
      [60, 60],
      [30, 90],
      [-30, 30],
      [0, 0],
    ];
    const hole: Ring = [
      [0, 30],
      [30, 60],
      [40, 50],
      [10, 20],
      [0, 30],
    ];
    expectSameCells(zone('diamond', [outer, hole]), 5);
  });

  it('a comb: several runs inside on one row, wound clockwise', () => {
    const comb: Ring = [
      [0, 0],
      [0, 40],
      [10, 40],
      [10, 10],
      [20, 10],
      [20, 40],
      [30, 40],
      [30, 10],
      [40, 10],
      [40, 40],
      [50, 40],
      [50, 0],
      [0, 0],
    ];
    expectSameCells(zone('comb', [comb]), 3.3);
  });

  it('a triangle and a star, edges at many slopes', () => {
    const triangle: Ring = [
      [0, 0],
      [47, 3],
      [12, 38],
      [0, 0],
    ];
    expectSameCells(zone('triangle', [triangle]), 4);
    const star: Ring = Array.from({ length: 11 }, (_, k) => {
      const angle = (k * Math.PI) / 5;
      const radiusKm = k % 2 === 0 ? 50 : 18;
      return [radiusKm * Math.cos(angle), radiusKm * Math.sin(angle)] as [number, number];
    });
    star[10] = star[0] as [number, number];
    expectSameCells(zone('star', [star]), 6);
  });
});

import { describe, expect, it } from 'vitest';
import { subdivideZoneCell, zoneCells } from '../../../api/engine/geometry/zone-cells.ts';
import { InvalidInput } from '../../../api/engine/errors.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { FIXED_M7, FRAME, zoneKm } from './km-fixtures.ts';
import { boxRing } from '../../helpers/box-ring.ts';

/* Areas by hand (plane geometry). Rings go through [lon, lat] and back, ~1e-9 km. */

/** The triangle (0, 0), (60, 0), (0, 45) km. */
const TRIANGLE = zoneKm(
  [
    [
      [0, 0],
      [60, 0],
      [0, 45],
      [0, 0],
    ],
  ],
  FIXED_M7,
);

describe('zoneCells', () => {
  it('a 100 km square with a 40 km square hole on the grid: 84 whole 10 km cells, 1/84 each', () => {
    const zone = zoneKm([boxRing(0, 0, 100, 100), boxRing(30, 30, 70, 70)], FIXED_M7);
    const cells = zoneCells(zone, FRAME, 10);
    expect(cells.length).toBe(100 - 16);
    for (const cell of cells) {
      expectRelative(cell.areaKm2, 100, 1e-6, 'whole 10 km cell');
      expectRelative(cell.share, 1 / 84, 1e-6, 'area share of 8400 km²');
      const inHole =
        cell.centre.x > 30 && cell.centre.x < 70 && cell.centre.y > 30 && cell.centre.y < 70;
      expect(inHole, `cell at (${cell.centre.x}, ${cell.centre.y}) is in the hole`).toBe(false);
    }
    expectClose(
      cells.reduce((s, c) => s + c.share, 0),
      1,
      1e-12,
      'shares sum to 1',
    );
  });

  it('anchored to the zone, not the frame: a square from (5, 5) is cut along x, y = 5, 15, ..., holes respected', () => {
    // Outer 5..105 x 5..105 (10 000 km²) minus hole 33..67 x 33..67 (1156 km²) = 8844 km².
    const zone = zoneKm([boxRing(5, 5, 105, 105), boxRing(33, 33, 67, 67)], FIXED_M7);
    const cells = zoneCells(zone, FRAME, 10);
    const total = cells.reduce((s, c) => s + c.areaKm2, 0);
    expectRelative(total, 8844, 1e-6, 'area by hand');
    expectClose(
      cells.reduce((s, c) => s + c.share, 0),
      1,
      1e-12,
      'shares sum to 1',
    );
    for (const cell of cells)
      expectRelative(cell.share, cell.areaKm2 / total, 1e-12, 'share by area');
    const corner = cells[0];
    expectRelative(
      corner?.areaKm2 ?? NaN,
      100,
      1e-6,
      'south-west corner cell: a whole 10 km cell from the first vertex',
    );
    expectClose(corner?.centre.x ?? NaN, 10, 1e-6, 'its centre');
    const ringCell = cells.find(
      (c) => c.centre.x > 25 && c.centre.x < 35 && c.centre.y > 35 && c.centre.y < 45,
    );
    expectRelative(
      ringCell?.areaKm2 ?? NaN,
      80,
      1e-6,
      'cell 25..35 x 35..45 cut by the hole at x = 33: 8 x 10 km left',
    );
  });

  it("a cell subdivided into 5 x 5 squares: the parts inside, shares adding to the cell's", () => {
    // Triangle (0,0), (60,0), (0,45): the 10 km cell 20..30 x 20..30 is cut by the hypotenuse 3x + 4y = 180.
    const zone = TRIANGLE;
    const cells = zoneCells(zone, FRAME, 10);
    const cell = cells.find(
      (c) => c.box[0] > 19 && c.box[0] < 21 && c.box[1] > 19 && c.box[1] < 21,
    )!;
    const squares = subdivideZoneCell(zone, FRAME, cell, 5);
    expectClose(
      squares.reduce((s, q) => s + q.share, 0),
      cell.share,
      1e-15,
      "shares add to the cell's",
    );
    expectRelative(
      squares.reduce((s, q) => s + q.areaKm2, 0),
      cell.areaKm2,
      1e-9,
      "areas add to the cell's",
    );
    // Inside the cell, below 3x + 4y = 180: at x = 20 up to y = 30 (whole), at x = 30 up to y = 22.5; area 100 - ½ x 10 x 7.5 = 62.5 km².
    expectRelative(cell.areaKm2, 62.5, 1e-6, 'trapezoid by hand');
    for (const q of squares)
      expect(3 * q.centre.x + 4 * q.centre.y).toBeLessThanOrEqual(180 + 1e-6);
  });

  it('a triangle: total area ½ b h, cells south row first, west to east', () => {
    const zone = TRIANGLE;
    const cells = zoneCells(zone, FRAME, 7.5);
    expectRelative(
      cells.reduce((s, c) => s + c.areaKm2, 0),
      0.5 * 60 * 45,
      1e-6,
      '½ b h',
    );
    for (let i = 1; i < cells.length; i++) {
      const a = cells[i - 1];
      const b = cells[i];
      if (!a || !b) continue;
      const rowA = Math.floor(a.centre.y / 7.5);
      const rowB = Math.floor(b.centre.y / 7.5);
      expect(rowB > rowA || (rowB === rowA && b.centre.x > a.centre.x)).toBe(true);
    }
  });

  it('a concave L-shape, wound clockwise: area 50 x 20 + 20 x 30 = 1600 km² on 15 km cells', () => {
    const zone = zoneKm(
      [
        [
          [0, 0],
          [0, 50],
          [20, 50],
          [20, 20],
          [50, 20],
          [50, 0],
          [0, 0],
        ],
      ],
      FIXED_M7,
    );
    const cells = zoneCells(zone, FRAME, 15);
    expectRelative(
      cells.reduce((s, c) => s + c.areaKm2, 0),
      1600,
      1e-6,
      'L-shape area by hand',
    );
    const notch = cells.find(
      (c) => c.centre.x > 15 && c.centre.x < 30 && c.centre.y > 15 && c.centre.y < 30,
    );
    expectRelative(
      notch?.areaKm2 ?? NaN,
      15 * 15 - 10 * 10,
      1e-6,
      'cell 15..30 x 15..30 minus the notch 20..30 x 20..30',
    );
  });

  it('refuses a cell size that is not positive', () => {
    expect(() => zoneCells(zoneKm([boxRing(0, 0, 10, 10)], FIXED_M7), FRAME, 0)).toThrow(
      InvalidInput,
    );
  });
});

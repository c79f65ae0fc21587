import { describe, expect, it } from 'vitest';
import { fastMarching, type StartCell } from '../../../api/engine/tsunami/fast-marching.ts';
import { STANDARD_GRAVITY_MS2 } from '../../../api/engine/units.ts';
import { expectRelative } from '../../helpers/close.ts';

/** Long-wave speed √(g h), km/s (Lamb 1932, Hydrodynamics, §170: the speed of long waves). */
const longWaveKmS = (depthM: number) => Math.sqrt(STANDARD_GRAVITY_MS2 * depthM) / 1000;

/** A square grid of `n` × `n` cells of `h` km with the slowness of `depthAt(x, y)` at each centre (x east, y down the rows, km). */
function grid(n: number, h: number, depthAt: (x: number, y: number) => number) {
  const slownessSPerKm = new Float64Array(n * n);
  for (let r = 0; r < n; r += 1) {
    for (let c = 0; c < n; c += 1) {
      const depth = depthAt((c + 0.5) * h, (r + 0.5) * h);
      slownessSPerKm[r * n + c] = depth > 0 ? 1 / longWaveKmS(depth) : Infinity;
    }
  }
  return { columns: n, rows: n, spacingKm: h, slownessSPerKm };
}

/** Cells within `radiusKm` of (x, y) start at their exact time from there: the usual start of a point source. */
function pointSource(
  n: number,
  h: number,
  x: number,
  y: number,
  radiusKm: number,
  speedKmS: number,
): StartCell[] {
  const cells: StartCell[] = [];
  for (let r = 0; r < n; r += 1) {
    for (let c = 0; c < n; c += 1) {
      const d = Math.hypot((c + 0.5) * h - x, (r + 0.5) * h - y);
      if (d <= radiusKm) cells.push({ index: r * n + c, timeS: d / speedKmS });
    }
  }
  return cells;
}

const timeAt = (times: Float64Array, n: number, h: number, x: number, y: number) =>
  times[Math.floor(y / h) * n + Math.floor(x / h)] as number;

/**
 * The refracted first arrival from (xs, ys) in the upper medium to (xr, yr) in the lower across
 * the straight boundary y = yb: Fermat's principle, the least time over the crossing point,
 * found by golden-section search (derived).
 */
function fermatTimeS(
  xs: number,
  ys: number,
  xr: number,
  yr: number,
  yb: number,
  c1: number,
  c2: number,
): number {
  const t = (x: number) => Math.hypot(x - xs, yb - ys) / c1 + Math.hypot(xr - x, yr - yb) / c2;
  let a = Math.min(xs, xr),
    b = Math.max(xs, xr);
  const g = (Math.sqrt(5) - 1) / 2;
  for (let k = 0; k < 200; k += 1) {
    const x1 = b - g * (b - a),
      x2 = a + g * (b - a);
    if (t(x1) < t(x2)) b = x2;
    else a = x1;
  }
  return t((a + b) / 2);
}

describe('fast marching of the long-wave eikonal equation', () => {
  it('over a constant depth, takes distance / √(g h) (derived: the eikonal with constant slowness)', () => {
    const n = 201,
      h = 0.5,
      depthM = 2000;
    const c = longWaveKmS(depthM);
    const times = fastMarching(
      grid(n, h, () => depthM),
      pointSource(n, h, 50.25, 50.25, 2, c),
    );
    for (const [x, y] of [
      [95, 50.25],
      [50.25, 5],
      [90, 90],
      [10, 85],
      [80, 20],
    ] as const) {
      const cx = (Math.floor(x / h) + 0.5) * h,
        cy = (Math.floor(y / h) + 0.5) * h;
      expectRelative(
        timeAt(times, n, h, x, y),
        Math.hypot(cx - 50.25, cy - 50.25) / c,
        0.02,
        `distance / √(g h) at (${x}, ${y}) km (derived)`,
      );
    }
  });

  it("across a straight boundary between two depths, takes the refracted first arrival of Fermat's principle", () => {
    const n = 200,
      h = 0.5,
      yb = 50;
    const deep = 4000,
      shallow = 100;
    const times = fastMarching(
      grid(n, h, (_x, y) => (y < yb ? deep : shallow)),
      pointSource(n, h, 30.25, 20.25, 2, longWaveKmS(deep)),
    );
    for (const [x, y] of [
      [30.25, 70.25],
      [80.25, 60.25],
      [95.25, 95.25],
      [5.25, 55.25],
    ] as const) {
      const expected = fermatTimeS(30.25, 20.25, x, y, yb, longWaveKmS(deep), longWaveKmS(shallow));
      expectRelative(
        timeAt(times, n, h, x, y),
        expected,
        0.02,
        `refracted first arrival at (${x}, ${y}) km (Fermat's principle, derived)`,
      );
    }
  });

  it('converges as the grid is refined: the error at a far point shrinks with each halving of the cell', () => {
    const depthM = 1000,
      c = longWaveKmS(depthM);
    const errors = [1, 0.5, 0.25].map((h) => {
      const n = Math.round(64 / h);
      // Source and receiver on cell centres at every spacing: (8, 8) and (56, 40) km less half a cell.
      const sx = 8 - h / 2,
        sy = 8 - h / 2,
        rx = 56 - h / 2,
        ry = 40 - h / 2;
      const times = fastMarching(
        grid(n, h, () => depthM),
        pointSource(n, h, sx, sy, 1, c),
      );
      return Math.abs(timeAt(times, n, h, rx, ry) / (Math.hypot(rx - sx, ry - sy) / c) - 1);
    });
    expect(errors[1]).toBeLessThan(errors[0] as number);
    expect(errors[2]).toBeLessThan(errors[1] as number);
    expect(errors[2]).toBeLessThan(0.01);
  });

  it('is blocked by land: it goes round the end of a wall, and never reaches water walled in', () => {
    const n = 200,
      h = 0.5,
      depthM = 1000,
      c = longWaveKmS(depthM);
    // A wall of land along y in [50, 50.5] km from x = 0 to 75 km; a ring of land round (25, 80) km.
    const land = (x: number, y: number) =>
      (y > 50 && y < 50.5 && x < 75) || Math.abs(Math.hypot(x - 25, y - 80) - 6) < 0.6;
    const times = fastMarching(
      grid(n, h, (x, y) => (land(x, y) ? -5 : depthM)),
      pointSource(n, h, 25.25, 25.25, 2, c),
    );
    // Shortest path round the wall's end (derived): source → (75, 50) → (75, 50.5) → receiver.
    const rx = 45.25,
      ry = 60.25;
    const aroundKm = Math.hypot(75 - 25.25, 50 - 25.25) + 0.5 + Math.hypot(rx - 75, ry - 50.5);
    expectRelative(
      timeAt(times, n, h, rx, ry),
      aroundKm / c,
      0.02,
      'path round the end of the wall (derived)',
    );
    expect(timeAt(times, n, h, 25.25, 80.25)).toBe(Infinity);
    expect(timeAt(times, n, h, 10, 51)).toBeGreaterThan(Math.hypot(75 - 25.25, 50 - 25.25) / c);
    expect(timeAt(times, n, h, 10.25, 50.25)).toBe(Infinity);
  });

  it('ignores start cells on land and answers Infinity everywhere when nothing can start', () => {
    const times = fastMarching(
      grid(10, 1, () => -10),
      [{ index: 0, timeS: 0 }],
    );
    expect([...times].every((t) => t === Infinity)).toBe(true);
  });
});

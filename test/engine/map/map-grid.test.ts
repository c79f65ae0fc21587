import { describe, expect, it } from 'vitest';
import { InvalidInput, StudyTooLarge } from '../../../api/engine/errors.ts';
import { frameForStudy } from '../../../api/engine/geometry/projection.ts';
import { gridPoint, mapGrid, studyBounds } from '../../../api/engine/map/map-grid.ts';
import type { LonLat } from '../../../api/engine/model.ts';
import { expectClose } from '../../helpers/close.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';

const study = allKindsStudy();
const frame = frameForStudy(study);

/** Every coordinate the study area is made of: communities, sources and outline. */
function studyPoints(): LonLat[] {
  const points: LonLat[] = study.communities.map((c) => [c.lon, c.lat] as const);
  for (const s of study.sources) {
    if (s.kind === 'fault') points.push(...s.trace);
    else if (s.kind === 'zone') for (const ring of s.rings) points.push(...ring);
    else points.push(s.location);
  }
  for (const ring of study.outline ?? []) points.push(...ring);
  return points;
}

describe('mapGrid', () => {
  it('covers the study area: every community, source coordinate and outline vertex lies inside the grid', () => {
    const grid = mapGrid(study, frame, { spacingKm: 7 });
    const last = gridPoint(grid, grid.count - 1);
    for (const p of studyPoints()) {
      const { x, y } = frame.toLocal(p);
      expect(x).toBeGreaterThanOrEqual(grid.x0 - 1e-9);
      expect(y).toBeGreaterThanOrEqual(grid.y0 - 1e-9);
      expect(x).toBeLessThanOrEqual(last.x + 1e-9);
      expect(y).toBeLessThanOrEqual(last.y + 1e-9);
    }
  });

  it('spaces points evenly, row by row from the south-west corner, and reaches past the far edges by less than a spacing', () => {
    const grid = mapGrid(study, frame, { spacingKm: 10 });
    expect(grid.count).toBe(grid.columns * grid.rows);
    const a = gridPoint(grid, 0);
    const b = gridPoint(grid, 1);
    const c = gridPoint(grid, grid.columns);
    expectClose(b.x - a.x, 10, 1e-9, 'east neighbour one spacing away');
    expectClose(c.y - a.y, 10, 1e-9, 'north neighbour one spacing away');
    const xs = studyPoints().map((p) => frame.toLocal(p).x);
    const east = Math.max(...xs);
    const lastX = gridPoint(grid, grid.columns - 1).x;
    expect(lastX).toBeGreaterThanOrEqual(east);
    // The box's edges bow in the frame (parallels are curves there), so the box reaches a few km past the points.
    expect(lastX - east).toBeLessThan(2 * 10);
  });

  it('covers a box given in degrees instead', () => {
    const [w, s, e, n] = studyBounds(study);
    const bounds = [w + 0.2, s + 0.2, w + 0.5, s + 0.4] as const;
    const grid = mapGrid(study, frame, { spacingKm: 2, bounds });
    expect(grid.count).toBeLessThan(mapGrid(study, frame, { spacingKm: 2 }).count);
    expect(e > w && n > s).toBe(true);
    // Every point of the box's edges, 200 to an edge, inside the grid to within 1 m (the bow between the builder's samples).
    const last = gridPoint(grid, grid.count - 1);
    for (let k = 0; k <= 200; k++) {
      const f = k / 200;
      const lon = bounds[0] + (bounds[2] - bounds[0]) * f;
      const lat = bounds[1] + (bounds[3] - bounds[1]) * f;
      for (const p of [
        [lon, bounds[1]],
        [lon, bounds[3]],
        [bounds[0], lat],
        [bounds[2], lat],
      ] as const) {
        const { x, y } = frame.toLocal(p);
        expect(
          x >= grid.x0 - 1e-3 && y >= grid.y0 - 1e-3 && x <= last.x + 1e-3 && y <= last.y + 1e-3,
          `edge point ${p} inside the grid`,
        ).toBe(true);
      }
    }
  });

  it('refuses a spacing that is not positive and a grid over the point budget, naming the field', () => {
    expect(() => mapGrid(study, frame, { spacingKm: 0 })).toThrow(InvalidInput);
    expect(() => mapGrid(study, frame, { spacingKm: -1 })).toThrow(
      /spacingKm: expected a grid spacing above 0 km, got -1/,
    );
    expect(() => mapGrid(study, frame, { spacingKm: 1, maxPoints: 100 })).toThrow(StudyTooLarge);
    expect(() => mapGrid(study, frame, { spacingKm: 1, bounds: [10, 0, 5, 1] })).toThrow(
      /bounds: expected \[west, south, east, north\]/,
    );
  });
});

import { describe, expect, it } from 'vitest';
import { hazardMapChunk, planHazardMap } from '../../../api/engine/map/hazard-map.ts';
import type { Study } from '../../../api/engine/model.ts';
import { siteProxy } from '../../../api/engine/terrain/site-proxy.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';
import { lonLatGrid } from '../fixtures/lonlat-grid.ts';

// The invented all-kinds study (test scaffolding) on a coarse grid, over a project-made terrain
// grid: land whose height rises with the square of the distance east of its west edge (so the
// slope, and the proxy's Vs30, change from point to point), sea in the northern third.
const { outline: _, ...base } = allKindsStudy({ measures: ['PGA'] });
const study: Study = { ...base, sources: base.sources.filter((s) => s.id !== 'background') };
const rp = {
  measure: 'PGA',
  quantity: { kind: 'return-period' as const, returnPeriodYears: 475 },
  spacingKm: 45,
};

function terrainOver(points: readonly { lon: number; lat: number }[]) {
  const cell = 0.02;
  const west = Math.min(...points.map((p) => p.lon)) - 1;
  const north = Math.max(...points.map((p) => p.lat)) + 1;
  const columns = Math.ceil((Math.max(...points.map((p) => p.lon)) + 1 - west) / cell);
  const rows = Math.ceil((north - Math.min(...points.map((p) => p.lat)) + 1) / cell);
  const values: number[] = [];
  for (let r = 0; r < rows; r += 1)
    for (let c = 0; c < columns; c += 1)
      values.push(r < rows / 3 ? -50 : 10 + 20 * ((c * cell) / 0.1) ** 2);
  return lonLatGrid('squares.asc', { west, north, cellDeg: cell, columns, rows }, values);
}

describe('a hazard map over a terrain grid', () => {
  const flat = planHazardMap(study, rp);
  const flatPoints = hazardMapChunk(flat, 0, flat.grid.count);
  const terrain = terrainOver(flatPoints);
  const plan = planHazardMap(study, { ...rp, terrain });
  const points = hazardMapChunk(plan, 0, plan.grid.count);
  const proxy = siteProxy(terrain);

  it('gives each point on land the value of a map with the proxy Vs30 there, and 760 m/s at sea', () => {
    let onLand = 0;
    for (const p of points) {
      const estimate = proxy([p.lon, p.lat]);
      if (estimate === null) {
        expect(p.value).toBe(flatPoints[p.index]?.value);
        continue;
      }
      onLand += 1;
      const single = planHazardMap(study, { ...rp, vs30: estimate.vs30 });
      expect(p.value).toBe(hazardMapChunk(single, p.index, 1)[0]?.value);
    }
    expect(onLand).toBeGreaterThan(2);
    expect(plan.warnings.join(' ')).toMatch(/proxy from the topographic slope of squares\.asc/);
  });
});

import { describe, expect, it } from 'vitest';
import { createElevationGrid } from '../../../api/engine/terrain/elevation-grid.ts';
import { siteProxy } from '../../../api/engine/terrain/site-proxy.ts';
import { vs30FromSlope } from '../../../api/engine/terrain/slope-vs30.ts';
import {
  PROXY_STEP_DEG,
  slopeSampler,
  slopeStepDeg,
} from '../../../api/engine/terrain/topographic-slope.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { lonLatGrid } from '../fixtures/lonlat-grid.ts';

const TABLE = 'Wald & Allen (2007) BSSA 97(5) Table 1, active tectonic regions (from memory)';

describe('vs30FromSlope', () => {
  // Each boundary of the table: the slope (m/m) at which a Vs30 bin starts, and that Vs30 (m/s).
  const boundaries: [slope: number, vs30: number, siteClass: string][] = [
    [1.0e-4, 180, 'D'], // E/D boundary
    [2.2e-3, 240, 'D'],
    [6.3e-3, 300, 'D'],
    [0.018, 360, 'C'], // D/C boundary
    [0.05, 490, 'C'],
    [0.1, 620, 'C'],
    [0.138, 760, 'B'], // C/B boundary
  ];
  it.each(boundaries)('slope %f starts the %f m/s bin (class %s)', (slope, vs30, siteClass) => {
    const at = vs30FromSlope(slope);
    expectRelative(at.vs30, vs30, 1e-9, TABLE);
    expect(at.siteClass).toBe(siteClass);
  });

  it('just below each class boundary the class below applies', () => {
    expect(vs30FromSlope(0.99e-4).siteClass).toBe('E');
    expect(vs30FromSlope(0.0179).siteClass).toBe('D');
    expect(vs30FromSlope(0.1379).siteClass).toBe('C');
    // The row's upper Vs30 is reached as the slope reaches its upper bound (log–log within a row).
    expectRelative(vs30FromSlope(0.018 * (1 - 1e-12)).vs30, 360, 1e-9, TABLE);
  });

  it('interpolates log Vs30 linearly in log slope inside a row (common practice)', () => {
    // The geometric middle of the 0.018–0.05 row gives the geometric middle of 360–490 m/s.
    expectRelative(vs30FromSlope(Math.sqrt(0.018 * 0.05)).vs30, Math.sqrt(360 * 490), 1e-12, TABLE);
  });

  it('states the class range as the uncertainty and refuses a negative slope', () => {
    expect(vs30FromSlope(0.01).vs30Range).toEqual([180, 360]);
    expect(vs30FromSlope(0).vs30).toBe(150);
    expect(vs30FromSlope(0.5).vs30).toBe(760);
    expect(() => vs30FromSlope(-0.01)).toThrow(/slope/);
    expect(() => vs30FromSlope(Number.NaN)).toThrow(/slope/);
  });
});

/**
 * A small project-made grid: a plane rising `riseM` metres per degree of longitude, on
 * 10 arc-second cells (finer than the relation's 30″) around 40° S.
 */
function tiltedGrid(riseMPerDegLon: number, cellDeg: number) {
  const columns = 61;
  const rows = 61;
  const west = 150;
  const north = -39.9;
  const values: number[] = [];
  for (let r = 0; r < rows; r += 1)
    for (let c = 0; c < columns; c += 1) values.push(10 + riseMPerDegLon * (c + 0.5) * cellDeg);
  return lonLatGrid('tilted.asc', { west, north, cellDeg, columns, rows }, values);
}

describe('slope from a grid', () => {
  it('is the rise over the run in metres at the latitude (analytic plane)', () => {
    const grid = tiltedGrid(500, 10 / 3600);
    expect(slopeStepDeg(grid)).toBe(PROXY_STEP_DEG);
    const lat = -40;
    // Analytic: 500 m per degree of longitude; one degree of longitude is R·π/180·cos(lat) metres
    // on the mean sphere (R = 6371008.8 m, Moritz 2000).
    const metresPerDegLon = ((6_371_008.8 * Math.PI) / 180) * Math.cos((lat * Math.PI) / 180);
    const slope = slopeSampler(grid)([150.08, lat]) as number;
    expectRelative(slope, 500 / metresPerDegLon, 1e-6, 'analytic plane');
  });

  it('takes the grid cell as the step on a grid coarser than 30″', () => {
    expect(slopeStepDeg(tiltedGrid(500, 0.02))).toBe(0.02);
  });

  it('gives the proxy on land, none at sea or off the grid', () => {
    const grid = tiltedGrid(5000, 10 / 3600);
    const proxy = siteProxy(grid);
    const onLand = proxy([150.08, -40]);
    expect(onLand?.siteClass).toBe('C');
    expectClose(
      onLand?.slope ?? 0,
      5000 / 85_263,
      1e-3,
      'analytic plane, about 85.3 km per degree of longitude at 40° S',
    );
    expect(proxy([140, -40])).toBeNull();
    const sea = createElevationGrid({
      ...grid,
      elevationM: Array.from(grid.elevationM, (z) => z - 1000),
    });
    expect(siteProxy(sea)([150.08, -40])).toBeNull();
  });
});

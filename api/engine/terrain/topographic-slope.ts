/**
 * Topographic slope for the slope–Vs30 proxy (slope-vs30.ts): the gradient magnitude in m/m by
 * central differences, |∇z| = √((∂z/∂x)² + (∂z/∂y)²), with each derivative taken over two steps
 * of `stepDeg` either side of the point, the steps converted from degrees to metres at the
 * point's latitude on a sphere of the mean Earth radius (Moritz 2000, IUGG mean radius R1;
 * the sphere's error, under 0.5% in a distance, is far below the spread of the proxy).
 *
 * The relation was calibrated on 30 arc-second topography (Wald & Allen 2007), so the step is
 * 30″ (about 0.93 km of latitude) on finer grids: a finer grid is sampled, bilinearly, at 30″
 * spacing instead of its own cell, which would give steeper slopes than the relation expects
 * (Allen & Wald 2009). On a coarser grid the step is the grid's own cell, since interpolating
 * below it adds nothing; such slopes are smoothed, so Vs30 leans low (the caller says so).
 */

import type { LonLat } from '../model.ts';
import { DEG_TO_RAD } from '../units.ts';
import { type ElevationGrid, elevationSampler } from './elevation-grid.ts';

/** Mean Earth radius R1 = (2a + b)/3 of WGS84, metres (Moritz 2000, Geodetic Reference System 1980). */
const MEAN_EARTH_RADIUS_M = 6_371_008.8;

/** 30 arc-seconds in degrees: the resolution of the slope–Vs30 relation. */
export const PROXY_STEP_DEG = 30 / 3600;

/** Metres per degree of latitude, and of longitude at a latitude, on the mean sphere. */
const metresPerDegree = (latDeg: number): { readonly x: number; readonly y: number } => {
  const y = MEAN_EARTH_RADIUS_M * DEG_TO_RAD;
  return { x: y * Math.cos(latDeg * DEG_TO_RAD), y };
};

/**
 * The step slopes are taken over on this grid, degrees: 30″, or the grid's own cell where that
 * is coarser (a projected grid's cell converted at the equator's metres per degree of latitude).
 */
export function slopeStepDeg(grid: ElevationGrid): number {
  const cellDeg =
    grid.crs.kind === 'lonlat'
      ? Math.max(grid.cellWidth, grid.cellHeight)
      : Math.max(grid.cellWidth, grid.cellHeight) / metresPerDegree(0).y;
  return Math.max(PROXY_STEP_DEG, cellDeg);
}

/** Slope at a point from the four samples, m/m; null where any sample is off the grid or missing. */
export type SlopeSampler = (lonLat: LonLat) => number | null;

/** A sampler of topographic slope (m/m) over a grid, by central differences at `slopeStepDeg`. */
export function slopeSampler(grid: ElevationGrid): SlopeSampler {
  const elevation = elevationSampler(grid);
  const step = slopeStepDeg(grid);
  return ([lon, lat]) => {
    const east = elevation([lon + step, lat]);
    const west = elevation([lon - step, lat]);
    const north = elevation([lon, lat + step]);
    const south = elevation([lon, lat - step]);
    if (east === null || west === null || north === null || south === null) return null;
    const metres = metresPerDegree(lat);
    const dzdx = (east - west) / (2 * step * metres.x);
    const dzdy = (north - south) / (2 * step * metres.y);
    return Math.hypot(dzdx, dzdy);
  };
}

import type { LonLat } from '../model.ts';
import { type ElevationGrid, elevationSampler } from './elevation-grid.ts';
import { type SlopeVs30, vs30FromSlope } from './slope-vs30.ts';
import { slopeSampler } from './topographic-slope.ts';

/** Vs30 by the slope proxy at a point, or null where the grid cannot give one. */
export type SiteProxy = (lonLat: LonLat) => SlopeVs30 | null;

/**
 * The slope–Vs30 proxy over a terrain grid (Wald & Allen 2007, active regions). Null off the
 * grid, where a sample has no data, and below sea level: the relation was fitted on land, and
 * a sea-floor slope says nothing of the ground a village stands on.
 */
export function siteProxy(grid: ElevationGrid): SiteProxy {
  const elevation = elevationSampler(grid);
  const slope = slopeSampler(grid);
  return (lonLat) => {
    const z = elevation(lonLat);
    if (z === null || z < 0) return null;
    const s = slope(lonLat);
    return s === null ? null : vs30FromSlope(s);
  };
}

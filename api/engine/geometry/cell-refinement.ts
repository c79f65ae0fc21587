import type { PointXY } from './projection.ts';

/**
 * Zone cells refined near each community, so that a community's result neither depends on the
 * coarse cell size near it nor on which other communities the study holds.
 *
 * A point source's distance to a site is poorest as a stand-in for the cell's spread-out
 * seismicity when the site is within a few cells of it; far away the coarse cell is exact
 * enough. So every coarse cell whose centre lies within REFINE_RADIUS_CELLS cells of a
 * community is also cut into REFINE_PARTS × REFINE_PARTS squares, and the rule below picks,
 * for each site, either the coarse cell or its squares by the site's own distance to the coarse
 * cell's centre. A site's sum therefore depends only on the zone and the site: a cell refined
 * because of another community is used as its squares at this site only if it lies near this
 * site, where it would have been refined anyway. The radius and the parts were chosen by
 * measurement: with 10 km cells, 475- and 2475-year PGA within 1% of 1 km cells for sites
 * inside, at the edge of and outside a shallow crustal zone
 * (test/engine/hazard/zone-refinement.test.ts).
 */
export const REFINE_RADIUS_CELLS = 3;
export const REFINE_PARTS = 5;

/** The distance (km) within which a site uses a coarse cell's squares instead of the cell. */
export const refineRadiusKm = (cellKm: number): number => REFINE_RADIUS_CELLS * cellKm;

/**
 * Which sites use a zone rupture: `near` ruptures (the squares of a refined cell) at sites
 * within `radiusKm` of the coarse cell's `centre`, the others (a refined cell itself) beyond it.
 * Ruptures without one are used everywhere.
 */
export interface CellUse {
  readonly centre: PointXY;
  readonly radiusKm: number;
  readonly near: boolean;
}

/** Whether a rupture with `use` counts at the site (x, y), local km. */
export function cellUsedAt(
  near: boolean,
  centreX: number,
  centreY: number,
  radiusKm: number,
  x: number,
  y: number,
): boolean {
  const dx = x - centreX;
  const dy = y - centreY;
  return dx * dx + dy * dy <= radiusKm * radiusKm ? near : !near;
}

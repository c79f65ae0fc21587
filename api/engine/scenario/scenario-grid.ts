import { StudyTooLarge } from '../errors.ts';
import { ruptureDistances } from '../geometry/distances.ts';
import type { LocalFrame } from '../geometry/projection.ts';
import { mmiFromPga } from '../intensity/worden2012.ts';
import type { Study } from '../model.ts';
import type { GroundMotionModel } from '../motion/types.ts';
import { siteMotions } from './site-motions.ts';
import type { ScenarioRupture } from './scenario-rupture.ts';

/** Margin around the communities and sources that the map grid covers, km. */
const GRID_MARGIN_KM = 10;

export interface ScenarioGridOptions {
  readonly study: Study;
  readonly frame: LocalFrame;
  readonly rupture: ScenarioRupture;
  readonly branches: readonly { readonly model: GroundMotionModel; readonly weight: number }[];
  readonly spacingKm: number;
  /** One Vs30 for every grid point, m/s: a map has no site data between communities. */
  readonly vs30: number;
  readonly maxPoints: number;
  readonly notes: Set<string>;
}

export interface ScenarioGrid {
  readonly spacingKm: number;
  readonly vs30: number;
  readonly columns: number;
  readonly rows: number;
  /** Row by row from the south-west corner; WGS84 degrees. */
  readonly lon: readonly number[];
  readonly lat: readonly number[];
  readonly pgaMedianG: readonly number[];
  readonly mmiMedian: readonly number[];
}

/**
 * Median PGA and MMI of one rupture on a square grid (in the study's local frame) covering the
 * communities and the rupture with a margin.
 */
export function scenarioGrid(options: ScenarioGridOptions): ScenarioGrid {
  const { frame, rupture, spacingKm } = options;
  const xs: number[] = [];
  const ys: number[] = [];
  for (const c of options.study.communities) {
    const p = frame.toLocal([c.lon, c.lat]);
    xs.push(p.x);
    ys.push(p.y);
  }
  const corners =
    rupture.surface.kind === 'planes'
      ? rupture.surface.planes.flatMap((p) => p.corners)
      : [rupture.surface.hypocentre];
  for (const c of corners) {
    xs.push(c.x);
    ys.push(c.y);
  }
  const x0 = Math.min(...xs) - GRID_MARGIN_KM;
  const y0 = Math.min(...ys) - GRID_MARGIN_KM;
  const columns = Math.floor((Math.max(...xs) + GRID_MARGIN_KM - x0) / spacingKm) + 1;
  const rows = Math.floor((Math.max(...ys) + GRID_MARGIN_KM - y0) / spacingKm) + 1;
  if (columns * rows > options.maxPoints) {
    throw new StudyTooLarge(
      columns * rows,
      options.maxPoints,
      `scenario grid points at ${spacingKm} km spacing`,
    );
  }
  const grid = {
    spacingKm,
    vs30: options.vs30,
    columns,
    rows,
    lon: [] as number[],
    lat: [] as number[],
    pgaMedianG: [] as number[],
    mmiMedian: [] as number[],
  };
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < columns; c++) {
      const site = { x: x0 + c * spacingKm, y: y0 + r * spacingKm };
      const [lon, lat] = frame.toLonLat(site);
      const distances = ruptureDistances(rupture.surface, site);
      const pga = siteMotions({
        rupture,
        distances,
        vs30: options.vs30,
        vs30Measured: false,
        branches: options.branches,
        measures: ['PGA'],
        notes: options.notes,
      }).PGA;
      grid.lon.push(lon);
      grid.lat.push(lat);
      grid.pgaMedianG.push(pga?.median ?? 0);
      grid.mmiMedian.push(mmiFromPga(pga?.median ?? 0));
    }
  }
  return grid;
}

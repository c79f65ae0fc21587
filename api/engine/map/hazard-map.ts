import { Cancelled, InvalidInput } from '../errors.ts';
import type { LocalFrame } from '../geometry/projection.ts';
import { createFastHazard } from '../hazard/fast-site-hazard.ts';
import { createFastRates, fastSiteRates, type FastRates } from '../hazard/fast-site-rates.ts';
import { levelsFor } from '../hazard/hazard-levels.ts';
import { poissonProbability } from '../hazard/poisson.ts';
import { levelAtReturnPeriodBySearch } from '../hazard/return-period-search.ts';
import type { RuptureTable } from '../hazard/rupture-table.ts';
import { studyFrameAndTable } from '../hazard/study-rupture-table.ts';
import { countsOf, type ValidityCounts } from '../hazard/validity-counts.ts';
import type { HazardMeasure, ValiditySummary } from '../hazard/hazard-types.ts';
import type { Study } from '../model.ts';
import type { ElevationGrid } from '../terrain/elevation-grid.ts';
import { siteProxy, type SiteProxy } from '../terrain/site-proxy.ts';
import type { ModelCatalog } from '../motion/catalog.ts';
import { measureUnit, parseMeasure } from '../motion/measure.ts';
import { modelCatalog } from '../motion/registry.ts';
import type { ReturnPeriodStatus } from '../results.ts';
import { resolveBranches } from '../screening-plan.ts';
import { gridPoint, mapGrid, type LonLatBounds, type MapGrid } from './map-grid.ts';

/** What a map shows at each point. */
export type MapQuantity =
  /** The level of the measure (g; PGV cm/s) exceeded once in `returnPeriodYears` on average. */
  | { readonly kind: 'return-period'; readonly returnPeriodYears: number }
  /** The chance (0–1, Poisson) of exceeding `level` (g; PGV cm/s) at least once within `horizonYears`. */
  | { readonly kind: 'chance'; readonly level: number; readonly horizonYears: number };

/**
 * Vs30 given to every grid point by default, m/s: the B/C boundary, the reference rock of
 * BSSA14 (760 m/s), as is common practice for regional hazard maps. A map has no site data
 * between communities; the communities' own results use their own Vs30.
 */
export const MAP_VS30 = 760;

export interface HazardMapOptions {
  /** "PGA", "PGV" or "SA(T)". */
  readonly measure: string;
  readonly quantity: MapQuantity;
  readonly spacingKm: number;
  /** The box to cover; the study area by default (map-grid.ts, studyBounds). */
  readonly bounds?: LonLatBounds;
  /** Vs30 of every grid point, m/s; MAP_VS30 by default (and where `terrain` gives no proxy). */
  readonly vs30?: number;
  /**
   * The study's terrain grid: each point on land takes the slope–Vs30 proxy there
   * (terrain/site-proxy.ts) instead of the one `vs30`.
   */
  readonly terrain?: ElevationGrid;
  readonly models?: ModelCatalog;
  readonly maxPoints?: number;
  /** The study's rupture table, already built: the study is not discretised again (a worker thread's case). */
  readonly table?: RuptureTable;
}

/** One grid point's value; null where the return period's level falls off the computed curve. */
export interface MapPoint {
  readonly index: number;
  readonly column: number;
  readonly row: number;
  readonly lon: number;
  readonly lat: number;
  readonly value: number | null;
  readonly status: ReturnPeriodStatus;
}

/** Everything about a map that does not depend on the point; one per thread (it holds scratch buffers). */
export interface HazardMapPlan {
  readonly grid: MapGrid;
  readonly frame: LocalFrame;
  readonly measure: HazardMeasure;
  readonly quantity: MapQuantity;
  readonly vs30: number;
  /** Vs30 per point from the terrain's slope, where it gives one. */
  readonly proxy?: SiteProxy;
  /** g, or cm/s for PGV; for a chance map, the unit of its level. */
  readonly unit: 'g' | 'cm/s';
  readonly table: RuptureTable;
  /** Study-level warnings (PGV derived from SA). */
  readonly warnings: readonly string[];
  /** The fast path's work for the points, built on first use (a thread that only hands out chunks needs none). */
  rates(): FastRates;
}

function checkQuantity(quantity: MapQuantity): void {
  const positive = (path: string, value: number, what: string): void => {
    if (!(value > 0 && Number.isFinite(value)))
      throw new InvalidInput([{ path, message: `expected ${what} above 0, got ${value}` }]);
  };
  if (quantity.kind === 'return-period')
    positive('returnPeriodYears', quantity.returnPeriodYears, 'a return period in years');
  else {
    positive('level', quantity.level, 'a level of the measure');
    positive('horizonYears', quantity.horizonYears, 'a horizon in years');
  }
}

/** Plans a map of one study: the grid, the measure's levels, the branches and the fast path's work. */
export function planHazardMap(study: Study, options: HazardMapOptions): HazardMapPlan {
  checkQuantity(options.quantity);
  const vs30 = options.vs30 ?? MAP_VS30;
  if (!(vs30 > 0 && Number.isFinite(vs30)))
    throw new InvalidInput([{ path: 'vs30', message: `expected a Vs30 above 0 m/s, got ${vs30}` }]);
  const parsed = parseMeasure(options.measure);
  // A chance map needs the rate at its one level only; a return-period map reads the study's curve levels.
  const levels =
    options.quantity.kind === 'chance'
      ? [options.quantity.level]
      : levelsFor(study.settings.levels, options.measure, parsed);
  const measure: HazardMeasure = { key: options.measure, measure: parsed, levels };
  const warnings: string[] = [];
  if (options.terrain)
    warnings.push(
      `Vs30 at each point on land is a proxy from the topographic slope of ${options.terrain.label} (Wald & Allen 2007, active regions), not a measurement: each NEHRP class spans a range (D 180–360 m/s, C 360–760 m/s); ${vs30} m/s at sea and off the grid`,
    );
  const branches = resolveBranches(
    study,
    { all: [measure] },
    options.models ?? modelCatalog,
    warnings,
  );
  const { frame, table } = studyFrameAndTable(study, options.table);
  const grid = mapGrid(study, frame, {
    spacingKm: options.spacingKm,
    ...(options.bounds ? { bounds: options.bounds } : {}),
    ...(options.maxPoints !== undefined ? { maxPoints: options.maxPoints } : {}),
  });
  let rates: FastRates | undefined;
  const fastRates = (): FastRates =>
    (rates ??= createFastRates(
      createFastHazard({
        table,
        branches,
        measures: [measure],
        truncationSigma: study.settings.truncationSigma,
        maxDistanceKm: study.settings.maxDistanceKm,
        branchCurves: false,
      }),
    ));
  return {
    grid,
    frame,
    measure,
    quantity: options.quantity,
    vs30,
    ...(options.terrain ? { proxy: siteProxy(options.terrain) } : {}),
    unit: measureUnit(parsed),
    table,
    warnings,
    rates: fastRates,
  };
}

/** Per-model counts of predictions outside validity over a map's points (as a community's warnings give them). */
export type MapValidity = ValidityCounts;

/**
 * The values of points firstIndex .. firstIndex + count − 1 (clipped to the grid), in order;
 * `validity` collects the models' validity counts when given; `shouldStop` is polled before
 * each point (true stops with Cancelled).
 */
export function hazardMapChunk(
  plan: HazardMapPlan,
  firstIndex: number,
  count: number,
  validity?: MapValidity,
  shouldStop?: () => boolean,
): MapPoint[] {
  const { grid, quantity } = plan;
  const last = Math.min(grid.count, firstIndex + count);
  const rates = plan.rates();
  const points: MapPoint[] = [];
  // Where the last point's curve crossed the return period's rate: where to look first for the next.
  let hint: number | undefined;
  for (let index = firstIndex; index < last; index++) {
    if (shouldStop?.()) throw new Cancelled((index - firstIndex) / Math.max(1, last - firstIndex));
    const point = gridPoint(grid, index);
    const [lon, lat] = plan.frame.toLonLat(point);
    const vs30 = plan.proxy?.([lon, lat])?.vs30 ?? plan.vs30;
    const hazard = fastSiteRates(rates, { point, site: { vs30, vs30Measured: false } });
    let value: number | null;
    let status: ReturnPeriodStatus;
    if (quantity.kind === 'return-period') {
      const found = levelAtReturnPeriodBySearch(
        plan.measure.levels,
        (j) => hazard.rateAt(j),
        quantity.returnPeriodYears,
        hint,
      );
      ({ level: value, status } = found);
      if (found.index >= 0) hint = found.index;
    } else {
      value = poissonProbability(hazard.rateAt(0), quantity.horizonYears);
      status = 'ok';
    }
    if (validity) mergeValidity(validity, hazard.validity);
    const column = index % grid.columns;
    points.push({ index, column, row: (index - column) / grid.columns, lon, lat, value, status });
  }
  return points;
}

export function mergeValidity(
  into: MapValidity,
  from: readonly ValiditySummary[] | MapValidity,
): void {
  const entries =
    from instanceof Map ? [...from.entries()] : from.map((v) => [v.model, v] as const);
  for (const [model, v] of entries) {
    const summary = countsOf(into, model);
    summary.outside += v.outside;
    summary.evaluated += v.evaluated;
    if (!summary.firstNote) summary.firstNote = v.firstNote;
  }
}

/** What a finished map says about itself. */
export interface HazardMapSummary {
  readonly measure: string;
  readonly unit: 'g' | 'cm/s';
  readonly quantity: MapQuantity;
  readonly vs30: number;
  readonly spacingKm: number;
  readonly columns: number;
  readonly rows: number;
  readonly count: number;
  readonly warnings: readonly string[];
}

/** Summary of a planned map with the validity counts its points gathered. */
export function mapSummary(
  plan: Pick<HazardMapPlan, 'grid' | 'measure' | 'unit' | 'quantity' | 'vs30' | 'warnings'>,
  validity: MapValidity,
): HazardMapSummary {
  const warnings = [...plan.warnings];
  for (const [model, v] of validity) {
    if (v.outside > 0)
      warnings.push(
        `${model}: ${v.outside} of ${v.evaluated} rupture predictions over the map are outside its validity range (for example, ${v.firstNote})`,
      );
  }
  return { ...describeMap(plan), warnings };
}

/** What a planned map is of, known before any point is computed (the head of its GeoJSON). */
export function describeMap(
  plan: Pick<HazardMapPlan, 'grid' | 'measure' | 'unit' | 'quantity' | 'vs30'>,
): Omit<HazardMapSummary, 'warnings'> {
  const { grid } = plan;
  return {
    measure: plan.measure.key,
    unit: plan.unit,
    quantity: plan.quantity,
    vs30: plan.vs30,
    spacingKm: grid.spacingKm,
    columns: grid.columns,
    rows: grid.rows,
    count: grid.count,
  };
}

export interface HazardMapRunOptions {
  /** Points per chunk handed to onChunk (1,000 by default). */
  readonly chunkSize?: number;
  /** Polled between chunks; returning true stops the map with Cancelled (the chunks given so far stand). */
  readonly shouldStop?: () => boolean;
}

/**
 * A hazard map of a study on the fast path, in one thread: each chunk of points goes to
 * `onChunk` as soon as it is computed and is not kept, so memory stays flat however large the
 * grid. Returns the summary. (The parallel runner shares the chunks over worker threads.)
 */
export function hazardMap(
  study: Study,
  options: HazardMapOptions,
  onChunk: (points: readonly MapPoint[], shareDone: number) => void,
  run: HazardMapRunOptions = {},
): HazardMapSummary {
  const plan = planHazardMap(study, options);
  const chunkSize = run.chunkSize ?? 1000;
  const validity: MapValidity = new Map();
  for (let first = 0; first < plan.grid.count; first += chunkSize) {
    if (run.shouldStop?.()) throw new Cancelled(first / plan.grid.count);
    const points = hazardMapChunk(plan, first, chunkSize, validity);
    onChunk(points, Math.min(1, (first + points.length) / plan.grid.count));
  }
  return mapSummary(plan, validity);
}

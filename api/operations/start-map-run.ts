import { StudyTooLarge } from '../engine/errors.ts';
import { terrainGridsOf } from './terrain-grids.ts';
import { frameForStudy } from '../engine/geometry/projection.ts';
import { MAP_VS30 } from '../engine/map/hazard-map.ts';
import { mapGrid } from '../engine/map/map-grid.ts';
import type { Study } from '../engine/model.ts';
import { inputHash } from '../results/input-hash.ts';
import type { MapRunRecord, StudyRecord } from '../store/index.ts';
import type { MapRequest } from '../workers/messages.ts';
import { mapRunsOf, type MapRuns } from './map-runs.ts';
import { runQuickTask } from './quick-task.ts';
import type { ServiceContext } from './service-context.ts';
import { storedInputs, validateStudy } from './study-input.ts';

/**
 * Terms a map sums per point and rupture, for the work budget (work-budget.ts counts
 * communities × ruptures × levels): one level for a chance map; for a return-period map the
 * levels its search reads, about log₂ of the curve's 25 levels and two more.
 */
export const MAP_LEVELS_READ = { 'return-period': 7, chance: 1 } as const;

export interface MapWork {
  readonly points: number;
  readonly ruptures: number;
  readonly levels: number;
  /** points × (ruptures × levels + planes beyond each rupture's first). */
  readonly size: number;
}

/**
 * The work of a map of `study`, counted like a screening's (the study's ruptures measured on
 * the quick pool); throws StudyTooLarge over the budget, and the grid's own errors (spacing,
 * box, too many points) as the engine words them.
 */
export async function checkMapWork(
  ctx: ServiceContext,
  study: Study,
  request: MapRequest,
): Promise<MapWork> {
  const grid = mapGrid(study, frameForStudy(study), {
    spacingKm: request.spacingKm,
    ...(request.bounds ? { bounds: request.bounds } : {}),
  });
  const { ruptures, extraPlanes } = await runQuickTask(ctx, { kind: 'measure', study });
  const levels = MAP_LEVELS_READ[request.quantity.kind];
  // A map sums the mean only (no per-variant sums); each plane beyond a rupture's first is one
  // more distance per point, counted as one term (work-budget.ts).
  const size = grid.count * (ruptures * levels + extraPlanes);
  if (size > ctx.workBudget)
    throw new StudyTooLarge(
      size,
      ctx.workBudget,
      `${grid.count} map points x ${ruptures} ruptures x ${levels} levels read` +
        (extraPlanes > 0 ? ` + ${grid.count} map points x ${extraPlanes} planes` : ''),
    );
  return { points: grid.count, ruptures, levels, size };
}

/**
 * Starts a hazard map of a saved study, for the API and the pages alike: the saved inputs are
 * validated and the map's work checked against the budget first (InvalidInput or
 * StudyTooLarge; nothing is recorded), then the map run is recorded, queued, with the Vs30 of
 * its grid filled in (MAP_VS30 unless asked; without one asked, the study's terrain grid gives
 * each point on land the slope–Vs30 proxy), and handed to the map runs. Undefined when the
 * study was deleted meanwhile.
 */
export async function startMapRun(
  ctx: ServiceContext & { readonly maps?: MapRuns },
  record: StudyRecord,
  request: MapRequest,
): Promise<MapRunRecord | undefined> {
  const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
  const { study } = validateStudy(inputs.raw, ctx.models, inputs);
  await checkMapWork(ctx, study, request);
  // Without a Vs30 asked for, a study's terrain grid gives each point on land the slope proxy.
  const terrain =
    request.vs30 === undefined && study.terrain !== undefined
      ? await terrainGridsOf(ctx).grid(study.terrain)
      : undefined;
  if (!ctx.store.studies.get(record.id)) return undefined;
  const full = { ...request, vs30: request.vs30 ?? MAP_VS30 };
  return mapRunsOf(ctx).start(record.id, study, full, inputHash(study), terrain);
}

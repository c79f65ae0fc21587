import { Cancelled } from '../engine/errors.ts';
import {
  describeMap,
  mapSummary,
  mergeValidity,
  planHazardMap,
  type HazardMapSummary,
  type MapPoint,
  type MapValidity,
} from '../engine/map/hazard-map.ts';
import type { MapDescription } from '../engine/map/map-geojson.ts';
import type { Study } from '../engine/model.ts';
import { modelCatalog } from '../engine/motion/registry.ts';
import { newPlanKey, runChunks, type ChunkPool } from './chunk-runner.ts';
import type { MapRequest } from './messages.ts';
import type { TaskHandle, WorkerPool } from './worker-pool.ts';

/** Points per task by default: about a second of a thread's work on a study like the demo's. */
export const MAP_CHUNK_POINTS = 100;

export interface ParallelMapOptions {
  /** What the map is of and its grid, once known and before any point. */
  readonly onStart?: (description: MapDescription) => void;
  /** Each chunk of points, in grid order, with the share of the map done. */
  readonly onPoints: (points: readonly MapPoint[], shareDone: number) => void;
  /** Share of the map done, in (0, 1], as the threads report (finer than onPoints). */
  readonly onProgress?: (shareDone: number) => void;
  readonly chunkPoints?: number;
  /** Where the chunks of points go (the Redis queue, api/queue); the pool's own threads by default. */
  readonly chunks?: ChunkPool;
}

/**
 * A hazard map of a study over the pool's threads: one thread lays the ruptures out in a shared
 * table, then the grid is handed out in chunks of points; chunks are passed to `onPoints` in
 * grid order as they come and not kept, so memory stays flat whatever the grid's size. The
 * numbers are hazardMap's (map/hazard-map.ts). Resolves with the map's summary.
 */
export function hazardMapOnPool(
  pool: WorkerPool,
  study: Study,
  map: MapRequest,
  options: ParallelMapOptions,
): TaskHandle<HazardMapSummary> {
  let cancelled = false;
  let active: { cancel(): void } | undefined;
  const result = (async (): Promise<HazardMapSummary> => {
    const tableTask = pool.run({ kind: 'rupture-table', study });
    active = tableTask;
    const { table } = await tableTask.result;
    if (cancelled) throw new Cancelled(0);
    // The grid and checks of the map, here; the models' work is left to the threads (it is built lazily).
    const plan = planHazardMap(study, { ...map, models: modelCatalog, table });
    options.onStart?.(describeMap(plan));
    const size = options.chunkPoints ?? MAP_CHUNK_POINTS;
    const planKey = newPlanKey();
    const tasks = [];
    for (let first = 0; first < plan.grid.count; first += size) {
      tasks.push({
        kind: 'map-points' as const,
        planKey,
        study,
        table,
        map,
        firstIndex: first,
        count: Math.min(size, plan.grid.count - first),
      });
    }
    const validity: MapValidity = new Map();
    let pointsDone = 0;
    const run = runChunks(options.chunks ?? pool, {
      tasks,
      weights: tasks.map((t) => t.count),
      ...(options.onProgress ? { onProgress: options.onProgress } : {}),
      onOutput: (output) => {
        pointsDone += output.points.length;
        mergeValidity(validity, new Map(output.validity));
        options.onPoints(output.points, pointsDone / plan.grid.count);
      },
    });
    active = run;
    await run.result;
    return mapSummary(plan, validity);
  })();
  return {
    result,
    cancel() {
      cancelled = true;
      active?.cancel();
    },
  };
}

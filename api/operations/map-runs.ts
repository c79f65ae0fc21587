import type { HazardMapSummary } from '../engine/map/hazard-map.ts';
import type { ElevationGrid } from '../engine/terrain/elevation-grid.ts';
import {
  mapDescription,
  mapGeoJsonFeatures,
  mapGeoJsonHead,
  mapGeoJsonTail,
  type MapDescription,
} from '../engine/map/map-geojson.ts';
import type { Study } from '../engine/model.ts';
import { PooledJobs, type PooledJobsOptions } from '../jobs/pooled-jobs.ts';
import { mapLedger } from '../jobs/store-ledgers.ts';
import { buildProvenance } from '../results/provenance.ts';
import type { MapRunOutputs, MapRunRecord, MapRunRequest, Store } from '../store/index.ts';
import type { ChunkPool } from '../workers/chunk-runner.ts';
import { hazardMapOnPool } from '../workers/parallel-map.ts';
import type { WorkerPool } from '../workers/worker-pool.ts';

/**
 * Hazard-map runs of saved studies, spread over the run pool (parallel-map.ts) and recorded
 * in the store through the one job lifecycle (job-lifecycle.ts): queued when asked for, running
 * once the study's ruptures are laid out and the grid is known, progress as the points come,
 * then done (the GeoJSON written in the statement that marks it done), failed, cancelled, or
 * interrupted by a shutdown. Only the GeoJSON of a map still computing is held here, piece by
 * piece; a finished map is read from the store and outlives the service.
 */
export class MapRuns extends PooledJobs<MapDescription, MapRunOutputs> {
  readonly #store: Store;

  /** `chunks`: where the map's chunks of points go; the pool's threads by default. */
  constructor(options: PooledJobsOptions) {
    super(options, mapLedger(options.store));
    this.#store = options.store;
  }

  /**
   * Records a queued map run of `study` (the saved study `studyId`, validated) and starts it.
   * With `terrain` (the study's grid), each point on land takes the slope–Vs30 proxy and
   * `request.vs30` holds only at sea and off the grid; the map's warnings say so.
   */
  start(
    studyId: string,
    study: Study,
    request: MapRunRequest,
    inputHash: string,
    terrain?: ElevationGrid,
  ): MapRunRecord {
    const record = this.#store.maps.create({ studyId, request, inputHash });
    const pieces: string[] = [];
    let description: MapDescription | undefined;
    let first = true;
    this.jobs.start({
      id: record.id,
      ledger: this.ledger,
      kind: 'map run',
      progressOf: 'points',
      launch: (signals) =>
        hazardMapOnPool(this.pool, study, terrain ? { ...request, terrain } : request, {
          ...(this.chunks ? { chunks: this.chunks } : {}),
          onStart: (d) => {
            description = mapDescription(d);
            pieces.push(mapGeoJsonHead(d));
            signals.started(description);
          },
          onPoints: (points, share) => {
            pieces.push(mapGeoJsonFeatures(description as MapDescription, points, first));
            first &&= points.length === 0;
            signals.progress(share);
          },
          onProgress: (share) => signals.progress(share),
        }),
      done: (summary: HazardMapSummary, startedAt) => {
        pieces.push(mapGeoJsonTail(summary));
        const finishedAt = new Date().toISOString();
        const provenance = {
          ...buildProvenance({
            study,
            toolVersion: this.toolVersion,
            inputHash,
            startedAt,
            finishedAt,
          }),
          map: request,
        };
        return {
          geojson: pieces.join(''),
          warnings: summary.warnings,
          provenanceJson: JSON.stringify(provenance),
          finishedAt,
        };
      },
      settled: () => {
        pieces.length = 0;
      },
    });
    return record;
  }
}

/** One MapRuns per store: the API's routes and the pages share it, so either can cancel what the other started. */
const perStore = new WeakMap<Store, MapRuns>();

/**
 * The map runs of a service: `ctx.maps` when the context carries its own (tests), else the
 * one kept for the context's store, made on first use with the run pool.
 */
export function mapRunsOf(ctx: {
  readonly store: Store;
  readonly runPool: WorkerPool;
  readonly toolVersion: string;
  readonly maps?: MapRuns;
  readonly queue?: ChunkPool;
}): MapRuns {
  if (ctx.maps) return ctx.maps;
  let runs = perStore.get(ctx.store);
  if (!runs) {
    runs = new MapRuns({
      store: ctx.store,
      pool: ctx.runPool,
      toolVersion: ctx.toolVersion,
      ...(ctx.queue ? { chunks: ctx.queue } : {}),
    });
    perStore.set(ctx.store, runs);
  }
  return runs;
}

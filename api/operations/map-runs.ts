import { randomUUID } from 'node:crypto';
import { Cancelled, TremoraError } from '../engine/errors.ts';
import type { HazardMapSummary } from '../engine/map/hazard-map.ts';
import { mapDescription, mapGeoJsonFeatures, mapGeoJsonHead, mapGeoJsonTail, type MapDescription } from '../engine/map/map-geojson.ts';
import type { Study } from '../engine/model.ts';
import { buildProvenance } from '../results/provenance.ts';
import { INTERRUPTED_MESSAGE, type MapRunRecord, type MapRunRequest, type Store } from '../store/index.ts';
import { hazardMapOnPool } from '../workers/parallel-map.ts';
import { PoolClosed, type WorkerCrashed } from '../workers/task-errors.ts';
import type { TaskHandle, WorkerPool } from '../workers/worker-pool.ts';

/**
 * Smallest rise in a map's progress written to the store, as a share of its points: the
 * threads report far more often than anyone reads, and each write is a synced commit.
 */
const PROGRESS_STEP = 0.01;

export interface MapRunsOptions {
  readonly store: Store;
  /** The threads maps are spread over (the run pool). */
  readonly pool: WorkerPool;
  readonly toolVersion: string;
  readonly logError?: (id: string, context: string, error: unknown) => void;
}

const percent = (share: number): string => `${Math.round(share * 100)}%`;

/**
 * Hazard-map runs of saved studies, spread over the run pool (parallel-map.ts) and recorded
 * in the store as the screening scheduler records runs: queued when asked for, running once
 * the study's ruptures are laid out and the grid is known, progress as the points come, then
 * done (the GeoJSON written in the statement that marks it done), failed, cancelled, or
 * interrupted by a shutdown. Only the GeoJSON of a map still computing is held here, piece by
 * piece; a finished map is read from the store and outlives the service.
 */
export class MapRuns {
  readonly #store: Store;
  readonly #pool: WorkerPool;
  readonly #toolVersion: string;
  readonly #logError: (id: string, context: string, error: unknown) => void;
  readonly #active = new Map<string, TaskHandle<HazardMapSummary>>();

  constructor(options: MapRunsOptions) {
    this.#store = options.store;
    this.#pool = options.pool;
    this.#toolVersion = options.toolVersion;
    this.#logError = options.logError ?? ((id, context, error) => console.error(`[${id}] ${context}`, error));
  }

  /** Records a queued map run of `study` (the saved study `studyId`, validated) and starts it. */
  start(studyId: string, study: Study, request: MapRunRequest, inputHash: string): MapRunRecord {
    const maps = this.#store.maps;
    const record = maps.create({ studyId, request, inputHash });
    const id = record.id;
    const pieces: string[] = [];
    let description: MapDescription | undefined;
    let startedAt = record.createdAt;
    let first = true;
    let shareDone = 0;
    let written = 0;
    const progress = (share: number): void => {
      shareDone = Math.max(shareDone, share);
      if (share - written < PROGRESS_STEP) return;
      written = share;
      this.#write(id, () => maps.setProgress(id, share));
    };
    const handle = hazardMapOnPool(this.#pool, study, request, {
      onStart: (d) => {
        description = mapDescription(d);
        pieces.push(mapGeoJsonHead(d));
        startedAt = new Date().toISOString();
        this.#write(id, () => maps.markRunning(id, startedAt, description as MapDescription));
      },
      onPoints: (points, share) => {
        pieces.push(mapGeoJsonFeatures(description as MapDescription, points, first));
        first &&= points.length === 0;
        progress(share);
      },
      onProgress: progress,
    });
    this.#active.set(id, handle);
    handle.result
      .then((summary) => {
        pieces.push(mapGeoJsonTail(summary));
        const finishedAt = new Date().toISOString();
        const provenance = { ...buildProvenance({ study, toolVersion: this.#toolVersion, inputHash, startedAt, finishedAt }), map: request };
        maps.finishDone(id, { geojson: pieces.join(''), warnings: summary.warnings, provenanceJson: JSON.stringify(provenance), finishedAt });
      })
      .catch((error: unknown) => this.#recordFailure(id, error, shareDone))
      .catch((error: unknown) => this.#logError(randomUUID(), `could not record the end of map run ${id}`, error))
      .finally(() => {
        pieces.length = 0;
        this.#active.delete(id);
      });
    return record;
  }

  /** Asks an active map run to stop; false when it is not active in this process. */
  cancel(id: string): boolean {
    const handle = this.#active.get(id);
    if (!handle) return false;
    handle.cancel();
    return true;
  }

  get activeCount(): number {
    return this.#active.size;
  }

  /** A store write made from the threads' callbacks: a failure is logged, never thrown into the pool's machinery. */
  #write(id: string, write: () => unknown): void {
    try {
      write();
    } catch (error) {
      this.#logError(randomUUID(), `could not record the progress of map run ${id}`, error);
    }
  }

  #recordFailure(id: string, error: unknown, shareDone: number): void {
    const maps = this.#store.maps;
    if (error instanceof Cancelled) {
      maps.finishWithout(id, 'cancelled', `cancelled on request after ${percent(shareDone)} of the points`);
    } else if (error instanceof PoolClosed) {
      maps.finishWithout(id, 'interrupted', INTERRUPTED_MESSAGE);
    } else if (error instanceof TremoraError) {
      maps.finishWithout(id, 'failed', error.message);
    } else {
      const errorId = randomUUID();
      this.#logError(errorId, `map run ${id} failed`, error);
      const what = (error as Partial<WorkerCrashed>).name === 'WorkerCrashed' ? (error as Error).message : 'internal error';
      maps.finishWithout(id, 'failed', `${what} (error id ${errorId}); the service is still running`);
    }
  }
}

/** One MapRuns per store: the API's routes and the pages share it, so either can cancel what the other started. */
const perStore = new WeakMap<Store, MapRuns>();

/**
 * The map runs of a service: `ctx.maps` when the context carries its own (tests), else the
 * one kept for the context's store, made on first use with the run pool.
 */
export function mapRunsOf(ctx: { readonly store: Store; readonly runPool: WorkerPool; readonly toolVersion: string; readonly maps?: MapRuns }): MapRuns {
  if (ctx.maps) return ctx.maps;
  let runs = perStore.get(ctx.store);
  if (!runs) {
    runs = new MapRuns({ store: ctx.store, pool: ctx.runPool, toolVersion: ctx.toolVersion });
    perStore.set(ctx.store, runs);
  }
  return runs;
}

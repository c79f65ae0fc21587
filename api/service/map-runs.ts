import { randomUUID } from 'node:crypto';
import { Cancelled, TremoraError } from '../engine/errors.ts';
import type { HazardMapSummary } from '../engine/map/hazard-map.ts';
import { mapGeoJsonFeatures, mapGeoJsonHead, mapGeoJsonTail, type MapDescription } from '../engine/map/map-geojson.ts';
import type { Study } from '../engine/model.ts';
import { newId } from '../store/new-id.ts';
import type { MapRequest } from '../workers/messages.ts';
import { hazardMapOnPool } from '../workers/parallel-map.ts';
import type { TaskHandle, WorkerPool } from '../workers/worker-pool.ts';

export type MapRunStatus = 'running' | 'done' | 'failed' | 'cancelled';

/** A map run as the service keeps it: its state, and its GeoJSON as the pieces arrived. */
export interface MapRun {
  readonly id: string;
  readonly studyId: string;
  readonly request: MapRequest;
  status: MapRunStatus;
  /** Share of the points done, 0 to 1. */
  progress: number;
  description: MapDescription | null;
  summary: HazardMapSummary | null;
  error: string | null;
  readonly createdAt: string;
  finishedAt: string | null;
  /** The GeoJSON text, piece by piece (head, features, tail). */
  readonly geojson: string[];
}

/** Finished map runs kept for reading; the oldest go first. A map's GeoJSON is about 200 bytes a point. */
export const KEPT_MAP_RUNS = 8;

/**
 * Map runs of the service: each spread over the run pool (parallel-map.ts), followed through
 * its status while its chunks arrive. Kept in memory, not in the store: a map is derived from a
 * saved study at any time and is recomputed after a restart (a store table for maps would keep
 * them; see the issue report).
 */
export class MapRuns {
  readonly #runs = new Map<string, MapRun>();
  readonly #active = new Map<string, TaskHandle<HazardMapSummary>>();
  readonly #logError: (id: string, context: string, error: unknown) => void;

  constructor(logError: (id: string, context: string, error: unknown) => void = (id, context, error) => console.error(`[${id}] ${context}`, error)) {
    this.#logError = logError;
  }

  start(pool: WorkerPool, studyId: string, study: Study, request: MapRequest): MapRun {
    const run: MapRun = {
      id: newId(),
      studyId,
      request,
      status: 'running',
      progress: 0,
      description: null,
      summary: null,
      error: null,
      createdAt: new Date().toISOString(),
      finishedAt: null,
      geojson: [],
    };
    this.#runs.set(run.id, run);
    let first = true;
    const handle = hazardMapOnPool(pool, study, request, {
      onStart: (d) => {
        run.description = d;
        run.geojson.push(mapGeoJsonHead(d));
      },
      onPoints: (points, share) => {
        run.geojson.push(mapGeoJsonFeatures(run.description!, points, first));
        first = false;
        run.progress = share;
      },
      onProgress: (share) => (run.progress = Math.max(run.progress, share)),
    });
    this.#active.set(run.id, handle);
    handle.result
      .then((summary) => {
        run.summary = summary;
        run.geojson.push(mapGeoJsonTail(summary));
        run.progress = 1;
        run.status = 'done';
      })
      .catch((error: unknown) => {
        run.geojson.length = 0;
        if (error instanceof Cancelled) {
          run.status = 'cancelled';
          run.error = `cancelled on request after ${Math.round(run.progress * 100)}% of the points`;
        } else if (error instanceof TremoraError) {
          run.status = 'failed';
          run.error = error.message;
        } else {
          const id = randomUUID();
          this.#logError(id, `map run ${run.id} failed`, error);
          run.status = 'failed';
          run.error = `internal error (error id ${id}); the service is still running`;
        }
      })
      .finally(() => {
        run.finishedAt = new Date().toISOString();
        this.#active.delete(run.id);
        this.#forgetOld();
      });
    return run;
  }

  get(id: string): MapRun | undefined {
    return this.#runs.get(id);
  }

  listForStudy(studyId: string): MapRun[] {
    return [...this.#runs.values()].filter((r) => r.studyId === studyId);
  }

  /** Asks a running map to stop; false when it is not running. */
  cancel(id: string): boolean {
    const handle = this.#active.get(id);
    if (!handle) return false;
    handle.cancel();
    return true;
  }

  #forgetOld(): void {
    const finished = [...this.#runs.values()].filter((r) => r.status !== 'running');
    for (const run of finished.slice(0, Math.max(0, finished.length - KEPT_MAP_RUNS))) this.#runs.delete(run.id);
  }
}

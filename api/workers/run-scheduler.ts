import { randomUUID } from 'node:crypto';
import { Cancelled, TremoraError } from '../engine/errors.ts';
import type { Study } from '../engine/model.ts';
import type { RunRecord, Store } from '../store/index.ts';
import { PoolClosed, type WorkerCrashed } from './task-errors.ts';
import type { TaskHandle, WorkerPool } from './worker-pool.ts';
import type { ScreenOutput } from './messages.ts';
import { spreadScreening } from './parallel-screen.ts';

export interface RunSchedulerOptions {
  readonly store: Store;
  readonly pool: WorkerPool;
  readonly toolVersion: string;
  /** Where unexpected failures go, with the id their run's error names. */
  readonly logError?: (id: string, context: string, error: unknown) => void;
  /**
   * Spread each run's communities over every thread of the pool (parallel-screen.ts) instead of
   * one 'screen' task on one thread: faster on a pool of several threads, the same numbers.
   * Off by default (the pool's workers must then speak the chunk tasks, as run-worker.ts does).
   */
  readonly spreadOverPool?: boolean;
}

const percent = (share: number): string => `${Math.round(share * 100)}%`;

/**
 * Runs saved studies on the worker pool and records each run's life in the store: running
 * when a worker takes it, progress as it reports, then done (results and provenance written in
 * the statement that marks it done), failed, cancelled, or interrupted by a shutdown.
 */
export class RunScheduler {
  readonly #store: Store;
  readonly #pool: WorkerPool;
  readonly #toolVersion: string;
  readonly #logError: (id: string, context: string, error: unknown) => void;
  readonly #active = new Map<string, TaskHandle<ScreenOutput>>();
  readonly #spread: boolean;

  constructor(options: RunSchedulerOptions) {
    this.#store = options.store;
    this.#pool = options.pool;
    this.#toolVersion = options.toolVersion;
    this.#logError = options.logError ?? ((id, context, error) => console.error(`[${id}] ${context}`, error));
    this.#spread = options.spreadOverPool ?? false;
  }

  /** Queues a run the store holds as 'queued', computing `study` (the run's validated inputs). */
  start(run: RunRecord, study: Study): void {
    const runs = this.#store.runs;
    const events = { onStart: (at: string) => runs.markRunning(run.id, at), onProgress: (share: number) => runs.setProgress(run.id, share) };
    const handle = this.#spread
      ? spreadScreening(this.#pool, study, run.inputHash, this.#toolVersion, events)
      : this.#pool.run({ kind: 'screen', study, inputHash: run.inputHash, toolVersion: this.#toolVersion }, events);
    this.#active.set(run.id, handle);
    handle.result
      .then((output) => {
        runs.finishDone(run.id, { resultsJson: output.resultsJson, provenanceJson: JSON.stringify(output.provenance), finishedAt: output.provenance.finishedAt });
      })
      .catch((error: unknown) => this.#recordFailure(run.id, error))
      .catch((error: unknown) => this.#logError(randomUUID(), `could not record the end of run ${run.id}`, error))
      .finally(() => this.#active.delete(run.id));
  }

  /** Asks an active run to stop; false when the run is not active in this process. */
  cancel(runId: string): boolean {
    const handle = this.#active.get(runId);
    if (!handle) return false;
    handle.cancel();
    return true;
  }

  get activeCount(): number {
    return this.#active.size;
  }

  #recordFailure(runId: string, error: unknown): void {
    const runs = this.#store.runs;
    if (error instanceof Cancelled) {
      runs.finishWithout(runId, 'cancelled', `cancelled on request after ${percent(error.shareDone)} of the work`);
    } else if (error instanceof PoolClosed) {
      runs.finishWithout(runId, 'interrupted', 'the service stopped before this run finished; start a new run');
    } else if (error instanceof TremoraError) {
      runs.finishWithout(runId, 'failed', error.message);
    } else {
      const id = randomUUID();
      this.#logError(id, `run ${runId} failed`, error);
      const what = (error as Partial<WorkerCrashed>).name === 'WorkerCrashed' ? (error as Error).message : 'internal error';
      runs.finishWithout(runId, 'failed', `${what} (error id ${id}); the service is still running`);
    }
  }
}

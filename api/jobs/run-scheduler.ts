import type { Study } from '../engine/model.ts';
import { isQueuedScreening } from '../queue/queued-screening.ts';
import type { RunRecord, Store } from '../store/index.ts';
import type { ChunkPool } from '../workers/chunk-runner.ts';
import { spreadScreening } from '../workers/parallel-screen.ts';
import type { WorkerPool } from '../workers/worker-pool.ts';
import { JobLifecycle, type LogError } from './job-lifecycle.ts';
import { runLedger } from './store-ledgers.ts';

export interface RunSchedulerOptions {
  readonly store: Store;
  readonly pool: WorkerPool;
  readonly toolVersion: string;
  /** Where unexpected failures go, with the id their run's error names. */
  readonly logError?: LogError;
  /**
   * Spread each run's communities over every thread of the pool (parallel-screen.ts) instead of
   * one 'screen' task on one thread: faster on a pool of several threads, the same numbers.
   * Off by default (the pool's workers must then speak the chunk tasks, as run-worker.ts does).
   */
  readonly spreadOverPool?: boolean;
  /**
   * The Redis queue of `tremora worker` machines (TREMORA_QUEUE): the communities of a screening
   * of at least QUEUED_SCREENING_COMMUNITIES (queued-screening.ts) go there, in chunks; smaller
   * ones stay here.
   */
  readonly chunks?: ChunkPool;
}

/**
 * Screening runs of saved studies on the worker pool, their life recorded in the store through
 * the one job lifecycle (job-lifecycle.ts): running when a worker takes the run, progress as it
 * reports, then done (results and provenance written in the statement that marks it done),
 * failed, cancelled, or interrupted by a shutdown.
 */
export class RunScheduler {
  readonly #pool: WorkerPool;
  readonly #toolVersion: string;
  readonly #spread: boolean;
  readonly #chunks: ChunkPool | undefined;
  readonly #ledger: ReturnType<typeof runLedger>;
  readonly #jobs: JobLifecycle;

  constructor(options: RunSchedulerOptions) {
    this.#pool = options.pool;
    this.#toolVersion = options.toolVersion;
    this.#spread = options.spreadOverPool ?? false;
    this.#chunks = options.chunks;
    this.#ledger = runLedger(options.store);
    this.#jobs = new JobLifecycle(options.logError);
  }

  /** Starts a run the store holds as 'queued', computing `study` (the run's validated inputs). */
  start(run: RunRecord, study: Study): void {
    this.#jobs.start({
      id: run.id,
      ledger: this.#ledger,
      kind: 'run',
      progressOf: 'work',
      launch: (signals) => {
        const events = {
          onStart: () => signals.started(),
          onProgress: (share: number) => signals.progress(share),
        };
        const queue = isQueuedScreening(study) ? this.#chunks : undefined;
        return queue
          ? spreadScreening(this.#pool, study, run.inputHash, this.#toolVersion, events, queue)
          : this.#spread
            ? spreadScreening(this.#pool, study, run.inputHash, this.#toolVersion, events)
            : this.#pool.run(
                { kind: 'screen', study, inputHash: run.inputHash, toolVersion: this.#toolVersion },
                events,
              );
      },
      done: (output) => ({
        resultsJson: output.resultsJson,
        provenanceJson: JSON.stringify(output.provenance),
        finishedAt: output.provenance.finishedAt,
      }),
    });
  }

  /** Asks an active run to stop; false when the run is not active in this process. */
  cancel(runId: string): boolean {
    return this.#jobs.cancel(runId);
  }

  get activeCount(): number {
    return this.#jobs.activeCount;
  }
}

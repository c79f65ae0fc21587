import type { Study } from '../engine/model.ts';
import { isQueuedScreening } from '../queue/queued-screening.ts';
import type { RunOutputs, RunRecord } from '../store/index.ts';
import type { ChunkPool } from '../workers/chunk-runner.ts';
import { spreadScreening } from '../workers/parallel-screen.ts';
import { PooledJobs, type PooledJobsOptions } from './pooled-jobs.ts';
import { runLedger } from './store-ledgers.ts';

export interface RunSchedulerOptions extends PooledJobsOptions {
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
export class RunScheduler extends PooledJobs<void, RunOutputs> {
  readonly #spread: boolean;

  constructor(options: RunSchedulerOptions) {
    super(options, runLedger(options.store));
    this.#spread = options.spreadOverPool ?? false;
  }

  /** Starts a run the store holds as 'queued', computing `study` (the run's validated inputs). */
  start(run: RunRecord, study: Study): void {
    this.jobs.start({
      id: run.id,
      ledger: this.ledger,
      kind: 'run',
      progressOf: 'work',
      launch: (signals) => {
        const events = {
          onStart: () => signals.started(),
          onProgress: (share: number) => signals.progress(share),
        };
        const queue = isQueuedScreening(study) ? this.chunks : undefined;
        return queue
          ? spreadScreening(this.pool, study, run.inputHash, this.toolVersion, events, queue)
          : this.#spread
            ? spreadScreening(this.pool, study, run.inputHash, this.toolVersion, events)
            : this.pool.run(
                { kind: 'screen', study, inputHash: run.inputHash, toolVersion: this.toolVersion },
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
}

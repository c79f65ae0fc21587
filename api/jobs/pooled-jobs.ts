import type { Store } from '../store/index.ts';
import type { ChunkPool } from '../workers/chunk-runner.ts';
import type { WorkerPool } from '../workers/worker-pool.ts';
import type { JobLedger } from './job-ledger.ts';
import { JobLifecycle, type LogError } from './job-lifecycle.ts';

/** What a kind of job computed on the run pool is made with. */
export interface PooledJobsOptions {
  readonly store: Store;
  /** The threads the jobs are computed on (the run pool). */
  readonly pool: WorkerPool;
  readonly toolVersion: string;
  /** Where unexpected failures go, with the id their job's error names. */
  readonly logError?: LogError;
  /** Where chunks of the work may go (the Redis queue of `tremora worker` machines). */
  readonly chunks?: ChunkPool;
}

/**
 * One kind of job computed on the run pool, or the queue, and recorded in the store through the
 * one job lifecycle (job-lifecycle.ts): screening runs (run-scheduler.ts) and hazard-map runs
 * (operations/map-runs.ts). Each starts its jobs its own way; stopping and counting them is alike.
 */
export abstract class PooledJobs<Started, Done> {
  protected readonly pool: WorkerPool;
  protected readonly toolVersion: string;
  protected readonly chunks: ChunkPool | undefined;
  protected readonly ledger: JobLedger<Started, Done>;
  protected readonly jobs: JobLifecycle;

  protected constructor(options: PooledJobsOptions, ledger: JobLedger<Started, Done>) {
    this.pool = options.pool;
    this.toolVersion = options.toolVersion;
    this.chunks = options.chunks;
    this.ledger = ledger;
    this.jobs = new JobLifecycle(options.logError);
  }

  /** Asks an active job to stop; false when it is not active in this process. */
  cancel(id: string): boolean {
    return this.jobs.cancel(id);
  }

  get activeCount(): number {
    return this.jobs.activeCount;
  }
}

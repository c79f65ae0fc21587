import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { Store } from '../store/index.ts';
import type { RunScheduler } from '../workers/run-scheduler.ts';
import type { WorkerPool } from '../workers/worker-pool.ts';

/** What the routes work with; server.ts builds it, tests build their own. */
export interface ServiceContext {
  readonly store: Store;
  readonly scheduler: RunScheduler;
  /** Threads for screenings (saved runs and stateless computes). */
  readonly runPool: WorkerPool;
  /**
   * One thread for short tasks a request waits on (sizing a study, a scenario), so they are
   * never queued behind a screening that may take minutes.
   */
  readonly quickPool: WorkerPool;
  readonly models: ModelCatalog;
  readonly toolVersion: string;
  /** Most work one screening may ask for (work-budget.ts). */
  readonly workBudget: number;
}

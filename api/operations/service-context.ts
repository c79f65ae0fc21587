import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { Store } from '../store/index.ts';
import type { RunScheduler } from '../jobs/run-scheduler.ts';
import type { ChunkPool } from '../workers/chunk-runner.ts';
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
  /** How long one request may keep the quick thread, s (quick-task.ts; TREMORA_QUICK_LIMIT_S). */
  readonly quickLimitS?: number;
  readonly models: ModelCatalog;
  readonly toolVersion: string;
  /** Most work one screening may ask for (work-budget.ts). */
  readonly workBudget: number;
  /** The Redis queue of `tremora worker` machines (TREMORA_QUEUE), for map chunks; absent: the run pool's threads. */
  readonly queue?: ChunkPool;
}

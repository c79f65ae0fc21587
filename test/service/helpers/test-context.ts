import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { RunScheduler } from '../../../api/jobs/run-scheduler.ts';
import type { ServiceContext } from '../../../api/operations/service-context.ts';
import { openStore } from '../../../api/store/store.ts';
import { WorkerPool } from '../../../api/workers/worker-pool.ts';

/**
 * A service context for tests through app.request(): a store at `dbPath`, one-thread run and
 * quick pools that log nothing, the registered models, tool version "test".
 */
export function testServiceContext(dbPath: string, workBudget: number): ServiceContext {
  const store = openStore(dbPath);
  const runPool = new WorkerPool({ size: 1, log: () => {} });
  const quickPool = new WorkerPool({ size: 1, log: () => {} });
  return {
    store,
    runPool,
    quickPool,
    scheduler: new RunScheduler({ store, pool: runPool, toolVersion: 'test' }),
    models: modelCatalog,
    toolVersion: 'test',
    workBudget,
  };
}

/** Closes what testServiceContext opened: both pools, then the store. */
export async function closeServiceContext(ctx: ServiceContext): Promise<void> {
  await Promise.all([ctx.runPool.close(), ctx.quickPool.close()]);
  ctx.store.close();
}

import { afterAll, describe, expect, it } from 'vitest';
import { Cancelled } from '../../api/engine/errors.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { QuickTaskTooLong, runQuickTask } from '../../api/operations/quick-task.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { WorkerPool } from '../../api/workers/worker-pool.ts';
import { smallStudy } from '../service/helpers/small-study.ts';

/**
 * The quick thread's guard: a task is stopped when its request's client goes away and when it
 * runs past the time limit, and the thread is free for the next request afterwards.
 */
const quickPool = new WorkerPool({ size: 1, log: () => {} });
afterAll(() => quickPool.close());

const contextWith = (quickLimitS: number) =>
  ({ quickPool, models: modelCatalog, quickLimitS }) as unknown as ServiceContext;
const study = (() => {
  const loaded = loadStudy(smallStudy(), { models: modelCatalog });
  if (!loaded.ok) throw new Error('the small study must load');
  return loaded.study;
})();

describe('runQuickTask', () => {
  it('answers within the limit', async () => {
    const { ruptures } = await runQuickTask(contextWith(600), { kind: 'measure', study });
    expect(ruptures).toBeGreaterThan(0);
  });

  it('stops a task past the limit with QuickTaskTooLong', async () => {
    const pool = new PoolThatNeverAnswers();
    const late = runQuickTask(withPool(pool, 0.05), { kind: 'measure', study });
    await expect(late).rejects.toBeInstanceOf(QuickTaskTooLong);
    await expect(late).rejects.toThrow(/longer than 0\.05 s/);
    expect(pool.cancels).toBe(1);
  });

  it("stops a task whose request's client has gone, before it starts or while it runs", async () => {
    const pool = new PoolThatNeverAnswers();
    const gone = new AbortController();
    gone.abort();
    await expect(
      runQuickTask(withPool(pool, 600), { kind: 'measure', study }, gone.signal),
    ).rejects.toBeInstanceOf(Cancelled);
    const going = new AbortController();
    const task = runQuickTask(withPool(pool, 600), { kind: 'measure', study }, going.signal);
    going.abort();
    await expect(task).rejects.toBeInstanceOf(Cancelled);
    expect(pool.cancels).toBe(2);
  });

  it('leaves the real thread free for the next task after a stop', async () => {
    const going = new AbortController();
    const task = runQuickTask(contextWith(600), { kind: 'measure', study }, going.signal);
    going.abort();
    await expect(task).rejects.toBeInstanceOf(Cancelled);
    const { ruptures } = await runQuickTask(contextWith(600), { kind: 'measure', study });
    expect(ruptures).toBeGreaterThan(0);
  });
});

/** A stand-in for the quick pool whose task runs until it is cancelled: the guard's timing is then the test's own. */
class PoolThatNeverAnswers {
  cancels = 0;
  run() {
    return { result: new Promise<never>(() => {}), cancel: () => void this.cancels++ };
  }
}
const withPool = (pool: PoolThatNeverAnswers, quickLimitS: number) =>
  ({ quickPool: pool, quickLimitS }) as unknown as ServiceContext;

import type { RuptureTable } from '../engine/hazard/rupture-table.ts';
import { joinRuptureTables } from '../engine/hazard/rupture-table-builder.ts';
import type { Study } from '../engine/model.ts';
import type { TaskEvents, TaskHandle, WorkerPool } from './worker-pool.ts';

/** Shared memory for a table's columns. */
const sharedMemory = (bytes: number): SharedArrayBuffer => new SharedArrayBuffer(bytes);

/**
 * The table with every column on shared memory: posting it to a worker thread then passes the
 * memory itself, where a plain typed array would be copied (several MB for a study like the
 * demo's) for every chunk of work. Nothing writes to a table once built, so sharing is safe.
 */
export const shareTable = (table: RuptureTable): RuptureTable =>
  joinRuptureTables([table], sharedMemory);

/** Parts per thread the sources are split into, so that a thread done early takes another. */
const PARTS_PER_THREAD = 4;

/**
 * A study's rupture table on shared memory, laid out over the pool's threads: the sources are
 * split into consecutive parts (one per source while there are few), each part's table is laid
 * out on a thread, and the parts are joined in order (joinRuptureTables), which gives the
 * table one thread would lay out, whatever the number of threads. `events.onStart` hears the
 * first part start.
 */
export function tableOnPool(
  pool: Pick<WorkerPool, 'run' | 'size'>,
  study: Study,
  events: TaskEvents = {},
): TaskHandle<RuptureTable> {
  const sourceCount = study.sources.length;
  const parts = Math.min(sourceCount, pool.size === 1 ? 1 : PARTS_PER_THREAD * pool.size);
  if (parts <= 1) {
    const task = pool.run({ kind: 'rupture-table', study }, events);
    return { result: task.result.then((o) => o.table), cancel: () => task.cancel() };
  }
  let started = false;
  const onStart = (at: string): void => {
    if (started) return;
    started = true;
    events.onStart?.(at);
  };
  const tasks = Array.from({ length: parts }, (_, p) =>
    pool.run(
      {
        kind: 'rupture-table',
        study,
        sources: {
          first: Math.floor((p * sourceCount) / parts),
          end: Math.floor(((p + 1) * sourceCount) / parts),
        },
      },
      { onStart },
    ),
  );
  const cancel = (): void => tasks.forEach((t) => t.cancel());
  const result = Promise.all(tasks.map((t) => t.result)).then(
    (outputs) =>
      joinRuptureTables(
        outputs.map((o) => o.table),
        sharedMemory,
      ),
    (error: unknown) => {
      cancel();
      throw error;
    },
  );
  return { result, cancel };
}

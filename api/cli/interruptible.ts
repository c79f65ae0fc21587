import type { TaskHandle } from '../workers/worker-pool.ts';

/**
 * A run's result, the run cancelled on Ctrl-C or SIGTERM rather than the process ended at once:
 * on threads it stops them; through the queue it marks the run in Redis, so every
 * `tremora worker` leaves its chunks instead of computing them for nobody. The result then
 * rejects with Cancelled.
 */
export async function untilDoneOrInterrupted<T>(handle: TaskHandle<T>): Promise<T> {
  const cancel = (): void => handle.cancel();
  process.once('SIGINT', cancel);
  process.once('SIGTERM', cancel);
  try {
    return await handle.result;
  } finally {
    process.off('SIGINT', cancel);
    process.off('SIGTERM', cancel);
  }
}

import { randomUUID } from 'node:crypto';
import { Cancelled } from '../engine/errors.ts';
import type { TaskKind, TaskOutputs, WorkerTask } from './messages.ts';
import type { TaskEvents, TaskHandle } from './worker-pool.ts';

/** A key naming one run's plan in the threads (parallel-tasks.ts keeps plans by it). */
export const newPlanKey = (): string => randomUUID();

/**
 * Where chunks of a run are computed: the pool of threads (worker-pool.ts) or the Redis queue
 * of many machines (api/queue). `size` is how many chunks it works on at once.
 */
export interface ChunkPool {
  readonly size: number;
  run<K extends TaskKind>(
    task: Extract<WorkerTask, { kind: K }>,
    events?: TaskEvents,
  ): TaskHandle<TaskOutputs[K]>;
}

export interface ChunkRun<K extends TaskKind> {
  readonly tasks: readonly Extract<WorkerTask, { kind: K }>[];
  /** Each task's share of the work (e.g. its points), for progress; equal shares by default. */
  readonly weights?: readonly number[];
  /** Share of all the tasks' work done, in (0, 1]. */
  readonly onProgress?: (shareDone: number) => void;
  /**
   * Each task's output, in task order, as soon as it and all before it are done. When given,
   * outputs are not kept (the result resolves with an empty list), so memory stays flat.
   */
  readonly onOutput?: (output: TaskOutputs[K], index: number) => void;
  /** Most tasks queued or running at once; twice the pool's threads by default. */
  readonly window?: number;
}

/**
 * Runs a list of tasks over a pool, at most `window` at a time, and hands their outputs on in
 * order (an output that arrives early waits for those before it). The first failure cancels
 * the rest and rejects; so does cancel() (with Cancelled).
 */
export function runChunks<K extends TaskKind>(
  pool: ChunkPool,
  run: ChunkRun<K>,
): TaskHandle<TaskOutputs[K][]> {
  const { tasks } = run;
  const weights = run.weights ?? tasks.map(() => 1);
  const totalWeight = weights.reduce((s, w) => s + w, 0) || 1;
  const window = Math.max(1, run.window ?? 2 * pool.size);
  const handles = new Map<number, TaskHandle<TaskOutputs[K]>>();
  const progress = new Array<number>(tasks.length).fill(0);
  const waiting = new Map<number, TaskOutputs[K]>();
  const kept: TaskOutputs[K][] = [];
  let next = 0;
  let emitted = 0;
  let stopped: Error | undefined;
  let cancelRun: () => void = () => {};

  const result = new Promise<TaskOutputs[K][]>((resolve, reject) => {
    const fail = (error: Error): void => {
      if (stopped) return;
      stopped = error;
      for (const handle of handles.values()) handle.cancel();
      reject(error);
    };
    const report = (): void => {
      if (!run.onProgress) return;
      let done = 0;
      for (let i = 0; i < tasks.length; i++)
        done += (progress[i] as number) * (weights[i] as number);
      run.onProgress(Math.min(1, done / totalWeight));
    };
    const emit = (): void => {
      while (waiting.has(emitted)) {
        const output = waiting.get(emitted) as TaskOutputs[K];
        waiting.delete(emitted);
        if (run.onOutput) run.onOutput(output, emitted);
        else kept.push(output);
        emitted++;
      }
      if (emitted === tasks.length) resolve(kept);
    };
    const launch = (): void => {
      while (!stopped && next < tasks.length && handles.size + waiting.size < window) {
        const index = next++;
        const handle = pool.run(tasks[index] as Extract<WorkerTask, { kind: K }>, {
          onProgress: (share) => {
            progress[index] = share;
            report();
          },
        });
        handles.set(index, handle);
        handle.result.then(
          (output) => {
            handles.delete(index);
            if (stopped) return;
            progress[index] = 1;
            report();
            waiting.set(index, output);
            try {
              emit();
            } catch (error) {
              fail(error as Error);
              return;
            }
            launch();
          },
          (error: unknown) => {
            handles.delete(index);
            fail(error as Error);
          },
        );
      }
    };
    if (tasks.length === 0) resolve(kept);
    else launch();
    cancelRun = () => fail(new Cancelled(emitted / Math.max(1, tasks.length)));
  });
  return { result, cancel: () => cancelRun() };
}

import { serialize } from 'node:v8';
import { UnrecoverableError, Worker, type Job } from 'bullmq';
import { Cancelled } from '../engine/errors.ts';
import type { RuptureTable } from '../engine/hazard/rupture-table.ts';
import type { Study } from '../engine/model.ts';
import type { MapRequest, WorkerTask } from '../workers/messages.ts';
import { serialiseError } from '../workers/task-errors.ts';
import { WorkerPool } from '../workers/worker-pool.ts';
import { MAX_STALLS } from './chunk-queue.ts';
import { getInput } from './job-inputs.ts';
import { cancelKey, CHUNK_QUEUE, connect, QUEUE_PREFIX, type ChunkJobData } from './queue-names.ts';

/** How often a chunk being computed looks for its run's cancel mark, ms. */
const CANCEL_POLL_MS = 500;

/**
 * How long a worker's claim on a chunk lasts without renewal, ms (BullMQ's lock; renewed at half
 * this while the chunk computes). A worker that vanishes loses its chunks this long after, and
 * another worker takes them. BullMQ's default.
 */
export const DEFAULT_LOCK_MS = 30_000;

/** Runs whose inputs and rupture table a worker keeps, most recent last. */
const KEPT_INPUTS = 4;

export interface QueueWorkerOptions {
  readonly url: string;
  /** Threads computing chunks, and chunks taken at once. */
  readonly threads: number;
  readonly lockMs?: number;
  readonly log?: (line: string) => void;
}

export interface QueueWorker {
  readonly threads: number;
  /** Finishes the chunks in hand, takes no more, and closes the threads. */
  close(): Promise<void>;
}

interface RunInputs {
  readonly study: Study;
  readonly table: Promise<RuptureTable>;
}

/**
 * `tremora worker`: takes chunks of maps and screenings from the Redis queue (chunk-queue.ts)
 * and computes them on this machine's threads (the pool of worker-pool.ts, so this process's
 * own thread stays free to renew its claims, report progress and hear a cancel). The inputs of
 * each run are fetched once by content hash, and its ruptures laid out once, for every chunk of
 * it this worker takes.
 */
export async function startQueueWorker(options: QueueWorkerOptions): Promise<QueueWorker> {
  const log = options.log ?? ((line: string) => console.log(line));
  const redis = connect(options.url);
  const pool = new WorkerPool({ size: options.threads, name: 'tremora-queue' });
  const inputs = new Map<string, RunInputs>();
  const lockMs = options.lockMs ?? DEFAULT_LOCK_MS;

  const runInputs = async (hash: string): Promise<RunInputs> => {
    let kept = inputs.get(hash);
    if (kept) {
      inputs.delete(hash);
    } else {
      const study = await getInput<Study>(redis, hash);
      kept = inputs.get(hash) ?? {
        study,
        table: pool.run({ kind: 'rupture-table', study }).result.then((o) => o.table),
      };
      while (inputs.size >= KEPT_INPUTS) inputs.delete(inputs.keys().next().value as string);
    }
    inputs.set(hash, kept);
    return kept;
  };

  const compute = async (job: Job<ChunkJobData>): Promise<string> => {
    const data = job.data;
    try {
      if ((await redis.exists(cancelKey(data.planKey))) === 1) throw new Cancelled(0);
      const { study, table: tablePromise } = await runInputs(data.inputHash);
      const table = await tablePromise;
      const task: WorkerTask =
        data.kind === 'map-points'
          ? {
              kind: 'map-points',
              planKey: data.planKey,
              study,
              table,
              map: data.map as MapRequest,
              firstIndex: data.firstIndex,
              count: data.count,
            }
          : {
              kind: 'screen-communities',
              planKey: data.planKey,
              study,
              table,
              indices: data.indices,
            };
      const handle = pool.run(task, {
        onProgress: (share) => void job.updateProgress(share).catch(() => {}),
      });
      const poll = setInterval(() => {
        redis.exists(cancelKey(data.planKey)).then(
          (n) => n === 1 && handle.cancel(),
          () => {},
        );
      }, CANCEL_POLL_MS);
      try {
        return serialize(await handle.result).toString('base64');
      } finally {
        clearInterval(poll);
      }
    } catch (error) {
      // Every failure is final for the chunk: the coordinator rebuilds the error from this text.
      throw new UnrecoverableError(JSON.stringify(serialiseError(error)));
    }
  };

  const workerRedis = connect(options.url);
  const worker = new Worker<ChunkJobData, string>(CHUNK_QUEUE, compute, {
    connection: workerRedis,
    prefix: QUEUE_PREFIX,
    concurrency: options.threads,
    lockDuration: lockMs,
    stalledInterval: lockMs,
    maxStalledCount: MAX_STALLS,
  });
  worker.on('error', (error) => log(`queue: ${error.message}`));
  await worker.waitUntilReady();
  return {
    threads: options.threads,
    async close() {
      await worker.close();
      await pool.close();
      // Connections handed to BullMQ are ours to close.
      redis.disconnect();
      workerRedis.disconnect();
    },
  };
}

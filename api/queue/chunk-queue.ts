import { deserialize } from 'node:v8';
import { Queue, QueueEvents, type Job } from 'bullmq';
import type { Redis } from 'ioredis';
import { Cancelled } from '../engine/errors.ts';
import type { Study } from '../engine/model.ts';
import type { ChunkPool } from '../workers/chunk-runner.ts';
import type { SerialisedError, TaskKind, TaskOutputs, WorkerTask } from '../workers/messages.ts';
import { rebuildError } from '../workers/task-errors.ts';
import type { TaskEvents, TaskHandle } from '../workers/worker-pool.ts';
import { putInput } from './job-inputs.ts';
import {
  cancelKey,
  CHUNK_QUEUE,
  connect,
  KEEP_S,
  QUEUE_PREFIX,
  type ChunkJobData,
} from './queue-names.ts';

/**
 * Chunks in flight at once from one run by default: enough to keep a few machines' threads
 * busy, few enough that a cancelled run leaves little behind in the queue.
 */
export const QUEUE_WINDOW = 32;

/**
 * How many times a chunk whose worker vanished (killed, lost its machine) is handed out again
 * before its run fails. A chunk is computed from its inputs alone, so a second try gives the
 * same numbers; the coordinator keeps only the first result it is given for a chunk.
 */
export const MAX_STALLS = 5;

export interface ChunkQueueOptions {
  readonly url: string;
  readonly window?: number;
}

/**
 * The coordinating side of the Redis queue (BullMQ): a ChunkPool whose chunks are computed by
 * `tremora worker` processes on any number of machines (queue-worker.ts). Each chunk is one
 * job carrying its task without its inputs; the inputs travel once per run by content hash
 * (job-inputs.ts). Outputs come back as V8 serialisation, exactly as a thread returns them.
 * Progress comes through BullMQ's queue events; cancel marks the run in Redis, which the
 * workers read (between chunks, and every half second inside one).
 */
export class ChunkQueue implements ChunkPool {
  readonly size: number;
  readonly #redis: Redis;
  readonly #queue: Queue;
  readonly #events: QueueEvents;
  readonly #eventsRedis: Redis;
  readonly #inputs = new WeakMap<Study, Promise<string>>();
  readonly #progress = new Map<string, (share: number) => void>();
  #next = 0;

  private constructor(
    options: ChunkQueueOptions,
    redis: Redis,
    queue: Queue,
    events: QueueEvents,
    eventsRedis: Redis,
  ) {
    this.size = options.window ?? QUEUE_WINDOW;
    this.#redis = redis;
    this.#queue = queue;
    this.#events = events;
    this.#eventsRedis = eventsRedis;
    // Every chunk in flight waits on these emitters; the window, not a leak, sets how many.
    queue.setMaxListeners(0);
    events.setMaxListeners(0);
    events.on('progress', ({ jobId, data }) => {
      if (typeof data === 'number') this.#progress.get(jobId)?.(data);
    });
  }

  /** Connects to the queue's Redis (TREMORA_QUEUE) and waits until events can be heard. */
  static async open(options: ChunkQueueOptions): Promise<ChunkQueue> {
    const redis = connect(options.url);
    const eventsRedis = connect(options.url);
    const queue = new Queue(CHUNK_QUEUE, { connection: redis, prefix: QUEUE_PREFIX });
    const events = new QueueEvents(CHUNK_QUEUE, { connection: eventsRedis, prefix: QUEUE_PREFIX });
    await Promise.all([queue.waitUntilReady(), events.waitUntilReady()]);
    return new ChunkQueue(options, redis, queue, events, eventsRedis);
  }

  run<K extends TaskKind>(
    task: Extract<WorkerTask, { kind: K }>,
    events: TaskEvents = {},
  ): TaskHandle<TaskOutputs[K]> {
    let cancelled = false;
    let job: Job | undefined;
    let rejectRun: (error: Error) => void = () => {};
    const result = new Promise<TaskOutputs[K]>((resolve, reject) => {
      rejectRun = reject;
      this.#submit(task, events, () => cancelled)
        .then(async (added) => {
          job = added;
          const encoded = (await added.waitUntilFinished(this.#events)) as string;
          this.#progress.delete(added.id as string);
          resolve(deserialize(Buffer.from(encoded, 'base64')) as TaskOutputs[K]);
        })
        .catch((error: unknown) => {
          if (job) this.#progress.delete(job.id as string);
          reject(cancelled ? new Cancelled(0) : this.#rebuild(error));
        });
    });
    return {
      result,
      cancel: () => {
        if (cancelled) return;
        cancelled = true;
        rejectRun(new Cancelled(0));
        const chunk = task as WorkerTask;
        if (chunk.kind === 'map-points' || chunk.kind === 'screen-communities') {
          void this.#redis.set(cancelKey(chunk.planKey), '1', 'EX', KEEP_S).catch(() => {});
        }
        void job?.remove().catch(() => {});
      },
    };
  }

  async close(): Promise<void> {
    await this.#events.close();
    await this.#queue.close();
    // Connections handed to BullMQ are ours to close.
    this.#redis.disconnect();
    this.#eventsRedis.disconnect();
  }

  async #submit(task: WorkerTask, events: TaskEvents, cancelled: () => boolean): Promise<Job> {
    if (task.kind !== 'map-points' && task.kind !== 'screen-communities')
      throw new Error(
        `the queue takes chunks of maps and screenings; expected map-points or screen-communities, got ${task.kind}`,
      );
    const inputHash = await this.#inputOf(task.study);
    if (cancelled()) throw new Cancelled(0);
    const data: ChunkJobData =
      task.kind === 'map-points'
        ? {
            kind: task.kind,
            inputHash,
            planKey: task.planKey,
            map: task.map,
            firstIndex: task.firstIndex,
            count: task.count,
          }
        : { kind: task.kind, inputHash, planKey: task.planKey, indices: task.indices };
    const jobId = `${task.planKey}-${this.#next++}`;
    if (events.onProgress) this.#progress.set(jobId, events.onProgress);
    // attempts 1: a chunk that fails fails its run (a bad input fails everywhere alike); a chunk
    // whose worker vanished is not a failure and goes back to the queue (MAX_STALLS, on the workers).
    return this.#queue.add(task.kind, data, {
      jobId,
      attempts: 1,
      removeOnComplete: { age: 3600 },
      removeOnFail: { age: 24 * 3600 },
    });
  }

  /** The study's content hash, storing it in Redis on the first chunk of its run. */
  #inputOf(study: Study): Promise<string> {
    let hash = this.#inputs.get(study);
    if (!hash) {
      hash = putInput(this.#redis, study);
      this.#inputs.set(study, hash);
    }
    return hash;
  }

  /** The worker's error, as its failed reason carries it (queue-worker.ts), rebuilt. */
  #rebuild(error: unknown): Error {
    const message = error instanceof Error ? error.message : String(error);
    try {
      return rebuildError(JSON.parse(message) as SerialisedError);
    } catch {
      return error instanceof Error ? error : new Error(message);
    }
  }
}

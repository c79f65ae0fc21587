import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { Cancelled } from '../engine/errors.ts';
import type { TaskKind, TaskMessage, TaskOutputs, WorkerReply, WorkerTask } from './messages.ts';
import { PoolClosed, rebuildError, WorkerCrashed } from './task-errors.ts';

/**
 * Threads for computation by default: one per core but one, which stays with the service
 * thread (HTTP, SQLite) so health and page requests are answered while every worker computes.
 * Never fewer than one.
 */
export function defaultPoolSize(cores: number = availableParallelism()): number {
  return Math.max(1, cores - 1);
}

/**
 * A worker thread does not inherit tsx's loader from a parent started with `tsx` or
 * `node --import tsx` (checked with tsx 4.23 on Node 20: the thread fails with "Unknown file
 * extension .ts", also with execArgv passed explicitly). So a thread running from source
 * registers tsx itself, then imports the TypeScript worker module; a thread of the compiled
 * build (dist/, `npm run build`) loads its JavaScript module directly, with no loader.
 */
function startThread(moduleUrl: URL, name: string): Worker {
  if (!/\.tsx?$/.test(moduleUrl.pathname)) return new Worker(moduleUrl, { name });
  const tsxApiUrl = import.meta.resolve('tsx/esm/api');
  const bootstrap = `import(${JSON.stringify(tsxApiUrl)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(moduleUrl.href)}); });`;
  return new Worker(bootstrap, { eval: true, name });
}

/** The worker module beside this one: run-worker.ts from source, run-worker.js once compiled. */
const RUN_WORKER_URL = new URL(
  `./run-worker${import.meta.url.endsWith('.ts') ? '.ts' : '.js'}`,
  import.meta.url,
);

export interface TaskEvents {
  /** The worker took the task (ISO time). */
  readonly onStart?: (at: string) => void;
  /** Share of the work done, in (0, 1]. */
  readonly onProgress?: (shareDone: number) => void;
}

export interface TaskHandle<T> {
  readonly result: Promise<T>;
  /** Stops the task: a queued one at once, a running one at its next check (Cancelled). */
  cancel(): void;
}

export interface PoolStats {
  readonly size: number;
  readonly alive: number;
  readonly busy: number;
  readonly queued: number;
}

interface Job {
  readonly id: number;
  readonly task: WorkerTask;
  readonly stop: Int32Array;
  readonly events: TaskEvents;
  readonly resolve: (output: never) => void;
  readonly reject: (error: Error) => void;
  shareDone: number;
  cancelRequested: boolean;
  graceTimer?: NodeJS.Timeout;
}

interface Slot {
  readonly worker: Worker;
  ready: boolean;
  job?: Job;
  lastError?: unknown;
}

export interface WorkerPoolOptions {
  /** Number of threads (defaultPoolSize() by default). */
  readonly size?: number;
  /** The worker module; run-worker.ts by default (tests give their own). */
  readonly workerUrl?: URL;
  /**
   * How long a running task has to honour a cancel before its thread is terminated, ms. The
   * engine checks for a stop between communities' branches, which can be seconds apart on a
   * large study; terminating loses nothing, as a cancelled task's output is never kept.
   */
  readonly cancelGraceMs?: number;
  /** Thread name prefix, shown in diagnostics. */
  readonly name?: string;
  /** Where failures of the threads themselves are reported. */
  readonly log?: (message: string, error?: unknown) => void;
}

const DEFAULT_CANCEL_GRACE_MS = 1_000;

/**
 * A fixed set of worker threads running WorkerTasks in arrival order, one per thread at a
 * time. A thread that exits while holding a task fails only that task (WorkerCrashed) and is
 * replaced; the service carries on.
 */
export class WorkerPool {
  readonly size: number;
  readonly #workerUrl: URL;
  readonly #cancelGraceMs: number;
  readonly #name: string;
  readonly #log: (message: string, error?: unknown) => void;
  readonly #slots: Slot[] = [];
  readonly #queue: Job[] = [];
  #nextId = 1;
  #closing = false;
  #startFailure: unknown;

  constructor(options: WorkerPoolOptions = {}) {
    this.size = options.size ?? defaultPoolSize();
    if (!Number.isInteger(this.size) || this.size < 1)
      throw new RangeError(`expected a pool size of at least 1 thread, got ${this.size}`);
    this.#workerUrl = options.workerUrl ?? RUN_WORKER_URL;
    this.#cancelGraceMs = options.cancelGraceMs ?? DEFAULT_CANCEL_GRACE_MS;
    this.#name = options.name ?? 'tremora-worker';
    this.#log =
      options.log ?? ((message, error) => console.error(`[${this.#name}] ${message}`, error ?? ''));
    for (let i = 0; i < this.size; i++) this.#spawn();
  }

  /** Queues a task; its result resolves with the worker's output or rejects with its error. */
  run<K extends TaskKind>(
    task: Extract<WorkerTask, { kind: K }>,
    events: TaskEvents = {},
  ): TaskHandle<TaskOutputs[K]> {
    let job!: Job;
    const result = new Promise<TaskOutputs[K]>((resolve, reject) => {
      job = {
        id: this.#nextId++,
        task,
        stop: new Int32Array(new SharedArrayBuffer(Int32Array.BYTES_PER_ELEMENT)),
        events,
        resolve: resolve as (output: never) => void,
        reject,
        shareDone: 0,
        cancelRequested: false,
      };
    });
    if (this.#closing) job.reject(new PoolClosed());
    else if (this.#slots.length === 0) job.reject(new WorkerCrashed(undefined, this.#startFailure));
    else {
      this.#queue.push(job);
      this.#dispatch();
    }
    return { result, cancel: () => this.#cancel(job) };
  }

  stats(): PoolStats {
    return {
      size: this.size,
      alive: this.#slots.length,
      busy: this.#slots.filter((s) => s.job).length,
      queued: this.#queue.length,
    };
  }

  /** Rejects queued and running tasks with PoolClosed and stops every thread. */
  async close(): Promise<void> {
    this.#closing = true;
    for (const job of this.#queue.splice(0)) job.reject(new PoolClosed());
    await Promise.all(this.#slots.map((slot) => slot.worker.terminate()));
  }

  #spawn(): void {
    const worker = startThread(this.#workerUrl, `${this.#name}-${this.#slots.length + 1}`);
    const slot: Slot = { worker, ready: false };
    this.#slots.push(slot);
    worker.on('message', (reply: WorkerReply) => this.#onReply(slot, reply));
    worker.on('error', (error) => {
      slot.lastError = error;
      this.#log('a worker thread failed', error);
    });
    worker.on('exit', (code) => this.#onExit(slot, code));
  }

  #dispatch(): void {
    for (const slot of this.#slots) {
      if (slot.job) continue;
      const job = this.#queue.shift();
      if (!job) return;
      slot.job = job;
      const message: TaskMessage = { id: job.id, task: job.task, stop: job.stop };
      slot.worker.postMessage(message);
    }
  }

  #onReply(slot: Slot, reply: WorkerReply): void {
    if (reply.type === 'ready') {
      slot.ready = true;
      return;
    }
    const job = slot.job;
    if (!job || job.id !== reply.id) return;
    switch (reply.type) {
      case 'started':
        this.#notify(() => job.events.onStart?.(reply.at));
        return;
      case 'progress':
        job.shareDone = reply.shareDone;
        this.#notify(() => job.events.onProgress?.(reply.shareDone));
        return;
      case 'done':
        this.#release(slot);
        job.resolve(reply.output as never);
        return;
      case 'failed':
        this.#release(slot);
        job.reject(rebuildError(reply.error));
        return;
    }
  }

  #onExit(slot: Slot, code: number): void {
    this.#slots.splice(this.#slots.indexOf(slot), 1);
    const job = slot.job;
    if (job) {
      clearTimeout(job.graceTimer);
      if (job.cancelRequested) job.reject(new Cancelled(job.shareDone));
      else if (this.#closing) job.reject(new PoolClosed());
      else job.reject(new WorkerCrashed(code, slot.lastError));
    }
    if (this.#closing) return;
    // A thread that never got as far as loading its module would fail the same way again.
    if (slot.ready) this.#spawn();
    else this.#startFailure = slot.lastError;
    if (this.#slots.length === 0) {
      for (const queued of this.#queue.splice(0))
        queued.reject(new WorkerCrashed(undefined, this.#startFailure));
    } else {
      this.#dispatch();
    }
  }

  #release(slot: Slot): void {
    clearTimeout(slot.job?.graceTimer);
    slot.job = undefined;
    this.#dispatch();
  }

  #cancel(job: Job): void {
    const queuedAt = this.#queue.indexOf(job);
    if (queuedAt >= 0) {
      this.#queue.splice(queuedAt, 1);
      job.reject(new Cancelled(0));
      return;
    }
    const slot = this.#slots.find((s) => s.job === job);
    if (!slot || job.cancelRequested) return;
    job.cancelRequested = true;
    Atomics.store(job.stop, 0, 1);
    job.graceTimer = setTimeout(() => void slot.worker.terminate(), this.#cancelGraceMs);
    job.graceTimer.unref();
  }

  /** Runs a caller's event handler; its failure is the caller's and must not break the pool. */
  #notify(handler: () => void): void {
    try {
      handler();
    } catch (error) {
      this.#log('a task event handler failed', error);
    }
  }
}

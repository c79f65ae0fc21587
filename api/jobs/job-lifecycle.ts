import { randomUUID } from 'node:crypto';
import { Cancelled, TremoraError } from '../engine/errors.ts';
import { PoolClosed, type WorkerCrashed } from '../workers/task-errors.ts';
import type { TaskHandle } from '../workers/worker-pool.ts';
import type { JobLedger } from './job-ledger.ts';

/**
 * Smallest rise in a job's progress written to its ledger, as a share of the job: workers
 * report far more often than anyone reads, and each write to the store is a synced commit.
 */
export const PROGRESS_STEP = 0.01;

/** What a job tells the lifecycle while it runs. */
export interface JobSignals<Started> {
  /** The job has started; `started` is what it knows at that point. */
  started(started: Started): void;
  progress(share: number): void;
}

export interface JobSpec<Started, Output, Done> {
  /** The id of the job's record, already made as queued. */
  readonly id: string;
  readonly ledger: JobLedger<Started, Done>;
  /** What a share of the job counts, for the cancellation message ("work", "points"). */
  readonly progressOf: string;
  /** How the job is described in logs ("run", "map run"). */
  readonly kind: string;
  /** Starts the computation (on a pool of threads or through the queue). */
  launch(signals: JobSignals<Started>): TaskHandle<Output>;
  /** The record of a finished job, from its output; runs once, before finishDone. */
  done(output: Output, startedAt: string): Done;
  /** Called once the job has ended and its end is recorded (or failed to be). */
  settled?(): void;
}

export type LogError = (id: string, context: string, error: unknown) => void;

const percent = (share: number): string => `${Math.round(share * 100)}%`;

/**
 * The one lifecycle of Tremora's jobs, screening runs and map runs alike: queued (the record is
 * made before start), running when the computation starts, progress as it reports, then exactly
 * one end — done (outputs and status written together), cancelled on request, failed (a user
 * error as the engine words it, or an unexpected one logged with an id), or interrupted when the
 * pool or queue closes under it. The ledger refuses changes to an ended job, so a late message
 * cannot rewrite one.
 */
export class JobLifecycle {
  readonly #logError: LogError;
  readonly #active = new Map<string, TaskHandle<unknown>>();

  constructor(
    logError: LogError = (id, context, error) => console.error(`[${id}] ${context}`, error),
  ) {
    this.#logError = logError;
  }

  start<Started, Output, Done>(spec: JobSpec<Started, Output, Done>): void {
    const { id, ledger } = spec;
    let startedAt = new Date().toISOString();
    let shareDone = 0;
    let written = 0;
    let ended = false;
    const handle = spec.launch({
      started: (started) => {
        if (ended) return;
        startedAt = new Date().toISOString();
        this.#write(spec, () => ledger.markRunning(id, startedAt, started));
      },
      progress: (share) => {
        if (ended) return;
        shareDone = Math.max(shareDone, share);
        if (share - written < PROGRESS_STEP) return;
        written = share;
        this.#write(spec, () => ledger.setProgress(id, share));
      },
    });
    this.#active.set(id, handle);
    handle.result
      .then((output) => ledger.finishDone(id, spec.done(output, startedAt)))
      .catch((error: unknown) => this.#recordEnd(spec, error, shareDone))
      .catch((error: unknown) =>
        this.#logError(randomUUID(), `could not record the end of ${spec.kind} ${id}`, error),
      )
      .finally(() => {
        ended = true;
        this.#active.delete(id);
        spec.settled?.();
      });
  }

  /** Asks an active job to stop; false when it is not active here. */
  cancel(id: string): boolean {
    const handle = this.#active.get(id);
    if (!handle) return false;
    handle.cancel();
    return true;
  }

  get activeCount(): number {
    return this.#active.size;
  }

  /** A ledger write made from a worker's callback: a failure is logged, never thrown into the pool's machinery. */
  #write<Started, Output, Done>(spec: JobSpec<Started, Output, Done>, write: () => unknown): void {
    try {
      write();
    } catch (error) {
      this.#logError(
        randomUUID(),
        `could not record the progress of ${spec.kind} ${spec.id}`,
        error,
      );
    }
  }

  #recordEnd<Started, Output, Done>(
    spec: JobSpec<Started, Output, Done>,
    error: unknown,
    shareDone: number,
  ): void {
    const { id, ledger } = spec;
    if (error instanceof Cancelled) {
      ledger.finishWithout(
        id,
        'cancelled',
        `cancelled on request after ${percent(Math.max(shareDone, error.shareDone))} of the ${spec.progressOf}`,
      );
    } else if (error instanceof PoolClosed) {
      ledger.finishWithout(id, 'interrupted', ledger.interruptedMessage);
    } else if (error instanceof TremoraError) {
      ledger.finishWithout(id, 'failed', error.message);
    } else {
      const errorId = randomUUID();
      this.#logError(errorId, `${spec.kind} ${id} failed`, error);
      const what =
        (error as Partial<WorkerCrashed>).name === 'WorkerCrashed'
          ? (error as Error).message
          : 'internal error';
      ledger.finishWithout(
        id,
        'failed',
        `${what} (error id ${errorId}); the service is still running`,
      );
    }
  }
}

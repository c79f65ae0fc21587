import { Cancelled, InvalidInput, StudyTooLarge, TremoraError } from '../engine/errors.ts';
import type { SerialisedError } from './messages.ts';

/** A worker thread exited (crash, out of memory, killed) while it held a task. */
export class WorkerCrashed extends Error {
  override name = 'WorkerCrashed';
  constructor(
    readonly exitCode: number | undefined,
    cause?: unknown,
  ) {
    super(
      `the computation stopped unexpectedly: its worker thread exited${exitCode === undefined ? '' : ` with code ${exitCode}`}`,
      { cause },
    );
  }
}

/** The pool was closed (service shutting down) before the task finished. */
export class PoolClosed extends Error {
  override name = 'PoolClosed';
  constructor() {
    super('the worker pool was closed before the task finished');
  }
}

/** An unexpected failure inside a worker: a fault of the code, not of the input. */
export class WorkerFailure extends Error {
  override name = 'WorkerFailure';
  constructor(
    readonly errorName: string,
    message: string,
    readonly workerStack?: string,
  ) {
    super(`${errorName}: ${message}`);
  }
}

/** Flattens an error thrown in a worker so the service can rebuild it. */
export function serialiseError(error: unknown): SerialisedError {
  if (!(error instanceof Error)) return { name: 'Error', message: String(error), domain: false };
  const base = { name: error.name, message: error.message, domain: error instanceof TremoraError };
  if (error instanceof InvalidInput) return { ...base, issues: error.issues };
  if (error instanceof StudyTooLarge)
    return { ...base, size: error.size, budget: error.budget, detail: error.detail };
  if (error instanceof Cancelled) return { ...base, shareDone: error.shareDone };
  return base.domain ? base : { ...base, ...(error.stack ? { stack: error.stack } : {}) };
}

/**
 * The error a worker reported, rebuilt: the engine's named errors keep their class (so the
 * service maps them as if thrown in its own thread); other domain errors become a
 * TremoraError with their message; anything else is a WorkerFailure.
 */
export function rebuildError(error: SerialisedError): Error {
  if (error.name === 'InvalidInput' && error.issues) return new InvalidInput(error.issues);
  if (error.name === 'StudyTooLarge' && error.size !== undefined && error.budget !== undefined) {
    return new StudyTooLarge(error.size, error.budget, error.detail ?? 'work');
  }
  if (error.name === 'Cancelled') return new Cancelled(error.shareDone ?? 0);
  if (error.domain) {
    const rebuilt = new TremoraError(error.message);
    rebuilt.name = error.name;
    return rebuilt;
  }
  return new WorkerFailure(error.name, error.message, error.stack);
}

/**
 * Where a job's life is recorded: the one port between the job lifecycle (job-lifecycle.ts) and
 * a record keeper (the store, through store-ledgers.ts). A job is queued when its record is
 * made; then running, progress, and exactly one end. The keeper refuses any change after the
 * end, so each method says whether it changed anything.
 */
export type JobEnd = 'failed' | 'cancelled' | 'interrupted';

export interface JobLedger<Started, Done> {
  /** Queued to running, with what is known once the job has started (a map's grid). */
  markRunning(id: string, startedAt: string, started: Started): boolean;
  /** Share of the job done, 0 to 1; only ever rises. */
  setProgress(id: string, share: number): void;
  /** The job's outputs and the status 'done', together. */
  finishDone(id: string, done: Done): boolean;
  finishWithout(id: string, end: JobEnd, message: string): boolean;
  /** The message the keeper leaves on jobs a shutdown stopped (the same as on those it finds unfinished at start). */
  readonly interruptedMessage: string;
}

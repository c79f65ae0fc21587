import type { Database, Statement } from 'better-sqlite3';

export type RunStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled' | 'interrupted';

/** Statuses after which a run never changes. */
export const FINISHED_STATUSES: readonly RunStatus[] = [
  'done',
  'failed',
  'cancelled',
  'interrupted',
];

export const isFinished = (status: RunStatus): boolean => FINISHED_STATUSES.includes(status);

/** Message stored on runs found unfinished when the service starts. */
export const INTERRUPTED_MESSAGE = 'the service stopped before this run finished; start a new run';

/** What every run kept in the store has: screening runs and map runs alike. */
export interface JobRecord {
  readonly id: string;
  readonly studyId: string;
  readonly status: RunStatus;
  /** Share of the work done, 0 to 1. */
  readonly progress: number;
  readonly inputHash: string;
  /** Provenance JSON text, once the run is done. */
  readonly provenance: string | null;
  readonly error: string | null;
  readonly createdAt: string;
  readonly startedAt: string | null;
  readonly finishedAt: string | null;
}

/** The columns of JobRecord, as a table of runs stores them. */
export interface JobRow {
  id: string;
  study_id: string;
  status: RunStatus;
  progress: number;
  input_hash: string;
  provenance: string | null;
  error: string | null;
  created_at: string;
  started_at: string | null;
  finished_at: string | null;
}

export const JOB_COLUMNS =
  'id, study_id, status, progress, input_hash, provenance, error, created_at, started_at, finished_at';

export const jobRecordOf = (row: JobRow): JobRecord => ({
  id: row.id,
  studyId: row.study_id,
  status: row.status,
  progress: row.progress,
  inputHash: row.input_hash,
  provenance: row.provenance,
  error: row.error,
  createdAt: row.created_at,
  startedAt: row.started_at,
  finishedAt: row.finished_at,
});

/**
 * The writes a table of runs shares with every other: progress, an end without results, and
 * the interruption of whatever was unfinished. Only unfinished runs ever change: every update
 * names the statuses it may change from, and the table's trigger (migrations 001 and 003)
 * refuses any change to a finished one.
 */
export abstract class JobTable {
  readonly #progress: Statement;
  readonly #finishWithout: Statement;
  readonly #interruptAll: Statement;

  protected constructor(db: Database, table: 'runs' | 'map_runs') {
    // Progress only moves forward, so a late message cannot make a run look less done.
    this.#progress = db.prepare(
      `UPDATE ${table} SET progress = ? WHERE id = ? AND status = 'running' AND progress < ?`,
    );
    this.#finishWithout = db.prepare(
      `UPDATE ${table} SET status = ?, error = ?, finished_at = ? WHERE id = ? AND status IN ('queued', 'running')`,
    );
    this.#interruptAll = db.prepare(
      `UPDATE ${table} SET status = 'interrupted', error = ?, finished_at = ? WHERE status IN ('queued', 'running')`,
    );
  }

  setProgress(id: string, share: number): void {
    const clamped = Math.min(Math.max(share, 0), 1);
    this.#progress.run(clamped, id, clamped);
  }

  finishWithout(
    id: string,
    status: 'failed' | 'cancelled' | 'interrupted',
    error: string,
    finishedAt = new Date().toISOString(),
  ): boolean {
    return this.#finishWithout.run(status, error, finishedAt, id).changes > 0;
  }

  /** Marks every queued or running run interrupted (at open, after a crash; at shutdown). */
  interruptUnfinished(): number {
    return this.#interruptAll.run(INTERRUPTED_MESSAGE, new Date().toISOString()).changes;
  }
}

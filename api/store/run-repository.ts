import type { Database, Statement } from 'better-sqlite3';
import { newId } from './new-id.ts';

export type RunStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled' | 'interrupted';

/** Statuses after which a run never changes. */
export const FINISHED_STATUSES: readonly RunStatus[] = [
  'done',
  'failed',
  'cancelled',
  'interrupted',
];

export const isFinished = (status: RunStatus): boolean => FINISHED_STATUSES.includes(status);

/** A run without its results (which can be large; read them with `results`). */
export interface RunRecord {
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

/** What a run computes, copied from the study when the run is created. */
export interface RunInputs {
  readonly studyId: string;
  readonly document: string;
  readonly communitiesCsv?: string;
  readonly inputHash: string;
}

export interface RunOutputs {
  readonly resultsJson: string;
  readonly provenanceJson: string;
  readonly finishedAt: string;
}

interface RunRow {
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

const RUN_COLUMNS =
  'id, study_id, status, progress, input_hash, provenance, error, created_at, started_at, finished_at';

const recordOf = (row: RunRow): RunRecord => ({
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

/** Message stored on runs found unfinished when the service starts. */
export const INTERRUPTED_MESSAGE = 'the service stopped before this run finished; start a new run';

/**
 * Runs and their results. Only unfinished runs ever change: every update names the statuses it
 * may change from, and a trigger (migration 001) refuses any change to a finished run.
 */
export class RunRepository {
  readonly #get: Statement;
  readonly #inputs: Statement;
  readonly #results: Statement;
  readonly #listForStudy: Statement;
  readonly #insert: Statement;
  readonly #markRunning: Statement;
  readonly #progress: Statement;
  readonly #finishDone: Statement;
  readonly #finishWithout: Statement;
  readonly #interruptAll: Statement;

  constructor(db: Database) {
    this.#get = db.prepare(`SELECT ${RUN_COLUMNS} FROM runs WHERE id = ?`);
    this.#inputs = db.prepare('SELECT document, communities_csv FROM runs WHERE id = ?');
    this.#results = db.prepare("SELECT results FROM runs WHERE id = ? AND status = 'done'");
    this.#listForStudy = db.prepare(
      `SELECT ${RUN_COLUMNS} FROM runs WHERE study_id = ? ORDER BY created_at, id`,
    );
    this.#insert = db.prepare(
      "INSERT INTO runs (id, study_id, status, progress, document, communities_csv, input_hash, created_at) VALUES (?, ?, 'queued', 0, ?, ?, ?, ?)",
    );
    this.#markRunning = db.prepare(
      "UPDATE runs SET status = 'running', started_at = ? WHERE id = ? AND status = 'queued'",
    );
    // Progress only moves forward, so a late message cannot make a run look less done.
    this.#progress = db.prepare(
      "UPDATE runs SET progress = ? WHERE id = ? AND status = 'running' AND progress < ?",
    );
    this.#finishDone = db.prepare(
      "UPDATE runs SET status = 'done', progress = 1, results = ?, provenance = ?, finished_at = ?, error = NULL WHERE id = ? AND status = 'running'",
    );
    this.#finishWithout = db.prepare(
      "UPDATE runs SET status = ?, error = ?, finished_at = ? WHERE id = ? AND status IN ('queued', 'running')",
    );
    this.#interruptAll = db.prepare(
      "UPDATE runs SET status = 'interrupted', error = ?, finished_at = ? WHERE status IN ('queued', 'running')",
    );
  }

  create(inputs: RunInputs): RunRecord {
    const id = newId();
    const now = new Date().toISOString();
    this.#insert.run(
      id,
      inputs.studyId,
      inputs.document,
      inputs.communitiesCsv ?? null,
      inputs.inputHash,
      now,
    );
    return this.get(id) as RunRecord;
  }

  get(id: string): RunRecord | undefined {
    const row = this.#get.get(id) as RunRow | undefined;
    return row ? recordOf(row) : undefined;
  }

  /** The study document (and communities CSV) the run computed. */
  inputs(id: string): { document: string; communitiesCsv?: string } | undefined {
    const row = this.#inputs.get(id) as
      { document: string; communities_csv: string | null } | undefined;
    if (!row) return undefined;
    return row.communities_csv === null
      ? { document: row.document }
      : { document: row.document, communitiesCsv: row.communities_csv };
  }

  /** The results JSON text of a done run; undefined for any other run. */
  results(id: string): string | undefined {
    return (this.#results.get(id) as { results: string } | undefined)?.results;
  }

  listForStudy(studyId: string): RunRecord[] {
    return (this.#listForStudy.all(studyId) as RunRow[]).map(recordOf);
  }

  markRunning(id: string, startedAt: string): boolean {
    return this.#markRunning.run(startedAt, id).changes > 0;
  }

  setProgress(id: string, share: number): void {
    const clamped = Math.min(Math.max(share, 0), 1);
    this.#progress.run(clamped, id, clamped);
  }

  /** Results, provenance and the status 'done' are written in one statement: never half a run. */
  finishDone(id: string, outputs: RunOutputs): boolean {
    return (
      this.#finishDone.run(outputs.resultsJson, outputs.provenanceJson, outputs.finishedAt, id)
        .changes > 0
    );
  }

  finishWithout(
    id: string,
    status: 'failed' | 'cancelled' | 'interrupted',
    error: string,
    finishedAt = new Date().toISOString(),
  ): boolean {
    return this.#finishWithout.run(status, error, finishedAt, id).changes > 0;
  }

  /** Marks every queued or running run interrupted (at start, after a crash; at shutdown). */
  interruptUnfinished(): number {
    return this.#interruptAll.run(INTERRUPTED_MESSAGE, new Date().toISOString()).changes;
  }
}

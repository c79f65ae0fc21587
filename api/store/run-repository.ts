import type { Database, Statement } from 'better-sqlite3';
import { JOB_COLUMNS, type JobRecord, type JobRow, JobTable, jobRecordOf } from './job-table.ts';
import { newId } from './new-id.ts';

export { INTERRUPTED_MESSAGE, isFinished } from './job-table.ts';

/** A run without its results (which can be large; read them with `results`). */
export type RunRecord = JobRecord;

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

/** Runs and their results; what only unfinished runs may change is JobTable's. */
export class RunRepository extends JobTable {
  readonly #get: Statement;
  readonly #inputs: Statement;
  readonly #results: Statement;
  readonly #listForStudy: Statement;
  readonly #insert: Statement;
  readonly #markRunning: Statement;
  readonly #finishDone: Statement;

  constructor(db: Database) {
    super(db, 'runs');
    this.#get = db.prepare(`SELECT ${JOB_COLUMNS} FROM runs WHERE id = ?`);
    this.#inputs = db.prepare('SELECT document, communities_csv FROM runs WHERE id = ?');
    this.#results = db.prepare("SELECT results FROM runs WHERE id = ? AND status = 'done'");
    this.#listForStudy = db.prepare(
      `SELECT ${JOB_COLUMNS} FROM runs WHERE study_id = ? ORDER BY created_at, id`,
    );
    this.#insert = db.prepare(
      "INSERT INTO runs (id, study_id, status, progress, document, communities_csv, input_hash, created_at) VALUES (?, ?, 'queued', 0, ?, ?, ?, ?)",
    );
    this.#markRunning = db.prepare(
      "UPDATE runs SET status = 'running', started_at = ? WHERE id = ? AND status = 'queued'",
    );
    this.#finishDone = db.prepare(
      "UPDATE runs SET status = 'done', progress = 1, results = ?, provenance = ?, finished_at = ?, error = NULL WHERE id = ? AND status = 'running'",
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
    const row = this.#get.get(id) as JobRow | undefined;
    return row ? jobRecordOf(row) : undefined;
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
    return (this.#listForStudy.all(studyId) as JobRow[]).map(jobRecordOf);
  }

  markRunning(id: string, startedAt: string): boolean {
    return this.#markRunning.run(startedAt, id).changes > 0;
  }

  /** Results, provenance and the status 'done' are written in one statement: never half a run. */
  finishDone(id: string, outputs: RunOutputs): boolean {
    return (
      this.#finishDone.run(outputs.resultsJson, outputs.provenanceJson, outputs.finishedAt, id)
        .changes > 0
    );
  }
}

import type { Database, Statement } from 'better-sqlite3';
import { newId } from './new-id.ts';

export type StudyFileKind = 'communities-csv' | 'sources-geojson';

export interface StudySummary {
  readonly id: string;
  readonly name: string;
  readonly createdAt: string;
  readonly updatedAt: string;
}

export interface StudyRecord extends StudySummary {
  /** The study document's JSON text, exactly as it was accepted. */
  readonly document: string;
}

/** A file imported into a study, kept as it was received. */
export interface StudyFile {
  readonly kind: StudyFileKind;
  readonly content: string;
}

export interface StudyWrite {
  readonly name: string;
  readonly document: string;
  /** A file that came with this write (an import); kept beside the study. */
  readonly file?: StudyFile;
}

interface StudyRow {
  id: string;
  name: string;
  document: string;
  created_at: string;
  updated_at: string;
}

const summaryOf = (row: Omit<StudyRow, 'document'>): StudySummary => ({
  id: row.id,
  name: row.name,
  createdAt: row.created_at,
  updatedAt: row.updated_at,
});

/** Saved studies and their imported files. Every write is one transaction. */
export class StudyRepository {
  readonly #db: Database;
  readonly #list: Statement;
  readonly #get: Statement;
  readonly #insert: Statement;
  readonly #update: Statement;
  readonly #delete: Statement;
  readonly #insertFile: Statement;
  readonly #latestFile: Statement;

  constructor(db: Database) {
    this.#db = db;
    this.#list = db.prepare(
      'SELECT id, name, created_at, updated_at FROM studies ORDER BY created_at, id',
    );
    this.#get = db.prepare(
      'SELECT id, name, document, created_at, updated_at FROM studies WHERE id = ?',
    );
    this.#insert = db.prepare(
      'INSERT INTO studies (id, name, document, created_at, updated_at) VALUES (?, ?, ?, ?, ?)',
    );
    this.#update = db.prepare(
      'UPDATE studies SET name = ?, document = ?, updated_at = ? WHERE id = ?',
    );
    this.#delete = db.prepare('DELETE FROM studies WHERE id = ?');
    this.#insertFile = db.prepare(
      'INSERT INTO study_files (study_id, kind, content, imported_at) VALUES (?, ?, ?, ?)',
    );
    this.#latestFile = db.prepare(
      'SELECT content FROM study_files WHERE study_id = ? AND kind = ? ORDER BY id DESC LIMIT 1',
    );
  }

  list(): StudySummary[] {
    return (this.#list.all() as StudyRow[]).map(summaryOf);
  }

  get(id: string): StudyRecord | undefined {
    const row = this.#get.get(id) as StudyRow | undefined;
    return row ? { ...summaryOf(row), document: row.document } : undefined;
  }

  create(write: StudyWrite): StudyRecord {
    const id = newId();
    const now = new Date().toISOString();
    this.#db.transaction(() => {
      this.#insert.run(id, write.name, write.document, now, now);
      if (write.file) this.#insertFile.run(id, write.file.kind, write.file.content, now);
    })();
    return { id, name: write.name, document: write.document, createdAt: now, updatedAt: now };
  }

  /** Replaces a study's document (and records the file that came with it); undefined if no such study. */
  replace(id: string, write: StudyWrite): StudyRecord | undefined {
    const now = new Date().toISOString();
    const changed = this.#db.transaction(() => {
      const { changes } = this.#update.run(write.name, write.document, now, id);
      if (changes === 0) return false;
      if (write.file) this.#insertFile.run(id, write.file.kind, write.file.content, now);
      return true;
    })();
    return changed ? this.get(id) : undefined;
  }

  /**
   * Reads the study, lets `change` build the write from what it read, and writes it, all in one
   * transaction: nothing saved between the read and the write can be overwritten unseen.
   * Undefined if there is no such study; whatever `change` throws leaves the study as it was.
   */
  update(id: string, change: (current: StudyRecord) => StudyWrite): StudyRecord | undefined {
    return this.#db.transaction(() => {
      const current = this.get(id);
      return current === undefined ? undefined : this.replace(id, change(current));
    })();
  }

  /** Deletes a study with its files and runs; false if there was none. */
  delete(id: string): boolean {
    return this.#db.transaction(() => this.#delete.run(id).changes > 0)();
  }

  /** The content of the most recent file of `kind` imported into the study. */
  latestFile(id: string, kind: StudyFileKind): string | undefined {
    return (this.#latestFile.get(id, kind) as { content: string } | undefined)?.content;
  }
}

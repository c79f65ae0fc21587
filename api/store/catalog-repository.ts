import type { Database } from 'better-sqlite3';
import type { CatalogFormat } from '../catalog/catalog-formats.ts';

/**
 * The earthquake catalog attached to a study (migration 002): one per study, its text kept
 * exactly as it was received, with the counts of its load. Attaching another replaces it;
 * deleting the study deletes it (ON DELETE CASCADE).
 *
 */
export interface StudyCatalogWrite {
  /** What the user called the file, e.g. "network-2024.csv". */
  readonly fileName: string;
  readonly format: CatalogFormat;
  /** The catalog text as given. */
  readonly content: string;
  /** Events loaded from the text (at least one: an empty catalog is not attached). */
  readonly loadedCount: number;
  readonly rejectedCount: number;
  /** Loaded events whose magnitude is not a moment magnitude. */
  readonly nonMomentCount: number;
}

export interface StudyCatalogRecord extends StudyCatalogWrite {
  readonly studyId: string;
  /** ISO 8601 UTC. */
  readonly importedAt: string;
}

interface CatalogRow {
  study_id: string;
  file_name: string;
  format: CatalogFormat;
  content: string;
  imported_at: string;
  loaded_count: number;
  rejected_count: number;
  non_moment_count: number;
}

const recordOf = (row: CatalogRow): StudyCatalogRecord => ({
  studyId: row.study_id,
  fileName: row.file_name,
  format: row.format,
  content: row.content,
  importedAt: row.imported_at,
  loadedCount: row.loaded_count,
  rejectedCount: row.rejected_count,
  nonMomentCount: row.non_moment_count,
});

const SELECT =
  'SELECT study_id, file_name, format, content, imported_at, loaded_count, rejected_count, non_moment_count FROM study_catalogs WHERE study_id = ?';

/** The study catalogs of one connection; every write in a transaction. */
export class CatalogRepository {
  readonly #db: Database;

  constructor(db: Database) {
    this.#db = db;
  }

  /**
   * Attaches `write` to the study, replacing any catalog it had, in one transaction. Undefined
   * when there is no such study; `replaced` says whether a catalog was there before.
   */
  put(
    studyId: string,
    write: StudyCatalogWrite,
  ): { readonly catalog: StudyCatalogRecord; readonly replaced: boolean } | undefined {
    const db = this.#db;
    const importedAt = new Date().toISOString();
    return db.transaction(() => {
      if (db.prepare('SELECT 1 FROM studies WHERE id = ?').get(studyId) === undefined)
        return undefined;
      const replaced =
        db.prepare('SELECT 1 FROM study_catalogs WHERE study_id = ?').get(studyId) !== undefined;
      db.prepare(
        `INSERT INTO study_catalogs (study_id, file_name, format, content, imported_at, loaded_count, rejected_count, non_moment_count)
         VALUES (?, ?, ?, ?, ?, ?, ?, ?)
         ON CONFLICT (study_id) DO UPDATE SET file_name = excluded.file_name, format = excluded.format, content = excluded.content,
           imported_at = excluded.imported_at, loaded_count = excluded.loaded_count, rejected_count = excluded.rejected_count,
           non_moment_count = excluded.non_moment_count`,
      ).run(
        studyId,
        write.fileName,
        write.format,
        write.content,
        importedAt,
        write.loadedCount,
        write.rejectedCount,
        write.nonMomentCount,
      );
      return { catalog: recordOf(db.prepare(SELECT).get(studyId) as CatalogRow), replaced };
    })();
  }

  /** The study's catalog, or undefined when it has none (or there is no such study). */
  get(studyId: string): StudyCatalogRecord | undefined {
    const row = this.#db.prepare(SELECT).get(studyId) as CatalogRow | undefined;
    return row ? recordOf(row) : undefined;
  }

  /** Detaches the study's catalog; false when it had none. */
  delete(studyId: string): boolean {
    return this.#db.transaction(
      () =>
        this.#db.prepare('DELETE FROM study_catalogs WHERE study_id = ?').run(studyId).changes > 0,
    )();
  }
}

import type { Database } from 'better-sqlite3';

/**
 * Tremora's mark in the SQLite file header (`PRAGMA application_id`, offset 68 of the header,
 * https://www.sqlite.org/fileformat.html): the four letters "TRMR" read as a big-endian
 * 32-bit integer. A file with another mark belongs to another program and is never written.
 */
export const TREMORA_APPLICATION_ID = 0x54524d52;

/** Problems quoted from `PRAGMA quick_check` when a file is refused as damaged. */
const QUOTED_PROBLEMS = 3;

/** The database file cannot be used; the message names the file, what is wrong and what to do. */
export class DatabaseRefused extends Error {
  override name = 'DatabaseRefused';
}

/** Whether an error is SQLite's "database or disk is full" (SQLITE_FULL; also max_page_count reached). */
export const isDiskFull = (error: unknown): boolean =>
  (error as { code?: unknown } | null)?.code === 'SQLITE_FULL';

/** Whether an error says the database file is damaged (SQLITE_CORRUPT and its extended codes). */
export const isDamaged = (error: unknown): boolean =>
  String((error as { code?: unknown } | null)?.code ?? '').startsWith('SQLITE_CORRUPT');

/** What an SQLite error code says about a file that would not open (https://www.sqlite.org/rescode.html). */
export function refusalFor(path: string, error: unknown): DatabaseRefused {
  if (error instanceof DatabaseRefused) return error;
  const code = (error as { code?: string }).code ?? '';
  const said = error instanceof Error ? error.message : String(error);
  if (code === 'SQLITE_NOTADB')
    return new DatabaseRefused(
      `${path} is not an SQLite database (${said}); expected a Tremora database, or a path where none exists yet (set TREMORA_DB)`,
    );
  if (code.startsWith('SQLITE_CORRUPT'))
    return new DatabaseRefused(
      `${path} is damaged (${said}); restore it from a backup, or set TREMORA_DB to start a new database`,
    );
  if (code.startsWith('SQLITE_READONLY'))
    return new DatabaseRefused(
      `${path} cannot be written (${said}); expected a file and folder the service may write, or set TREMORA_DB to another path`,
    );
  if (
    code.startsWith('SQLITE_CANTOPEN') ||
    code === 'EACCES' ||
    code === 'EISDIR' ||
    code === 'ENOTDIR'
  ) {
    return new DatabaseRefused(
      `${path} cannot be opened (${said}); expected a file the service may read and write, in a folder it may write (set TREMORA_DB)`,
    );
  }
  if (code.startsWith('SQLITE_FULL') || code === 'ENOSPC')
    return new DatabaseRefused(
      `the disk holding ${path} is full (${said}); free some space and start again`,
    );
  return new DatabaseRefused(`${path} could not be opened: ${said}`);
}

const userTables = (db: Database): string[] =>
  (
    db
      .prepare("SELECT name FROM sqlite_schema WHERE type = 'table' AND name NOT LIKE 'sqlite_%'")
      .all() as { name: string }[]
  ).map((r) => r.name);

/**
 * Checks, before anything is written, that the file at `path` is Tremora's and whole:
 * its application_id is Tremora's (or unset, on a new file or one written by a Tremora that
 * did not yet set it, which then gets the mark), and `PRAGMA quick_check` finds no damage (the
 * O(N) subset of integrity_check, https://www.sqlite.org/pragma.html#pragma_quick_check).
 */
export function checkDatabaseFile(db: Database, path: string): void {
  const applicationId = db.pragma('application_id', { simple: true }) as number;
  if (applicationId !== 0 && applicationId !== TREMORA_APPLICATION_ID) {
    throw new DatabaseRefused(
      `${path} belongs to another program (its application_id is ${applicationId}, Tremora's is ${TREMORA_APPLICATION_ID}); nothing was written to it. Set TREMORA_DB to a Tremora database or to a new path`,
    );
  }
  const problems = (db.pragma('quick_check') as { quick_check: string }[]).map(
    (r) => r.quick_check,
  );
  if (problems.length !== 1 || problems[0] !== 'ok') {
    throw new DatabaseRefused(
      `${path} is damaged (PRAGMA quick_check: ${problems.slice(0, QUOTED_PROBLEMS).join('; ')}${problems.length > QUOTED_PROBLEMS ? `; and ${problems.length - QUOTED_PROBLEMS} more` : ''}); nothing was written to it. Restore it from a backup, or set TREMORA_DB to start a new database`,
    );
  }
  if (applicationId === 0) {
    const tables = userTables(db);
    if (tables.length > 0 && !(tables.includes('schema_version') && tables.includes('studies'))) {
      throw new DatabaseRefused(
        `${path} holds another program's tables (${tables.slice(0, 5).join(', ')}${tables.length > 5 ? ', …' : ''}); nothing was written to it. Set TREMORA_DB to a Tremora database or to a new path`,
      );
    }
    db.pragma(`application_id = ${TREMORA_APPLICATION_ID}`);
  }
}

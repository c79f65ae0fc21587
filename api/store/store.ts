import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import Database from 'better-sqlite3';
import { CatalogRepository } from './catalog-repository.ts';
import { checkDatabaseFile, isDiskFull, refusalFor } from './database-file.ts';
import { MapRunRepository } from './map-run-repository.ts';
import { migrate, type MigrationOutcome } from './migrate.ts';
import { PageAccessRepository } from './page-access-repository.ts';
import { RunRepository } from './run-repository.ts';
import { StudyRepository } from './study-repository.ts';

/** The database file used when TREMORA_DB is not set, relative to the working directory (git-ignored). */
export const DEFAULT_DATABASE_PATH = '.tremora/tremora.db';

/**
 * How long a statement waits for another connection's lock before failing, ms. Only one
 * service writes, but a backup or an inspection with the sqlite3 shell may hold a lock briefly.
 */
const BUSY_TIMEOUT_MS = 5_000;

export interface Store {
  /** The connection itself, for tests and diagnostics; the service goes through the repositories. */
  readonly db: Database.Database;
  readonly studies: StudyRepository;
  /** The earthquake catalog attached to each study. */
  readonly catalogs: CatalogRepository;
  readonly runs: RunRepository;
  /** Hazard-map runs and their GeoJSON. */
  readonly maps: MapRunRepository;
  /** Browsers given access to the pages of a service with a token. */
  readonly pageAccess: PageAccessRepository;
  readonly migration: MigrationOutcome;
  /** Runs found queued or running at open (left by a crash), now marked interrupted. */
  readonly interruptedAtOpen: number;
  /** Map runs found queued or running at open, now marked interrupted. */
  readonly mapRunsInterruptedAtOpen: number;
  /** `PRAGMA integrity_check`: 'ok' or the problems found. */
  /** Runs `work` in one transaction, for writes that span repositories (all or nothing). */
  transaction<T>(work: () => T): T;
  integrityCheck(): string;
  /** Cheap liveness check of the connection. */
  ping(): boolean;
  /** Remembers a write that failed for want of space (SQLITE_FULL); other errors are ignored. */
  noteWriteFailure(error: unknown): void;
  /** Whether the disk is full: the last write failed for want of space and none has succeeded since. */
  diskFull(): boolean;
  close(): void;
}

/**
 * Opens (creating if needed) the database at `path`: checked to be Tremora's own and whole
 * (database-file.ts; DatabaseRefused otherwise, with nothing written), WAL journal, foreign keys on, a busy
 * timeout, schema migrated, runs and map runs left unfinished by a previous process marked
 * interrupted.
 */
export function openStore(path: string): Store {
  let db: Database.Database;
  try {
    if (path !== ':memory:') mkdirSync(dirname(path), { recursive: true });
    db = new Database(path);
  } catch (error) {
    throw refusalFor(path, error);
  }
  try {
    checkDatabaseFile(db, path);
    db.pragma('journal_mode = WAL');
    // FULL: each commit survives a power cut too, not only a crash of the process; the
    // service writes rarely, so the extra sync costs nothing noticeable.
    db.pragma('synchronous = FULL');
    db.pragma('foreign_keys = ON');
    db.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
    const migration = migrate(db);
    const runs = new RunRepository(db);
    const interruptedAtOpen = runs.interruptUnfinished();
    const maps = new MapRunRepository(db);
    const mapRunsInterruptedAtOpen = maps.interruptUnfinished();
    // total_changes() counts the rows this connection has written: once it moves past its
    // value at the failure, a write has succeeded since and there is room again.
    const totalChanges = db.prepare('SELECT total_changes() AS n');
    const changesNow = () => (totalChanges.get() as { n: number }).n;
    let changesAtFull: number | undefined;
    return {
      db,
      studies: new StudyRepository(db),
      catalogs: new CatalogRepository(db),
      runs,
      maps,
      pageAccess: new PageAccessRepository(db),
      migration,
      interruptedAtOpen,
      mapRunsInterruptedAtOpen,
      transaction: (work) => db.transaction(work)(),
      integrityCheck: () =>
        (db.pragma('integrity_check') as { integrity_check: string }[])
          .map((r) => r.integrity_check)
          .join('; '),
      ping: () => (db.prepare('SELECT 1 AS one').get() as { one: number }).one === 1,
      noteWriteFailure: (error) => {
        if (isDiskFull(error)) changesAtFull = changesNow();
      },
      diskFull: () => {
        if (changesAtFull !== undefined && changesNow() !== changesAtFull)
          changesAtFull = undefined;
        return changesAtFull !== undefined;
      },
      close: () => db.close(),
    };
  } catch (error) {
    db.close();
    throw refusalFor(path, error);
  }
}

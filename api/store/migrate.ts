import { readdirSync, readFileSync } from 'node:fs';
import type { Database } from 'better-sqlite3';

/** The migrations shipped with the code: `NNN-name.sql`, applied in increasing NNN. */
export const MIGRATIONS_DIR = new URL('./migrations/', import.meta.url);

const MIGRATION_FILE = /^(\d{3})-[a-z0-9-]+\.sql$/;

export interface Migration {
  readonly version: number;
  readonly name: string;
  readonly sql: string;
}

/** Reads the numbered migrations of `dir`; numbers must run 1, 2, 3, ... without gaps. */
export function readMigrations(dir: URL = MIGRATIONS_DIR): Migration[] {
  const migrations = readdirSync(dir)
    .filter((file) => MIGRATION_FILE.test(file))
    .map((file) => ({
      version: Number(file.slice(0, 3)),
      name: file,
      sql: readFileSync(new URL(file, dir), 'utf8'),
    }))
    .sort((a, b) => a.version - b.version);
  migrations.forEach((m, i) => {
    if (m.version !== i + 1)
      throw new Error(
        `migration ${m.name}: expected number ${String(i + 1).padStart(3, '0')}; migrations must be numbered without gaps`,
      );
  });
  return migrations;
}

export interface MigrationOutcome {
  /** Schema version before: 0 for a new database. */
  readonly fromVersion: number;
  readonly toVersion: number;
}

/**
 * Brings the schema up to date. Each pending migration runs in its own transaction together
 * with its row in schema_version, so a failure leaves the database at the last whole version.
 * A database newer than the code is refused rather than guessed at.
 */
export function migrate(
  db: Database,
  migrations: readonly Migration[] = readMigrations(),
): MigrationOutcome {
  db.exec(`CREATE TABLE IF NOT EXISTS schema_version (
    version INTEGER PRIMARY KEY, name TEXT NOT NULL, applied_at TEXT NOT NULL)`);
  const row = db.prepare('SELECT MAX(version) AS version FROM schema_version').get() as {
    version: number | null;
  };
  const fromVersion = row.version ?? 0;
  const latest = migrations.at(-1)?.version ?? 0;
  if (fromVersion > latest) {
    throw new Error(
      `the database is at schema version ${fromVersion} but this Tremora knows versions up to ${latest}; expected an older database or a newer Tremora`,
    );
  }
  const record = db.prepare(
    'INSERT INTO schema_version (version, name, applied_at) VALUES (?, ?, ?)',
  );
  for (const migration of migrations) {
    if (migration.version <= fromVersion) continue;
    db.transaction(() => {
      db.exec(migration.sql);
      record.run(migration.version, migration.name, new Date().toISOString());
    })();
  }
  return { fromVersion, toVersion: Math.max(fromVersion, latest) };
}

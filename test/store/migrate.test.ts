import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { migrate, readMigrations } from '../../api/store/migrate.ts';

const dirs: string[] = [];
const tempDir = () => {
  const dir = mkdtempSync(join(tmpdir(), 'tremora-migrate-'));
  dirs.push(dir);
  return dir;
};
afterEach(() => dirs.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true })));

const tables = (db: Database.Database) =>
  (
    db.prepare("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name").all() as {
      name: string;
    }[]
  ).map((r) => r.name);

describe('migrate', () => {
  it('brings a new database from version 0 to the latest and records each version', () => {
    const db = new Database(':memory:');
    const shipped = readMigrations();
    const outcome = migrate(db, shipped);
    expect(outcome).toEqual({ fromVersion: 0, toVersion: shipped.length });
    expect(tables(db)).toEqual([
      'map_runs',
      'page_access',
      'runs',
      'schema_version',
      'studies',
      'study_catalogs',
      'study_files',
    ]);
    const versions = db.prepare('SELECT version, name FROM schema_version ORDER BY version').all();
    expect(versions).toEqual(shipped.map((m) => ({ version: m.version, name: m.name })));
  });

  it('does nothing the second time', () => {
    const db = new Database(':memory:');
    migrate(db);
    const latest = readMigrations().length;
    expect(migrate(db)).toEqual({ fromVersion: latest, toVersion: latest });
  });

  it('applies only pending migrations, each in its own transaction: a failing one leaves the last good version', () => {
    const dir = tempDir();
    writeFileSync(join(dir, '001-first.sql'), 'CREATE TABLE a (x INTEGER);');
    writeFileSync(
      join(dir, '002-second.sql'),
      'CREATE TABLE b (y INTEGER); INSERT INTO nowhere VALUES (1);',
    );
    const db = new Database(':memory:');
    const migrations = readMigrations(pathToFileURL(`${dir}/`));
    expect(() => migrate(db, migrations)).toThrow(/nowhere/);
    expect(tables(db)).toEqual(['a', 'schema_version']);
    expect(db.prepare('SELECT MAX(version) AS v FROM schema_version').get()).toEqual({ v: 1 });
  });

  it('refuses migration numbers with a gap', () => {
    const dir = tempDir();
    writeFileSync(join(dir, '001-first.sql'), 'SELECT 1;');
    writeFileSync(join(dir, '003-third.sql'), 'SELECT 1;');
    expect(() => readMigrations(pathToFileURL(`${dir}/`))).toThrow(
      'migration 003-third.sql: expected number 002',
    );
  });

  it('refuses a database newer than the code', () => {
    const db = new Database(':memory:');
    migrate(db);
    db.prepare(
      "INSERT INTO schema_version (version, name, applied_at) VALUES (999, '999-future.sql', 'x')",
    ).run();
    expect(() => migrate(db)).toThrow('the database is at schema version 999');
  });
});

import {
  closeSync,
  mkdirSync,
  openSync,
  readFileSync,
  statSync,
  writeFileSync,
  writeSync,
} from 'node:fs';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { migrate } from '../../../api/store/migrate.ts';
import { TREMORA_APPLICATION_ID } from '../../../api/store/database-file.ts';
import { openStore } from '../../../api/store/store.ts';
import { startPageApp, type PageApp } from '../../web/helpers/page-app.ts';
import { expectError } from '../helpers/assertions.ts';
import { jsonInit, startExpectingRefusal, tempDir } from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';

/**
 * Damaged, foreign and unusable database files: the service refuses to start with the
 * documented "tremora: cannot start: …" and exit code 2, no stack trace, and writes nothing
 * into a file that is not its own. A full disk is answered 507 in the error shape and health
 * says "degraded" until a write succeeds again.
 */
const dir = tempDir('tremora-dbfiles-');
afterAll(() => dir.remove());

async function expectRefusal(path: string, said: RegExp): Promise<string> {
  const { code, output } = await startExpectingRefusal({ databasePath: path });
  expect(code, output).toBe(2);
  expect(output).toMatch(/^tremora: cannot start: /m);
  expect(output).toMatch(said);
  expect(output).not.toMatch(/\n\s+at /);
  return output;
}

const tablesOf = (path: string) => {
  const db = new Database(path, { readonly: true });
  const names = (
    db.prepare("SELECT name FROM sqlite_schema WHERE type = 'table' ORDER BY name").all() as {
      name: string;
    }[]
  ).map((r) => r.name);
  db.close();
  return names;
};

/** A Tremora database with enough studies to fill many pages. */
function filledDatabase(path: string): void {
  const store = openStore(path);
  for (let i = 0; i < 60; i++)
    store.studies.create({
      name: `Filler ${i}`,
      document: JSON.stringify({ ...smallStudy(`Filler ${i}`), padding: 'x'.repeat(3000) }),
    });
  store.db.pragma('wal_checkpoint(TRUNCATE)');
  store.close();
}

describe('start on a file that is not a whole Tremora database', () => {
  test('garbage written into the middle of the file: refused as damaged', async () => {
    const path = `${dir.path}/damaged.db`;
    filledDatabase(path);
    const size = statSync(path).size;
    const pageSize = 4096;
    // Overwrite three whole pages in the middle with a fixed pattern (not a valid b-tree page).
    const fd = openSync(path, 'r+');
    const middle = Math.floor(size / pageSize / 2) * pageSize;
    writeSync(fd, Buffer.alloc(3 * pageSize, 0xa5), 0, 3 * pageSize, middle);
    closeSync(fd);
    const before = readFileSync(path);
    // quick_check lists the problems, or stops at the first page it cannot read at all.
    await expectRefusal(path, /damaged.db is damaged \(/);
    expect(readFileSync(path).equals(before)).toBe(true);
  });

  test("another program's SQLite file: refused, and none of Tremora's tables added", async () => {
    const path = `${dir.path}/foreign.db`;
    const db = new Database(path);
    db.exec('CREATE TABLE birds (id INTEGER PRIMARY KEY, name TEXT)');
    db.close();
    await expectRefusal(path, /holds another program's tables \(birds\)/);
    expect(tablesOf(path)).toEqual(['birds']);
  });

  test("a file marked with another program's application_id: refused", async () => {
    const path = `${dir.path}/marked.db`;
    const db = new Database(path);
    db.pragma('application_id = 1234');
    db.exec('CREATE TABLE schema_version (version INTEGER); CREATE TABLE studies (id TEXT)');
    db.close();
    await expectRefusal(path, /belongs to another program \(its application_id is 1234/);
  });

  test('a file that is not SQLite at all, a newer schema, a path that cannot be opened', async () => {
    const text = `${dir.path}/notes.db`;
    writeFileSync(text, 'These are notes, not a database.\n'.repeat(200));
    await expectRefusal(text, /is not an SQLite database/);
    expect(readFileSync(text, 'utf8')).toBe('These are notes, not a database.\n'.repeat(200));

    const newer = `${dir.path}/newer.db`;
    const store = openStore(newer);
    store.db
      .prepare(
        "INSERT INTO schema_version (version, name, applied_at) VALUES (99, '099-future.sql', '2030-01-01')",
      )
      .run();
    store.close();
    await expectRefusal(newer, /schema version 99 but this Tremora knows versions up to \d+/);

    const folder = `${dir.path}/a-folder.db`;
    mkdirSync(folder);
    await expectRefusal(folder, /cannot be opened/);
  });

  test('a Tremora database from before the mark is recognised and marked; a new one is marked', () => {
    const path = `${dir.path}/earlier.db`;
    const db = new Database(path);
    migrate(db);
    db.close();
    const store = openStore(path);
    expect(store.db.pragma('application_id', { simple: true })).toBe(TREMORA_APPLICATION_ID);
    store.close();
    const fresh = openStore(`${dir.path}/fresh.db`);
    expect(fresh.db.pragma('application_id', { simple: true })).toBe(TREMORA_APPLICATION_ID);
    fresh.close();
  });
});

describe('a full disk', () => {
  let page: PageApp;
  beforeAll(() => {
    page = startPageApp();
  });
  afterAll(async () => {
    await page.close();
  });

  test('writes answer 507 in the error shape, health says degraded, and both recover once there is room', async () => {
    const kept = await page.app.request(
      '/api/studies',
      jsonInit('POST', smallStudy('Saved before')),
    );
    expect(kept.status).toBe(201);
    const keptId = ((await kept.json()) as { id: string }).id;
    // SQLite's max_page_count stands in for the disk: no page beyond it can be written.
    const pages = page.ctx.store.db.pragma('page_count', { simple: true }) as number;
    page.ctx.store.db.pragma(`max_page_count = ${pages}`);
    const big = { ...smallStudy('Too big for the disk'), padding: 'x'.repeat(200_000) };
    const refused = await expectError(
      await page.app.request('/api/studies', jsonInit('POST', big)),
      507,
    );
    expect(refused.error).toMatch(/disk .* is full: nothing was saved/);
    const health = await page.app.request('/api/health');
    expect(health.status).toBe(503);
    expect(await health.json()).toMatchObject({ status: 'degraded', database: 'full' });
    expect((await page.app.request(`/api/studies/${keptId}`)).status).toBe(200);

    page.ctx.store.db.pragma('max_page_count = 1073741823');
    expect((await page.app.request('/api/studies', jsonInit('POST', big))).status).toBe(201);
    const after = await page.app.request('/api/health');
    expect(after.status).toBe(200);
    expect(await after.json()).toMatchObject({ status: 'ok', database: 'ok' });
    expect(page.ctx.store.integrityCheck()).toBe('ok');
  });
});

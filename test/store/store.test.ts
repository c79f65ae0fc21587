import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { INTERRUPTED_MESSAGE } from '../../api/store/run-repository.ts';
import { openStore } from '../../api/store/store.ts';

const dirs: string[] = [];
const dbPath = () => {
  const dir = mkdtempSync(join(tmpdir(), 'tremora-store-'));
  dirs.push(dir);
  return join(dir, 'nested', 'tremora.db');
};
afterEach(() => dirs.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true })));

describe('openStore', () => {
  it('creates the file and its folder, with WAL, foreign keys and a busy timeout', () => {
    const path = dbPath();
    const store = openStore(path);
    expect(existsSync(path)).toBe(true);
    expect(store.migration.fromVersion).toBe(0);
    expect(store.integrityCheck()).toBe('ok');
    expect(store.ping()).toBe(true);
    store.close();
    const db = new Database(path);
    expect(db.pragma('journal_mode', { simple: true })).toBe('wal');
    db.close();
  });

  it('marks runs left queued or running by a previous process interrupted, without results', () => {
    const path = dbPath();
    const first = openStore(path);
    const study = first.studies.create({ name: 'S', document: '{}' });
    const queued = first.runs.create({ studyId: study.id, document: '{}', inputHash: 'h1' });
    const running = first.runs.create({ studyId: study.id, document: '{}', inputHash: 'h2' });
    first.runs.markRunning(running.id, '2000-01-01T00:00:00.000Z');
    first.runs.setProgress(running.id, 0.4);
    const done = first.runs.create({ studyId: study.id, document: '{}', inputHash: 'h3' });
    first.runs.markRunning(done.id, '2000-01-01T00:00:00.000Z');
    first.runs.finishDone(done.id, {
      resultsJson: '{"ok":1}',
      provenanceJson: '{}',
      finishedAt: '2000-01-01T00:01:00.000Z',
    });
    first.close();

    const second = openStore(path);
    expect(second.interruptedAtOpen).toBe(2);
    expect(second.migration.fromVersion).toBe(second.migration.toVersion);
    for (const id of [queued.id, running.id]) {
      const run = second.runs.get(id);
      expect(run?.status).toBe('interrupted');
      expect(run?.error).toBe(INTERRUPTED_MESSAGE);
      expect(second.runs.results(id)).toBeUndefined();
    }
    expect(second.runs.get(running.id)?.progress).toBe(0.4);
    expect(second.runs.get(done.id)?.status).toBe('done');
    expect(second.runs.results(done.id)).toBe('{"ok":1}');
    second.close();
  });
});

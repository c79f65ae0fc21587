import Database from 'better-sqlite3';
import { beforeEach, describe, expect, it } from 'vitest';
import { openStore } from '../../api/store/store.ts';
import { RunRepository } from '../../api/store/run-repository.ts';
import { type StudyRepository } from '../../api/store/study-repository.ts';

let db: Database.Database;
let studies: StudyRepository;

beforeEach(() => {
  ({ db, studies } = openStore(':memory:'));
});

describe('StudyRepository', () => {
  it('keeps the document text exactly as given', () => {
    const text = '{\n  "name": "Kept",   "communities": []\n}\n';
    const created = studies.create({ name: 'Kept', document: text });
    expect(created.id).toMatch(/^[A-Za-z0-9_-]{12}$/);
    expect(studies.get(created.id)?.document).toBe(text);
    expect(studies.list()).toEqual([
      { id: created.id, name: 'Kept', createdAt: created.createdAt, updatedAt: created.updatedAt },
    ]);
  });

  it('replaces a document and records the imported file with it; the latest file wins', () => {
    const { id } = studies.create({ name: 'A', document: '{"v":1}' });
    studies.replace(id, {
      name: 'A',
      document: '{"v":2}',
      file: { kind: 'communities-csv', content: 'first' },
    });
    const replaced = studies.replace(id, {
      name: 'B',
      document: '{"v":3}',
      file: { kind: 'communities-csv', content: 'second' },
    });
    expect(replaced?.name).toBe('B');
    expect(replaced?.document).toBe('{"v":3}');
    expect(studies.latestFile(id, 'communities-csv')).toBe('second');
    expect(studies.latestFile(id, 'sources-geojson')).toBeUndefined();
    expect(studies.replace('no-such-id', { name: 'x', document: '{}' })).toBeUndefined();
  });

  it('deletes a study with its files and runs', () => {
    const { id } = studies.create({
      name: 'A',
      document: '{}',
      file: { kind: 'sources-geojson', content: '{}' },
    });
    const runs = new RunRepository(db);
    const run = runs.create({ studyId: id, document: '{}', inputHash: 'h' });
    expect(studies.delete(id)).toBe(true);
    expect(studies.get(id)).toBeUndefined();
    expect(runs.get(run.id)).toBeUndefined();
    expect(db.prepare('SELECT COUNT(*) AS n FROM study_files').get()).toEqual({ n: 0 });
    expect(studies.delete(id)).toBe(false);
  });
});

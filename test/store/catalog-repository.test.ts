import Database from 'better-sqlite3';
import { beforeEach, describe, expect, it } from 'vitest';
import { openStore } from '../../api/store/store.ts';
import { CatalogRepository, type StudyCatalogWrite } from '../../api/store/catalog-repository.ts';
import { migrate, readMigrations } from '../../api/store/migrate.ts';
import { StudyRepository } from '../../api/store/study-repository.ts';

let db: Database.Database;
let catalogs: CatalogRepository;
let studies: StudyRepository;

beforeEach(() => {
  ({ db, catalogs, studies } = openStore(':memory:'));
});

// Kept byte for byte: a BOM, CRLF line ends and a trailing blank line.
const TEXT =
  '\uFEFFtime,lon,lat,depthKm,magnitude,magnitudeType,id\r\n2001-01-15T00:00:00Z,-139,-50,10,5.0,Mw,ev-01\r\n\r\n';
const write = (overrides: Partial<StudyCatalogWrite> = {}): StudyCatalogWrite => ({
  fileName: 'network.csv',
  format: 'csv',
  content: TEXT,
  loadedCount: 1,
  rejectedCount: 0,
  nonMomentCount: 0,
  ...overrides,
});
const rows = () =>
  (db.prepare('SELECT COUNT(*) AS n FROM study_catalogs').get() as { n: number }).n;

describe('migration 002', () => {
  it('adds the study_catalogs table as schema version 2', () => {
    const names = readMigrations().map((m) => m.name);
    expect(names.slice(0, 2)).toEqual(['001-initial.sql', '002-study-catalogs.sql']);
    const columns = (
      db.prepare('PRAGMA table_info(study_catalogs)').all() as { name: string; pk: number }[]
    ).map((c) => [c.name, c.pk]);
    expect(columns).toEqual([
      ['study_id', 1],
      ['file_name', 0],
      ['format', 0],
      ['content', 0],
      ['imported_at', 0],
      ['loaded_count', 0],
      ['rejected_count', 0],
      ['non_moment_count', 0],
    ]);
  });
});

describe('migration 004', () => {
  it('keeps every stored catalog and takes a format name no CHECK lists, so a new format needs no rebuild', () => {
    const old = new Database(':memory:');
    old.pragma('foreign_keys = ON');
    const shipped = readMigrations();
    const fourth = shipped.findIndex((m) => m.name === '004-catalog-format-open.sql');
    migrate(old, shipped.slice(0, fourth));
    const { id } = new StudyRepository(old).create({ name: 'S', document: '{}' });
    new CatalogRepository(old).put(id, write());
    expect(() => old.prepare("UPDATE study_catalogs SET format = 'another-format'").run()).toThrow(
      /CHECK/,
    );
    migrate(old, shipped);
    expect(new CatalogRepository(old).get(id)).toMatchObject({
      fileName: 'network.csv',
      format: 'csv',
      content: TEXT,
    });
    old.prepare("UPDATE study_catalogs SET format = 'another-format'").run();
    expect(
      (old.prepare('SELECT format FROM study_catalogs').get() as { format: string }).format,
    ).toBe('another-format');
  });
});

describe('CatalogRepository put, get, delete', () => {
  it('attaches a catalog to a study and gives it back exactly as written', () => {
    const { id } = studies.create({ name: 'S', document: '{}' });
    const put = catalogs.put(id, write({ rejectedCount: 2, nonMomentCount: 1 }));
    expect(put?.replaced).toBe(false);
    expect(put?.catalog.importedAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
    expect(catalogs.get(id)).toEqual({
      studyId: id,
      fileName: 'network.csv',
      format: 'csv',
      content: TEXT,
      importedAt: put?.catalog.importedAt,
      loadedCount: 1,
      rejectedCount: 2,
      nonMomentCount: 1,
    });
  });

  it('keeps one catalog per study: a second put replaces the first', () => {
    const { id } = studies.create({ name: 'S', document: '{}' });
    catalogs.put(id, write());
    const second = catalogs.put(
      id,
      write({ fileName: 'events.xml', format: 'quakeml', content: '<q:quakeml/>', loadedCount: 3 }),
    );
    expect(second?.replaced).toBe(true);
    expect(catalogs.get(id)).toMatchObject({
      fileName: 'events.xml',
      format: 'quakeml',
      content: '<q:quakeml/>',
      loadedCount: 3,
    });
    expect(rows()).toBe(1);
  });

  it('writes nothing for an unknown study, and reads nothing for a study without a catalog', () => {
    expect(catalogs.put('no-such-id', write())).toBeUndefined();
    expect(rows()).toBe(0);
    const { id } = studies.create({ name: 'S', document: '{}' });
    expect(catalogs.get(id)).toBeUndefined();
    expect(catalogs.get('no-such-id')).toBeUndefined();
  });

  it('leaves the catalog as it was when a write is refused (one transaction)', () => {
    const { id } = studies.create({ name: 'S', document: '{}' });
    catalogs.put(id, write());
    expect(() => catalogs.put(id, write({ fileName: 'empty.csv', loadedCount: 0 }))).toThrow(
      /CHECK constraint failed/,
    );
    expect(() => catalogs.put(id, write({ format: '' as never }))).toThrow(
      /CHECK constraint failed/,
    );
    expect(catalogs.get(id)).toMatchObject({
      fileName: 'network.csv',
      loadedCount: 1,
      format: 'csv',
    });
  });

  it('detaches a catalog; false when there was none', () => {
    const { id } = studies.create({ name: 'S', document: '{}' });
    catalogs.put(id, write());
    expect(catalogs.delete(id)).toBe(true);
    expect(catalogs.get(id)).toBeUndefined();
    expect(catalogs.delete(id)).toBe(false);
    expect(catalogs.delete('no-such-id')).toBe(false);
  });

  it('goes with its study when the study is deleted', () => {
    const keep = studies.create({ name: 'Keep', document: '{}' });
    const gone = studies.create({ name: 'Gone', document: '{}' });
    catalogs.put(keep.id, write());
    catalogs.put(gone.id, write());
    expect(studies.delete(gone.id)).toBe(true);
    expect(catalogs.get(gone.id)).toBeUndefined();
    expect(catalogs.get(keep.id)?.content).toBe(TEXT);
    expect(rows()).toBe(1);
  });
});

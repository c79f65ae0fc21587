import { readFileSync, writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { DEMO_CATALOG_URL, seedDemoStudy } from '../../api/operations/demo-seed.ts';
import { openStore, type Store } from '../../api/store/store.ts';
import { tempDir } from '../service/helpers/service-process.ts';

let dir: ReturnType<typeof tempDir>;
let store: Store;

beforeEach(() => {
  dir = tempDir();
  store = openStore(`${dir.path}/seed.db`);
});
afterEach(() => {
  store.close();
  dir.remove();
});

/** Seeds from a study file, or the shipped study with a catalog file, in the test folder. */
const seedWithStudy = (fileName: string) =>
  seedDemoStudy(store, modelCatalog, pathToFileURL(`${dir.path}/${fileName}`));
const seedWithCatalog = (fileName: string) =>
  seedDemoStudy(store, modelCatalog, undefined, pathToFileURL(`${dir.path}/${fileName}`));

describe('seedDemoStudy', () => {
  it('saves the demo study with its document text as shipped', () => {
    const seed = seedDemoStudy(store, modelCatalog);
    expect(seed.seeded).toBe(true);
    const [only] = store.studies.list();
    expect(only?.name).toBe('Demo coast');
  });

  it('saves nothing and says why when the file is missing, malformed or invalid', () => {
    const missing = seedWithStudy('absent.json');
    expect(missing).toMatchObject({
      seeded: false,
      issues: [{ message: 'cannot read the demo study (ENOENT)' }],
    });
    writeFileSync(`${dir.path}/bad.json`, '{ "name": ');
    expect(seedWithStudy('bad.json').seeded).toBe(false);
    writeFileSync(`${dir.path}/invalid.json`, '{ "name": "Invalid" }');
    const invalid = seedWithStudy('invalid.json');
    expect(invalid.seeded).toBe(false);
    expect(store.studies.list()).toEqual([]);
  });

  it('attaches the demo catalog to the demo study (a smoke run: the demo is never a check value)', () => {
    const seed = seedDemoStudy(store, modelCatalog);
    const catalog = seed.seeded ? store.catalogs.get(seed.id) : undefined;
    expect(catalog).toMatchObject({ fileName: 'catalog.csv', format: 'csv', rejectedCount: 0 });
    expect(catalog?.content).toBe(readFileSync(DEMO_CATALOG_URL, 'utf8'));
  });

  it('saves nothing when the demo catalog is missing or loads no event', () => {
    const missing = seedWithCatalog('absent.csv');
    expect(missing).toMatchObject({
      seeded: false,
      issues: [{ message: 'cannot read the demo catalog (ENOENT)' }],
    });
    writeFileSync(
      `${dir.path}/empty.csv`,
      'time,lon,lat,depthKm,magnitude,magnitudeType,id\n2001-13-01T00:00:00Z,-150,-47,10,5,Mw,x\n',
    );
    const empty = seedWithCatalog('empty.csv');
    expect(empty).toMatchObject({
      seeded: false,
      issues: [{ path: `${dir.path}/empty.csv[line 2]` }],
    });
    expect(store.studies.list()).toEqual([]);
  });
});

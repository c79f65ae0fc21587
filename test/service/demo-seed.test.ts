import { writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { seedDemoStudy } from '../../api/service/demo-seed.ts';
import { openStore, type Store } from '../../api/store/store.ts';
import { tempDir } from './helpers/service-process.ts';

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

describe('seedDemoStudy', () => {
  it('saves the demo study with its document text as shipped', () => {
    const seed = seedDemoStudy(store, modelCatalog);
    expect(seed.seeded).toBe(true);
    const [only] = store.studies.list();
    expect(only?.name).toBe('Demo coast');
  });

  it('saves nothing and says why when the file is missing, malformed or invalid', () => {
    const missing = seedDemoStudy(store, modelCatalog, pathToFileURL(`${dir.path}/absent.json`));
    expect(missing).toMatchObject({ seeded: false, issues: [{ message: 'cannot read the demo study (ENOENT)' }] });
    writeFileSync(`${dir.path}/bad.json`, '{ "name": ');
    expect(seedDemoStudy(store, modelCatalog, pathToFileURL(`${dir.path}/bad.json`)).seeded).toBe(false);
    writeFileSync(`${dir.path}/invalid.json`, '{ "name": "Invalid" }');
    const invalid = seedDemoStudy(store, modelCatalog, pathToFileURL(`${dir.path}/invalid.json`));
    expect(invalid.seeded).toBe(false);
    expect(store.studies.list()).toEqual([]);
  });
});

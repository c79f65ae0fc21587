import { readFileSync } from 'node:fs';
import { readCatalogText } from '../catalog/catalog-input.ts';
import type { CatalogLoad } from '../catalog/catalog-load.ts';
import { InvalidInput, type InputIssue } from '../engine/errors.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { Store } from '../store/index.ts';
import { parseJsonText } from '../study/json-text.ts';
import { loadStudy } from '../study/load-study.ts';

/** The invented demo study (data-demo/README.md) saved into a new database. */
export const DEMO_STUDY_URL = new URL('../../data-demo/demo.study.json', import.meta.url);
/** Its synthetic catalog, attached to it. */
export const DEMO_CATALOG_URL = new URL('../../data-demo/catalog.csv', import.meta.url);

export type DemoSeed =
  | { readonly seeded: true; readonly id: string }
  | { readonly seeded: false; readonly issues: readonly InputIssue[] };

/** A file shipped with Tremora, or the issue that names it and why it cannot be read. */
function readDemoFile(
  url: URL,
  what: string,
): { ok: true; text: string } | { ok: false; issue: InputIssue } {
  try {
    return { ok: true, text: readFileSync(url, 'utf8') };
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? 'error';
    return { ok: false, issue: { path: url.pathname, message: `cannot read ${what} (${code})` } };
  }
}

/**
 * Saves the demo study and its catalog, each validated like any other, into `store`. Called
 * once, when the database is new, so a user who deletes the demo does not find it back at the
 * next start.
 */
export function seedDemoStudy(
  store: Store,
  models: ModelCatalog,
  url: URL = DEMO_STUDY_URL,
  catalogUrl: URL = DEMO_CATALOG_URL,
): DemoSeed {
  const read = readDemoFile(url, 'the demo study');
  if (!read.ok) return { seeded: false, issues: [read.issue] };
  const text = read.text;
  const parsed = parseJsonText(text, url.pathname);
  if (!parsed.ok) return { seeded: false, issues: [parsed.issue] };
  const result = loadStudy(parsed.value, { models });
  if (!result.ok) return { seeded: false, issues: result.issues };
  const catalogRead = readDemoFile(catalogUrl, 'the demo catalog');
  if (!catalogRead.ok) return { seeded: false, issues: [catalogRead.issue] };
  const catalogText = catalogRead.text;
  let catalog: CatalogLoad;
  try {
    catalog = readCatalogText(catalogText, undefined, catalogUrl.pathname);
  } catch (error) {
    if (!(error instanceof InvalidInput)) throw error;
    return { seeded: false, issues: error.issues };
  }
  const { summary, format } = catalog;
  const fileName = catalogUrl.pathname.split('/').pop() as string;
  return store.transaction((): DemoSeed => {
    const { id } = store.studies.create({ name: result.study.name, document: text });
    store.catalogs.put(id, {
      fileName,
      format,
      content: catalogText,
      loadedCount: summary.loaded,
      rejectedCount: summary.rejected,
      nonMomentCount: summary.nonMoment,
    });
    return { seeded: true, id };
  });
}

import { readFileSync } from 'node:fs';
import type { InputIssue } from '../engine/errors.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { Store } from '../store/index.ts';
import { parseJsonText } from '../study/json-text.ts';
import { loadStudy } from '../study/load-study.ts';

/** The invented demo study (data-demo/README.md) saved into a new database. */
export const DEMO_STUDY_URL = new URL('../../data-demo/demo.study.json', import.meta.url);

export type DemoSeed = { readonly seeded: true; readonly id: string } | { readonly seeded: false; readonly issues: readonly InputIssue[] };

/**
 * Saves the demo study, validated like any other, into `store`. Called once, when the
 * database is new, so a user who deletes the demo does not find it back at the next start.
 */
export function seedDemoStudy(store: Store, models: ModelCatalog, url: URL = DEMO_STUDY_URL): DemoSeed {
  let text: string;
  try {
    text = readFileSync(url, 'utf8');
  } catch (error) {
    return { seeded: false, issues: [{ path: url.pathname, message: `cannot read the demo study (${(error as NodeJS.ErrnoException).code ?? 'error'})` }] };
  }
  const parsed = parseJsonText(text, url.pathname);
  if (!parsed.ok) return { seeded: false, issues: [parsed.issue] };
  const result = loadStudy(parsed.value, { models });
  if (!result.ok) return { seeded: false, issues: result.issues };
  return { seeded: true, id: store.studies.create({ name: result.study.name, document: text }).id };
}

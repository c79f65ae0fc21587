import { readFileSync } from 'node:fs';
import { DEMO_STUDY_URL } from '../../../api/operations/demo-seed.ts';
import type { Store } from '../../../api/store/store.ts';

/** Saves a study document straight into the store (no request), under its own name; gives its id. */
export function saveStudy(store: Store, study: Readonly<Record<string, unknown>>): string {
  return store.studies.create({ name: String(study.name), document: JSON.stringify(study) }).id;
}

/** Saves the demo study as shipped (data-demo/demo.study.json, its text unchanged); gives its id. */
export function saveDemoStudy(store: Store): string {
  return store.studies.create({
    name: 'Demo coast',
    document: readFileSync(DEMO_STUDY_URL, 'utf8'),
  }).id;
}

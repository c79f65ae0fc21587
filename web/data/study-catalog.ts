import { readFileSync } from 'node:fs';
import type { CatalogFormat } from '../../api/catalog/catalog-formats.ts';
import type { CatalogLoad } from '../../api/catalog/catalog-load.ts';
import { readCatalogText } from '../../api/catalog/catalog-input.ts';
import { feltHistory, type FeltHistory } from '../../api/engine/catalog/felt-history.ts';
import { InvalidInput } from '../../api/engine/errors.ts';
import type { Study } from '../../api/engine/model.ts';
import { FELT_PAIR_BUDGET } from '../../api/operations/catalog-limits.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';

/** A catalog attached to a study: its text as received, format and file name. */
export interface AttachedCatalog {
  readonly text: string;
  readonly format: CatalogFormat;
  readonly fileName: string;
}

/** The demo's synthetic catalog (data-demo/README.md): invented, for the demo only. */
export const DEMO_CATALOG_URL = new URL('../../data-demo/catalog.csv', import.meta.url);
export const DEMO_CATALOG_FILE = 'catalog.csv';

export function readDemoCatalog(): AttachedCatalog {
  return {
    text: readFileSync(DEMO_CATALOG_URL, 'utf8'),
    format: 'csv',
    fileName: DEMO_CATALOG_FILE,
  };
}

/** The catalog attached to the study (study_catalogs, api/store/catalog-repository.ts). */
export function studyCatalog(ctx: ServiceContext, studyId: string): AttachedCatalog | undefined {
  const record = ctx.store.catalogs.get(studyId);
  return record
    ? { text: record.content, format: record.format, fileName: record.fileName }
    : undefined;
}

/**
 * Attaches a catalog whose load found events (as PUT /api/studies/{id}/catalog does), replacing
 * any other; false when there is no such study.
 */
export function attachCatalog(
  ctx: ServiceContext,
  studyId: string,
  catalog: AttachedCatalog,
  load: CatalogLoad,
): boolean {
  const put = ctx.store.catalogs.put(studyId, {
    fileName: catalog.fileName,
    format: load.format,
    content: catalog.text,
    loadedCount: load.summary.loaded,
    rejectedCount: load.summary.rejected,
    nonMomentCount: load.summary.nonMoment,
  });
  return put !== undefined;
}

export type FeltData =
  | { readonly kind: 'history'; readonly load: CatalogLoad; readonly history: FeltHistory }
  /** More events × communities than a request computes (FELT_PAIR_BUDGET). */
  | { readonly kind: 'too-many'; readonly pairs: number };

/**
 * The felt history of every community of `study` from its attached catalog: all events, not
 * declustered (people felt the aftershocks too). Undefined without a catalog, or when the
 * stored text no longer loads.
 */
export function feltData(
  ctx: ServiceContext,
  study: Study,
  catalog: AttachedCatalog | undefined,
): FeltData | undefined {
  if (!catalog) return undefined;
  try {
    const load = readCatalogText(catalog.text, catalog.format);
    const pairs = load.events.length * study.communities.length;
    if (pairs > FELT_PAIR_BUDGET) return { kind: 'too-many', pairs };
    return {
      kind: 'history',
      load,
      history: feltHistory(study, load.events, { models: ctx.models }),
    };
  } catch (error) {
    if (error instanceof InvalidInput) return undefined;
    throw error;
  }
}

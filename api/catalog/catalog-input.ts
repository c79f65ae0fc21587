import { InvalidInput, type InputIssue } from '../engine/errors.ts';
import { CATALOG_FORMAT_LABELS } from './catalog-formats.ts';
import type { CatalogFormat } from './catalog-formats.ts';
import type { CatalogLoad, RejectedRecord } from './catalog-load.ts';
import { parseCatalog } from './parse-catalog.ts';

/**
 * Most issues listed when no event loads: enough to show the pattern of a wrong file, short
 * enough to read (our choice); the last issue says how many more there were.
 */
const MAX_ISSUES = 50;

/** `catalog[line 7]` for a record's place, `catalog.quakeml` for an element. */
const under = (path: string, where: string): string =>
  /^(line|event) /.test(where) ? `${path}[${where}]` : `${path}.${where}`;

/** One issue per reason of each rejected record, under `path`, at most MAX_ISSUES in all. */
export function rejectedIssues(rejected: readonly RejectedRecord[], path: string): InputIssue[] {
  const issues = rejected.flatMap((r) =>
    r.reasons.map((reason) => ({ path: under(path, r.where), message: reason })),
  );
  if (issues.length <= MAX_ISSUES) return issues;
  return [
    ...issues.slice(0, MAX_ISSUES - 1),
    { path, message: `and ${issues.length - MAX_ISSUES + 1} more problems in other records` },
  ];
}

/**
 * Catalog text as a user hands it in: parsed in the given format or the detected one. Records
 * that fail are kept in the load's `rejected` list while the rest load; a text that cannot be
 * read at all (no header, malformed XML) or that loads no event at all throws InvalidInput
 * with issues under `path` naming the line or event.
 */
export function readCatalogText(
  text: string,
  format?: CatalogFormat,
  path = 'catalog',
): CatalogLoad {
  if (text.trim() === '') {
    throw new InvalidInput(
      [{ path, message: `expected catalog text (${CATALOG_FORMAT_LABELS}); got an empty text` }],
      'invalid catalog',
    );
  }
  let load: CatalogLoad;
  try {
    load = parseCatalog(text, format);
  } catch (error) {
    if (!(error instanceof InvalidInput)) throw error;
    throw new InvalidInput(
      error.issues.map((i) => ({ path: under(path, i.path), message: i.message })),
      'invalid catalog',
    );
  }
  if (load.events.length > 0) return load;
  const issues =
    load.rejected.length > 0
      ? rejectedIssues(load.rejected, path)
      : [{ path, message: `expected at least one event; the ${load.format} text holds none` }];
  throw new InvalidInput(issues, 'no event could be loaded from the catalog');
}

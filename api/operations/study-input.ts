import { InvalidInput, type InputIssue } from '../engine/errors.ts';
import type { Study } from '../engine/model.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { StudyRecord, Store } from '../store/index.ts';
import type { SiteProxy } from '../engine/terrain/site-proxy.ts';
import { loadStudy, type LoadStudyOptions, type StudyPart } from '../study/load-study.ts';
import { jsonDepthExceeds, MAX_JSON_DEPTH, parseJsonText } from '../study/json-text.ts';

export interface ValidStudy {
  readonly study: Study;
  readonly warnings: readonly InputIssue[];
}

/** Issues of a study nested in a request (`study.communities[2].vs30`). */
const under = (prefix: string | undefined, issues: readonly InputIssue[]): InputIssue[] =>
  prefix === undefined
    ? [...issues]
    : issues.map((i) => ({
        path: i.path === '(study)' ? prefix : `${prefix}.${i.path}`,
        message: i.message,
      }));

/**
 * The parts of a document that nest deeper than a stored document may (MAX_JSON_DEPTH, which
 * is also the limit it is read back with). A body within the limit can exceed it once placed
 * in the document: an import of sources goes one level down, under `sources`.
 */
function nestingIssues(raw: unknown): InputIssue[] {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return [];
  return Object.entries(raw)
    .filter(
      ([, value]) =>
        typeof value === 'object' &&
        value !== null &&
        jsonDepthExceeds(JSON.stringify(value), MAX_JSON_DEPTH - 1),
    )
    .map(([key]) => ({
      path: key,
      message: `expected the study document nested at most ${MAX_JSON_DEPTH} levels deep (objects and lists), got deeper with ${key} in it`,
    }));
}

/**
 * What a study document names and the caller has read: the CSV of a document whose
 * `communities` names a file (imported earlier), and the slope–Vs30 proxy over the terrain
 * grid it names (terrain-grids.ts), which communities without vs30 or a site class take.
 */
export interface StudyFiles {
  readonly communitiesCsv?: string | undefined;
  readonly siteProxy?: SiteProxy | undefined;
  /** Why the terrain grid the document names could not be read, when it could not. */
  readonly terrainProblem?: string | undefined;
}

const loadOptions = (models: ModelCatalog, files: StudyFiles): LoadStudyOptions => ({
  models,
  ...(files.communitiesCsv === undefined ? {} : { communitiesCsv: files.communitiesCsv }),
  ...(files.siteProxy === undefined ? {} : { siteProxy: files.siteProxy }),
  ...(files.terrainProblem === undefined ? {} : { terrainProblem: files.terrainProblem }),
});

/** Validates a study document; throws InvalidInput listing every problem. */
export function validateStudy(
  raw: unknown,
  models: ModelCatalog,
  files: StudyFiles = {},
  pathPrefix?: string,
): ValidStudy {
  const tooDeep = nestingIssues(raw);
  if (tooDeep.length > 0) throw new InvalidInput(under(pathPrefix, tooDeep), 'invalid study');
  const result = loadStudy(raw, loadOptions(models, files));
  if (!result.ok) throw new InvalidInput(under(pathPrefix, result.issues), 'invalid study');
  return { study: result.study, warnings: under(pathPrefix, result.warnings) };
}

/**
 * Validates a study that may still be a draft (no communities or no sources yet: the pages create
 * studies so); everything it holds is checked as validateStudy does, and what it lacks comes back
 * in `missing`. A draft is saved but never screened: the runs go through validateStudy.
 */
export function validateDraft(
  raw: unknown,
  models: ModelCatalog,
  files: StudyFiles = {},
): ValidStudy & { readonly missing: readonly StudyPart[] } {
  const tooDeep = nestingIssues(raw);
  if (tooDeep.length > 0) throw new InvalidInput(tooDeep, 'invalid study');
  const result = loadStudy(raw, { ...loadOptions(models, files), allowIncomplete: true });
  if (!result.ok) throw new InvalidInput(result.issues, 'invalid study');
  return { study: result.study, warnings: result.warnings, missing: result.missing };
}

/** The inputs of a saved study: its document text and what it names (the imported CSV, the terrain's proxy). */
export interface StoredInputs extends StudyFiles {
  readonly document: string;
  readonly raw: Record<string, unknown>;
}

/** Terrain grids read beforehand (terrain-grids.ts), looked up by the document that names them. */
export interface TerrainLookup {
  siteProxyFor(document: unknown): SiteProxy | undefined;
  problemWith(document: unknown): string | undefined;
}

/** A stored document is one the service validated before writing, so it parses. */
function parseStored(text: string): Record<string, unknown> {
  const parsed = parseJsonText(text, 'document');
  if (!parsed.ok || typeof parsed.value !== 'object' || parsed.value === null) {
    throw new Error(
      `a stored study document does not parse as a JSON object: ${parsed.ok ? 'not an object' : parsed.issue.message}`,
    );
  }
  return parsed.value as Record<string, unknown>;
}

/** The proxy over the terrain grid a document names, or why it could not be read. */
export function terrainFiles(document: unknown, terrain: TerrainLookup | undefined): StudyFiles {
  return {
    siteProxy: terrain?.siteProxyFor(document),
    terrainProblem: terrain?.problemWith(document),
  };
}

/**
 * A saved study's document and, when its `communities` names a file, the latest imported CSV;
 * with `terrain`, the proxy over the grid it names (read beforehand: TerrainGrids.prepare).
 */
export function storedInputs(
  store: Store,
  record: StudyRecord,
  terrain?: TerrainLookup,
): StoredInputs {
  const raw = parseStored(record.document);
  const named = terrainFiles(raw, terrain);
  if (typeof raw.communities !== 'string') return { document: record.document, raw, ...named };
  const csv = store.studies.latestFile(record.id, 'communities-csv');
  return { document: record.document, raw, communitiesCsv: csv, ...named };
}

/** The study a run computed, from the inputs copied into it (and the proxy of the terrain it names). */
export function runStudy(
  inputs: { document: string; communitiesCsv?: string },
  models: ModelCatalog,
  terrain?: TerrainLookup,
): ValidStudy {
  const raw = parseStored(inputs.document);
  return validateStudy(raw, models, {
    communitiesCsv: inputs.communitiesCsv,
    ...terrainFiles(raw, terrain),
  });
}

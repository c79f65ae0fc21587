import { sourceSanity } from '../engine/sanity/source-sanity.ts';
import type { InputIssue } from '../engine/errors.ts';
import type { Community, LonLat, Study, TectonicSetting } from '../engine/model.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import type { SiteProxy } from '../engine/terrain/site-proxy.ts';
import { readBranches } from './branches-schema.ts';
import { MAX_COMMUNITIES, readCommunities } from './community-schema.ts';
import { readCommunitiesCsv } from './communities-csv.ts';
import type { CommunityTable } from './community-files/community-table.ts';
import { tableCommunities } from './community-files/table-communities.ts';
import { describeValue, text } from './fields.ts';
import { IssueList } from './issues.ts';
import { readSettings } from './settings-schema.ts';
import { MAX_STUDY_VERTICES, readSourceGeometry, vertexCount } from './source-geometry.ts';
import { readSources } from './source-schema.ts';
import { checkRuptureEstimate } from './rupture-estimate.ts';
import { checkStudyExtent } from './study-extent.ts';

export const STUDY_KEYS = [
  'name',
  'communities',
  'sources',
  'groundMotion',
  'settings',
  'outline',
  'terrain',
  'notes',
] as const;

/** The parts a study must have before it can be screened; a draft may lack them. */
export type StudyPart = 'communities' | 'sources';

export type LoadResult =
  | {
      readonly ok: true;
      readonly study: Study;
      readonly warnings: readonly InputIssue[];
      /** What a draft still lacks (only with `allowIncomplete`); empty for a complete study. */
      readonly missing: readonly StudyPart[];
    }
  | {
      readonly ok: false;
      readonly issues: readonly InputIssue[];
      readonly warnings: readonly InputIssue[];
    };

export interface LoadStudyOptions {
  /** The models studies may name (api/engine/motion/registry.ts). */
  readonly models: ModelCatalog;
  /**
   * CSV text for `communities` when the study gives a path there instead of a list; the caller
   * (CLI, service) reads the file, so loading stays free of I/O.
   */
  readonly communitiesCsv?: string;
  /**
   * The file `communities` names, read into a table by its format's reader
   * (community-files/read-community-file.ts); used instead of `communitiesCsv` when given.
   */
  readonly communitiesTable?: CommunityTable;
  /**
   * The slope–Vs30 proxy over the study's terrain grid (engine/terrain/site-proxy.ts), read by
   * the caller: communities without vs30 or a site class take it.
   */
  readonly siteProxy?: SiteProxy;
  /** Why the terrain grid the study names could not be read (reported at `terrain`). */
  readonly terrainProblem?: string;
  /**
   * Accept a draft: a study with no communities or no sources yet (an empty list, or the key left
   * out). Everything it does hold is checked as usual; what it lacks comes back in `missing`, and
   * a draft is never screened (the runs validate without this).
   */
  readonly allowIncomplete?: boolean;
}

/** An empty or absent list of communities or collection of sources, which a draft may have. */
function isEmptyPart(part: StudyPart, raw: unknown): boolean {
  if (raw === undefined) return true;
  if (part === 'communities') return Array.isArray(raw) && raw.length === 0;
  const collection = raw as { type?: unknown; features?: unknown } | null;
  return (
    typeof collection === 'object' &&
    collection !== null &&
    collection.type === 'FeatureCollection' &&
    Array.isArray(collection.features) &&
    collection.features.length === 0
  );
}

/**
 * Validates a study document (DESIGN.md section 2) and builds the typed Study. Every problem is
 * reported at once, each with the path of the field and what was expected.
 */
export function loadStudy(raw: unknown, options: LoadStudyOptions): LoadResult {
  const issues = new IssueList();
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    issues.add(
      [],
      `expected a study object with ${STUDY_KEYS.join(', ')}, got ${describeValue(raw)}`,
    );
    return { ok: false, issues: issues.issues, warnings: [] };
  }
  const doc = raw as Record<string, unknown>;
  issues.warnUnknownKeys(doc, STUDY_KEYS, []);

  const name = issues.parse(text(200, 'a study name'), doc.name, ['name']);
  const missing = options.allowIncomplete
    ? (['communities', 'sources'] as const).filter((part) => isEmptyPart(part, doc[part]))
    : [];
  const communities = missing.includes('communities')
    ? []
    : readStudyCommunities(doc.communities, options, issues);
  const sources = missing.includes('sources') ? [] : readSources(doc.sources, issues, ['sources']);
  const settings = readSettings(doc.settings, issues, ['settings']);
  const used = new Set<TectonicSetting>(sources.map((s) => s.setting));
  const groundMotion = readBranches(doc.groundMotion, used, settings, options.models, issues, [
    'groundMotion',
  ]);
  const outline = doc.outline === undefined ? undefined : readOutline(doc.outline, issues);
  // The terrain grid's file name; the CLI reads it beside the study, the service in its terrain folder.
  const terrain =
    doc.terrain === undefined
      ? undefined
      : issues.parse(
          text(300, 'the file name of a GeoTIFF or ESRI ASCII elevation grid'),
          doc.terrain,
          ['terrain'],
        );
  if (terrain !== undefined && options.terrainProblem !== undefined)
    issues.add(['terrain'], options.terrainProblem);
  // Notes are the study author's words on where the model comes from; kept in the document only.
  if (doc.notes !== undefined) issues.parse(text(4000, 'notes on the study'), doc.notes, ['notes']);
  // Only on a study without other problems: the valid sources then keep their feature order.
  // The extent first: beyond it the local frame, and with it the estimates, do not hold.
  if (issues.issues.length === 0) checkStudyExtent(communities, sources, outline, issues);
  if (issues.issues.length === 0 && settings) checkRuptureEstimate(sources, settings, issues);

  if (
    issues.issues.length > 0 ||
    name === undefined ||
    !settings ||
    !groundMotion ||
    (communities.length === 0 && !missing.includes('communities'))
  ) {
    return { ok: false, issues: issues.issues, warnings: issues.warnings };
  }
  const study: Study = {
    name,
    communities,
    sources,
    groundMotion,
    settings,
    ...(outline ? { outline } : {}),
    ...(terrain ? { terrain } : {}),
  };
  for (const w of sourceSanity(study))
    issues.warn(
      ['sources', 'features', w.sourceIndex, 'properties', ...w.field.split('.')],
      w.message,
    );
  return { ok: true, study, warnings: issues.warnings, missing };
}

function readStudyCommunities(
  raw: unknown,
  options: LoadStudyOptions,
  issues: IssueList,
): Community[] {
  if (typeof raw === 'string') {
    if (options.communitiesTable !== undefined)
      return tableCommunities(
        options.communitiesTable,
        ['communities'],
        issues,
        {},
        options.siteProxy,
      ).communities;
    if (options.communitiesCsv === undefined) {
      issues.add(
        ['communities'],
        `a file "${raw}" is named here but its contents were not supplied; expected a list of communities or a readable communities file`,
      );
      return [];
    }
    return readCommunitiesCsv(
      options.communitiesCsv,
      ['communities'],
      issues,
      raw,
      options.siteProxy,
    ).communities;
  }
  if (!Array.isArray(raw) || raw.length === 0 || raw.length > MAX_COMMUNITIES) {
    issues.add(
      ['communities'],
      `expected a list of 1 to ${MAX_COMMUNITIES} communities (or the path of a communities file: CSV, XLSX, KML, KMZ, zipped shapefile or GeoJSON), got ${describeValue(raw)}`,
    );
    return [];
  }
  return readCommunities(raw, issues, (i) => ['communities', i], options.siteProxy);
}

/** The optional map outline: a GeoJSON Polygon, MultiPolygon or FeatureCollection of polygons. */
function readOutline(raw: unknown, issues: IssueList): LonLat[][] | undefined {
  const rings: LonLat[][] = [];
  const take = (geometry: unknown, path: readonly PropertyKey[]) => {
    const g = geometry as { type?: unknown; coordinates?: unknown } | null;
    if (g?.type === 'MultiPolygon' && Array.isArray(g.coordinates)) {
      g.coordinates.forEach((coords, i) =>
        take({ type: 'Polygon', coordinates: coords }, [...path, 'coordinates', i]),
      );
      return;
    }
    const read = readSourceGeometry(geometry, issues, path);
    if (read?.kind === 'zone') rings.push(read.rings[0] as LonLat[]);
    else if (read)
      issues.add(
        [...path, 'type'],
        `expected a Polygon or MultiPolygon outline, got ${describeValue(g?.type)}`,
      );
  };
  const fc = raw as { type?: unknown; features?: unknown };
  const vertices = Array.isArray(fc.features)
    ? fc.features.reduce(
        (n: number, f) => n + vertexCount((f as { geometry?: unknown } | null)?.geometry),
        0,
      )
    : vertexCount(raw);
  if (vertices > MAX_STUDY_VERTICES) {
    issues.add(
      ['outline'],
      `expected at most ${MAX_STUDY_VERTICES} vertices in the outline (the limit), got ${vertices}; simplify it`,
    );
    return undefined;
  }
  if (fc.type === 'FeatureCollection' && Array.isArray(fc.features)) {
    fc.features.forEach((f, i) =>
      take((f as { geometry?: unknown } | null)?.geometry, ['outline', 'features', i, 'geometry']),
    );
  } else {
    take(raw, ['outline']);
  }
  return rings;
}

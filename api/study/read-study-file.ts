import { readFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import { InvalidInput } from '../engine/errors.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import { siteProxy, type SiteProxy } from '../engine/terrain/site-proxy.ts';
import { readTerrainFile, terrainBesideStudy } from '../terrain/index.ts';
import { CommunityFileProblem } from './community-files/file-problem.ts';
import { readCommunityFile } from './community-files/read-community-file.ts';
import { IssueList } from './issues.ts';
import { loadStudy, type LoadResult } from './load-study.ts';
import { parseJsonText } from './json-text.ts';

/**
 * Reads and validates a study file. A `communities` path (CSV, XLSX, KML, KMZ, zipped shapefile
 * or GeoJSON) is read relative to the study file. File-system failures and unreadable files
 * come back as issues, like any other problem with the input.
 */
export async function readStudyFile(path: string, models: ModelCatalog): Promise<LoadResult> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (error) {
    return {
      ok: false,
      issues: [
        {
          path,
          message: `cannot read the study file (${(error as NodeJS.ErrnoException).code ?? 'error'})`,
        },
      ],
      warnings: [],
    };
  }
  const parsed = parseJsonText(text, path);
  if (!parsed.ok) return { ok: false, issues: [parsed.issue], warnings: [] };
  const doc = parsed.value as { communities?: unknown; terrain?: unknown } | null;
  const terrain = await terrainProxy(path, doc?.terrain);
  const withTerrain = (result: LoadResult): LoadResult =>
    result.ok || terrain.problem === undefined
      ? result
      : { ...result, issues: [...result.issues, terrain.problem] };
  const communities = doc?.communities;
  if (typeof communities !== 'string')
    return withTerrain(loadStudy(parsed.value, { models, ...terrain.options }));
  let bytes: Uint8Array;
  try {
    bytes = await readFile(resolve(dirname(path), communities));
  } catch (error) {
    return {
      ok: false,
      issues: [
        {
          path: 'communities',
          message: `cannot read the communities file "${communities}" (${(error as NodeJS.ErrnoException).code ?? 'error'})`,
        },
      ],
      warnings: [],
    };
  }
  const fileIssues = new IssueList();
  try {
    const table = await readCommunityFile(bytes, communities, ['communities'], fileIssues);
    const result = withTerrain(
      loadStudy(parsed.value, { models, communitiesTable: table, ...terrain.options }),
    );
    if (fileIssues.issues.length === 0) return result;
    const issues = [...fileIssues.issues, ...(result.ok ? [] : result.issues)];
    return { ok: false, issues, warnings: [...fileIssues.warnings, ...result.warnings] };
  } catch (error) {
    if (!(error instanceof CommunityFileProblem)) throw error;
    return { ok: false, issues: [{ path: 'communities', message: error.message }], warnings: [] };
  }
}

/**
 * The slope–Vs30 proxy over the terrain grid a study names, read beside the study file. A grid
 * that cannot be read gives no proxy; its problem is reported only when the study then fails
 * (a community needed the proxy), since a study with every Vs30 given does not need the grid.
 */
async function terrainProxy(
  studyPath: string,
  terrain: unknown,
): Promise<{ options: { siteProxy?: SiteProxy }; problem?: { path: string; message: string } }> {
  if (typeof terrain !== 'string') return { options: {} };
  try {
    return {
      options: {
        siteProxy: siteProxy(await readTerrainFile(terrainBesideStudy(studyPath, terrain))),
      },
    };
  } catch (error) {
    if (!(error instanceof InvalidInput)) throw error;
    const issue = error.issues[0] ?? { path: 'terrain', message: error.message };
    return { options: {}, problem: { path: issue.path, message: issue.message } };
  }
}

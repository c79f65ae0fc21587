import { readFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
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
  const communities = (parsed.value as { communities?: unknown } | null)?.communities;
  if (typeof communities !== 'string') return loadStudy(parsed.value, { models });
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
    const result = loadStudy(parsed.value, { models, communitiesTable: table });
    if (fileIssues.issues.length === 0) return result;
    const issues = [...fileIssues.issues, ...(result.ok ? [] : result.issues)];
    return { ok: false, issues, warnings: [...fileIssues.warnings, ...result.warnings] };
  } catch (error) {
    if (!(error instanceof CommunityFileProblem)) throw error;
    return { ok: false, issues: [{ path: 'communities', message: error.message }], warnings: [] };
  }
}

import { readFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import { loadStudy, type LoadResult } from './load-study.ts';
import { parseJsonText } from './json-text.ts';

/**
 * Reads and validates a study file. A `communities` path is read relative to the study file.
 * File-system failures come back as issues, like any other problem with the input.
 */
export async function readStudyFile(path: string, models: ModelCatalog): Promise<LoadResult> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (error) {
    return { ok: false, issues: [{ path, message: `cannot read the study file (${(error as NodeJS.ErrnoException).code ?? 'error'})` }], warnings: [] };
  }
  const parsed = parseJsonText(text, path);
  if (!parsed.ok) return { ok: false, issues: [parsed.issue], warnings: [] };
  const communities = (parsed.value as { communities?: unknown } | null)?.communities;
  if (typeof communities !== 'string') return loadStudy(parsed.value, { models });
  const csvPath = resolve(dirname(path), communities);
  try {
    return loadStudy(parsed.value, { models, communitiesCsv: await readFile(csvPath, 'utf8') });
  } catch (error) {
    return {
      ok: false,
      issues: [{ path: 'communities', message: `cannot read the communities CSV "${communities}" (${(error as NodeJS.ErrnoException).code ?? 'error'})` }],
      warnings: [],
    };
  }
}

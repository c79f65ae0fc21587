import type { Study } from '../engine/model.ts';
import { modelCatalog } from '../engine/motion/registry.ts';
import { readStudyFile } from '../study/read-study-file.ts';
import { formatIssues, type Io, UsageError } from './output.ts';

/** Thrown when a study file has problems; they are printed already. */
export class StudyRejected extends Error {
  override name = 'StudyRejected';
}

/** Reads and validates a study for a verb; prints its problems (and warnings unless quiet) to stderr. */
export async function loadStudyForVerb(
  path: string | undefined,
  io: Io,
  quiet = false,
): Promise<Study> {
  if (path === undefined) throw new UsageError('expected a STUDY file');
  const result = await readStudyFile(path, modelCatalog);
  if (!quiet && result.warnings.length > 0) io.err(`warnings:\n${formatIssues(result.warnings)}`);
  if (!result.ok) {
    io.err(
      `${path}: ${result.issues.length} problem${result.issues.length === 1 ? '' : 's'}:\n${formatIssues(result.issues)}`,
    );
    throw new StudyRejected(path);
  }
  return result.study;
}

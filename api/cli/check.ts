import { modelCatalog } from '../engine/motion/registry.ts';
import { readStudyFile } from '../study/read-study-file.ts';
import { EXIT_BAD_INPUT, EXIT_OK, formatIssues, type Io, UsageError } from './output.ts';
import { verbArgs } from './args.ts';

export const CHECK_USAGE = `tremora check STUDY [--json]

Validates a study file (and the communities CSV it names) without computing anything.
Prints that it is valid, or every problem with the path of the field; exits 2 on problems.`;

export async function checkVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, { booleans: ['json'] });
  if (positionals.length !== 1) throw new UsageError('expected exactly one STUDY file');
  const path = positionals[0] as string;
  const result = await readStudyFile(path, modelCatalog);
  if (values.json) {
    io.out(
      JSON.stringify(
        result.ok
          ? { valid: true, warnings: result.warnings }
          : { valid: false, issues: result.issues, warnings: result.warnings },
        null,
        2,
      ),
    );
    return result.ok ? EXIT_OK : EXIT_BAD_INPUT;
  }
  if (result.warnings.length > 0) io.err(`warnings:\n${formatIssues(result.warnings)}`);
  if (!result.ok) {
    io.err(
      `${path}: ${result.issues.length} problem${result.issues.length === 1 ? '' : 's'}:\n${formatIssues(result.issues)}`,
    );
    return EXIT_BAD_INPUT;
  }
  const { study } = result;
  io.out(
    `${path}: valid — "${study.name}", ${study.communities.length} communities, ${study.sources.length} sources, measures ${study.settings.measures.join(', ')}`,
  );
  return EXIT_OK;
}

import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { catalogVerb, CATALOG_USAGE } from './cli/catalog.ts';
import { checkVerb, CHECK_USAGE } from './cli/check.ts';
import { StudyRejected } from './cli/load.ts';
import { mapVerb, MAP_USAGE } from './cli/map.ts';
import { motionVerb, MOTION_USAGE } from './cli/motion.ts';
import { scenarioVerb, SCENARIO_USAGE } from './cli/scenario.ts';
import { screenVerb, SCREEN_USAGE } from './cli/screen.ts';
import { tsunamiVerb, TSUNAMI_USAGE } from './cli/tsunami.ts';
import { EXIT_BAD_INPUT, EXIT_FAILURE, EXIT_OK, formatIssues, type Io, processIo, UsageError } from './cli/output.ts';
import { InvalidInput, TremoraError } from './engine/errors.ts';

interface Verb {
  readonly usage: string;
  run(args: readonly string[], io: Io): Promise<number>;
}

const VERBS: Readonly<Record<string, Verb>> = {
  screen: { usage: SCREEN_USAGE, run: screenVerb },
  check: { usage: CHECK_USAGE, run: checkVerb },
  scenario: { usage: SCENARIO_USAGE, run: scenarioVerb },
  map: { usage: MAP_USAGE, run: mapVerb },
  motion: { usage: MOTION_USAGE, run: motionVerb },
  catalog: { usage: CATALOG_USAGE, run: catalogVerb },
  tsunami: { usage: TSUNAMI_USAGE, run: tsunamiVerb },
};

const USAGE = `tremora — earthquake-hazard screening for small communities

Usage:
${Object.values(VERBS).map((v) => `  ${v.usage.split('\n')[0]}`).join('\n')}

Run "tremora VERB --help" for one verb. Results are screening estimates, not design values.`;

/** Runs one CLI invocation; returns the exit code. */
export async function runCli(argv: readonly string[], io: Io = processIo): Promise<number> {
  const [name, ...args] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(USAGE);
    return name === undefined ? EXIT_BAD_INPUT : EXIT_OK;
  }
  const verb = VERBS[name];
  if (!verb) {
    io.err(`tremora: unknown verb "${name}"; expected one of ${Object.keys(VERBS).join(', ')}\n\n${USAGE}`);
    return EXIT_BAD_INPUT;
  }
  if (args.includes('--help') || args.includes('-h')) {
    io.out(verb.usage);
    return EXIT_OK;
  }
  try {
    return await verb.run(args, io);
  } catch (error) {
    if (error instanceof UsageError || (error instanceof TypeError && 'code' in error && String(error.code).startsWith('ERR_PARSE_ARGS'))) {
      io.err(`tremora ${name}: ${error.message}\n\n${verb.usage}`);
      return EXIT_BAD_INPUT;
    }
    if (error instanceof StudyRejected) return EXIT_BAD_INPUT;
    if (error instanceof InvalidInput) {
      io.err(`tremora ${name}: ${error.issues.length} problem${error.issues.length === 1 ? '' : 's'}:\n${formatIssues(error.issues)}`);
      return EXIT_BAD_INPUT;
    }
    if (error instanceof TremoraError) {
      io.err(`tremora ${name}: ${error.message}`);
      return EXIT_BAD_INPUT;
    }
    io.err(`tremora ${name}: unexpected failure: ${error instanceof Error ? error.message : String(error)}`);
    return EXIT_FAILURE;
  }
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === resolve(process.argv[1])) {
  process.exitCode = await runCli(process.argv.slice(2));
}

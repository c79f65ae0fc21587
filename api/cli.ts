import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  EXIT_BAD_INPUT,
  EXIT_FAILURE,
  EXIT_OK,
  formatIssues,
  type Io,
  processIo,
  UsageError,
} from './cli/output.ts';
import { InvalidInput, TremoraError } from './engine/errors.ts';

interface VerbModule {
  readonly usage: string;
  run(args: readonly string[], io: Io): Promise<number>;
}

interface Verb {
  /** The first line of the verb's usage (checked against it in test/cli/cli.test.ts). */
  readonly synopsis: string;
  /** Loaded only when the verb runs, so `tremora --help` starts without the engine. */
  load(): Promise<VerbModule>;
}

const VERBS: Readonly<Record<string, Verb>> = {
  screen: {
    synopsis: 'tremora screen STUDY [--out FILE] [--format json|csv] [--json]',
    load: async () =>
      import('./cli/screen.ts').then((m) => ({ usage: m.SCREEN_USAGE, run: m.screenVerb })),
  },
  check: {
    synopsis: 'tremora check STUDY [--json]',
    load: async () =>
      import('./cli/check.ts').then((m) => ({ usage: m.CHECK_USAGE, run: m.checkVerb })),
  },
  scenario: {
    synopsis: 'tremora scenario STUDY --source ID --magnitude M [options] [--json]',
    load: async () =>
      import('./cli/scenario.ts').then((m) => ({ usage: m.SCENARIO_USAGE, run: m.scenarioVerb })),
  },
  map: {
    synopsis:
      'tremora map STUDY --measure PGA --return-period YEARS --spacing KM [options] [--json]',
    load: async () => import('./cli/map.ts').then((m) => ({ usage: m.MAP_USAGE, run: m.mapVerb })),
  },
  motion: {
    synopsis: 'tremora motion --model NAME --magnitude M --rjb KM [options] [--json]',
    load: async () =>
      import('./cli/motion.ts').then((m) => ({ usage: m.MOTION_USAGE, run: m.motionVerb })),
  },
  catalog: {
    synopsis: 'tremora catalog (fit CATALOG | felt STUDY CATALOG) [options] [--json]',
    load: async () =>
      import('./cli/catalog.ts').then((m) => ({ usage: m.CATALOG_USAGE, run: m.catalogVerb })),
  },
  tsunami: {
    synopsis: 'tremora tsunami STUDY [--source ID]... [--high-ground M] [--json]',
    load: async () =>
      import('./cli/tsunami.ts').then((m) => ({ usage: m.TSUNAMI_USAGE, run: m.tsunamiVerb })),
  },
  'import-faults': {
    synopsis:
      'tremora import-faults STUDY FILE [--map FIELD=ATTRIBUTE]... [defaults] [--dry-run] [--json]',
    load: async () =>
      import('./cli/import-faults.ts').then((m) => ({
        usage: m.IMPORT_FAULTS_USAGE,
        run: m.importFaultsVerb,
      })),
  },
  worker: {
    synopsis: 'tremora worker [--threads N]',
    load: async () =>
      import('./cli/worker.ts').then((m) => ({
        usage: m.WORKER_USAGE,
        run: (args: readonly string[], io: Io) => m.workerVerb(args, io),
      })),
  },
};

export const VERB_SYNOPSES: Readonly<Record<string, string>> = Object.fromEntries(
  Object.entries(VERBS).map(([name, v]) => [name, v.synopsis]),
);

const USAGE = `tremora — earthquake-hazard screening for small communities

Usage:
${Object.values(VERBS)
  .map((v) => `  ${v.synopsis}`)
  .join('\n')}

Run "tremora VERB --help" for one verb. Results are screening estimates, not design values.`;

/**
 * Node's argument parser speaks to programmers ("Unknown option '--x'. To specify a positional
 * argument ..."); say the same in the CLI's words, or undefined when the error is not the parser's.
 */
export function parserProblem(error: unknown): string | undefined {
  if (!(
    error instanceof TypeError &&
    'code' in error &&
    String(error.code).startsWith('ERR_PARSE_ARGS')
  ))
    return undefined;
  const quoted = /'([^']+)'/.exec(error.message)?.[1] ?? '';
  const option = quoted.split(' ')[0] ?? quoted;
  switch (error.code) {
    case 'ERR_PARSE_ARGS_UNKNOWN_OPTION':
      return `unknown option "${option}"; the options are listed below`;
    case 'ERR_PARSE_ARGS_UNEXPECTED_POSITIONAL':
      return `unexpected argument "${quoted}"`;
    case 'ERR_PARSE_ARGS_INVALID_OPTION_VALUE':
      return error.message.includes('does not take an argument')
        ? `option "${option}" takes no value`
        : `option "${option}" needs a value`;
    default:
      return error.message;
  }
}

/** Runs one CLI invocation; returns the exit code. */
export async function runCli(argv: readonly string[], io: Io = processIo): Promise<number> {
  const [name, ...args] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(USAGE);
    return name === undefined ? EXIT_BAD_INPUT : EXIT_OK;
  }
  const verb = Object.hasOwn(VERBS, name) ? VERBS[name] : undefined;
  if (!verb) {
    io.err(
      `tremora: unknown verb "${name}"; expected one of ${Object.keys(VERBS).join(', ')}\n\n${USAGE}`,
    );
    return EXIT_BAD_INPUT;
  }
  const { usage, run } = await verb.load();
  if (args.includes('--help') || args.includes('-h')) {
    io.out(usage);
    return EXIT_OK;
  }
  try {
    return await run(args, io);
  } catch (error) {
    const usageProblem = error instanceof UsageError ? error.message : parserProblem(error);
    if (usageProblem !== undefined) {
      io.err(`tremora ${name}: ${usageProblem}\n\n${usage}`);
      return EXIT_BAD_INPUT;
    }
    // A study that did not load has had its problems printed already (cli/load.ts).
    if (error instanceof Error && error.name === 'StudyRejected') return EXIT_BAD_INPUT;
    if (error instanceof InvalidInput) {
      io.err(
        `tremora ${name}: ${error.issues.length} problem${error.issues.length === 1 ? '' : 's'}:\n${formatIssues(error.issues)}`,
      );
      return EXIT_BAD_INPUT;
    }
    if (
      error instanceof TremoraError ||
      (error instanceof Error && error.name === 'QueueSettingError')
    ) {
      io.err(`tremora ${name}: ${error.message}`);
      return EXIT_BAD_INPUT;
    }
    io.err(
      `tremora ${name}: unexpected failure: ${error instanceof Error ? error.message : String(error)}`,
    );
    return EXIT_FAILURE;
  }
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === resolve(process.argv[1])) {
  process.exitCode = await runCli(process.argv.slice(2));
}

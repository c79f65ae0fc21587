import { readFile, rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { parseArgs } from 'node:util';
import { modelCatalog } from '../engine/motion/registry.ts';
import { CommunityFileProblem } from '../study/community-files/file-problem.ts';
import {
  studyIssuesByFault,
  studySourceFeatures,
  withFaults,
} from '../study/fault-files/add-faults.ts';
import {
  readFaultDefaults,
  STARTING_DEFAULTS,
  type DefaultsText,
} from '../study/fault-files/fault-defaults.ts';
import {
  FAULT_FIELDS,
  guessFaultMapping,
  type FaultField,
  type FaultMapping,
} from '../study/fault-files/fault-fields.ts';
import { faultSources, type FaultProblem } from '../study/fault-files/fault-sources.ts';
import { readFaultFile } from '../study/fault-files/read-fault-file.ts';
import { parseJsonText } from '../study/json-text.ts';
import { readStudyFile } from '../study/read-study-file.ts';
import { EXIT_BAD_INPUT, EXIT_OK, formatIssues, type Io, UsageError } from './output.ts';

export const IMPORT_FAULTS_USAGE = `tremora import-faults STUDY FILE [--map FIELD=ATTRIBUTE]... [defaults] [--dry-run] [--json]

Adds the faults of a regional fault file (GeoJSON, KML, KMZ or a zipped shapefile) to the
study's sources, keeping the sources it has. Each fault gets a moment-balanced recurrence from
its slip rate. Nothing is written unless every fault and the whole study are valid; otherwise
every missing or out-of-range value is listed by feature (number and name) and field.
  --map FIELD=ATTRIBUTE  the file's attribute for one of Tremora's fields (repeat); fields:
                         ${FAULT_FIELDS.join(', ')}
                         (attributes with usual names are recognised without it)
  --setting S            tectonic setting of the faults: crustal (default), interface, intraslab
  --dip DEG, --rake DEG, --upper-depth KM, --lower-depth KM, --slip-rate MM_PER_YR
                         values for faults whose file gives none (upper depth 0 km unless given)
  --b-value B            b-value of the recurrence (default ${STARTING_DEFAULTS.bValue})
  --m-min M              smallest magnitude of the recurrence (default ${STARTING_DEFAULTS.mMin})
  --m-max M              largest magnitude of the recurrence (required)
  --dry-run              list the mapping and the problems; write nothing`;

const DEFAULT_OPTIONS = {
  setting: 'setting',
  dip: 'dip',
  rake: 'rake',
  'upper-depth': 'upperDepthKm',
  'lower-depth': 'lowerDepthKm',
  'slip-rate': 'slipRateMmYr',
  'b-value': 'bValue',
  'm-min': 'mMin',
  'm-max': 'mMax',
} as const;

/** `--map` options as a mapping; a field Tremora does not have is a usage error naming the fields. */
function readMapOptions(pairs: readonly string[]): FaultMapping {
  const mapping: FaultMapping = {};
  for (const pair of pairs) {
    const at = pair.indexOf('=');
    const field = pair.slice(0, Math.max(at, 0));
    if (at < 1 || !FAULT_FIELDS.includes(field as FaultField))
      throw new UsageError(
        `--map: expected FIELD=ATTRIBUTE with FIELD one of ${FAULT_FIELDS.join(', ')}, got "${pair}"`,
      );
    mapping[field as FaultField] = pair.slice(at + 1);
  }
  return mapping;
}

const describeProblem = (p: FaultProblem) =>
  `  feature ${p.feature} (${p.name}) ${p.field}${p.from !== undefined ? ` [${p.from}]` : ''}: ${p.message}`;

export async function importFaultsVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = parseArgs({
    args: [...args],
    options: {
      map: { type: 'string', multiple: true },
      ...Object.fromEntries(Object.keys(DEFAULT_OPTIONS).map((k) => [k, { type: 'string' }])),
      'dry-run': { type: 'boolean' },
      json: { type: 'boolean' },
    } as Record<string, { type: 'string' | 'boolean'; multiple?: boolean }>,
    allowPositionals: true,
    strict: true,
  });
  if (positionals.length !== 2) throw new UsageError('expected a STUDY file and a fault FILE');
  const [studyPath, faultPath] = positionals as [string, string];
  const given = readMapOptions((values.map as string[] | undefined) ?? []);
  const text: DefaultsText = { ...STARTING_DEFAULTS };
  for (const [option, key] of Object.entries(DEFAULT_OPTIONS)) {
    const value = values[option];
    if (typeof value === 'string') text[key] = value;
  }
  const defaults = readFaultDefaults(text);
  if (!defaults.ok) {
    io.err(`tremora import-faults: the defaults:\n${formatIssues(defaults.issues)}`);
    return EXIT_BAD_INPUT;
  }
  const studyText = await readFile(studyPath, 'utf8').catch((error: NodeJS.ErrnoException) => {
    throw new UsageError(`cannot read the study file ${studyPath} (${error.code ?? 'error'})`);
  });
  const parsed = parseJsonText(studyText, studyPath);
  if (!parsed.ok || typeof parsed.value !== 'object' || parsed.value === null) {
    io.err(
      `${studyPath}: expected a study (a JSON object)${parsed.ok ? '' : `: ${parsed.issue.message}`}`,
    );
    return EXIT_BAD_INPUT;
  }
  const raw = parsed.value as Record<string, unknown>;
  let file;
  try {
    file = await readFaultFile(await readFile(faultPath), basename(faultPath));
  } catch (error) {
    if (error instanceof CommunityFileProblem) {
      io.err(`tremora import-faults: ${error.message}`);
      return EXIT_BAD_INPUT;
    }
    if ((error as NodeJS.ErrnoException).code !== undefined) {
      io.err(
        `tremora import-faults: cannot read ${faultPath} (${(error as NodeJS.ErrnoException).code})`,
      );
      return EXIT_BAD_INPUT;
    }
    throw error;
  }
  const mapping = {
    ...guessFaultMapping(file.attributes),
    ...given,
  };
  const unknown = Object.entries(mapping).filter(([, a]) => !file.attributes.includes(a as string));
  if (unknown.length > 0)
    throw new UsageError(
      `--map: the file has no attribute ${unknown.map(([f, a]) => `"${a}" (for ${f})`).join(', ')}; its attributes are ${file.attributes.join(', ') || 'none'}`,
    );
  const own = studySourceFeatures(raw);
  const ownIds = new Set(
    own.map((f) => String((f as { properties?: { id?: unknown } }).properties?.id)),
  );
  const imported = faultSources(file, mapping, defaults.defaults, ownIds);
  const mappingLine = FAULT_FIELDS.map((f) => `${f}=${mapping[f] ?? '(none)'}`).join(', ');
  let problems = [...imported.problems];
  let others: { path: string; message: string }[] = [];
  const document = withFaults(raw, imported.features);
  const dryRun = values['dry-run'] === true;
  let written = false;
  if (problems.length === 0) {
    // Validated as the study file it will become, beside the study so that the files it names
    // (communities, terrain) are found; it replaces the study only when valid.
    const candidate = join(
      dirname(studyPath),
      `.${basename(studyPath)}.import-${process.pid}.json`,
    );
    await writeFile(candidate, `${JSON.stringify(document, null, 2)}\n`);
    try {
      const result = await readStudyFile(candidate, modelCatalog);
      if (!result.ok) {
        const split = studyIssuesByFault(result.issues, own.length, imported.features);
        problems = split.problems;
        others = split.others;
      } else if (!dryRun) {
        await rename(candidate, studyPath);
        written = true;
      }
    } finally {
      if (!written) await rm(candidate, { force: true });
    }
  }
  const ok = problems.length === 0 && others.length === 0;
  if (values.json) {
    io.out(
      JSON.stringify(
        { added: written ? imported.features.length : 0, mapping, problems, issues: others },
        null,
        2,
      ),
    );
    return ok ? EXIT_OK : EXIT_BAD_INPUT;
  }
  io.err(
    `${file.fileName}: ${file.records.length} features (${file.format}); mapping: ${mappingLine}`,
  );
  if (!ok) {
    const lines = [
      ...problems.map(describeProblem),
      ...(others.length > 0 ? [formatIssues(others)] : []),
    ];
    io.err(
      `${studyPath}: nothing written; ${problems.length + others.length} problem${problems.length + others.length === 1 ? '' : 's'}:\n${lines.join('\n')}`,
    );
    return EXIT_BAD_INPUT;
  }
  io.out(
    dryRun
      ? `${studyPath}: ${imported.features.length} faults would be added (dry run, nothing written)`
      : `${studyPath}: added ${imported.features.length} faults; ${own.length + imported.features.length} sources in all`,
  );
  return EXIT_OK;
}

import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { fitCatalog, type CatalogFit, type FitOptionNames } from '../catalog/catalog-fit.ts';
import { readCatalogText } from '../catalog/catalog-input.ts';
import { catalogFitJson, catalogLoadJson, feltJson, isoTime } from '../catalog/catalog-json.ts';
import { describeCatalogLoad, type CatalogLoad } from '../catalog/catalog-load.ts';
import { parseIsoTimeMs } from '../catalog/iso-time.ts';
import { readZonePolygon } from '../catalog/zone-geojson.ts';
import {
  feltHistory,
  FELT_MMI,
  STRONGLY_FELT_MMI,
  type Compass,
  type FeltEstimate,
  type FeltHistory,
} from '../engine/catalog/felt-history.ts';
import { MAGNITUDE_RELATIONS } from '../engine/catalog/magnitude-conversion.ts';
import { InvalidInput } from '../engine/errors.ts';
import { mmiRoman } from '../engine/intensity/mmi-roman.ts';
import { modelCatalog } from '../engine/motion/registry.ts';
import { parseJsonText } from '../study/json-text.ts';
import type { CompletenessPeriod } from '../engine/catalog/completeness-periods.ts';
import { numberOption, sig, verbArgs } from './args.ts';
import { loadStudyForVerb } from './load.ts';
import { EXIT_OK, type Io, UsageError } from './output.ts';

export const CATALOG_USAGE = `tremora catalog (fit CATALOG | felt STUDY CATALOG) [options] [--json]

tremora catalog fit CATALOG [--polygon FILE] [--m-max M] [--no-decluster] [--all-magnitudes]
                   [--start TIME --end TIME] [--periods LIST] [--json]
  Gutenberg–Richter recurrence from an earthquake catalog (our CSV, FDSN event text or QuakeML):
  Gardner & Knopoff (1974) declustering, Mc by maximum curvature + 0.2 (Woessner & Wiemer 2005),
  b by Aki (1965) with Utsu's correction and Shi & Bolt (1982) uncertainty, the annual rate.
  --polygon FILE      fit only the events inside a GeoJSON Polygon (or a Feature holding one)
  --m-max M           largest magnitude the zone can host: gives the recurrence to paste into a study
  --no-decluster      keep foreshocks and aftershocks
  --all-magnitudes    use every magnitude type as it is (default: moment magnitudes only)
  --convert IDS       convert ML, mb or Ms to Mw by the relations named (comma-separated):
                      scordilis2006-ms, scordilis2006-mb, grunthal2009-ml; events outside a
                      relation's range are not converted; converted events are counted
  --start --end TIME  the catalog's observation span, ISO 8601 (default: first to last event,
                      which shortens it and so raises the rates)
  --periods LIST      completeness periods for a Weichert (1980) fit, as M@TIME pairs, e.g.
                      5.0@1946-01-01,4.0@1970-01-01,3.0@2000-01-01 (complete from M 5.0 since
                      1946, ...); or "proposed" to take them from Mc over time windows

tremora catalog felt STUDY CATALOG [--community ID] [--all-magnitudes] [--json]
  The past earthquakes people at each community of the study have likely felt: the median
  intensity of each event from the study's ground-motion models and Worden et al. (2012);
  likely felt at MMI IV or more, strongly felt at VI or more.
  --community ID      one community only

With --json: only the machine-readable result (as the API answers it). Screening estimates,
not design values.`;

/** `tremora catalog fit ...` or `tremora catalog felt ...`. */
export async function catalogVerb(args: readonly string[], io: Io): Promise<number> {
  const [sub, ...rest] = args;
  if (sub === 'fit') return fitVerb(rest, io);
  if (sub === 'felt') return feltVerb(rest, io);
  throw new UsageError(
    `expected "fit" or "felt" after "catalog", got ${sub === undefined ? 'nothing' : `"${sub}"`}`,
  );
}

function timeOption(text: string, name: string): number {
  const parsed = parseIsoTimeMs(text);
  if (!parsed.ok) throw new UsageError(`--${name}: ${parsed.message}`);
  return parsed.timeMs;
}

/** --periods: "proposed", or comma-separated M@TIME pairs (magnitude of completeness since an ISO 8601 time). */
function periodsOption(text: string): CompletenessPeriod[] | 'proposed' {
  if (text.trim() === 'proposed') return 'proposed';
  return text.split(',').map((pair, i) => {
    const [m, time, extra] = pair.trim().split('@');
    const magnitude = Number(m);
    if (
      extra !== undefined ||
      time === undefined ||
      m === undefined ||
      m.trim() === '' ||
      !Number.isFinite(magnitude)
    ) {
      throw new UsageError(
        `--periods: expected "proposed" or M@TIME pairs such as 4.0@1970-01-01, got "${pair.trim()}" (pair ${i + 1})`,
      );
    }
    const parsed = parseIsoTimeMs(time);
    if (!parsed.ok) throw new UsageError(`--periods: pair ${i + 1}: ${parsed.message}`);
    return { magnitude, startMs: parsed.timeMs };
  });
}

async function readTextFile(path: string, what: string): Promise<string> {
  try {
    return await readFile(path, 'utf8');
  } catch (error) {
    throw new InvalidInput([
      {
        path,
        message: `cannot read the ${what} (${(error as NodeJS.ErrnoException).code ?? 'error'})`,
      },
    ]);
  }
}

async function readCatalogFile(path: string): Promise<CatalogLoad> {
  return readCatalogText(await readTextFile(path, 'catalog file'), undefined, path);
}

async function fitVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, {
    strings: ['polygon', 'm-max', 'convert', 'start', 'end', 'periods'],
    booleans: ['no-decluster', 'all-magnitudes', 'json'],
  });
  if (positionals.length !== 1)
    throw new UsageError('expected exactly one CATALOG file after "catalog fit"');
  const path = positionals[0] as string;
  const mMax = numberOption(values, 'm-max');
  if ((values.start === undefined) !== (values.end === undefined))
    throw new UsageError('--start and --end go together (the observation span of the catalog)');
  const startMs = values.start === undefined ? undefined : timeOption(values.start, 'start');
  const endMs = values.end === undefined ? undefined : timeOption(values.end, 'end');
  if (startMs !== undefined && endMs !== undefined && !(endMs > startMs))
    throw new UsageError(`--end: expected a time after --start ${values.start}, got ${values.end}`);
  const periods = values.periods === undefined ? undefined : periodsOption(values.periods);
  const conversions = values.convert === undefined ? undefined : conversionOption(values.convert);
  let rings;
  if (values.polygon !== undefined) {
    const parsed = parseJsonText(
      await readTextFile(values.polygon, 'polygon file'),
      values.polygon,
    );
    if (!parsed.ok) throw new InvalidInput([parsed.issue]);
    rings = readZonePolygon(parsed.value, values.polygon);
  }
  const load = await readCatalogFile(path);
  const fit = fitCatalog(load.events, {
    ...(rings ? { rings } : {}),
    ...(mMax === undefined ? {} : { mMax }),
    decluster: !values['no-decluster'],
    magnitudes: values['all-magnitudes'] ? 'all' : 'moment',
    ...(conversions ? { conversions } : {}),
    ...(startMs === undefined || endMs === undefined ? {} : { startMs, endMs }),
    ...(periods === undefined ? {} : { periods }),
    optionNames: CLI_OPTION_NAMES,
  });
  if (values.json) {
    io.out(JSON.stringify({ catalog: catalogLoadJson(load), ...catalogFitJson(fit) }, null, 2));
    return EXIT_OK;
  }
  for (const line of fitLines(
    basename(path),
    load,
    fit,
    values.polygon === undefined ? undefined : basename(values.polygon),
  ))
    io.out(line);
  return EXIT_OK;
}

/** The command line's names for what the fit's notes and warnings point to. */
const CLI_OPTION_NAMES: FitOptionNames = {
  span: '--start and --end',
  mMax: '--m-max',
  periods: '--periods proposed, or your own',
  decluster: '--no-decluster',
};

const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;

/** `--convert scordilis2006-mb,grunthal2009-ml`: relation ids, each known. */
function conversionOption(text: string): string[] {
  const ids = text
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
  const known = MAGNITUDE_RELATIONS.map((r) => r.id);
  for (const id of ids)
    if (!known.includes(id))
      throw new UsageError(
        `--convert: expected relation ids among ${known.join(', ')}; got "${id}"`,
      );
  return ids;
}

/** The conversions of a fit, one line per relation: how many converted, how many outside its range. */
function conversionLines(fit: CatalogFit): string[] {
  if (!fit.conversion) return [];
  const ids = [
    ...new Set([
      ...Object.keys(fit.conversion.converted),
      ...Object.keys(fit.conversion.outsideRange),
    ]),
  ];
  return ids.map((id) => {
    const r = MAGNITUDE_RELATIONS.find((x) => x.id === id) as (typeof MAGNITUDE_RELATIONS)[number];
    const outside = fit.conversion?.outsideRange[id] ?? 0;
    return `Converted to Mw: ${plural(fit.conversion?.converted[id] ?? 0, `${r.scale} event`)} by ${r.source}${outside > 0 ? `; ${outside} outside ${r.scale} ${r.min}–${r.max} not converted (left out)` : ''}`;
  });
}
const day = (timeMs: number): string => isoTime(timeMs).slice(0, 10);
/** Magnitudes as catalogs print them: one decimal, two for bin edges such as 4.15. */
const mag = (m: number): string =>
  Math.abs(m * 10 - Math.round(m * 10)) < 1e-6 ? m.toFixed(1) : m.toFixed(2);

/** The human-readable account of a fit, line by line. */
export function fitLines(
  fileName: string,
  load: CatalogLoad,
  fit: CatalogFit,
  polygonName?: string,
): string[] {
  const lines = [`Catalog ${fileName} (${load.format}): ${describeCatalogLoad(load)}`];
  lines.push(
    fit.magnitudes === 'all'
      ? 'Magnitudes: every magnitude type, as reported'
      : `Magnitudes: moment magnitudes only${fit.excludedNonMoment > 0 ? ` (${plural(fit.excludedNonMoment, 'event')} of other types left out)` : ''}`,
    ...conversionLines(fit),
  );
  const d = fit.declustering;
  if (!d) lines.push('Declustering: none (foreshocks and aftershocks kept)');
  else {
    lines.push(
      `Declustering (Gardner & Knopoff 1974): ${plural(d.mainshocks.length, 'mainshock')} kept; ${plural(d.removed.length, 'foreshock or aftershock', 'foreshocks and aftershocks')} removed in ${plural(d.clusterCount, 'cluster')}`,
    );
    for (const r of d.removed.slice(0, 20)) {
      const days = sig(Math.abs(r.daysFromMainshock), 2);
      lines.push(
        `  ${day(r.event.timeMs)}  M ${mag(r.event.magnitude)} ${r.event.magnitudeType}  ${r.event.id}: ${sig(r.distanceKm, 2)} km from ${r.mainshockId}, ${days} day${days === '1' ? '' : 's'} ${r.daysFromMainshock < 0 ? 'before' : 'after'} it`,
      );
    }
    if (d.removed.length > 20)
      lines.push(`  and ${d.removed.length - 20} more (--json lists them all)`);
  }
  lines.push(
    polygonName === undefined
      ? `Zone: the whole catalog (${plural(fit.zone.eventsInZone, 'event')}; give --polygon for one zone)`
      : `Zone: ${plural(fit.zone.eventsInZone, 'event')} inside ${polygonName}, ${fit.zone.eventsOutside} outside`,
  );
  lines.push(
    `Observation: ${day(fit.observation.startMs)} to ${day(fit.observation.endMs)} (${sig(fit.observation.years)} years)`,
  );
  const c = fit.completeness;
  lines.push(
    c.method === 'max-curvature'
      ? `Completeness: Mc ${mag(c.mc)} (maximum curvature: most events at ${mag(c.peakMagnitude as number)}, plus ${c.correction})`
      : `Completeness: Mc ${mag(c.mc)} (as given)`,
  );
  const a = fit.akiUtsu;
  lines.push(
    `b-value (Aki–Utsu): ${a.bValue.toFixed(2)} ± ${a.sigmaB.toFixed(2)} (Shi & Bolt 1982) from ${plural(a.eventCount, 'event')} at or above Mc`,
  );
  if (fit.weichert)
    lines.push(
      `b-value (Weichert 1980, completeness periods): ${fit.weichert.bValue.toFixed(2)} ± ${fit.weichert.sigmaB.toFixed(2)}`,
    );
  const used = fit.weichert ?? a;
  lines.push(
    `a-value: ${used.aValue.toFixed(2)} (log10 of the yearly number of events of M 0 or more)`,
  );
  lines.push(
    `Yearly rate of M ${mag(used.referenceMagnitude)} or more: ${sig(used.rateAtReference)} ± ${sig(used.sigmaRate, 2)}`,
  );
  const r = fit.recurrence;
  if (r) {
    const paste = {
      ...r.recurrence,
      bValue: Number(r.recurrence.bValue.toFixed(3)),
      rate: Number(sig(r.recurrence.rate ?? 0, 4)),
    };
    lines.push(`Recurrence for a zone source, up to M ${mag(r.recurrence.mMax)}: ${r.summary}`);
    if (fit.warnings.length > 0)
      lines.push(
        ...warningLines(fit.warnings),
        'Read the warnings above before pasting this recurrence:',
      );
    lines.push(
      `To paste into the zone source's "properties" (rounded; --json gives every digit):`,
      `  "recurrence": ${JSON.stringify(paste)}`,
    );
  }
  lines.push('Frequency–magnitude (yearly rates of M at least the lower edge):');
  lines.push(
    `  ${'M from'.padEnd(8)}${'count'.padStart(7)}${'M >= count'.padStart(12)}${'rate/yr'.padStart(11)}${'fitted/yr'.padStart(11)}`,
  );
  for (const b of fit.frequencyMagnitude.bins) {
    const fitted =
      b.fittedCumulativeAnnualRate === undefined ? '' : sig(b.fittedCumulativeAnnualRate);
    lines.push(
      `  ${mag(b.lowerEdge).padEnd(8)}${String(b.count).padStart(7)}${String(b.cumulativeCount).padStart(12)}${sig(b.cumulativeAnnualRate).padStart(11)}${fitted.padStart(11)}`.trimEnd(),
    );
  }
  if (!r && fit.warnings.length > 0) lines.push(...warningLines(fit.warnings));
  lines.push(...noteLines(fit.notes));
  return lines;
}

const warningLines = (warnings: readonly string[]): string[] => [
  'Warnings:',
  ...warnings.map((w) => `  ! ${w}`),
];

async function feltVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, {
    strings: ['community'],
    booleans: ['all-magnitudes', 'json'],
  });
  if (positionals.length !== 2)
    throw new UsageError('expected a STUDY file and a CATALOG file after "catalog felt"');
  const [studyPath, catalogPath] = positionals as [string, string];
  const study = await loadStudyForVerb(studyPath, io, values.json);
  const communities =
    values.community === undefined
      ? study.communities
      : study.communities.filter((c) => c.id === values.community);
  if (communities.length === 0) {
    throw new InvalidInput([
      {
        path: 'community',
        message: `no community "${values.community}" in ${studyPath}; expected one of ${study.communities.map((c) => c.id).join(', ')}`,
      },
    ]);
  }
  const load = await readCatalogFile(catalogPath);
  const history = feltHistory({ ...study, communities }, load.events, {
    models: modelCatalog,
    ...(values['all-magnitudes'] ? { magnitudes: 'all' } : {}),
  });
  if (values.json) {
    io.out(
      JSON.stringify(
        { study: study.name, catalog: catalogLoadJson(load), ...feltJson(history) },
        null,
        2,
      ),
    );
    return EXIT_OK;
  }
  for (const line of feltLines(
    study.name,
    study.settings.maxDistanceKm,
    basename(catalogPath),
    load,
    history,
  ))
    io.out(line);
  return EXIT_OK;
}

const COMPASS_WORDS: Readonly<Record<Compass, string>> = {
  N: 'north',
  NE: 'north-east',
  E: 'east',
  SE: 'south-east',
  S: 'south',
  SW: 'south-west',
  W: 'west',
  NW: 'north-west',
};

/** "30 km to the north", or "under 1 km away" where a direction means little. */
export const distanceInWords = (e: Pick<FeltEstimate, 'distanceKm' | 'compass'>): string =>
  e.distanceKm < 1
    ? 'under 1 km away'
    : `${Math.round(e.distanceKm)} km to the ${COMPASS_WORDS[e.compass]}`;

/** Notes printed before "and N more": the engine notes each model limit met, which can run long. */
const MAX_NOTES = 8;

const noteLines = (notes: readonly string[]): string[] =>
  notes.length === 0
    ? []
    : [
        'Notes:',
        ...notes.slice(0, MAX_NOTES).map((n) => `  - ${n}`),
        ...(notes.length > MAX_NOTES
          ? [`  - and ${notes.length - MAX_NOTES} more (--json lists them all)`]
          : []),
      ];

/** The human-readable felt history, line by line; `maxDistanceKm` is the study's distance cut. */
export function feltLines(
  studyName: string,
  maxDistanceKm: number,
  fileName: string,
  load: CatalogLoad,
  history: FeltHistory,
): string[] {
  const lines = [
    `Catalog ${fileName} (${load.format}): ${describeCatalogLoad(load)}`,
    `Felt history of "${studyName}" from ${plural(history.eventCount, 'event')}: the median intensity each earthquake likely reached, from the study's ground-motion models and Worden et al. (2012). Likely felt: MMI ${mmiRoman(FELT_MMI)} or more; strongly felt: ${mmiRoman(STRONGLY_FELT_MMI)} or more.`,
  ];
  for (const c of history.communities) {
    const strong = c.stronglyFelt.length;
    lines.push('');
    const within = `${plural(c.estimates.length, 'event')} within ${sig(maxDistanceKm)} km`;
    lines.push(
      c.estimates.length === 0
        ? `${c.name}: no catalog event within ${sig(maxDistanceKm)} km`
        : c.felt.length === 0
          ? `${c.name}: none of ${within} was likely felt`
          : `${c.name}: ${c.felt.length} of ${within} likely felt${strong > 0 ? `, ${strong} strongly` : ''}`,
    );
    for (const e of c.felt) {
      const line = `  ${e.date}  M ${mag(e.magnitude)} ${e.magnitudeType.padEnd(4)} ${distanceInWords(e).padEnd(24)} MMI ${e.roman.padEnd(5)}${e.mmi >= STRONGLY_FELT_MMI ? ' strongly felt' : ''}`;
      lines.push(line.trimEnd());
    }
  }
  if (history.notes.length > 0) lines.push('', ...noteLines(history.notes));
  lines.push(
    '',
    'Estimates from past earthquakes for awareness, not design values: building codes and licensed engineers decide.',
  );
  return lines;
}

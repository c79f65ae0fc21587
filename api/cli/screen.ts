import { writeFile } from 'node:fs/promises';
import { modelCatalog } from '../engine/motion/registry.ts';
import type { NearestFault, StudyResult, ZoneDepthReport } from '../engine/results.ts';
import type { Study } from '../engine/model.ts';
import { screenStudy, type ScreeningOutput } from '../engine/screen-study.ts';
import { isQueuedScreening, QUEUED_SCREENING_COMMUNITIES } from '../queue/queued-screening.ts';
import { openChunkQueue, queueUrlFrom } from '../queue/queue-setting.ts';
import { screeningOutput, screenStudyOnPool } from '../workers/parallel-screen.ts';
import { WorkerPool } from '../workers/worker-pool.ts';
import { inputHash } from '../results/input-hash.ts';
import { buildProvenance } from '../results/provenance.ts';
import { robustnessLine } from '../results/band-robustness-words.ts';
import { runCsv } from '../results/run-csv.ts';
import { TOOL_VERSION } from '../results/tool-version.ts';
import { choiceOption, sig, verbArgs } from './args.ts';
import { untilDoneOrInterrupted } from './interruptible.ts';
import { loadStudyForVerb } from './load.ts';
import { EXIT_OK, type Io, UsageError } from './output.ts';

export const SCREEN_USAGE = `tremora screen STUDY [--out FILE] [--format json|csv] [--json]

Screens every community of a study: hazard curves, levels at the return periods, chances over
the horizons, intensity, deaggregation, nearest faults and the screening band.
  --out FILE          write the results there (JSON by default; --format csv for a table)
  --format FMT        json (every result, with the keys of README's Results) or csv (one row per community)
  --json              print only the JSON results on stdout (also with --out, which still writes)
With TREMORA_QUEUE set (a Redis URL), a study of ${QUEUED_SCREENING_COMMUNITIES} communities or more is screened by
\`tremora worker\` processes through that queue, in chunks of communities (the same results);
Ctrl-C then cancels it on every worker.
Screening estimates only, not design values: building codes and licensed engineers decide.`;

/**
 * The screening through the queue: this process lays out the ruptures on one thread and
 * `tremora worker` processes screen the communities, chunk by chunk (parallel-screen.ts).
 */
async function screenThroughQueue(
  study: Study,
  url: string,
  onProgress: (share: number) => void,
): Promise<ScreeningOutput> {
  const pool = new WorkerPool({ size: 1, name: 'tremora-screen' });
  const queue = await openChunkQueue(url);
  try {
    const handle = screenStudyOnPool(pool, study, { chunks: queue, onProgress });
    return screeningOutput(await untilDoneOrInterrupted(handle));
  } finally {
    await Promise.all([pool.close(), queue.close()]);
  }
}

/** PGA in one precision down the column: two decimals (0.50, 0.26), two significant figures below 0.01 g. */
const pgaText = (g: number): string => (g >= 0.01 ? g.toFixed(2) : sig(g, 2));

/** "12 km away" or, for a fault beneath the place, "38 km below" (its depth there). */
function faultWhere(fault: NearestFault): string {
  return fault.depthBelowKm === undefined
    ? `${sig(fault.distanceKm, 2)} km away`
    : `${sig(fault.depthBelowKm, 2)} km below`;
}

export async function screenVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, {
    strings: ['out', 'format'],
    booleans: ['json'],
  });
  if (positionals.length !== 1) throw new UsageError('expected exactly one STUDY file');
  const format = choiceOption(values, 'format', ['json', 'csv'] as const) ?? 'json';
  if (values.json && format === 'csv')
    throw new UsageError('--json prints JSON; use --format csv with --out');
  const study = await loadStudyForVerb(positionals[0], io, values.json);

  const startedAt = new Date().toISOString();
  let shown = -1;
  const onProgress = (share: number): void => {
    const percent = Math.floor(share * 100);
    if (!values.json && percent >= shown + 10) {
      shown = percent;
      io.err(`screening: ${percent}%`);
    }
  };
  const queueUrl = queueUrlFrom(process.env);
  const output =
    queueUrl !== undefined && isQueuedScreening(study)
      ? await screenThroughQueue(study, queueUrl, onProgress)
      : screenStudy(study, { models: modelCatalog, onProgress });
  const result: StudyResult = {
    ...output,
    provenance: buildProvenance({
      study,
      toolVersion: TOOL_VERSION,
      inputHash: inputHash(study),
      startedAt,
      finishedAt: new Date().toISOString(),
    }),
  };
  const text = format === 'csv' ? runCsv(study, result) : `${JSON.stringify(result, null, 2)}\n`;
  if (values.out) {
    await writeFile(values.out, text);
    if (!values.json) io.err(`wrote ${values.out} (${format})`);
  }
  if (values.json) {
    io.out(text);
    return EXIT_OK;
  }

  const chance = (p: number | undefined) => (p === undefined ? '' : `${sig(p * 100, 2)}%`);
  io.out(`${result.studyName}: ${result.communities.length} communities screened`);
  io.out(
    `\n${'community'.padEnd(22)}${'band'.padEnd(20)}${'PGA 475 yr'.padStart(12)}${'MMI 475'.padStart(9)}${'MMI VII+ 50 yr'.padStart(16)}  nearest fault`,
  );
  for (const c of result.communities) {
    const pga = c.atReturnPeriod['475']?.PGA;
    const mmi = c.intensity.atReturnPeriod['475'];
    const fault = c.nearestFaults[0];
    io.out(
      `${c.name.padEnd(22)}${c.band.label.padEnd(20)}${(pga == null ? 'n/a' : `${pgaText(pga)} g`).padStart(12)}${(mmi?.roman ?? 'n/a').padStart(9)}` +
        `${chance(c.intensity.chanceOfReaching['50']?.VII).padStart(16)}  ${fault ? `${fault.name} ${faultWhere(fault)}` : ''}`,
    );
  }
  const robust = result.communities.filter((c) => c.bandRobustness);
  if (robust.length > 0) {
    const { combinations, sampled } = robust[0]!.bandRobustness!;
    io.out(
      `\nHow firm each band is: the share of the logic tree's weight in each band (${combinations} combinations${sampled ? `, ${sampled} drawn` : ''}) and the single choice that moves it most`,
    );
    for (const c of robust) io.out(`${c.name.padEnd(22)}${robustnessLine(c.bandRobustness!)}`);
  }
  for (const zone of result.diagnostics?.zoneDepths ?? []) io.out(zoneDepthLine(zone));
  for (const w of result.warnings) io.err(`note: ${w}`);
  io.out(
    '\nScreening estimates only, not design values: building codes and licensed engineers decide.',
  );
  return EXIT_OK;
}

/** One zone's depths in a line: the range over its cells and where they came from (the JSON lists every cell). */
function zoneDepthLine(zone: ZoneDepthReport): string {
  const depths = zone.cells.flatMap((c) => c.depths.map((d) => d.depthKm));
  const from =
    zone.basis === 'depths'
      ? 'its weighted depths'
      : `${zone.basis.offsetKm} km below ${zone.basis.depthFromSource}`;
  return `zone depths: ${zone.name}: ${zone.cells.length} cells at ${Math.min(...depths)}–${Math.max(...depths)} km (${from}; per cell in the JSON diagnostics)`;
}

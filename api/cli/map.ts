import { createWriteStream, type WriteStream } from 'node:fs';
import { availableParallelism } from 'node:os';
import type { MapPoint, MapQuantity } from '../engine/map/hazard-map.ts';
import type { LonLatBounds } from '../engine/map/map-grid.ts';
import {
  MAP_CAUTION,
  mapGeoJsonFeatures,
  mapGeoJsonHead,
  mapGeoJsonTail,
  valueUnit,
  type MapDescription,
} from '../engine/map/map-geojson.ts';
import { openChunkQueue, queueUrlFrom } from '../queue/queue-setting.ts';
import { hazardMapOnPool } from '../workers/parallel-map.ts';
import { readTerrainFile, terrainBesideStudy } from '../terrain/index.ts';
import { WorkerPool } from '../workers/worker-pool.ts';
import { numberOption, requiredNumber, sig, verbArgs } from './args.ts';
import { untilDoneOrInterrupted } from './interruptible.ts';
import { loadStudyForVerb } from './load.ts';
import { EXIT_OK, type Io, processIo, UsageError } from './output.ts';

export const MAP_USAGE = `tremora map STUDY --measure PGA --return-period YEARS --spacing KM [options] [--json]
tremora map STUDY --measure PGA --level L --horizon YEARS --spacing KM [options] [--json]

A hazard map on a square grid over the study area (the box around its communities, sources
and outline): at each point the level of the measure with that return period (g; PGV cm/s),
or the chance of exceeding level L within the horizon.
  --measure NAME      PGA, PGV or SA(T) (default PGA)
  --return-period Y   years, e.g. 475
  --level L --horizon Y   a level of the measure and a horizon in years, instead
  --spacing KM        distance between grid points
  --vs30 M/S          one Vs30 for every point (default 760; without it, a study naming a terrain
                      grid gives each point on land the slope–Vs30 proxy there)
  --bounds=W,S,E,N    another box to cover, degrees (with "=" when W is negative)
  --out FILE          write the map there as GeoJSON points, as it is computed
  --threads N         worker threads (default: one per core)
  --json              print only machine-readable output: the GeoJSON (no --out) or a summary
With TREMORA_QUEUE set (a Redis URL), the points are computed by \`tremora worker\` processes
through that queue; this process lays out the ruptures and writes the map. Ctrl-C cancels the
map, on every worker too.
A progress bar goes to stderr. Screening estimates, not design values.`;

/** Characters of the progress bar. */
const BAR_WIDTH = 30;

function quantityOf(values: Record<string, unknown>): MapQuantity {
  const returnPeriodYears = numberOption(values, 'return-period');
  const level = numberOption(values, 'level');
  const horizonYears = numberOption(values, 'horizon');
  if (returnPeriodYears !== undefined) {
    if (level !== undefined || horizonYears !== undefined)
      throw new UsageError('give --return-period, or --level with --horizon, not both');
    return { kind: 'return-period', returnPeriodYears };
  }
  if (level === undefined || horizonYears === undefined)
    throw new UsageError('expected --return-period YEARS, or --level L with --horizon YEARS');
  return { kind: 'chance', level, horizonYears };
}

function boundsOf(text: unknown): LonLatBounds | undefined {
  if (text === undefined) return undefined;
  const parts = String(text)
    .split(',')
    .map((p) => Number(p.trim()));
  if (parts.length !== 4 || parts.some((p) => !Number.isFinite(p)))
    throw new UsageError(
      `--bounds: expected four numbers WEST,SOUTH,EAST,NORTH in degrees, got "${String(text)}"`,
    );
  return parts as unknown as LonLatBounds;
}

/** A progress bar on stderr: redrawn in place on a terminal, a line every 10% otherwise. */
function progressBar(
  io: Io,
  enabled: boolean,
): (share: number, points: number, count: number) => void {
  const terminal = io === processIo && process.stderr.isTTY;
  let shown = -1;
  return (share, points, count) => {
    if (!enabled) return;
    const percent = Math.floor(share * 100);
    const filled = Math.round(share * BAR_WIDTH);
    const line = `map [${'#'.repeat(filled)}${'.'.repeat(BAR_WIDTH - filled)}] ${String(percent).padStart(3)}%  ${points} of ${count} points`;
    if (terminal) {
      process.stderr.write(`\r${line}${share >= 1 ? '\n' : ''}`);
    } else if (percent >= shown + 10 || (share >= 1 && shown < 100)) {
      shown = percent;
      io.err(line);
    }
  };
}

export async function mapVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, {
    strings: [
      'measure',
      'return-period',
      'level',
      'horizon',
      'spacing',
      'vs30',
      'bounds',
      'out',
      'threads',
    ],
    booleans: ['json'],
  });
  if (positionals.length !== 1) throw new UsageError('expected exactly one STUDY file');
  const quantity = quantityOf(values);
  const spacingKm = requiredNumber(values, 'spacing');
  const vs30 = numberOption(values, 'vs30');
  const bounds = boundsOf(values.bounds);
  const threads = numberOption(values, 'threads') ?? availableParallelism();
  if (!Number.isInteger(threads) || threads < 1)
    throw new UsageError(`--threads: expected a whole number of at least 1, got ${threads}`);
  const study = await loadStudyForVerb(positionals[0], io, values.json);
  const terrain =
    vs30 === undefined && study.terrain !== undefined
      ? await readTerrainFile(terrainBesideStudy(positionals[0] as string, study.terrain))
      : undefined;
  const map = {
    measure: values.measure ?? 'PGA',
    quantity,
    spacingKm,
    ...(vs30 !== undefined ? { vs30 } : {}),
    ...(terrain ? { terrain } : {}),
    ...(bounds ? { bounds } : {}),
  };

  // The GeoJSON goes to the file, or to stdout for --json without --out; nowhere otherwise.
  const file: WriteStream | undefined = values.out ? createWriteStream(values.out) : undefined;
  // Through io.out on stdout: each piece ends a line or is followed by one, which JSON allows between tokens.
  const write = file
    ? (text: string) => void file.write(text)
    : values.json
      ? (text: string) => io.out(text)
      : undefined;
  const bar = progressBar(io, !values.json || file !== undefined);
  let description: MapDescription | undefined;
  let written = 0;
  let highest: MapPoint | undefined;
  const queueUrl = queueUrlFrom(process.env);
  const pool = new WorkerPool({ size: queueUrl === undefined ? threads : 1, name: 'tremora-map' });
  const queue = queueUrl === undefined ? undefined : await openChunkQueue(queueUrl);
  try {
    const handle = hazardMapOnPool(pool, study, map, {
      ...(queue ? { chunks: queue } : {}),
      onStart: (d) => {
        description = d;
        write?.(mapGeoJsonHead(d));
      },
      onPoints: (points, share) => {
        write?.(mapGeoJsonFeatures(description!, points, written === 0));
        written += points.length;
        for (const p of points)
          if (p.value !== null && (highest?.value == null || p.value > highest.value)) highest = p;
        bar(share, written, description!.count);
      },
    });
    const summary = await untilDoneOrInterrupted(handle);
    write?.(mapGeoJsonTail(summary));
    if (file)
      await new Promise<void>((resolve, reject) =>
        file.end((error?: Error | null) => (error ? reject(error) : resolve())),
      );
    if (values.json) {
      if (file)
        io.out(
          JSON.stringify({ ...summary, out: values.out, valueUnit: valueUnit(summary) }, null, 2),
        );
      return EXIT_OK;
    }
    const what =
      quantity.kind === 'return-period'
        ? `${summary.measure} with a ${quantity.returnPeriodYears}-year return period`
        : `chance of ${summary.measure} above ${quantity.level} ${summary.unit} within ${quantity.horizonYears} years`;
    io.out(
      `${study.name}: map of the ${what}, ${terrain ? `Vs30 from the terrain's slope (${summary.vs30} m/s at sea)` : `Vs30 ${summary.vs30} m/s`}`,
    );
    io.out(
      `${summary.count} points (${summary.columns} x ${summary.rows}) every ${sig(summary.spacingKm)} km${file ? `, written to ${values.out}` : ' (give --out FILE for the GeoJSON)'}`,
    );
    if (highest?.value != null) {
      const value =
        quantity.kind === 'chance'
          ? `${sig(highest.value * 100, 2)}%`
          : `${sig(highest.value, 3)} ${summary.unit}`;
      io.out(`highest: ${value} at ${highest.lon.toFixed(3)}, ${highest.lat.toFixed(3)}`);
    }
    for (const w of summary.warnings) io.err(`note: ${w}`);
    io.out(`\n${MAP_CAUTION}`);
    return EXIT_OK;
  } finally {
    file?.destroy();
    await Promise.all([pool.close(), queue?.close()]);
  }
}

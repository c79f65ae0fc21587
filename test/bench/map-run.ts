import { createHash } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { frameForStudy } from '../../api/engine/geometry/projection.ts';
import { mapGrid } from '../../api/engine/map/map-grid.ts';
import {
  mapGeoJsonFeatures,
  mapGeoJsonHead,
  mapGeoJsonTail,
  type MapDescription,
} from '../../api/engine/map/map-geojson.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { ChunkQueue } from '../../api/queue/chunk-queue.ts';
import { queueUrlFrom } from '../../api/queue/queue-setting.ts';
import { readStudyFile } from '../../api/study/read-study-file.ts';
import { hazardMapOnPool } from '../../api/workers/parallel-map.ts';
import { WorkerPool } from '../../api/workers/worker-pool.ts';
import { withPeakRss } from './hazard-cases.ts';

/**
 * One hazard map of the demo coast at 475-year PGA, in a process of its own (hazard.bench.ts
 * starts it, so each map's peak memory is its own): the grid spacing that gives at least the
 * number of points asked for, every core's thread, the GeoJSON streamed to a temporary file as
 * `tremora map` writes it. Prints one JSON line: the figures, the values of sampled points and
 * the SHA-256 of the points' GeoJSON (two runs with the same digest gave the same map). With
 * TREMORA_QUEUE set, the points are computed by `tremora worker` processes through that queue
 * (queue-map.bench.ts) and this process keeps one thread, for the rupture table.
 *
 *   node --import tsx test/bench/map-run.ts POINTS [SAMPLE_EVERY] [STOP_AFTER]
 *
 * STOP_AFTER (points) ends the map early (cancelled), for a memory reading on a grid too large to finish.
 */
const [target = 10_000, sampleEvery = 0, stopAfter = Infinity] = process.argv.slice(2).map(Number);

const loaded = await readStudyFile(
  new URL('../../data-demo/demo.study.json', import.meta.url).pathname,
  modelCatalog,
);
if (!loaded.ok) throw new Error('the demo study does not validate');
const study = loaded.study;
const frame = frameForStudy(study);
const count = (spacingKm: number): number =>
  mapGrid(study, frame, { spacingKm, maxPoints: Infinity }).count;
// The widest spacing that still gives `target` points: count falls as the spacing grows.
let lo = 0.05;
let hi = 100;
for (let i = 0; i < 60; i++) {
  const mid = (lo + hi) / 2;
  if (count(mid) >= target) lo = mid;
  else hi = mid;
}
const spacingKm = Number(lo.toPrecision(6)) > lo ? lo : Number(lo.toPrecision(6));

const queueUrl = queueUrlFrom(process.env);
const threads = queueUrl === undefined ? availableParallelism() : 1;
const pool = new WorkerPool({ size: threads, name: 'bench-map', log: () => {} });
const queue = queueUrl === undefined ? undefined : await ChunkQueue.open({ url: queueUrl });
const digest = createHash('sha256');
const dir = await mkdtemp(join(tmpdir(), 'tremora-bench-'));
const file = createWriteStream(join(dir, 'map.geojson'));
const samples: { index: number; value: number | null; status: string }[] = [];
let description: MapDescription | undefined;
let done = 0;
let first = true;
const cpuStart = process.cpuUsage();
const started = performance.now();
let stopped = false;
const { value: summary, peakRssMb } = await withPeakRss(async () => {
  const handle = hazardMapOnPool(
    pool,
    study,
    { measure: 'PGA', quantity: { kind: 'return-period', returnPeriodYears: 475 }, spacingKm },
    {
      ...(queue ? { chunks: queue } : {}),
      onStart: (d) => {
        description = d;
        file.write(mapGeoJsonHead(d));
      },
      onPoints: (points) => {
        const features = mapGeoJsonFeatures(description!, points, first);
        file.write(features);
        digest.update(features);
        first = false;
        for (const p of points)
          if (sampleEvery > 0 && p.index % sampleEvery === 0)
            samples.push({ index: p.index, value: p.value, status: p.status });
        done += points.length;
        if (done >= stopAfter && !stopped) {
          stopped = true;
          handle.cancel();
        }
      },
    },
  );
  try {
    return await handle.result;
  } catch (error) {
    if (stopped) return undefined;
    throw error;
  }
});
const wallMs = performance.now() - started;
const cpu = process.cpuUsage(cpuStart);
if (summary) file.write(mapGeoJsonTail(summary));
await new Promise<void>((resolve) => file.end(() => resolve()));
await rm(dir, { recursive: true, force: true });
await Promise.all([pool.close(), queue?.close()]);
process.stdout.write(
  `${JSON.stringify({ spacingKm, points: description?.count, computed: done, finished: summary !== undefined, threads, queued: queue !== undefined, wallMs, cpuMs: (cpu.user + cpu.system) / 1000, peakRssMb, digest: digest.digest('hex'), samples })}\n`,
);

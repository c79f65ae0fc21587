import { serialize } from 'node:v8';
import { Queue } from 'bullmq';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Cancelled } from '../../api/engine/errors.ts';
import type { HazardMapSummary, MapPoint } from '../../api/engine/map/hazard-map.ts';
import type { Study } from '../../api/engine/model.ts';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { ChunkQueue } from '../../api/queue/chunk-queue.ts';
import { CHUNK_QUEUE, connect, QUEUE_PREFIX } from '../../api/queue/queue-names.ts';
import { readStudyFile } from '../../api/study/read-study-file.ts';
import type { ChunkPool } from '../../api/workers/chunk-runner.ts';
import type { MapRequest } from '../../api/workers/messages.ts';
import { hazardMapOnPool } from '../../api/workers/parallel-map.ts';
import { screenStudyOnPool } from '../../api/workers/parallel-screen.ts';
import { WorkerPool } from '../../api/workers/worker-pool.ts';
import {
  startRedis,
  startWorker,
  type RedisServer,
  type WorkerProcess,
} from './helpers/redis-cluster.ts';

/**
 * The queue end to end: a real redis-server on a free loopback port, two `tremora worker`
 * processes (one thread each, claims of 2 s so a killed worker's chunk comes back quickly), and
 * this process coordinating. What a map or a screening gives through the queue is compared,
 * byte for byte in V8's serialisation, with the same run on this process's own threads.
 */
const MAP: MapRequest = {
  measure: 'PGA',
  quantity: { kind: 'return-period', returnPeriodYears: 475 },
  spacingKm: 25,
};
const CHUNK_POINTS = 8;
const WORKER_ARGS = ['--threads', '1', '--lock-ms', '2000'];

let redis: RedisServer;
let workers: WorkerProcess[] = [];
let queue: ChunkQueue;
let pool: WorkerPool;
let study: Study;
let inProcess: { points: MapPoint[]; summary: HazardMapSummary };

async function mapOn(
  chunks: ChunkPool | undefined,
  onPoints?: (points: readonly MapPoint[], share: number) => void,
  onProgress?: (share: number) => void,
) {
  const points: MapPoint[] = [];
  const handle = hazardMapOnPool(pool, study, MAP, {
    chunkPoints: CHUNK_POINTS,
    ...(chunks ? { chunks } : {}),
    onPoints: (chunk, share) => {
      points.push(...chunk);
      onPoints?.(chunk, share);
    },
    ...(onProgress ? { onProgress } : {}),
  });
  return { handle, done: handle.result.then((summary) => ({ points, summary })) };
}

beforeAll(async () => {
  const loaded = await readStudyFile(
    new URL('../../data-demo/demo.study.json', import.meta.url).pathname,
    modelCatalog,
  );
  if (!loaded.ok) throw new Error('the demo study does not validate');
  study = loaded.study;
  redis = await startRedis();
  workers = await Promise.all([
    startWorker(redis.url, WORKER_ARGS),
    startWorker(redis.url, WORKER_ARGS),
  ]);
  queue = await ChunkQueue.open({ url: redis.url, window: 4 });
  pool = new WorkerPool({ size: 1, name: 'tremora-test' });
  inProcess = await (await mapOn(undefined)).done;
}, 300_000);

afterAll(async () => {
  await queue?.close();
  await Promise.all(workers.map((w) => w.stop()));
  await pool?.close();
  await redis?.stop();
}, 120_000);

describe('the Redis queue with two workers', () => {
  it('gives the map of the in-process run, bit for bit, with progress from the workers', async () => {
    const shares: number[] = [];
    const { done } = await mapOn(queue, undefined, (share) => shares.push(share));
    const queued = await done;
    expect(queued.points.length).toBe(inProcess.summary.count);
    expect(Buffer.compare(serialize(queued.points), serialize(inProcess.points))).toBe(0);
    expect(Buffer.compare(serialize(queued.summary), serialize(inProcess.summary))).toBe(0);
    expect(shares.length).toBeGreaterThan(0);
    expect(shares.at(-1)).toBe(1);
    // Neither worker reported trouble with the queue.
    expect(workers.every((w) => !w.output().includes('queue:'))).toBe(true);
  }, 300_000);

  it('gives the screening of the in-process run, bit for bit', async () => {
    const local = await screenStudyOnPool(pool, study, { chunkSize: 1 }).result;
    const queued = await screenStudyOnPool(pool, study, { chunkSize: 1, chunks: queue }).result;
    expect(queued.communityChunks.length).toBe(study.communities.length);
    expect(Buffer.compare(serialize(queued), serialize(local))).toBe(0);
  }, 300_000);

  it('retries the chunk of a worker killed mid-chunk, and counts every point once', async () => {
    let killing: Promise<void> | undefined;
    const { done } = await mapOn(queue, () => {
      // After the first chunk lands, the first worker is computing another: kill it there.
      killing ??= (workers[0] as WorkerProcess).kill();
    });
    const queued = await done;
    await killing;
    expect(queued.points.length).toBe(inProcess.summary.count);
    expect(Buffer.compare(serialize(queued.points), serialize(inProcess.points))).toBe(0);
    const inspect = new Queue(CHUNK_QUEUE, {
      connection: connect(redis.url),
      prefix: QUEUE_PREFIX,
    });
    try {
      const completed = await inspect.getJobs(['completed']);
      expect(completed.some((job) => job.stalledCounter > 0 || job.attemptsStarted > 1)).toBe(true);
    } finally {
      await inspect.close();
      (await inspect.client).disconnect();
    }
    workers[0] = await startWorker(redis.url, WORKER_ARGS);
  }, 300_000);

  it('cancels a map across machines: the run stops and the workers leave its chunks', async () => {
    const { handle, done } = await mapOn(queue, () => handle.cancel());
    await expect(done).rejects.toBeInstanceOf(Cancelled);
    const inspect = new Queue(CHUNK_QUEUE, {
      connection: connect(redis.url),
      prefix: QUEUE_PREFIX,
    });
    try {
      let left = Infinity;
      for (let i = 0; i < 300 && left > 0; i++) {
        left = (await inspect.getActiveCount()) + (await inspect.getWaitingCount());
        if (left > 0) await new Promise((r) => setTimeout(r, 100));
      }
      expect(left).toBe(0);
    } finally {
      await inspect.close();
      (await inspect.client).disconnect();
    }
  }, 300_000);
});

import { spawn } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { Queue } from 'bullmq';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QUEUED_SCREENING_COMMUNITIES } from '../../api/queue/queued-screening.ts';
import { CHUNK_QUEUE, connect, QUEUE_PREFIX } from '../../api/queue/queue-names.ts';
import { runCapturing } from '../cli/helpers/run-cli.ts';
import { heavyStudy } from '../service/helpers/heavy-study.ts';
import { startRun, waitForStatus } from '../service/helpers/runs.ts';
import { REPO_ROOT, tempDir } from '../helpers/repo-files.ts';
import {
  jsonInit,
  startService,
  waitFor,
  type ServiceProcess,
} from '../service/helpers/service-process.ts';
import {
  startRedis,
  startWorker,
  type RedisServer,
  type WorkerProcess,
} from './helpers/redis-cluster.ts';

/**
 * Screenings through the queue end to end: a real redis-server on a free loopback port, two
 * `tremora worker` processes (one thread each, claims of 2 s), and the coordinator as users
 * start it: `tremora screen` and the service, each its own process with TREMORA_QUEUE set. The
 * study is the demo with each village repeated (55 communities, above the queue's threshold),
 * kept to its crustal faults and PGA so it screens in seconds; its results are compared, as
 * JSON text, with `tremora screen` run in this process without the queue.
 */
const COPIES = 5;
/** Copies of each village for the run that is interrupted: long enough to be caught midway. */
const CANCEL_COPIES = 20;
const WORKER_ARGS = ['--threads', '1', '--lock-ms', '2000'];

let redis: RedisServer;
let workers: WorkerProcess[] = [];
let dir: ReturnType<typeof tempDir>;
let studyFile: string;
let largerFile: string;
let inProcessJson: string;

/**
 * The results JSON with the run's clock times blanked, the one part two runs may not share, and
 * its closing line end left out (the in-process capture adds one of its own).
 */
const withoutTimes = (json: string): string =>
  json.replace(/"(startedAt|finishedAt)": "[^"]*"/g, '"$1": "-"').trimEnd();

/** heavyStudy's villages with the demo's crustal faults alone and PGA alone: cheap to screen. */
function manyVillages(copies: number): Record<string, unknown> {
  // The terrain grid is left out: a screening does not read it, and it lives beside the demo.
  const { terrain: _terrain, ...study } = heavyStudy(copies) as Record<string, any>;
  const faults = study.sources.features.filter(
    (f: any) => f.properties.setting === 'crustal' && f.geometry.type === 'LineString',
  );
  return {
    ...study,
    sources: { ...study.sources, features: faults },
    settings: { ...study.settings, measures: ['PGA'] },
  };
}

/** `tremora screen` as its own process on the queue; resolves with its exit and output. */
function screenProcess(
  file: string,
  args: readonly string[],
  onErr?: (text: string, interrupt: () => void) => void,
) {
  const child = spawn(
    process.execPath,
    ['--import', 'tsx', 'api/cli.ts', 'screen', file, ...args],
    {
      cwd: REPO_ROOT,
      env: { ...process.env, TREMORA_QUEUE: redis.url },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  let out = '';
  let err = '';
  child.stdout.on('data', (chunk: Buffer) => (out += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => {
    err += chunk.toString();
    onErr?.(err, () => child.kill('SIGINT'));
  });
  return new Promise<{ code: number | null; out: string; err: string }>((resolve) =>
    child.once('exit', (code) => resolve({ code, out, err })),
  );
}

/** The queue's chunk jobs of screenings in `states`, read from Redis. */
async function screeningJobs(states: ('completed' | 'active' | 'waiting')[]) {
  const inspect = new Queue(CHUNK_QUEUE, { connection: connect(redis.url), prefix: QUEUE_PREFIX });
  try {
    return (await inspect.getJobs(states)).filter((job) => job.name === 'screen-communities');
  } finally {
    await inspect.close();
    (await inspect.client).disconnect();
  }
}

beforeAll(async () => {
  dir = tempDir();
  studyFile = join(dir.path, 'many.study.json');
  largerFile = join(dir.path, 'more.study.json');
  writeFileSync(studyFile, JSON.stringify(manyVillages(COPIES)));
  writeFileSync(largerFile, JSON.stringify(manyVillages(CANCEL_COPIES)));
  redis = await startRedis();
  workers = await Promise.all([
    startWorker(redis.url, WORKER_ARGS),
    startWorker(redis.url, WORKER_ARGS),
  ]);
  const local = await runCapturing('screen', studyFile, '--json');
  expect(local.code, local.err).toBe(0);
  inProcessJson = local.out;
}, 600_000);

afterAll(async () => {
  await Promise.all(workers.map((w) => w.stop()));
  await redis?.stop();
  dir?.remove();
}, 120_000);

describe('screenings through the Redis queue with two workers', () => {
  it('tremora screen sends the communities to the workers and prints the in-process JSON', async () => {
    const communities = JSON.parse(inProcessJson).communities.length;
    expect(communities).toBeGreaterThanOrEqual(QUEUED_SCREENING_COMMUNITIES);
    const before = (await screeningJobs(['completed'])).length;
    const queued = await screenProcess(studyFile, ['--json']);
    expect(queued.code, queued.err).toBe(0);
    expect(withoutTimes(queued.out)).toBe(withoutTimes(inProcessJson));
    // One community a chunk (the coordinator's window of 32 chunks is wider than 55 / 4), each once.
    expect((await screeningJobs(['completed'])).length - before).toBe(communities);
  }, 300_000);

  it("the service's run goes to the workers and records the in-process results", async () => {
    const db = tempDir();
    let service: ServiceProcess | undefined;
    try {
      service = await startService({
        databasePath: join(db.path, 'queue.db'),
        env: { TREMORA_QUEUE: redis.url },
      });
      expect(service.output()).toContain('large screenings go to the queue');
      const before = (await screeningJobs(['completed'])).length;
      const saved = await service.fetch('/api/studies', jsonInit('POST', manyVillages(COPIES)));
      expect(saved.status).toBe(201);
      const run = await startRun(service, ((await saved.json()) as { id: string }).id);
      const shares = new Set<number>();
      await waitFor(
        async () => {
          const answer = (await (await service!.fetch(`/api/runs/${run.id}`)).json()) as {
            status: string;
            progress: number;
          };
          shares.add(answer.progress);
          return answer.status;
        },
        (status) => !['queued', 'running'].includes(status),
        3000,
        20,
      );
      const done = await waitForStatus(service, run.id, ['done']);
      expect(done.progress).toBe(1);
      // Progress came back from the workers chunk by chunk, not only at the end.
      expect([...shares].some((s) => s > 0 && s < 1)).toBe(true);
      const { provenance: _stored, ...stored } = (await (
        await service.fetch(`/api/runs/${run.id}/results`)
      ).json()) as Record<string, unknown>;
      const { provenance: _local, ...local } = JSON.parse(inProcessJson);
      expect(JSON.stringify(stored)).toBe(JSON.stringify(local));
      expect((await screeningJobs(['completed'])).length - before).toBe(local.communities.length);
    } finally {
      await service?.stop();
      db.remove();
    }
  }, 300_000);

  it('retries the chunk of a worker killed mid-screening, and gives every community once', async () => {
    const out = join(dir.path, 'killed.json');
    let killing: Promise<void> | undefined;
    const queued = await screenProcess(studyFile, ['--out', out], (err) => {
      // Both workers are computing a chunk once progress shows: kill the first there.
      if (/screening: [1-9]\d%/.test(err)) killing ??= (workers[0] as WorkerProcess).kill();
    });
    expect(killing).toBeDefined();
    await killing;
    expect(queued.code, queued.err).toBe(0);
    expect(withoutTimes(readFileSync(out, 'utf8'))).toBe(withoutTimes(inProcessJson));
    const completed = await screeningJobs(['completed']);
    expect(completed.some((job) => job.stalledCounter > 0 || job.attemptsStarted > 1)).toBe(true);
    workers[0] = await startWorker(redis.url, WORKER_ARGS);
  }, 300_000);

  it('Ctrl-C on tremora screen cancels the run on the workers: its chunks leave the queue', async () => {
    let interrupted = false;
    const queued = await screenProcess(largerFile, [], (err, interrupt) => {
      if (!interrupted && /screening: [1-9]\d%/.test(err)) {
        interrupted = true;
        interrupt();
      }
    });
    expect(interrupted).toBe(true);
    expect(queued.code, queued.err).toBe(2);
    expect(queued.err).toMatch(
      /tremora screen: screening cancelled on request after \d+% of the work/,
    );
    const left = await waitFor(
      async () => (await screeningJobs(['active', 'waiting'])).length,
      (n) => n === 0,
      300,
      100,
    );
    expect(left).toBe(0);
  }, 300_000);
});

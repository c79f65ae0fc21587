import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../api/store/store.ts';
import { RunScheduler } from '../../api/jobs/run-scheduler.ts';
import { WorkerPool } from '../../api/workers/worker-pool.ts';
import { tempDir } from '../service/helpers/service-process.ts';
import { namedStudy } from '../workers/fixtures/studies.ts';

const FIXTURE = new URL('../workers/fixtures/crash-worker.ts', import.meta.url);

let dir: ReturnType<typeof tempDir>;
let store: Store;
let pool: WorkerPool;
let scheduler: RunScheduler;
let logged: { id: string; context: string }[];
let studyId: string;

beforeEach(() => {
  dir = tempDir();
  store = openStore(`${dir.path}/scheduler.db`);
  pool = new WorkerPool({ size: 1, workerUrl: FIXTURE, log: () => {} });
  logged = [];
  scheduler = new RunScheduler({
    store,
    pool,
    toolVersion: '9.9.9',
    logError: (id, context) => logged.push({ id, context }),
  });
  studyId = store.studies.create({ name: 'S', document: '{}' }).id;
});
afterEach(async () => {
  await pool.close();
  store.close();
  dir.remove();
});

/** Starts a run of a study whose name tells the fixture worker what to do; resolves when it ends. */
async function runNamed(name: string, whileRunning?: (runId: string) => void) {
  const run = store.runs.create({ studyId, document: '{}', inputHash: `hash-${name}` });
  scheduler.start(run, namedStudy(name));
  if (whileRunning) whileRunning(run.id);
  for (
    let i = 0;
    i < 500 &&
    !['done', 'failed', 'cancelled', 'interrupted'].includes(store.runs.get(run.id)!.status);
    i++
  ) {
    await new Promise((r) => setTimeout(r, 10));
  }
  return store.runs.get(run.id)!;
}

describe('RunScheduler', () => {
  it('records a done run with its results and provenance', async () => {
    const run = await runNamed('fine');
    expect(run).toMatchObject({
      status: 'done',
      progress: 1,
      error: null,
      startedAt: expect.any(String),
    });
    expect(JSON.parse(store.runs.results(run.id)!)).toEqual({ fixture: 'fine' });
    expect(JSON.parse(run.provenance!)).toMatchObject({
      toolVersion: '9.9.9',
      inputHash: 'hash-fine',
    });
    expect(scheduler.activeCount).toBe(0);
  });

  it('marks a run failed when its worker crashes, logs an id, and keeps serving runs', async () => {
    const crashed = await runNamed('crash');
    expect(crashed.status).toBe('failed');
    expect(crashed.error).toMatch(
      /^the computation stopped unexpectedly: its worker thread exited with code 3 \(error id [0-9a-f-]{36}\); the service is still running$/,
    );
    expect(crashed.error).toContain(logged[0]!.id);
    expect(logged[0]!.context).toBe(`run ${crashed.id} failed`);
    expect(store.runs.results(crashed.id)).toBeUndefined();
    expect((await runNamed('after-crash')).status).toBe('done');
  });

  it("records the engine's message for a domain failure", async () => {
    const run = await runNamed('bad-input');
    expect(run).toMatchObject({
      status: 'failed',
      error: 'invalid input: settings.measures[0]: expected a measure',
    });
    expect(logged).toEqual([]);
  });

  it('records a cancellation with the share of the work done', async () => {
    const run = await runNamed('steps', (id) => {
      const check = setInterval(() => {
        if (store.runs.get(id)!.progress >= 0.2) {
          clearInterval(check);
          expect(scheduler.cancel(id)).toBe(true);
        }
      }, 5);
    });
    expect(run.status).toBe('cancelled');
    expect(run.error).toMatch(/^cancelled on request after \d+% of the work$/);
    expect(run.progress).toBeGreaterThanOrEqual(0.2);
    expect(scheduler.cancel(run.id)).toBe(false);
  });

  it('marks runs interrupted when the pool closes under them', async () => {
    const run = store.runs.create({ studyId, document: '{}', inputHash: 'h' });
    scheduler.start(run, namedStudy('hang'));
    while (store.runs.get(run.id)!.status !== 'running')
      await new Promise((r) => setTimeout(r, 10));
    await pool.close();
    await new Promise((r) => setImmediate(r));
    expect(store.runs.get(run.id)).toMatchObject({ status: 'interrupted' });
  });
});

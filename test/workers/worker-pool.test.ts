import { afterEach, describe, expect, it } from 'vitest';
import { Cancelled, InvalidInput } from '../../api/engine/errors.ts';
import type { StudyResult } from '../../api/engine/results.ts';
import { WorkerCrashed, PoolClosed } from '../../api/workers/task-errors.ts';
import { defaultPoolSize, WorkerPool } from '../../api/workers/worker-pool.ts';
import { expectRelative } from '../helpers/close.ts';
import { EXCEEDANCE_AT_LEVELS, RATE_PER_YEAR } from '../service/helpers/small-study.ts';
import { namedStudy, validSmallStudy } from './fixtures/studies.ts';
import { VIRTUAL_STRIKE_COUNT } from '../../api/engine/ruptures/virtual-ruptures.ts';

const FIXTURE = new URL('./fixtures/crash-worker.ts', import.meta.url);
const BROKEN = new URL('./fixtures/broken-worker.ts', import.meta.url);

const pools: WorkerPool[] = [];
const pool = (options: ConstructorParameters<typeof WorkerPool>[0]) => {
  const p = new WorkerPool({ log: () => {}, ...options });
  pools.push(p);
  return p;
};

/** Runs a measure task on a named test study; resolves with its result or the error it failed with. */
const measureOutcome = (p: WorkerPool, studyName: string): Promise<unknown> =>
  p.run({ kind: 'measure', study: namedStudy(studyName) }).result.catch((e: unknown) => e);

afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

describe('defaultPoolSize', () => {
  it('leaves one core to the service thread, never fewer than one worker', () => {
    expect(defaultPoolSize(1)).toBe(1);
    expect(defaultPoolSize(2)).toBe(1);
    expect(defaultPoolSize(8)).toBe(7);
  });
});

describe('WorkerPool with the real run worker', () => {
  it('screens a study in a TypeScript worker thread and reports progress up to 1', async () => {
    const runs = pool({ size: 1 });
    const progress: number[] = [];
    let startedAt: string | undefined;
    const handle = runs.run(
      {
        kind: 'screen',
        study: validSmallStudy(),
        inputHash: 'test-hash',
        toolVersion: '0.0.0-test',
      },
      { onStart: (at) => (startedAt = at), onProgress: (share) => progress.push(share) },
    );
    const output = await handle.result;
    const result = JSON.parse(output.resultsJson) as StudyResult;
    expect(startedAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect(progress.at(-1)).toBe(1);
    expect([...progress].sort((a, b) => a - b)).toEqual(progress);
    expect(result.provenance).toEqual(output.provenance);
    expect(output.provenance.inputHash).toBe('test-hash');
    expect(output.provenance.toolVersion).toBe('0.0.0-test');
    expect(output.provenance.models).toEqual({ crustal: [{ model: 'Cornell79', weight: 1 }] });
    // At the median level half of the truncated normal lies above: rate x 1/2 (see small-study.ts).
    const rates = result.communities[0]?.curves.PGA?.annualRate ?? [];
    EXCEEDANCE_AT_LEVELS.forEach((p, i) =>
      expectRelative(
        rates[i] as number,
        RATE_PER_YEAR * p,
        1e-6,
        `Cornell et al. (1979) median with a +-3 sigma truncated normal (Abramowitz & Stegun Table 26.1), level ${i}`,
      ),
    );
  });

  it('measures a study (rupture count) and gives identical outputs for identical inputs', async () => {
    const quick = pool({ size: 1 });
    const a = await quick.run({ kind: 'measure', study: validSmallStudy() }).result;
    // Its one M 6.5 point earthquake is a virtual rupture of one plane per strike
    // (ruptures/virtual-ruptures.ts), with no source-model alternatives.
    expect(a).toEqual({ ruptures: VIRTUAL_STRIKE_COUNT, extraPlanes: 0, variantRuptures: 0 });
    const runs = pool({ size: 1 });
    const first = await runs.run({
      kind: 'screen',
      study: validSmallStudy(),
      inputHash: 'h',
      toolVersion: 'v',
    }).result;
    const second = await runs.run({
      kind: 'screen',
      study: validSmallStudy(),
      inputHash: 'h',
      toolVersion: 'v',
    }).result;
    const strip = (json: string) => (JSON.parse(json) as StudyResult).communities;
    expect(strip(second.resultsJson)).toEqual(strip(first.resultsJson));
  });

  it("rebuilds the engine's named errors thrown in the worker", async () => {
    const runs = pool({ size: 1 });
    const study = validSmallStudy();
    const broken = {
      ...study,
      groundMotion: { ...study.groundMotion, crustal: [{ model: 'NO-SUCH-MODEL', weight: 1 }] },
    };
    const error = await runs
      .run({ kind: 'screen', study: broken, inputHash: 'h', toolVersion: 'v' })
      .result.catch((e: unknown) => e);
    expect((error as Error).name).toBe('UnknownModel');
    expect((error as Error).message).toContain('NO-SUCH-MODEL');
  });
});

describe('WorkerPool failures and cancellation (fixture worker)', () => {
  it('fails only the task whose thread crashed, replaces the thread and runs the next task', async () => {
    const p = pool({ size: 1, workerUrl: FIXTURE });
    const crashed = measureOutcome(p, 'crash');
    const next = p.run({ kind: 'measure', study: namedStudy('after') }).result;
    const error = await crashed;
    expect(error).toBeInstanceOf(WorkerCrashed);
    expect((error as WorkerCrashed).exitCode).toBe(3);
    await expect(next).resolves.toEqual({ ruptures: 1 });
    expect(p.stats()).toEqual({ size: 1, alive: 1, busy: 0, queued: 0 });
  });

  it('cancels a queued task at once and a running one at its next check', async () => {
    const p = pool({ size: 1, workerUrl: FIXTURE });
    const progress: number[] = [];
    const running = p.run(
      { kind: 'measure', study: namedStudy('steps') },
      { onProgress: (s) => progress.push(s) },
    );
    const queued = p.run({ kind: 'measure', study: namedStudy('waiting') });
    queued.cancel();
    const queuedError = await queued.result.catch((e: unknown) => e);
    expect(queuedError).toBeInstanceOf(Cancelled);
    expect((queuedError as Cancelled).shareDone).toBe(0);
    await new Promise<void>((resolve) => {
      const check = setInterval(() => {
        if (progress.length >= 2) {
          clearInterval(check);
          resolve();
        }
      }, 5);
    });
    running.cancel();
    const error = await running.result.catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Cancelled);
    expect((error as Cancelled).shareDone).toBeGreaterThanOrEqual(0.2);
    expect((error as Cancelled).shareDone).toBeLessThan(1);
  });

  it('terminates a thread that does not honour a cancel within the grace period', async () => {
    const p = pool({ size: 1, workerUrl: FIXTURE, cancelGraceMs: 50 });
    let markStarted!: () => void;
    const started = new Promise<void>((resolve) => (markStarted = resolve));
    const hanging = p.run(
      { kind: 'measure', study: namedStudy('hang') },
      { onStart: () => markStarted() },
    );
    const outcome = hanging.result.catch((e: unknown) => e);
    await started;
    hanging.cancel();
    expect(await outcome).toBeInstanceOf(Cancelled);
    await expect(p.run({ kind: 'measure', study: namedStudy('after') }).result).resolves.toEqual({
      ruptures: 1,
    });
  });

  it('passes domain errors through with their issues', async () => {
    const p = pool({ size: 1, workerUrl: FIXTURE });
    const error = await measureOutcome(p, 'bad-input');
    expect(error).toBeInstanceOf(InvalidInput);
    expect((error as InvalidInput).issues).toEqual([
      { path: 'settings.measures[0]', message: 'expected a measure' },
    ]);
  });

  it('rejects queued and new tasks once closed', async () => {
    const p = pool({ size: 1, workerUrl: FIXTURE });
    const running = measureOutcome(p, 'hang');
    const queued = measureOutcome(p, 'later');
    await p.close();
    expect(await running).toBeInstanceOf(PoolClosed);
    expect(await queued).toBeInstanceOf(PoolClosed);
    expect(await measureOutcome(p, 'late')).toBeInstanceOf(PoolClosed);
  });

  it('does not respawn a worker module that fails to load, and fails its tasks', async () => {
    const p = pool({ size: 1, workerUrl: BROKEN });
    const error = await measureOutcome(p, 'any');
    expect(error).toBeInstanceOf(WorkerCrashed);
    expect(p.stats().alive).toBe(0);
    expect(await measureOutcome(p, 'again')).toBeInstanceOf(WorkerCrashed);
  });
});

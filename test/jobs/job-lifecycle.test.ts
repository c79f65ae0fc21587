import { describe, expect, it } from 'vitest';
import { Cancelled, InvalidInput } from '../../api/engine/errors.ts';
import type { JobEnd, JobLedger } from '../../api/jobs/job-ledger.ts';
import { JobLifecycle, type JobSignals } from '../../api/jobs/job-lifecycle.ts';
import { PoolClosed } from '../../api/workers/task-errors.ts';

/** A ledger that keeps every write, and refuses what a store refuses: anything after an end. */
function memoryLedger() {
  const writes: string[] = [];
  let status = 'queued';
  const ledger: JobLedger<string, string> = {
    markRunning: (id, _at, started) =>
      status === 'queued'
        ? (writes.push(`running ${id} ${started}`), (status = 'running'), true)
        : false,
    setProgress: (_id, share) => void (status === 'running' && writes.push(`progress ${share}`)),
    finishDone: (_id, done) =>
      status === 'running' ? (writes.push(`done ${done}`), (status = 'done'), true) : false,
    finishWithout: (_id, end: JobEnd, message) =>
      ['queued', 'running'].includes(status)
        ? (writes.push(`${end}: ${message}`), (status = end), true)
        : false,
    interruptedMessage: 'stopped by a shutdown',
  };
  return { ledger, writes, status: () => status };
}

/** A job the test drives by hand: its signals, and the settling of its result. */
function manualJob() {
  let signals: JobSignals<string> | undefined;
  let resolve: (value: string) => void = () => {};
  let reject: (error: unknown) => void = () => {};
  let cancels = 0;
  const result = new Promise<string>((res, rej) => {
    resolve = res;
    reject = rej;
  });
  const launch = (s: JobSignals<string>) => {
    signals = s;
    return { result, cancel: () => void cancels++ };
  };
  return {
    launch,
    signals: () => signals as JobSignals<string>,
    resolve,
    reject,
    cancels: () => cancels,
  };
}

/**
 * Starts a hand-driven job on `jobs`, recorded in a memory ledger; its done record is its
 * output unless `done` says otherwise.
 */
function startManualJob(
  jobs: JobLifecycle,
  spec: { id: string; kind: string; progressOf: string; done?: (output: string) => string },
) {
  const memory = memoryLedger();
  const job = manualJob();
  jobs.start({ done: (out: string) => out, ...spec, ledger: memory.ledger, launch: job.launch });
  return { ...memory, job };
}

const settle = () => new Promise((r) => setTimeout(r, 0));

describe('JobLifecycle', () => {
  it('records running, progress in steps of at least 1%, and done once', async () => {
    const jobs = new JobLifecycle();
    const { writes, job } = startManualJob(jobs, {
      id: 'j1',
      kind: 'job',
      progressOf: 'work',
      done: (out) => `${out}!`,
    });
    expect(jobs.activeCount).toBe(1);
    job.signals().started('grid');
    for (const share of [0.001, 0.005, 0.02, 0.025, 0.5]) job.signals().progress(share);
    job.resolve('out');
    await settle();
    job.signals().progress(0.9);
    expect(writes).toEqual(['running j1 grid', 'progress 0.02', 'progress 0.5', 'done out!']);
    expect(jobs.activeCount).toBe(0);
  });

  it('names the share done when a job is cancelled, and the end is the last write', async () => {
    const jobs = new JobLifecycle();
    const { writes, status, job } = startManualJob(jobs, {
      id: 'j2',
      kind: 'job',
      progressOf: 'points',
    });
    job.signals().started('grid');
    job.signals().progress(0.3);
    expect(jobs.cancel('j2')).toBe(true);
    expect(job.cancels()).toBe(1);
    job.reject(new Cancelled(0.25));
    await settle();
    expect(status()).toBe('cancelled');
    expect(writes.at(-1)).toBe('cancelled: cancelled on request after 30% of the points');
    expect(jobs.cancel('j2')).toBe(false);
  });

  it('ends a job interrupted when its pool closes, failed on a user error in its own words', async () => {
    for (const [error, expected] of [
      [new PoolClosed(), 'interrupted: stopped by a shutdown'],
      [
        new InvalidInput([{ path: 'sources[0]', message: 'expected a source' }]),
        'failed: invalid input: sources[0]: expected a source',
      ],
    ] as const) {
      const { writes, job } = startManualJob(new JobLifecycle(), {
        id: 'j3',
        kind: 'job',
        progressOf: 'work',
      });
      job.reject(error);
      await settle();
      expect(writes).toEqual([expected]);
    }
  });

  it('logs an unexpected failure with an id the record names', async () => {
    const logged: { id: string; context: string }[] = [];
    const { writes, job } = startManualJob(
      new JobLifecycle((id, context) => logged.push({ id, context })),
      { id: 'j4', kind: 'map run', progressOf: 'points' },
    );
    job.signals().started('grid');
    job.reject(new TypeError('boom'));
    await settle();
    expect(logged).toEqual([{ id: expect.any(String), context: 'map run j4 failed' }]);
    expect(writes.at(-1)).toBe(
      `failed: internal error (error id ${logged[0]?.id}); the service is still running`,
    );
  });
});

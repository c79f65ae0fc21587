import { describe, expect, it } from 'vitest';
import { saveHeavyStudy } from './helpers/heavy-study.ts';
import { getRun, startRun, waitForStatus } from './helpers/runs.ts';
import { waitFor, serviceForFile } from './helpers/service-process.ts';

/** Health is answered while a heavy run (helpers/heavy-study.ts) computes; its latency is in the benchmark. */
const service = serviceForFile('busy');

describe('while a heavy study computes', () => {
  it('health answers, the run reports progress, and it can be cancelled', async () => {
    const run = await startRun(service, await saveHeavyStudy(service));
    await waitForStatus(service, run.id, ['running']);
    for (let i = 0; i < 5; i++) {
      const response = await service.fetch('/api/health');
      expect(response.status).toBe(200);
      const body = (await response.json()) as {
        status: string;
        workers: { runs: { busy: number } };
        activeRuns: number;
      };
      expect(body).toMatchObject({ status: 'ok', workers: { runs: { busy: 1 } }, activeRuns: 1 });
    }
    expect((await service.fetch('/api/studies')).status).toBe(200);
    // A run reports progress after each community's branch.
    // Waits as long as a busy machine needs (up to 5 minutes); nothing asserted depends on speed.
    const moving = await waitFor(
      () => getRun(service, run.id),
      (r) => r.progress > 0,
      3_000,
    );
    expect(moving.status).toBe('running');
    expect(moving.progress).toBeGreaterThan(0);
    expect(moving.progress).toBeLessThan(1);
    const cancel = await service.fetch(`/api/runs/${run.id}/cancel`, { method: 'POST' });
    expect(cancel.status).toBe(202);
    const stopped = await waitForStatus(service, run.id);
    expect(stopped.status).toBe('cancelled');
    expect(stopped.error).toMatch(/^cancelled on request after \d+% of the work$/);
    expect((await getRun(service, run.id)).provenance).toBeNull();
    const after = (await (await service.fetch('/api/health')).json()) as {
      workers: { runs: { alive: number; busy: number } };
    };
    expect(after.workers.runs).toMatchObject({ alive: 1, busy: 0 });
  }, 420_000);
});

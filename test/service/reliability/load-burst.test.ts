import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type ServiceProcess, startService, tempDir } from '../helpers/service-process.ts';
import { describeLoad, loadMix, startHeavyRun } from './load-mix.ts';

/**
 * Load (issue 8), the short burst: a few seconds of autocannon on loopback against health, the
 * study overview page and a small compute while a heavy run computes. Asserted: no failed
 * request (errors, timeouts, non-2xx answers) and the run still going. Requests per second
 * and p99 latency are printed, not asserted; the measured run is test/bench/load.bench.ts.
 */

const BURST_S = 4;
const CONNECTIONS = 8;

const dir = tempDir('tremora-load-');
let service: ServiceProcess;
beforeAll(async () => {
  // Two run workers: one for the heavy run, one for the computes beside it.
  service = await startService({ databasePath: `${dir.path}/load.db`, env: { TREMORA_WORKERS: '2' } });
});
afterAll(async () => {
  await service?.stop();
  dir.remove();
});

describe('under load while a heavy run computes', () => {
  it('health, the overview page and a small compute fail no request', async () => {
    const { runId, studyId } = await startHeavyRun(service);
    const targets = await loadMix(service, studyId, runId, { durationS: BURST_S, connections: CONNECTIONS });
    console.log(`load burst, ${BURST_S} s, ${CONNECTIONS} connections (compute ${Math.max(1, CONNECTIONS / 4)}), heavy run in flight:\n  ${describeLoad(targets)}`);
    for (const { label, result } of targets) {
      expect(result.requests.total, label).toBeGreaterThan(0);
      expect({ label, errors: result.errors, timeouts: result.timeouts, non2xx: result.non2xx }).toEqual({ label, errors: 0, timeouts: 0, non2xx: 0 });
    }
    await service.fetch(`/api/runs/${runId}/cancel`, { method: 'POST' });
  });
});

import { startService, tempDir } from '../service/helpers/service-process.ts';
import { describeLoad, loadMix, startHeavyRun } from '../service/reliability/load-mix.ts';

/**
 * Load on loopback: autocannon against GET /api/health, the study overview page and
 * a small POST /api/compute at once, while the demo study's run computes. Prints requests per
 * second and p50/p99 latency for each; asserts nothing about time. That no request fails under
 * such load is asserted by the short burst in test/service/reliability/load-burst.test.ts.
 */

const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);
const CONNECTIONS = 10;

const dir = tempDir('tremora-load-bench-');
// Two run workers: one for the heavy run, one for the computes beside it.
const service = await startService({
  databasePath: `${dir.path}/load.db`,
  env: { TREMORA_WORKERS: '2' },
});
try {
  const { runId, studyId } = await startHeavyRun(service);
  const targets = await loadMix(service, studyId, runId, {
    durationS: DURATION_S,
    connections: CONNECTIONS,
  });
  console.log(
    `load, ${DURATION_S} s, ${CONNECTIONS} connections each to health and the page, ${Math.max(1, Math.floor(CONNECTIONS / 4))} to compute, heavy run in flight:\n  ${describeLoad(targets)}`,
  );
  const failed = targets.reduce(
    (n, t) => n + t.result.errors + t.result.timeouts + t.result.non2xx,
    0,
  );
  console.log(`failed requests: ${failed}`);
  await service.fetch(`/api/runs/${runId}/cancel`, { method: 'POST' });
} finally {
  await service.stop();
  dir.remove();
}

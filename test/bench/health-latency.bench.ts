import { autocannon, type AutocannonResult } from '../service/helpers/autocannon.ts';
import { saveHeavyStudy } from '../service/helpers/heavy-study.ts';
import { startService, tempDir, type ServiceProcess } from '../service/helpers/service-process.ts';

/**
 * Latency of GET /api/health on a started service, idle and while a heavy study (the demo's
 * sources over 440 villages) computes in the worker pool. Prints figures; asserts nothing about time (the tests assert only that
 * health answers while a run computes: test/service/health-while-computing.test.ts).
 */

const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 5);
const CONNECTIONS = 10;

function report(label: string, r: AutocannonResult): void {
  console.log(
    `${label.padEnd(24)} p50 ${r.latency.p50} ms  p97.5 ${r.latency.p97_5} ms  p99 ${r.latency.p99} ms  max ${r.latency.max} ms  ` +
      `${Math.round(r.requests.average)} req/s  (${r.requests.total} requests, ${r.non2xx} non-2xx, ${r.errors} errors)`,
  );
}

async function waitUntilRunning(service: ServiceProcess, runId: string): Promise<void> {
  for (;;) {
    const run = (await (await service.fetch(`/api/runs/${runId}`)).json()) as { status: string };
    if (run.status === 'running') return;
    if (run.status !== 'queued') throw new Error(`the heavy run ended early: ${run.status}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const dir = tempDir('tremora-bench-');
const service = await startService({ databasePath: `${dir.path}/bench.db` });
try {
  const url = `${service.url}/api/health`;
  console.log(`health latency, ${CONNECTIONS} connections, ${DURATION_S} s each`);
  // Warm-up, not reported: the JIT and the worker threads' start-up would colour the idle figures.
  await autocannon({ url, connections: CONNECTIONS, duration: 1 });
  report('idle', await autocannon({ url, connections: CONNECTIONS, duration: DURATION_S }));
  const started = await service.fetch(`/api/studies/${await saveHeavyStudy(service)}/runs`, {
    method: 'POST',
  });
  const run = (await started.json()) as { id: string };
  await waitUntilRunning(service, run.id);
  report(
    'heavy run computing',
    await autocannon({ url, connections: CONNECTIONS, duration: DURATION_S }),
  );
  await service.fetch(`/api/runs/${run.id}/cancel`, { method: 'POST' });
} finally {
  await service.stop();
  dir.remove();
}

import { autocannon, type AutocannonResult } from '../helpers/autocannon.ts';
import { saveHeavyStudy } from '../helpers/heavy-study.ts';
import type { ServiceProcess } from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';
import { send } from './http-client.ts';

/**
 * The mixed load on loopback, shared by the short burst in the tests (load-burst.test.ts, which
 * asserts no failed request) and the longer measured run (test/bench/load.bench.ts, figures
 * only): autocannon on loopback against health, the study overview page and a small compute,
 * all at once, while a heavy run (the demo's sources over 440 villages, helpers/heavy-study.ts)
 * is in flight.
 */

export interface LoadTarget {
  readonly label: string;
  readonly result: AutocannonResult;
}

export interface LoadMixOptions {
  /** How long to load (the benchmark: rates depend on the machine, so they are only printed). */
  readonly durationS?: number;
  /**
   * Instead of a duration, a fixed number of requests to each target, sent with fetch and
   * never cut off (the test: what it asserts, every one answered and none failed, then does
   * not depend on the machine's speed).
   */
  readonly amounts?: { readonly health: number; readonly page: number; readonly compute: number };
  /** Connections to health and to the page; the compute gets fewer (it queues on a worker). */
  readonly connections: number;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Saves the heavy study, starts its run and waits until a worker computes it; returns the ids. */
export async function startHeavyRun(
  service: ServiceProcess,
): Promise<{ runId: string; studyId: string }> {
  const studyId = await saveHeavyStudy(service);
  const started = await service.fetch(`/api/studies/${studyId}/runs`, { method: 'POST' });
  if (started.status !== 202)
    throw new Error(`the heavy run did not start: ${started.status} ${await started.text()}`);
  const { id } = (await started.json()) as { id: string };
  // Every worker thread loads its code on its first task (seconds on a busy machine): one
  // compute and one page first, so the load measures the service, not the start-up.
  const warm = await service.fetch('/api/compute', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(smallStudy('Warm-up')),
  });
  if (warm.status !== 200)
    throw new Error(`the warm-up compute failed: ${warm.status} ${await warm.text()}`);
  await (await service.fetch(`/studies/${studyId}`)).text();
  for (let i = 0; i < 600; i++) {
    const run = (await (await service.fetch(`/api/runs/${id}`)).json()) as { status: string };
    if (run.status === 'running') return { runId: id, studyId };
    if (run.status !== 'queued')
      throw new Error(`the heavy run ended before the load: ${run.status}`);
    await sleep(100);
  }
  throw new Error('the heavy run never started');
}

/** The three loads at once, while the heavy run computes; throws if the run is no longer running after. */
export async function loadMix(
  service: ServiceProcess,
  studyId: string,
  runId: string,
  options: LoadMixOptions,
): Promise<LoadTarget[]> {
  const compute = JSON.stringify(smallStudy('Load compute'));
  const computeConnections = Math.max(1, Math.floor(options.connections / 4));
  const post = { method: 'POST', headers: { 'content-type': 'application/json' }, body: compute };
  const { amounts } = options;
  const common = { duration: options.durationS ?? 10, timeout: 30 };
  const [health, page, computed] = await Promise.all(
    amounts
      ? [
          fixedRequests(`${service.url}/api/health`, amounts.health, options.connections),
          fixedRequests(`${service.url}/studies/${studyId}`, amounts.page, options.connections),
          fixedRequests(`${service.url}/api/compute`, amounts.compute, computeConnections, post),
        ]
      : [
          autocannon({
            ...common,
            url: `${service.url}/api/health`,
            connections: options.connections,
          }),
          autocannon({
            ...common,
            url: `${service.url}/studies/${studyId}`,
            connections: options.connections,
          }),
          autocannon({
            ...common,
            url: `${service.url}/api/compute`,
            connections: computeConnections,
            ...post,
          }),
        ],
  );
  // Whether the heavy run outlasted the load depends on the machine: the benchmark needs it
  // (its figures are for a loaded service), the test with fixed amounts only reports it.
  const run = (await (await service.fetch(`/api/runs/${runId}`)).json()) as { status: string };
  if (!options.amounts && run.status !== 'running')
    throw new Error(
      `the heavy run was ${run.status} by the end of the load; expected it still running`,
    );
  return [
    { label: 'GET /api/health', result: health },
    { label: 'GET /studies/{id} (overview)', result: page },
    { label: 'POST /api/compute (small)', result: computed },
  ];
}

/**
 * `amount` requests to `url` over `connections` clients, each sending its share one after the
 * other; every answer is counted, none is cut off at a deadline. The figures come in
 * autocannon's shape so that describeLoad prints both alike.
 */
export async function fixedRequests(
  url: string,
  amount: number,
  connections: number,
  init: { method?: string; headers?: Record<string, string>; body?: string } = {},
): Promise<AutocannonResult> {
  const latencies: number[] = [];
  let non2xx = 0;
  let errors = 0;
  const started = performance.now();
  const client = async (share: number) => {
    for (let i = 0; i < share; i++) {
      const sent = performance.now();
      // A new connection per request (http-client.ts): a kept-alive socket that the service
      // closes as idle while the client reuses it would count against the service otherwise.
      const target = new URL(url);
      const answer = await send(target.origin, {
        method: init.method ?? 'GET',
        path: `${target.pathname}${target.search}`,
        ...(init.headers ? { headers: init.headers } : {}),
        ...(init.body === undefined ? {} : { body: new TextEncoder().encode(init.body) }),
        timeoutMs: 600_000,
      });
      if ('error' in answer) {
        errors++;
        console.log(`${init.method ?? 'GET'} ${target.pathname}: ${answer.error}`);
        continue;
      }
      if (answer.status < 200 || answer.status > 299) non2xx++;
      latencies.push(performance.now() - sent);
    }
  };
  await Promise.all(
    Array.from({ length: connections }, (_, k) =>
      client(Math.floor(amount / connections) + (k < amount % connections ? 1 : 0)),
    ),
  );
  const seconds = (performance.now() - started) / 1000;
  const sorted = latencies.sort((a, b) => a - b);
  const at = (q: number) =>
    Math.round(sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? 0);
  return {
    latency: {
      p50: at(0.5),
      p97_5: at(0.975),
      p99: at(0.99),
      max: Math.round(sorted.at(-1) ?? 0),
      average: Math.round(sorted.reduce((a, b) => a + b, 0) / Math.max(1, sorted.length)),
    },
    requests: { average: latencies.length / seconds, total: latencies.length + errors },
    non2xx,
    errors,
    timeouts: 0,
    resets: 0,
  };
}

/** One line of figures per target. */
export function describeLoad(targets: readonly LoadTarget[]): string {
  return targets
    .map(
      ({ label, result: r }) =>
        `${label.padEnd(30)} ${Math.round(r.requests.average)} req/s, p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms, max ${r.latency.max} ms ` +
        `(${r.requests.total} requests, ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts)`,
    )
    .join('\n  ');
}

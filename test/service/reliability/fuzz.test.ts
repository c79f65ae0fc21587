import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startRun, waitForStatus } from '../helpers/runs.ts';
import {
  jsonInit,
  type ServiceProcess,
  startService,
  tempDir,
} from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';
import { answerProblem, Tally } from './answer-checks.ts';
import {
  appRoutes,
  type FuzzRequest,
  type KnownIds,
  requestsFor,
  strayRequestArb,
} from './hostile-requests.ts';
import { closeClient, parseRawAnswer, send, sendRaw } from './http-client.ts';

/**
 * API fuzz: at least 2,000 generated malformed or hostile requests across every route
 * of a started service, then a set of raw requests no HTTP client would send. Expected: no
 * answer of 500 or above, no stack trace, the process alive, no internal error logged, and every
 * 4xx in the documented error shape (answer-checks.ts).
 */

const SEED = 8_008;
/** At least this many generated requests over the routes (README, Reliability, states 2,500 or more). */
const TARGET_REQUESTS = 2_500;
/** Requests in flight at once: enough to overlap, few enough for 2 shared cores. */
const CONCURRENCY = 6;

const dir = tempDir('tremora-fuzz-');
let service: ServiceProcess;
let ids: { study: string; victims: string[]; doomed: string[]; run: string };

beforeAll(async () => {
  service = await startService({
    databasePath: `${dir.path}/fuzz.db`,
    env: { TREMORA_WORKERS: '1' },
  });
  const create = async (name: string) =>
    (
      (await (await service.fetch('/api/studies', jsonInit('POST', smallStudy(name)))).json()) as {
        id: string;
      }
    ).id;
  const study = await create('Fuzz target');
  const victims = [await create('Fuzz victim 1'), await create('Fuzz victim 2')];
  const doomed = [await create('Fuzz doomed 1'), await create('Fuzz doomed 2')];
  const run = await waitForStatus(service, (await startRun(service, study)).id);
  expect(run.status, run.error ?? '').toBe('done');
  ids = { study, victims, doomed, run: run.id };
});

afterAll(async () => {
  closeClient();
  if (service && service.child.exitCode === null) await service.stop();
  dir.remove();
});

/** Runs `work` over `items` with at most `limit` in flight. */
async function pool<T>(
  items: readonly T[],
  limit: number,
  work: (item: T) => Promise<void>,
): Promise<void> {
  let next = 0;
  await Promise.all(
    Array.from({ length: limit }, async () => {
      while (next < items.length) await work(items[next++] as T);
    }),
  );
}

function generatedRequests(): FuzzRequest[] {
  const routes = appRoutes();
  // Writes that replace or import go to the victims and deletes to the doomed, so the target
  // study stays as it was and the victims stay to be written to.
  const known = (route: { method: string; path: string }): KnownIds => {
    const changes =
      route.method === 'PUT' ||
      /\/(communities|sources)$/.test(route.path) ||
      (!route.path.startsWith('/api') && route.method === 'POST');
    const targets = route.method === 'DELETE' ? ids.doomed : changes ? ids.victims : [ids.study];
    return { id: targets, studyId: targets, runId: [ids.run], cid: ['test-cove'] };
  };
  const perRoute = Math.ceil(TARGET_REQUESTS / routes.length);
  const requests = routes.flatMap((route, i) =>
    fc.sample(requestsFor(route, known(route)), { numRuns: perRoute, seed: SEED + i }),
  );
  return [...requests, ...fc.sample(strayRequestArb, { numRuns: 60, seed: SEED - 1 })];
}

describe('the API under hostile requests', () => {
  it(`answers ${TARGET_REQUESTS}+ generated requests across every route without a 5xx, a stack trace or a stray shape`, async () => {
    const requests = generatedRequests();
    const byStatus = new Tally();
    const byKind = new Tally();
    const routes = new Set<string>();
    const problems: string[] = [];
    let unanswered = 0;
    await pool(requests, CONCURRENCY, async (request) => {
      const answer = await send(service.url, {
        method: request.method,
        path: request.path,
        headers: request.headers,
        ...(request.body ? { body: request.body } : {}),
      });
      byKind.add(request.kind);
      routes.add(`${request.method} ${request.path.split('/').slice(0, 4).join('/')}`);
      if ('error' in answer) {
        unanswered++;
        problems.push(
          `${request.method} ${request.path.slice(0, 80)} (${request.kind}): no answer (${answer.error})`,
        );
        return;
      }
      byStatus.add(answer.status);
      const problem = answerProblem(answer, request.method, request.path);
      if (problem)
        problems.push(
          `${request.method} ${request.path.slice(0, 80)} (${request.kind}): ${problem}`,
        );
    });
    console.log(
      `API fuzz (seed ${SEED}): ${requests.length} requests over ${appRoutes().length} routes\n` +
        `  by status: ${byStatus}\n  by kind: ${byKind}\n  unanswered: ${unanswered}, problems: ${problems.length}`,
    );
    expect(requests.length).toBeGreaterThanOrEqual(2_000);
    expect(problems.slice(0, 10), problems.slice(0, 10).join('\n')).toEqual([]);
    expect(byStatus.total).toBe(requests.length);
    // A time limit for a fixed number of requests only: on a busy shared machine they take
    // several minutes, and what is checked does not depend on how fast they are answered.
  }, 600_000);

  it('answers raw requests no client would send (bad HTTP, header overflow, cut-short bodies) in the error shape', async () => {
    const port = Number(new URL(service.url).port);
    const head = (method: string, path: string, extra = '') =>
      `${method} ${path} HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n${extra}`;
    const cases: {
      label: string;
      bytes: Uint8Array | string;
      halfClose?: boolean;
      expect: number[];
      location?: string;
    }[] = [
      { label: 'garbage request line', bytes: '\u0000\u0001GARBAGE\r\n\r\n', expect: [400] },
      {
        label: 'unknown method token with a space',
        bytes: head('GE T', '/api/health') + '\r\n',
        expect: [400],
      },
      { label: 'TRACE', bytes: head('TRACE', '/api/health') + '\r\n', expect: [404, 405] },
      {
        label: 'header line without a colon',
        bytes: head('GET', '/api/health', 'Broken Header\r\n') + '\r\n',
        expect: [400],
      },
      {
        label: 'URL over 16 KiB',
        bytes: head('GET', `/api/studies/${'a'.repeat(20_000)}`) + '\r\n',
        expect: [431],
      },
      {
        label: 'headers over 16 KiB',
        bytes: head('GET', '/api/health', `X-Big: ${'b'.repeat(20_000)}\r\n`) + '\r\n',
        expect: [431],
      },
      {
        label: 'bad chunk size',
        bytes:
          head(
            'POST',
            '/api/validate',
            'Content-Type: application/json\r\nTransfer-Encoding: chunked\r\n',
          ) + '\r\nZZ\r\nabc\r\n0\r\n\r\n',
        expect: [400],
      },
      {
        label: 'Content-Length with Transfer-Encoding',
        bytes:
          head(
            'POST',
            '/api/validate',
            'Content-Type: application/json\r\nContent-Length: 4\r\nTransfer-Encoding: chunked\r\n',
          ) + '\r\n0\r\n\r\n',
        expect: [400],
      },
      {
        label: 'two Content-Length values',
        bytes:
          head(
            'POST',
            '/api/validate',
            'Content-Type: application/json\r\nContent-Length: 2\r\nContent-Length: 3\r\n',
          ) + '\r\n{}',
        expect: [400],
      },
      {
        label: 'body cut short (half-close)',
        bytes:
          head(
            'POST',
            '/api/validate',
            'Content-Type: application/json\r\nContent-Length: 500\r\n',
          ) + '\r\n{"name":',
        halfClose: true,
        expect: [400],
      },
      {
        label: 'chunked body cut short (half-close)',
        bytes:
          head(
            'POST',
            '/api/studies',
            'Content-Type: application/json\r\nTransfer-Encoding: chunked\r\n',
          ) + '\r\n20\r\n{"name":',
        halfClose: true,
        expect: [400],
      },
      {
        label: 'NUL in the path',
        bytes: head('GET', '/api/studies/\u0000') + '\r\n',
        expect: [400, 404],
      },
      {
        label: 'bytes over 0x7f in a header',
        bytes: Buffer.concat([
          Buffer.from(head('GET', '/api/health', 'X-Name: ')),
          Buffer.from([0xff, 0xfe]),
          Buffer.from('\r\n\r\n'),
        ]),
        expect: [200, 400],
      },
      {
        label: 'invalid UTF-8 JSON body',
        bytes: Buffer.concat([
          Buffer.from(
            head(
              'POST',
              '/api/validate',
              'Content-Type: application/json\r\nContent-Length: 13\r\n',
            ) + '\r\n',
          ),
          Buffer.from([
            0x7b, 0x22, 0x6e, 0x22, 0x3a, 0x22, 0xff, 0xfe, 0xc3, 0x28, 0x22, 0x7d, 0x20,
          ]),
        ]),
        expect: [422],
      },
      { label: 'HTTP/1.0 without Host', bytes: 'GET /api/health HTTP/1.0\r\n\r\n', expect: [200] },
      {
        label: 'absolute-form URL to another host',
        bytes:
          'GET http://elsewhere.invalid/api/health HTTP/1.1\r\nHost: elsewhere.invalid\r\nConnection: close\r\n\r\n',
        expect: [421],
      },
      {
        label: 'HTTP/1.1 without Host',
        bytes: 'GET /api/health HTTP/1.1\r\nConnection: close\r\n\r\n',
        expect: [400],
      },
      {
        label: 'an Expect not known',
        bytes: head('GET', '/api/health', 'Expect: 999-foo\r\n') + '\r\n',
        expect: [417],
      },
      { label: 'OPTIONS *', bytes: head('OPTIONS', '*') + '\r\n', expect: [204] },
      { label: 'HEAD on the API', bytes: head('HEAD', '/api/studies') + '\r\n', expect: [200] },
      {
        label: 'Host and Origin of another site writing (DNS rebinding)',
        bytes:
          'DELETE /api/studies/x HTTP/1.1\r\nHost: evil.example:8462\r\nOrigin: http://evil.example:8462\r\nConnection: close\r\n\r\n',
        expect: [421],
      },
      {
        label: 'a Host that is no host name',
        bytes: 'GET /api/health HTTP/1.1\r\nHost: a@127.0.0.1\r\nConnection: close\r\n\r\n',
        expect: [400, 421],
      },
      {
        label: 'back path with a tab before another host',
        bytes: head('GET', '/language?lang=fr&back=/%09/evil.example/x') + '\r\n',
        expect: [303],
        location: '/',
      },
      {
        label: 'back path with CR LF',
        bytes: head('GET', '/language?lang=fr&back=/%0d%0aSet-Cookie:%20x=1') + '\r\n',
        expect: [303],
        location: '/',
      },
    ];
    const byStatus = new Tally();
    const problems: string[] = [];
    for (const c of cases) {
      const raw = await sendRaw(port, c.bytes, c.halfClose ? { halfClose: true } : {});
      const answer = parseRawAnswer(raw);
      if (!answer) {
        problems.push(`${c.label}: no HTTP answer (${JSON.stringify(raw.slice(0, 80))})`);
        continue;
      }
      byStatus.add(answer.status);
      if (!c.expect.includes(answer.status))
        problems.push(`${c.label}: status ${answer.status}, expected ${c.expect.join(' or ')}`);
      if (c.location !== undefined && answer.headers.location !== c.location)
        problems.push(
          `${c.label}: Location ${String(answer.headers.location)}, expected ${c.location}`,
        );
      const problem = answerProblem(answer, 'GET');
      if (problem) problems.push(`${c.label}: ${problem}`);
    }
    console.log(
      `raw requests: ${cases.length}; by status: ${byStatus}; problems: ${problems.length}`,
    );
    expect(problems, problems.join('\n')).toEqual([]);
  });

  it('is alive afterwards, logged no internal error, and kept the target study as it was', async () => {
    const health = await service.fetch('/api/health');
    expect(health.status).toBe(200);
    expect(service.child.exitCode).toBeNull();
    const logged = service.output().match(/\[error [^\]]+\][^\n]*/g) ?? [];
    console.log(`internal errors logged during the fuzz: ${logged.length}`);
    expect(logged).toEqual([]);
    const document = await (await service.fetch(`/api/studies/${ids.study}/document`)).text();
    expect(JSON.parse(document)).toEqual(smallStudy('Fuzz target'));
    // Whatever the fuzz managed to save reads back: as JSON, as its document, as its page.
    const { studies } = (await (await service.fetch('/api/studies')).json()) as {
      studies: { id: string }[];
    };
    const reads = new Tally();
    for (const { id } of studies) {
      for (const path of [
        `/api/studies/${id}`,
        `/api/studies/${id}/document`,
        `/api/studies/${id}/runs`,
        `/studies/${id}`,
      ]) {
        const answer = await send(service.url, { method: 'GET', path });
        reads.add('error' in answer ? 'no answer' : answer.status);
      }
    }
    console.log(`saved studies after the fuzz: ${studies.length}; reading each back: ${reads}`);
    expect(reads.count(200)).toBe(reads.total);
  });
});

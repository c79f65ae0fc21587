import { describe, expect, test } from 'vitest';
import { CONTENT_SECURITY_POLICY } from '../../../api/service/security-headers.ts';
import { serviceForFile } from '../helpers/service-process.ts';
import { type Answer, parseRawAnswer, sendRaw } from './http-client.ts';

/**
 * Requests that Node or the hono adapter answer before the app sees them, and HEAD on the
 * API: every answer carries the security headers, and every refusal the one error shape.
 */
const service = serviceForFile('shape');

async function raw(lines: string[]): Promise<Answer> {
  const text = await sendRaw(Number(new URL(service.url).port), `${lines.join('\r\n')}\r\n\r\n`);
  const answer = parseRawAnswer(text);
  if (!answer) throw new Error(`no HTTP answer to ${lines[0]}: ${JSON.stringify(text)}`);
  return answer;
}

function expectHeaders(answer: Answer, what: string): void {
  expect(answer.headers['content-security-policy'], what).toBe(CONTENT_SECURITY_POLICY);
  expect(answer.headers['x-content-type-options'], what).toBe('nosniff');
  expect(answer.headers['x-frame-options'], what).toBe('DENY');
}

function expectRefusal(answer: Answer, status: number, what: string): void {
  expect(answer.status, what).toBe(status);
  expectHeaders(answer, what);
  expect(answer.headers['content-type'], what).toMatch(/^application\/json/);
  const body = JSON.parse(answer.text) as { error: unknown; issues: unknown };
  expect(typeof body.error, what).toBe('string');
  expect(Array.isArray(body.issues), what).toBe(true);
}

describe('answers the app does not write itself', () => {
  test('HTTP/1.1 without Host: 400 in the error shape', async () => {
    expectRefusal(await raw(['GET /api/health HTTP/1.1', 'Connection: close']), 400, 'no Host');
  });

  test('an Expect the service does not know: 417 in the error shape', async () => {
    expectRefusal(
      await raw([
        'GET /api/health HTTP/1.1',
        'Host: 127.0.0.1',
        'Expect: 999-foo',
        'Connection: close',
      ]),
      417,
      'Expect',
    );
  });

  test('OPTIONS *: the methods, with the headers', async () => {
    const answer = await raw(['OPTIONS * HTTP/1.1', 'Host: 127.0.0.1', 'Connection: close']);
    expect(answer.status).toBe(204);
    expect(answer.headers.allow).toContain('GET');
    expectHeaders(answer, 'OPTIONS *');
  });

  test('a target or Host the adapter cannot read: 400 in the error shape', async () => {
    expectRefusal(
      await raw(['GET /a\\b HTTP/1.1', 'Host: 127.0.0.1', 'Connection: close']),
      400,
      'backslash',
    );
    expectRefusal(
      await raw(['GET /api/health HTTP/1.1', 'Host: 127.0.0.1:80:80', 'Connection: close']),
      400,
      'bad Host',
    );
  });

  test('HEAD on API routes and pages carries the headers', async () => {
    for (const path of ['/api/health', '/api/studies', '/api/none-such', '/']) {
      const answer = await raw([`HEAD ${path} HTTP/1.1`, 'Host: 127.0.0.1', 'Connection: close']);
      expectHeaders(answer, `HEAD ${path}`);
    }
  });
});

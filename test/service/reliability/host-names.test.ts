import { afterAll, describe, expect, test } from 'vitest';
import { readConfig } from '../../../api/service/config.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';
import { closeClient, send, type Answer } from './http-client.ts';

/**
 * The shape of a DNS-rebinding attack: a page of another site whose name now points at
 * 127.0.0.1 sends requests that say its own name in Host and Origin. The tokenless loopback
 * service must answer them 421 and change nothing; its own names keep working.
 */
const service = serviceForFile('hosts');
afterAll(() => closeClient());

const port = () => new URL(service.url).port;
const studyCount = async () =>
  ((await (await service.fetch('/api/studies')).json()) as { studies: unknown[] }).studies.length;
const body = (value: unknown) => new TextEncoder().encode(JSON.stringify(value));

async function answer(
  method: string,
  path: string,
  headers: Record<string, string>,
  value?: unknown,
): Promise<Answer> {
  const result = await send(service.url, {
    method,
    path,
    headers: { 'content-type': 'application/json', ...headers },
    ...(value === undefined ? {} : { body: body(value) }),
  });
  if ('error' in result) throw new Error(result.error);
  return result;
}

describe('host names', () => {
  test('a foreign Host and Origin can neither create nor delete a study (421 in the error shape)', async () => {
    const created = await service.fetch('/api/studies', jsonInit('POST', smallStudy('Kept')));
    const id = ((await created.json()) as { id: string }).id;
    const before = await studyCount();
    const foreign = { host: 'evil.example:8462', origin: 'http://evil.example:8462' };
    const post = await answer('POST', '/api/studies', foreign, smallStudy('Planted'));
    const remove = await answer('DELETE', `/api/studies/${id}`, foreign);
    const read = await answer('GET', `/api/studies/${id}`, { host: 'evil.example:8462' });
    for (const refused of [post, remove, read]) {
      expect(refused.status).toBe(421);
      const parsed = JSON.parse(refused.text) as { error: string; issues: { path: string }[] };
      expect(parsed.error).toContain('evil.example:8462');
      expect(parsed.issues[0]?.path).toBe('(header) Host');
      expect(refused.headers['x-content-type-options']).toBe('nosniff');
    }
    expect(await studyCount()).toBe(before);
    expect((await service.fetch(`/api/studies/${id}`)).status).toBe(200);
  });

  test('its own names are answered: 127.0.0.1, localhost, [::1], with or without the port', async () => {
    for (const host of [
      `127.0.0.1:${port()}`,
      `localhost:${port()}`,
      'localhost',
      `[::1]:${port()}`,
    ]) {
      expect((await answer('GET', '/api/health', { host })).status, host).toBe(200);
    }
  });

  test('names that only look like ours are refused', async () => {
    for (const host of [
      'localhost.evil.example',
      '127.0.0.1.evil.example',
      '127.0.0.2',
      'evil.example@127.0.0.1',
      'LOCALHOST.evil.example',
    ]) {
      const refused = await answer('GET', '/api/health', { host });
      // 421 for a host name not ours; 400 for a Host that is no host name at all (the "@").
      expect([400, 421], host).toContain(refused.status);
      expect(JSON.parse(refused.text)).toHaveProperty('issues');
      expect(refused.headers['x-content-type-options']).toBe('nosniff');
    }
  });
});

describe('TREMORA_HOSTS', () => {
  test('adds names to the loopback ones; HOST is allowed; a wildcard HOST without a list allows any', () => {
    expect(readConfig({}).allowedHosts).toEqual(['localhost', '127.0.0.1', '[::1]']);
    expect(
      readConfig({ TREMORA_HOSTS: 'Survey-Laptop.lan, 192.168.1.20,fe80::1' }).allowedHosts,
    ).toEqual([
      'localhost',
      '127.0.0.1',
      '[::1]',
      'survey-laptop.lan',
      '192.168.1.20',
      '[fe80::1]',
    ]);
    expect(
      readConfig({ HOST: '192.168.1.20', TREMORA_TOKEN: 'a-token-of-enough-length' }).allowedHosts,
    ).toContain('192.168.1.20');
    expect(
      readConfig({ HOST: '0.0.0.0', TREMORA_TOKEN: 'a-token-of-enough-length' }).allowedHosts,
    ).toBeUndefined();
    expect(() => readConfig({ TREMORA_HOSTS: 'a/b' })).toThrow(/TREMORA_HOSTS .* got "a\/b"/);
  });
});

import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { safeBackPath } from '../../../web/routes/page-kit.ts';
import { startPageApp, type PageApp } from '../helpers/page-app.ts';

/**
 * Where the language switch and the access page send the browser back to (`back`) must stay
 * on this origin however the browser reads it: the WHATWG URL standard drops tab, CR and LF
 * from a URL and reads "\" as "/", which turns "/<tab>/other.example/x" into
 * "//other.example/x", another host. And no `back` may answer 500.
 */
const TOKEN = 'token-for-back-tests-0123456';
let page: PageApp;

beforeAll(() => {
  page = startPageApp({ token: TOKEN });
});
afterAll(async () => {
  await page.close();
});

/** Hostile values, as they appear encoded in a query string. */
const HOSTILE = [
  '/%09/evil.example/x',
  '/%0a/evil.example/x',
  '/%0d/evil.example/x',
  '/%0d%0aSet-Cookie:%20x=1',
  '//evil.example/x',
  '/%5Cevil.example/x',
  '/%5C/evil.example/x',
  'https://evil.example/x',
  '%2F%2Fevil.example',
  '/%00/evil.example',
  '/%7F/evil.example',
];

/** Where a browser at http://localhost:8357/ goes with this Location. */
const followed = (location: string) =>
  new URL(location.replace(/[\t\n\r]/g, ''), 'http://localhost:8357/language');

describe('the back path', () => {
  test('the language switch never leads off this origin, never answers 500', async () => {
    for (const back of HOSTILE) {
      const response = await page.app.request(`/language?lang=fr&back=${back}`);
      expect(response.status, back).toBe(303);
      const location = response.headers.get('location') as string;
      expect(followed(location).origin, `${back} -> ${location}`).toBe('http://localhost:8357');
      expect(location, back).toBe('/');
    }
  });

  test('the access page, after the token, goes back only on this origin', async () => {
    for (const back of HOSTILE.map(decodeURIComponent)) {
      const response = await page.app.request('/access', {
        method: 'POST',
        body: new URLSearchParams({ token: TOKEN, back }),
      });
      expect(response.status, JSON.stringify(back)).toBe(303);
      expect(
        followed(response.headers.get('location') as string).origin,
        JSON.stringify(back),
      ).toBe('http://localhost:8357');
    }
  });

  test('a path of this origin is kept, with its query; other letters come back percent-encoded', () => {
    expect(safeBackPath('/studies/abc/edit?saved=1')).toBe('/studies/abc/edit?saved=1');
    expect(safeBackPath('/studies/é')).toBe('/studies/%C3%A9');
    expect(safeBackPath('/a/../b')).toBe('/b');
    expect(safeBackPath('/\t/evil.example/x')).toBe('/');
    expect(safeBackPath('/\\evil.example')).toBe('/');
    expect(safeBackPath(undefined)).toBe('/');
  });
});

import { afterAll, beforeAll, beforeEach, describe, expect, test } from 'vitest';
import {
  ACCESS_COOKIE,
  ACCESS_MAX_AGE_S,
  accessCookieValue,
} from '../../../api/service/page-access.ts';
import { translator } from '../../../web/text/translator.ts';
import { expectError, expectSecurityHeaders } from '../../service/helpers/assertions.ts';
import { smallStudy } from '../../service/helpers/small-study.ts';
import { runFinished, startPageApp, type PageApp } from '../helpers/page-app.ts';
import { saveStudy } from '../../service/helpers/saved-study.ts';

/**
 * The access page of a service with TREMORA_TOKEN (web/routes/access-pages.tsx) and the token
 * check that accepts its cookie (api/service/require-token.ts), through app.request(). The
 * browser test (test/browser/access.test.ts) walks the same way in Chromium.
 */
const TOKEN = 'token-for-tests-0123456789';
const OTHER_TOKEN = 'another-token-for-tests-987';
const en = translator('en');
let guarded: PageApp;
let open: PageApp;
let studyId: string;

beforeAll(() => {
  guarded = startPageApp({ token: TOKEN });
  open = startPageApp();
  studyId = saveStudy(guarded.ctx.store, smallStudy('Access fixture'));
});
afterAll(async () => {
  await guarded.close();
  await open.close();
});

const request = (path: string, init?: RequestInit) => guarded.app.request(path, init);
const enter = (token: string, back?: string, headers: Record<string, string> = {}) =>
  request('/access', {
    method: 'POST',
    headers,
    body: new URLSearchParams({ token, ...(back === undefined ? {} : { back }) }),
  });
/** The `name=value` part of a Set-Cookie header. */
const cookiePair = (response: Response): string | undefined =>
  response.headers.get('set-cookie')?.split(';')[0];
/**
 * An access id of 32 random bytes, a dot, and an HMAC-SHA256 of it: SHA-256 gives 256 bits
 * (FIPS 180-4); base64url without padding writes 32 bytes in 43 characters (RFC 4648, section 5).
 */
const COOKIE_PAIR = `${ACCESS_COOKIE}=[A-Za-z0-9_-]{43}\\.[A-Za-z0-9_-]{43}`;
/** A cookie of an access given by the page just before each test (a test may end it). */
let accessCookie: string;
beforeEach(async () => {
  accessCookie = cookiePair(await enter(TOKEN)) as string;
});
/** The access id a `name=value` cookie names. */
const accessIdOf = (cookie: string): string => cookie.split('=')[1]?.split('.')[0] as string;

describe('the access cookie', () => {
  test('names a new access each time, with an HMAC of it that is not the token and differs from token to token', async () => {
    expect(accessCookie).toMatch(new RegExp(`^${COOKIE_PAIR}$`));
    expect(accessCookie).not.toContain(TOKEN);
    const another = cookiePair(await enter(TOKEN)) as string;
    expect(accessIdOf(another)).not.toBe(accessIdOf(accessCookie));
    const id = accessIdOf(accessCookie);
    expect(accessCookieValue(TOKEN, id)).toBe(accessCookie.split('=')[1]);
    expect(accessCookieValue(OTHER_TOKEN, id)).not.toBe(accessCookieValue(TOKEN, id));
  });
});

describe('entering the token on the access page', () => {
  test('the page has a password field, and the place to return to', async () => {
    const response = await request('/access?back=/studies/abc&why=needed');
    expect(response.status).toBe(200);
    expectSecurityHeaders(response);
    const html = await response.text();
    expect(html).toContain(
      '<form method="post" action="/access" class="access-form" novalidate="">',
    );
    expect(html).toContain('<input type="hidden" name="back" value="/studies/abc"/>');
    expect(html).toContain('name="token" type="password" autocomplete="current-password"');
    expect(html).toContain(en.t('access.needed'));
  });

  test('the right token sets the cookie (HttpOnly, SameSite=Strict, Path=/, not Secure over http) and returns to the page', async () => {
    const response = await enter(TOKEN, '/studies/abc');
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe('/studies/abc');
    expect(response.headers.get('set-cookie')).toMatch(
      new RegExp(
        `^${COOKIE_PAIR}; Max-Age=${ACCESS_MAX_AGE_S}; Path=/; HttpOnly; SameSite=Strict$`,
      ),
    );
    expect(response.headers.get('set-cookie')).not.toContain(TOKEN);
  });

  test('spaces copied around the token are forgiven; without a place to return to it comes back here', async () => {
    const response = await enter(`  ${TOKEN}\n`);
    expect(response.status).toBe(303);
    expect(response.headers.get('location')).toBe('/access');
    expect(cookiePair(response)).toMatch(new RegExp(`^${COOKIE_PAIR}$`));
  });

  test('the cookie is Secure when the request came over https, directly or through a proxy that says so', async () => {
    const direct = await guarded.app.request('https://tremora.test/access', {
      method: 'POST',
      headers: { host: 'tremora.test' },
      body: new URLSearchParams({ token: TOKEN }),
    });
    expect(direct.status).toBe(303);
    expect(direct.headers.get('set-cookie')).toMatch(
      new RegExp(
        `^${COOKIE_PAIR}; Max-Age=${ACCESS_MAX_AGE_S}; Path=/; HttpOnly; Secure; SameSite=Strict$`,
      ),
    );
    const proxied = await enter(TOKEN, '/', { 'X-Forwarded-Proto': 'https' });
    expect(proxied.headers.get('set-cookie')).toContain('; Secure;');
  });

  test('a wrong token is refused on the page (403) and no cookie is set; an empty one asks for it (422)', async () => {
    const wrong = await enter(OTHER_TOKEN, '/studies/abc');
    expect(wrong.status).toBe(403);
    expect(wrong.headers.get('set-cookie')).toBeNull();
    const html = await wrong.text();
    expect(html).toContain(en.t('access.wrong'));
    expect(html).toContain('aria-invalid="true"');
    expect(html).toContain('<input type="hidden" name="back" value="/studies/abc"/>');
    const prefix = await enter(TOKEN.slice(0, -1));
    expect(prefix.status).toBe(403);
    const empty = await enter('   ');
    expect(empty.status).toBe(422);
    expect(empty.headers.get('set-cookie')).toBeNull();
    expect(await empty.text()).toContain(en.t('access.missing'));
  });

  test('a place to return to on another site is not followed', async () => {
    const response = await enter(TOKEN, '//elsewhere.example/x');
    expect(response.headers.get('location')).toBe('/');
  });

  test('with the cookie the page says so and offers to end the access; ending clears the cookie', async () => {
    const html = await (await request('/access', { headers: { cookie: accessCookie } })).text();
    expect(html).toContain(en.t('access.granted'));
    expect(html).toContain('<form method="post" action="/access/leave" class="inline-form">');
    expect(html).not.toContain('name="token"');
    const left = await request('/access/leave', {
      method: 'POST',
      headers: { cookie: accessCookie },
    });
    expect(left.status).toBe(303);
    expect(left.headers.get('location')).toBe('/access?why=ended');
    expect(left.headers.get('set-cookie')).toBe(
      `${ACCESS_COOKIE}=; Max-Age=0; Path=/; HttpOnly; SameSite=Strict`,
    );
    expect(await (await request('/access?why=ended')).text()).toContain(en.t('access.ended'));
  });

  test('ending the access ends it on the service: a copy of the old cookie no longer writes', async () => {
    const kept = accessCookie;
    const write = () =>
      request(`/studies/${studyId}/screen`, { method: 'POST', headers: { cookie: kept } });
    const before = await write();
    expect(before.status).toBe(303);
    expect(before.headers.get('location')).toMatch(/\/runs\//);
    await runFinished(guarded.ctx, before.headers.get('location')?.split('/').at(-1) as string);
    await request('/access/leave', { method: 'POST', headers: { cookie: kept } });
    const after = await write();
    expect(after.status).toBe(303);
    expect(after.headers.get('location')).toBe('/access?back=%2F&why=needed');
    const page = await (await request('/access', { headers: { cookie: kept } })).text();
    expect(page).not.toContain(en.t('access.granted'));
    expect(page).toContain('name="token"');
  });
});

describe('page writes on a service with a token', () => {
  test('are accepted with the cookie', async () => {
    const started = await request(`/studies/${studyId}/screen`, {
      method: 'POST',
      headers: { cookie: accessCookie },
    });
    expect(started.status).toBe(303);
    const location = started.headers.get('location') as string;
    expect(location).toMatch(new RegExp(`^/studies/${studyId}/runs/[A-Za-z0-9_-]+$`));
    expect(await runFinished(guarded.ctx, location.split('/').at(-1) as string)).toBe('done');
  });

  test('without access go to the access page (303), which returns to the page the form was on', async () => {
    const refused = await request(`/studies/${studyId}/screen`, {
      method: 'POST',
      headers: { host: 'localhost', referer: `http://localhost/studies/${studyId}?sort=name` },
    });
    expect(refused.status).toBe(303);
    expect(refused.headers.get('location')).toBe(
      `/access?back=${encodeURIComponent(`/studies/${studyId}?sort=name`)}&why=needed`,
    );
    const foreignReferer = await request(`/studies/${studyId}/screen`, {
      method: 'POST',
      headers: { host: 'localhost', referer: 'http://elsewhere.example/x' },
    });
    expect(foreignReferer.headers.get('location')).toBe('/access?back=%2F&why=needed');
  });

  test('are refused with a cookie that is not the one of this token: the token itself, or one of another token', async () => {
    for (const cookie of [
      `${ACCESS_COOKIE}=${TOKEN}`,
      `${ACCESS_COOKIE}=${accessCookieValue(OTHER_TOKEN, accessIdOf(accessCookie))}`,
      `${ACCESS_COOKIE}=${accessCookieValue(TOKEN, 'never-given-by-this-service')}`,
      `${ACCESS_COOKIE}=${accessIdOf(accessCookie)}`,
      `${ACCESS_COOKIE}=`,
    ]) {
      const response = await request(`/studies/${studyId}/screen`, {
        method: 'POST',
        headers: { cookie },
      });
      expect(response.status, cookie).toBe(303);
      expect(response.headers.get('location'), cookie).toBe('/access?back=%2F&why=needed');
    }
  });

  test('are refused from another site even with the cookie (the same-origin check), the access form too', async () => {
    const crossSite = await request(`/studies/${studyId}/screen`, {
      method: 'POST',
      headers: { cookie: accessCookie, 'Sec-Fetch-Site': 'cross-site' },
    });
    await expectError(crossSite, 403);
    const foreignOrigin = await request(`/studies/${studyId}/screen`, {
      method: 'POST',
      headers: { cookie: accessCookie, host: 'localhost', origin: 'http://elsewhere.example' },
    });
    await expectError(foreignOrigin, 403);
    const login = await enter(TOKEN, '/', { 'Sec-Fetch-Site': 'cross-site' });
    await expectError(login, 403);
    expect(login.headers.get('set-cookie')).toBeNull();
  });
});

describe('the API on a service with a token', () => {
  const post = (headers: Record<string, string>) =>
    request('/api/studies', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', ...headers },
      body: JSON.stringify(smallStudy('API fixture')),
    });

  test('still answers a write without the token with 401 JSON, not a redirect', async () => {
    const body = await expectError(await post({}), 401);
    expect(body.error).toBe(
      'an access token is required; expected the header "Authorization: Bearer <TREMORA_TOKEN>" on every request that writes or computes',
    );
    expect(
      (await expectError(await post({ Authorization: `Bearer ${OTHER_TOKEN}` }), 401)).error,
    ).toMatch(/^the access token is wrong/);
  });

  test('a wrong bearer header is refused even beside a good cookie', async () => {
    await expectError(
      await post({ Authorization: `Bearer ${OTHER_TOKEN}`, cookie: accessCookie }),
      401,
    );
  });

  test('accepts the bearer header, and the access cookie of a page', async () => {
    expect((await post({ Authorization: `Bearer ${TOKEN}` })).status).toBe(201);
    expect((await post({ cookie: accessCookie })).status).toBe(201);
  });
});

describe('a service without a token (loopback)', () => {
  test('takes page writes as before, and its access page says no token is needed', async () => {
    // An unknown study: the write reaches its route (a 404 page) rather than any token check.
    const missing = await open.app.request('/studies/no-such-study/screen', { method: 'POST' });
    expect(missing.status).toBe(404);
    expect(missing.headers.get('content-type')).toContain('text/html');
    const html = await (await open.app.request('/access')).text();
    expect(html).toContain(en.t('access.open'));
    expect(html).not.toContain('name="token"');
  });
});

describe('the referrer policy', () => {
  test('is sent as a header (same-origin), so the pages carry no referrer meta tag of their own', async () => {
    const response = await request('/limits');
    expect(response.headers.get('referrer-policy')).toBe('same-origin');
    expect(await response.text()).not.toMatch(/<meta name="referrer"/);
  });
});

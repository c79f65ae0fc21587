import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { ACCESS_COOKIE } from '../../api/service/page-access.ts';
import { translator } from '../../web/text/translator.ts';
import { getRun, waitForStatus } from '../service/helpers/runs.ts';
import { ARTIFACTS, seriousAxeViolations, walkWithTab } from './helpers/chromium.ts';
import { browserService } from './helpers/browser-service.ts';

/**
 * A service on a shared office machine has TREMORA_TOKEN: in Chromium, a user who presses
 * "Screen this study" is sent to the access page, enters the token once, and screens the demo
 * from the overview. The service listens on loopback here (a token there is allowed, and
 * harmless); every request stays on its origin.
 */
const TOKEN = 'office-token-for-the-browser-test';
const en = translator('en');
const rig = browserService({
  tempPrefix: 'tremora-access-browser-',
  database: 'access.db',
  env: { HOST: '127.0.0.1', TREMORA_TOKEN: TOKEN },
});

describe('page forms on a service with a token', { timeout: 120_000 }, () => {
  test('a form post without access leads to the access page, which says why', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}`);
    await rig.page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await rig.page.waitForURL(/\/access\?/);
    const url = new URL(rig.page.url());
    expect(url.pathname).toBe('/access');
    expect(url.searchParams.get('back')).toBe(`/studies/${rig.studyId}`);
    expect(url.searchParams.get('why')).toBe('needed');
    expect(await rig.page.locator('p.notice').textContent()).toBe(en.t('access.needed'));
    const violations = await seriousAxeViolations(rig.page);
    expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
    const walk = await walkWithTab(rig.page);
    expect(walk.missed).toEqual([]);
    expect(walk.invisibleFocus).toEqual([]);
  });

  test('a wrong token is refused on the page', async () => {
    await rig.page.getByLabel(en.t('access.token')).fill('not-the-office-token-000');
    await rig.page.getByRole('button', { name: en.t('access.enter') }).click();
    await expect
      .poll(() => rig.page.locator('#access-token-problem').textContent())
      .toBe(en.t('access.wrong'));
    expect((await rig.context.cookies()).map((c) => c.name)).not.toContain(ACCESS_COOKIE);
  });

  test('the right token gives a cookie that is not the token and returns to the overview', async () => {
    await rig.page.getByLabel(en.t('access.token')).fill(TOKEN);
    await rig.page.getByRole('button', { name: en.t('access.enter') }).click();
    await rig.page.waitForURL(`${rig.service.url}/studies/${rig.studyId}`);
    const cookie = (await rig.context.cookies()).find((c) => c.name === ACCESS_COOKIE);
    expect(cookie).toMatchObject({
      // An access id and its HMAC-SHA256, each 32 bytes in base64url (43 characters, RFC 4648 section 5).
      value: expect.stringMatching(/^[A-Za-z0-9_-]{43}\.[A-Za-z0-9_-]{43}$/),
      path: '/',
      httpOnly: true,
      sameSite: 'Strict',
      secure: false,
    });
    expect(cookie?.value).not.toContain(TOKEN);
  });

  test('the demo is screened from the overview: the form post starts a run, and the page follows it to the ranking', async () => {
    await rig.page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await rig.page.waitForURL(/\/runs\//);
    const runId = new URL(rig.page.url()).pathname.split('/').at(-1) as string;
    expect((await getRun(rig.service, runId)).studyId).toBe(rig.studyId);
    // The page's script moves to the overview once the run is done (no time is asserted).
    await rig.page.waitForURL(`${rig.service.url}/studies/${rig.studyId}`, { timeout: 300_000 });
    expect((await waitForStatus(rig.service, runId)).status).toBe('done');
    // The demo coast has eleven invented communities (data-demo/demo.study.json).
    await expect.poll(() => rig.page.locator('table.ranking tbody tr').count()).toBe(11);
    await rig.page.screenshot({ path: join(ARTIFACTS, 'access-overview.png'), fullPage: true });
  }, 320_000);

  test('ending the access clears the cookie; the next form post goes to the access page again', async () => {
    await rig.page.goto(`${rig.service.url}/access`);
    expect(await rig.page.locator('p.notice').first().textContent()).toContain(
      en.t('access.granted'),
    );
    await rig.page.getByRole('button', { name: en.t('access.end') }).click();
    await rig.page.waitForURL(`${rig.service.url}/access?why=ended`);
    expect((await rig.context.cookies()).map((c) => c.name)).not.toContain(ACCESS_COOKIE);
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}`);
    await rig.page.getByRole('button', { name: en.t('overview.screenAgain') }).click();
    await rig.page.waitForURL(/\/access\?/);
    expect(rig.foreignRequests).toEqual([]);
  });
});

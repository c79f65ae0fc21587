import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { ACCESS_COOKIE } from '../../api/service/page-access.ts';
import { translator } from '../../web/text/translator.ts';
import { demoStudyId, getRun, waitForStatus } from '../service/helpers/runs.ts';
import { startService, tempDir, type ServiceProcess } from '../service/helpers/service-process.ts';
import {
  ARTIFACTS,
  launchChromium,
  offlineContext,
  seriousAxeViolations,
  walkWithTab,
  type LaunchedBrowser,
} from './helpers/chromium.ts';

/**
 * A service on a shared office machine has TREMORA_TOKEN: in Chromium, a user who presses
 * "Screen this study" is sent to the access page, enters the token once, and screens the demo
 * from the overview. The service listens on loopback here (a token there is allowed, and
 * harmless); every request stays on its origin.
 */
const TOKEN = 'office-token-for-the-browser-test';
const dir = tempDir('tremora-access-browser-');
const en = translator('en');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let context: BrowserContext;
let foreignRequests: string[];
let page: Page;
let demoId: string;

beforeAll(async () => {
  service = await startService({
    databasePath: join(dir.path, 'access.db'),
    env: { HOST: '127.0.0.1', TREMORA_TOKEN: TOKEN },
  });
  demoId = await demoStudyId(service);
  chromium = await launchChromium();
  ({ context, foreignRequests } = await offlineContext(chromium.browser, service.url));
  page = await context.newPage();
});

afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await service?.stop();
  dir.remove();
});

describe('page forms on a service with a token', { timeout: 120_000 }, () => {
  test('a form post without access leads to the access page, which says why', async () => {
    await page.goto(`${service.url}/studies/${demoId}`);
    await page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await page.waitForURL(/\/access\?/);
    const url = new URL(page.url());
    expect(url.pathname).toBe('/access');
    expect(url.searchParams.get('back')).toBe(`/studies/${demoId}`);
    expect(url.searchParams.get('why')).toBe('needed');
    expect(await page.locator('p.notice').textContent()).toBe(en.t('access.needed'));
    const violations = await seriousAxeViolations(page);
    expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
    const walk = await walkWithTab(page);
    expect(walk.missed).toEqual([]);
    expect(walk.invisibleFocus).toEqual([]);
  });

  test('a wrong token is refused on the page', async () => {
    await page.getByLabel(en.t('access.token')).fill('not-the-office-token-000');
    await page.getByRole('button', { name: en.t('access.enter') }).click();
    await expect
      .poll(() => page.locator('#access-token-problem').textContent())
      .toBe(en.t('access.wrong'));
    expect((await context.cookies()).map((c) => c.name)).not.toContain(ACCESS_COOKIE);
  });

  test('the right token gives a cookie that is not the token and returns to the overview', async () => {
    await page.getByLabel(en.t('access.token')).fill(TOKEN);
    await page.getByRole('button', { name: en.t('access.enter') }).click();
    await page.waitForURL(`${service.url}/studies/${demoId}`);
    const cookie = (await context.cookies()).find((c) => c.name === ACCESS_COOKIE);
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
    await page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await page.waitForURL(/\/runs\//);
    const runId = new URL(page.url()).pathname.split('/').at(-1) as string;
    expect((await getRun(service, runId)).studyId).toBe(demoId);
    // The page's script moves to the overview once the run is done (no time is asserted).
    await page.waitForURL(`${service.url}/studies/${demoId}`, { timeout: 300_000 });
    expect((await waitForStatus(service, runId)).status).toBe('done');
    // The demo coast has eleven invented communities (data-demo/demo.study.json).
    await expect.poll(() => page.locator('table.ranking tbody tr').count()).toBe(11);
    await page.screenshot({ path: join(ARTIFACTS, 'access-overview.png'), fullPage: true });
  }, 320_000);

  test('ending the access clears the cookie; the next form post goes to the access page again', async () => {
    await page.goto(`${service.url}/access`);
    expect(await page.locator('p.notice').first().textContent()).toContain(en.t('access.granted'));
    await page.getByRole('button', { name: en.t('access.end') }).click();
    await page.waitForURL(`${service.url}/access?why=ended`);
    expect((await context.cookies()).map((c) => c.name)).not.toContain(ACCESS_COOKIE);
    await page.goto(`${service.url}/studies/${demoId}`);
    await page.getByRole('button', { name: en.t('overview.screenAgain') }).click();
    await page.waitForURL(/\/access\?/);
    expect(foreignRequests).toEqual([]);
  });
});

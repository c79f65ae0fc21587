import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { TsunamiResult } from '../../api/engine/tsunami/index.ts';
import { translator } from '../../web/text/translator.ts';
import { demoStudyId } from '../service/helpers/runs.ts';
import { ARTIFACTS, offlineContext, seriousAxeViolations } from './helpers/chromium.ts';
import { browserService, screenStudy } from './helpers/browser-service.ts';

/**
 * The tsunami time to act on the demo coast in Chromium, at a desktop and a phone width: the
 * overview's ranking, a coastal village's page and handout, and the scenario's times. Each view
 * is checked with axe-core, no part of its tsunami section may be wider than the window, and
 * no request may leave the service's origin. Screenshots go to test-artifacts/tsunami-*.png.
 */
let times: TsunamiResult;
const rig = browserService({
  tempPrefix: 'tremora-tsunami-browser-',
  database: 'tsunami.db',
  prepare: async (service) => {
    const demoId = await demoStudyId(service);
    await screenStudy(service, demoId);
    times = (await (await service.fetch(`/api/studies/${demoId}/tsunami`)).json()) as TsunamiResult;
    return demoId;
  },
  context: false,
  setupTimeoutMs: 300_000,
});

/** Each view waits on the service and Chromium on a shared 2-core machine: a generous limit, no time asserted. */
const VIEW_TIMEOUT_MS = 180_000;

const WIDTHS = [
  { name: 'desktop', viewport: { width: 1100, height: 900 } },
  { name: 'phone', viewport: { width: 390, height: 844 } },
] as const;

describe.each(WIDTHS)('tsunami time to act at $name width', ({ name, viewport }) => {
  let context: BrowserContext;
  let foreignRequests: string[];
  let page: Page;

  beforeAll(async () => {
    ({ context, foreignRequests } = await offlineContext(rig.chromium.browser, rig.service.url, {
      viewport,
    }));
    page = await context.newPage();
  });
  afterAll(async () => context?.close());

  /** The tsunami section (`section`) is checked, shot alone and in the whole page. */
  async function check(view: string, section: string): Promise<void> {
    expect(await seriousAxeViolations(page), `${view}: serious axe-core violations`).toEqual([]);
    const selector = JSON.stringify(`${section}, ${section} *`);
    const wide = (await page.evaluate(
      // A table's header row hidden for screen readers on a phone (clipped to nothing) is not drawn.
      `[...document.querySelectorAll(${selector})].filter((el) => !el.closest('thead') || getComputedStyle(el.closest('thead')).clipPath === 'none').filter((el) => el.getBoundingClientRect().right > document.documentElement.clientWidth + 1).map((el) => el.tagName + '.' + el.className)`,
    )) as string[];
    expect(wide, `${view}: parts of the tsunami section wider than the window`).toEqual([]);
    await page
      .locator(section)
      .first()
      .screenshot({ path: join(ARTIFACTS, `tsunami-${view}-${name}-section.png`) });
    await page.screenshot({ path: join(ARTIFACTS, `tsunami-${view}-${name}.png`), fullPage: true });
    expect(foreignRequests).toEqual([]);
  }

  test(
    'the overview ranks the coastal villages by time to act',
    async () => {
      await page.goto(`${rig.service.url}/studies/${rig.studyId}`);
      const rows = page.locator('#tsunami-ranking tbody tr');
      expect(await rows.count()).toBe(times.communities.length);
      const minutes = await rows.evaluateAll((trs) =>
        trs.map((tr) => Number(tr.getAttribute('data-first-arrival-minutes'))),
      );
      expect(minutes).toEqual([...minutes].sort((a, b) => a - b));
      await check('overview', '.tsunami-ranking');
    },
    VIEW_TIMEOUT_MS,
  );

  test(
    "a coastal village's page and handout say the time in plain words",
    async () => {
      const quillan = times.communities.find((c) => c.id === 'quillan-landing');
      await page.goto(`${rig.service.url}/studies/${rig.studyId}/communities/quillan-landing`);
      await expect(page.locator('.tsunami-sentence').textContent()).resolves.toContain(
        `could reach this coast in about ${quillan?.firstArrivalMinutes} to ${quillan?.latestMinutes} minutes`,
      );
      await expect(page.locator('.tsunami-time .tsunami-caution').isVisible()).resolves.toBe(true);
      await check('community', '.tsunami-time');
      await page.goto(
        `${rig.service.url}/studies/${rig.studyId}/communities/quillan-landing/handout`,
      );
      await expect(page.locator('.tsunami-sentence').textContent()).resolves.toMatch(
        /could reach this coast in about \d+ to \d+ minutes/,
      );
      await check('handout', '.tsunami-time');
    },
    VIEW_TIMEOUT_MS,
  );

  test(
    'the scenario on the interface gives the times of its rupture',
    async () => {
      await page.goto(`${rig.service.url}/studies/${rig.studyId}/scenario?sourceId=orle-interface`);
      await page.getByRole('button', { name: translator('en').t('scenario.run') }).click();
      await page.waitForSelector('#tsunami-scenario', { timeout: 120_000 });
      expect(await page.locator('#tsunami-scenario tbody tr').count()).toBe(
        times.communities.length,
      );
      await check('scenario', '.tsunami-scenario');
    },
    VIEW_TIMEOUT_MS,
  );
});

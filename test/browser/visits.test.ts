import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { DEMO_STUDY_URL } from '../../api/operations/demo-seed.ts';
import { startRun, waitForStatus } from '../service/helpers/runs.ts';
import {
  jsonInit,
  startService,
  tempDir,
  type ServiceProcess,
} from '../service/helpers/service-process.ts';
import {
  ARTIFACTS,
  launchChromium,
  offlineContext,
  seriousAxeViolations,
  type LaunchedBrowser,
} from './helpers/chromium.ts';

/**
 * Recording a visit and planning a trip in Chromium, on a cut-down demo (three villages, PGA
 * only) so the screening is quick; screenshots at desktop and 390 px phone widths go to
 * test-artifacts/.
 */
const dir = tempDir('tremora-visits-browser-');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let context: BrowserContext;
let foreignRequests: string[];
let page: Page;
let id: string;

beforeAll(async () => {
  service = await startService({ databasePath: join(dir.path, 'visits.db') });
  const demo = JSON.parse(readFileSync(DEMO_STUDY_URL, 'utf8')) as Record<string, any>;
  const { terrain: _terrain, ...rest } = demo;
  const study = {
    ...rest,
    name: 'Demo coast, visits',
    communities: demo.communities.filter((c: { id: string }) =>
      ['harbour-point', 'vennick-bay', 'lisk-head'].includes(c.id),
    ),
    sources: {
      type: 'FeatureCollection',
      features: demo.sources.features.filter(
        (f: { properties: { id: string } }) => f.properties.id === 'orle-interface',
      ),
    },
    settings: { ...demo.settings, measures: ['PGA'], magnitudeStep: 0.5, horizonsYears: [50] },
  };
  const created = await service.fetch('/api/studies', jsonInit('POST', study));
  expect(created.status, await created.clone().text()).toBe(201);
  id = ((await created.json()) as { id: string }).id;
  const run = await startRun(service, id);
  expect((await waitForStatus(service, run.id)).status).toBe('done');
  chromium = await launchChromium();
  ({ context, foreignRequests } = await offlineContext(chromium.browser, service.url));
  page = await context.newPage();
}, 180_000);

afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await service?.stop();
  dir.remove();
});

/** Full-page screenshots at the desktop width and at 390 px; no sideways scrolling at 390 px is reported, not asserted (phones come later). */
async function shoot(name: string): Promise<void> {
  await page.setViewportSize({ width: 1100, height: 900 });
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`), fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: join(ARTIFACTS, `${name}-390.png`), fullPage: true });
  await page.setViewportSize({ width: 1100, height: 900 });
}

describe('visits in a browser', { timeout: 120_000 }, () => {
  test('a planner records a visit, plans a trip from the visit priority, then deletes the visit', async () => {
    await page.goto(`${service.url}/studies/${id}/communities/lisk-head`);
    await page.getByRole('link', { name: 'Record a visit' }).click();
    await page.getByLabel('Date of the visit').fill('2026-04-09');
    await page.getByLabel('Language used').fill('English');
    await page.getByLabel('People reached').fill('31');
    await page.getByLabel('Topics').fill('What to do during shaking');
    await page.getByLabel('Follow-ups').fill('Bring posters for the school');
    await page
      .getByLabel('Referral for a professional assessment')
      .selectOption({ label: 'requested' });
    expect(await seriousAxeViolations(page)).toEqual([]);
    await shoot('visit-form');
    await page.getByRole('button', { name: 'Save the visit' }).click();
    const visits = page.locator('.visit-records table');
    await expect.poll(() => visits.textContent()).toContain('Bring posters for the school');
    expect(await visits.textContent()).toContain('requested');

    await page.goto(`${service.url}/studies/${id}#priority-heading`);
    const table = page.locator('table.priority-table');
    expect(
      await table.locator('tr[data-community="lisk-head"] [data-key="visits"]').textContent(),
    ).toBe('1');
    await shoot('visit-priority');
    for (const name of ['Harbour Point', 'Vennick Bay', 'Lisk Head'])
      await page.getByLabel(`Add ${name} to the trip`).check();
    await page.getByLabel('Start from').selectOption({ label: 'Lisk Head' });
    await page.getByLabel('Come back to the start').check();
    await page.getByRole('button', { name: 'Plan a trip with the chosen villages' }).click();
    const stops = page.locator('table.trip-table tbody tr[data-community]');
    expect(await stops.count()).toBe(3);
    expect(await stops.first().getAttribute('data-community')).toBe('lisk-head');
    expect(await page.locator('.trip-total').textContent()).toMatch(/\d km$/);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await shoot('trip-plan');
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.site-header').isVisible()).toBe(false);
    expect(await page.locator('table.trip-table').isVisible()).toBe(true);
    await page.screenshot({ path: join(ARTIFACTS, 'trip-plan-print.png'), fullPage: true });
    await page.emulateMedia({ media: 'screen' });

    await page.goto(`${service.url}/studies/${id}/communities/lisk-head`);
    await page.getByRole('link', { name: /^Delete the visit of / }).click();
    expect(await page.locator('h1').textContent()).toMatch(/^Delete the visit to Lisk Head of /);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await shoot('visit-delete');
    await page.getByRole('button', { name: 'Delete this visit' }).click();
    await page.waitForURL(/\/communities\/lisk-head(#visits-heading)?$/);
    expect(await page.locator('.visit-records').textContent()).toContain(
      'No visit has been recorded here yet.',
    );
    expect(foreignRequests).toEqual([]);
  });
});

import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { translator } from '../../web/text/translator.ts';
import { startService, tempDir, type ServiceProcess } from '../service/helpers/service-process.ts';
import {
  ARTIFACTS,
  launchChromium,
  offlineContext,
  seriousAxeViolations,
  type LaunchedBrowser,
} from './helpers/chromium.ts';

/**
 * A new study from nothing in Chromium: "Start a new study" with a small village CSV, the
 * editor saying a source is missing, a fault added from typed "lat, lon" coordinates, then a
 * screening, ending on the overview with every village banded. Screenshots at desktop width and
 * at 390 px.
 */
const dir = tempDir('tremora-new-study-');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let context: BrowserContext;
let page: Page;
const en = translator('en');

// Two invented villages in the open-ocean demo region, with the spreadsheet header people use.
const VILLAGES_CSV =
  'Name,Latitude,Longitude,Site class,Population\nTest Cove,-47.40,-140.20,C,120\nFar Reef,-47.55,-140.45,D,60\n';

beforeAll(async () => {
  service = await startService({ databasePath: join(dir.path, 'new-study.db') });
  chromium = await launchChromium();
  ({ context } = await offlineContext(chromium.browser, service.url, { javaScriptEnabled: true }));
  page = await context.newPage();
});

afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await service?.stop();
  dir.remove();
});

describe('a new study from the pages', { timeout: 400_000 }, () => {
  test('village CSV, then a fault by typed coordinates, then a screened study', async () => {
    await page.goto(`${service.url}/`);
    await page.getByRole('link', { name: en.t('home.new') }).click();
    await page.waitForURL(`${service.url}/studies/new`);
    await page.fill('#study-name', 'Reef villages');
    await page.setInputFiles('#communities-file', {
      name: 'villages.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(VILLAGES_CSV),
    });
    await page.screenshot({ path: join(ARTIFACTS, 'new-study.png'), fullPage: true });
    await page.getByRole('button', { name: en.t('newStudy.button') }).click();
    await page.waitForURL(/\/studies\/[^/]+\/edit$/);
    const studyUrl = page.url().replace(/\/edit$/, '');
    expect(
      await page
        .locator('[data-missing]')
        .evaluateAll((l) => l.map((e) => e.getAttribute('data-missing'))),
    ).toEqual(['sources']);
    expect(await page.locator('tr[data-community]').count()).toBe(2);

    await page.getByRole('link', { name: en.t('source.add') }).click();
    await page.waitForURL(/\/edit\/new-source$/);
    await page.selectOption('#source-kind', 'fault');
    await page.fill('#source-coordinates', '-47.30, -140.35\n-47.60, -140.15');
    await page.fill('#source-id', 'reef-fault');
    await page.fill('#source-name', 'Reef Fault');
    await page.selectOption('#source-setting', 'crustal');
    await page.selectOption('#source-mechanism', 'strike-slip');
    await page.fill('#source-dip', '80');
    await page.fill('#source-lowerDepthKm', '15');
    await page.selectOption('#source-recurrence-type', 'gutenberg-richter');
    await page.fill('#source-recurrence-bValue', '1');
    await page.fill('#source-recurrence-mMin', '5');
    await page.fill('#source-recurrence-mMax', '7');
    await page.fill('#source-recurrence-rate', '0.02');
    await page.screenshot({ path: join(ARTIFACTS, 'new-source.png'), fullPage: true });
    const violations = await seriousAxeViolations(page);
    expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
    await page.getByRole('button', { name: en.t('source.save') }).click();
    await page.waitForURL(/\/edit\?saved=1/);
    expect(await page.locator('[data-missing]').count()).toBe(0);
    expect(await page.locator('tr[data-source="reef-fault"]').count()).toBe(1);
    expect(await page.locator('.editor-preview svg').count()).toBe(1);
    await page.screenshot({ path: join(ARTIFACTS, 'editor-with-fault.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: join(ARTIFACTS, 'editor-with-fault-390.png'), fullPage: true });
    await page.setViewportSize({ width: 1280, height: 900 });

    await page.goto(studyUrl);
    await page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await page.waitForURL(/\/runs\//);
    await page.waitForURL(studyUrl, { timeout: 300_000 });
    expect(await page.locator('tr[data-community] [data-band]').count()).toBe(2);
    await page.screenshot({ path: join(ARTIFACTS, 'new-study-screened.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.screenshot({ path: join(ARTIFACTS, 'new-study-screened-390.png'), fullPage: true });
  });
});

import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startService, tempDir, type ServiceProcess } from '../service/helpers/service-process.ts';
import { demoStudyId } from '../service/helpers/runs.ts';
import { faultShapefileZip } from '../study/fault-files/fixtures.ts';
import {
  ARTIFACTS,
  launchChromium,
  offlineContext,
  type LaunchedBrowser,
} from './helpers/chromium.ts';

/**
 * Faults from a zipped shapefile into the demo study from the editor in Chromium: the file is
 * shown with its guessed mapping and the one default it lacks (the largest magnitude) before
 * anything is saved; once given, the two faults are added beside the demo's own sources. The
 * shapefile is made by the test (test/study/fault-files/fixtures.ts); its faults are invented.
 */
const dir = tempDir('tremora-fault-import-');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let demoId: string;
let context: BrowserContext;
let page: Page;

const sourceIds = async (): Promise<string[]> =>
  (
    JSON.parse(await (await service.fetch(`/api/studies/${demoId}/document`)).text()) as {
      sources: { features: { properties: { id: string } }[] };
    }
  ).sources.features.map((f) => f.properties.id);

beforeAll(async () => {
  service = await startService({ databasePath: join(dir.path, 'faults.db') });
  demoId = await demoStudyId(service);
  chromium = await launchChromium();
  ({ context } = await offlineContext(chromium.browser, service.url, {
    viewport: { width: 1280, height: 900 },
  }));
  page = await context.newPage();
});

afterAll(async () => {
  await context?.close();
  await chromium?.close();
  await service?.stop();
  dir.remove();
});

describe('faults from a regional file', { timeout: 120_000 }, () => {
  test('the file is shown before anything is saved, then its faults join the sources', async () => {
    const before = await sourceIds();
    await page.goto(`${service.url}/studies/${demoId}/edit`);
    await page.getByRole('link', { name: 'Add faults from a regional file' }).click();
    await page.setInputFiles('#faults-file', {
      name: 'faults.zip',
      mimeType: 'application/zip',
      buffer: Buffer.from(faultShapefileZip()),
    });
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.waitForSelector('#default-mMax-problem');
    expect(await page.locator('#map-slipRateMmYr').inputValue()).toBe('SLIP_RATE');
    expect(await sourceIds()).toEqual(before);
    for (const width of [1280, 390]) {
      await page.setViewportSize({ width, height: 900 });
      await page.screenshot({ path: join(ARTIFACTS, `fault-import-${width}.png`), fullPage: true });
    }
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.fill('#default-mMax', '7');
    await page.getByRole('button', { name: 'Add the 2 faults' }).click();
    await page.waitForURL(/\/edit\?saved=1(#|$)/);
    expect(await sourceIds()).toEqual([...before, 'kessin-ridge-fault', 'marrow-flats-fault']);
  });
});

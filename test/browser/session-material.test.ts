import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { cutDownDemo } from '../web/helpers/cut-down-demo.ts';
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
  pdfPageCount,
  seriousAxeViolations,
  type LaunchedBrowser,
} from './helpers/chromium.ts';

/**
 * The handout and the A3 poster in Chromium, on a cut-down demo (two villages, the interface
 * and two crustal faults, PGA only) so the screening is quick: screenshots at 1280 px, at
 * 390 px and as printed go to test-artifacts/.
 */
const dir = tempDir('tremora-material-browser-');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let context: BrowserContext;
let foreignRequests: string[];
let page: Page;
let id: string;
const SOURCES = ['orle-interface', 'vennick-fault', 'pellow-thrust'];

/** A3 at the 96 px per inch of CSS: 297 × 420 mm. */
const A3_PX = { width: Math.round((297 / 25.4) * 96), height: Math.round((420 / 25.4) * 96) };

beforeAll(async () => {
  service = await startService({ databasePath: join(dir.path, 'material.db') });
  const study = cutDownDemo('Demo coast, material', ['harbour-point', 'vennick-bay'], SOURCES);
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

/** True when the page is no wider than the window (no sideways scrolling). */
const fitsWidth = () =>
  page.evaluate('document.documentElement.scrollWidth <= document.documentElement.clientWidth');

/** Full-page screenshots at 1280 px and 390 px, each checked for sideways scrolling. */
async function shootScreens(name: string): Promise<void> {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: 900 });
    expect(await fitsWidth(), `${name} at ${width} px`).toBe(true);
    await page.screenshot({ path: join(ARTIFACTS, `${name}-${width}.png`), fullPage: true });
  }
}

/** The page as printed on paper `width` px wide: print media, one tall screenshot. */
async function shootPrint(name: string, width: number): Promise<void> {
  await page.emulateMedia({ media: 'print' });
  await page.setViewportSize({ width, height: 900 });
  expect(await fitsWidth(), `${name} printed`).toBe(true);
  await page.setViewportSize({
    width,
    height: Number(await page.evaluate('document.documentElement.scrollHeight')),
  });
  await page.screenshot({ path: join(ARTIFACTS, `${name}-print.png`) });
  // Back to no emulation: a later page.pdf() then prints with print media, as a browser does
  // (an emulated 'screen' would carry over and print the screen layout).
  await page.emulateMedia({ media: null });
}

describe('session material in a browser', { timeout: 120_000 }, () => {
  test('the handout: map, picture strip, no band; screen, phone and print', async () => {
    await page.goto(`${service.url}/studies/${id}/communities/harbour-point/handout`);
    expect(await page.locator('.band-line, .band-swatch').count()).toBe(0);
    expect(await page.locator('.village-map svg.map').count()).toBe(1);
    expect(await page.locator('.picture-strip > li').count()).toBe(5);
    await shootScreens('handout');
    for (const format of ['A4', 'Letter'] as const)
      expect(pdfPageCount(await page.pdf({ format })), format).toBeLessThanOrEqual(2);
    await shootPrint('handout', 794);
    await page.setViewportSize({ width: 1280, height: 900 });
    expect(await seriousAxeViolations(page)).toEqual([]);
  });

  test('the poster: one A3 page, from the community page; screen, phone and A3 print', async () => {
    await page.goto(`${service.url}/studies/${id}/communities/vennick-bay`);
    await page.getByRole('link', { name: 'Print the poster (A3)' }).click();
    await page.waitForURL(/\/poster$/);
    expect(await page.locator('h1').textContent()).toBe('Vennick Bay: earthquakes and what to do');
    await shootScreens('poster');
    // preferCSSPageSize: the sheet is what the poster's @page asks for, A3 upright.
    await page.setViewportSize(A3_PX);
    const pdf = await page.pdf({ preferCSSPageSize: true, path: join(ARTIFACTS, 'poster-A3.pdf') });
    expect(pdfPageCount(pdf)).toBe(1);
    const mediaBox = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(pdf.toString('latin1'));
    // A3 in PostScript points (1/72 in): 841.89 × 1190.55, to a point.
    expect(Math.abs(Number(mediaBox?.[1]) - 841.89)).toBeLessThan(1);
    expect(Math.abs(Number(mediaBox?.[2]) - 1190.55)).toBeLessThan(1);
    await shootPrint('poster', A3_PX.width);
    await page.setViewportSize({ width: 1280, height: 900 });
    expect(await seriousAxeViolations(page)).toEqual([]);
    expect(foreignRequests).toEqual([]);
  });
});

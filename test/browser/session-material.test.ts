import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { cutDownDemo } from '../web/helpers/cut-down-demo.ts';
import { ARTIFACTS, pdfPageCount, seriousAxeViolations } from './helpers/chromium.ts';
import { browserService, saveStudy, screenStudy } from './helpers/browser-service.ts';

/**
 * The handout and the A3 poster in Chromium, on a cut-down demo (two villages, the interface
 * and two crustal faults, PGA only) so the screening is quick: screenshots at 1280 px, at
 * 390 px and as printed go to test-artifacts/.
 */
const SOURCES = ['orle-interface', 'vennick-fault', 'pellow-thrust'];

/** A3 at the 96 px per inch of CSS: 297 × 420 mm. */
const A3_PX = { width: Math.round((297 / 25.4) * 96), height: Math.round((420 / 25.4) * 96) };

const rig = browserService({
  tempPrefix: 'tremora-material-browser-',
  database: 'material.db',
  prepare: async (service) => {
    const study = cutDownDemo('Demo coast, material', ['harbour-point', 'vennick-bay'], SOURCES);
    const id = await saveStudy(service, study);
    await screenStudy(service, id);
    return id;
  },
  setupTimeoutMs: 180_000,
});

/** True when the page is no wider than the window (no sideways scrolling). */
const fitsWidth = () =>
  rig.page.evaluate('document.documentElement.scrollWidth <= document.documentElement.clientWidth');

/** Full-page screenshots at 1280 px and 390 px, each checked for sideways scrolling. */
async function shootScreens(name: string): Promise<void> {
  for (const width of [1280, 390]) {
    await rig.page.setViewportSize({ width, height: 900 });
    expect(await fitsWidth(), `${name} at ${width} px`).toBe(true);
    await rig.page.screenshot({ path: join(ARTIFACTS, `${name}-${width}.png`), fullPage: true });
  }
}

/** The page as printed on paper `width` px wide: print media, one tall screenshot. */
async function shootPrint(name: string, width: number): Promise<void> {
  await rig.page.emulateMedia({ media: 'print' });
  await rig.page.setViewportSize({ width, height: 900 });
  expect(await fitsWidth(), `${name} printed`).toBe(true);
  await rig.page.setViewportSize({
    width,
    height: Number(await rig.page.evaluate('document.documentElement.scrollHeight')),
  });
  await rig.page.screenshot({ path: join(ARTIFACTS, `${name}-print.png`) });
  // Back to no emulation: a later rig.page.pdf() then prints with print media, as a browser does
  // (an emulated 'screen' would carry over and print the screen layout).
  await rig.page.emulateMedia({ media: null });
}

describe('session material in a browser', { timeout: 120_000 }, () => {
  test('the handout: map, picture strip, no band; screen, phone and print', async () => {
    await rig.page.goto(
      `${rig.service.url}/studies/${rig.studyId}/communities/harbour-point/handout`,
    );
    expect(await rig.page.locator('.band-line, .band-swatch').count()).toBe(0);
    expect(await rig.page.locator('.village-map svg.map').count()).toBe(1);
    expect(await rig.page.locator('.picture-strip > li').count()).toBe(5);
    await shootScreens('handout');
    for (const format of ['A4', 'Letter'] as const)
      expect(pdfPageCount(await rig.page.pdf({ format })), format).toBeLessThanOrEqual(2);
    await shootPrint('handout', 794);
    await rig.page.setViewportSize({ width: 1280, height: 900 });
    expect(await seriousAxeViolations(rig.page)).toEqual([]);
  });

  test('the poster: one A3 page, from the community page; screen, phone and A3 print', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/communities/vennick-bay`);
    await rig.page.getByRole('link', { name: 'Print the poster (A3)' }).click();
    await rig.page.waitForURL(/\/poster$/);
    expect(await rig.page.locator('h1').textContent()).toBe(
      'Vennick Bay: earthquakes and what to do',
    );
    await shootScreens('poster');
    // preferCSSPageSize: the sheet is what the poster's @page asks for, A3 upright.
    await rig.page.setViewportSize(A3_PX);
    const pdf = await rig.page.pdf({
      preferCSSPageSize: true,
      path: join(ARTIFACTS, 'poster-A3.pdf'),
    });
    expect(pdfPageCount(pdf)).toBe(1);
    const mediaBox = /\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/.exec(pdf.toString('latin1'));
    // A3 in PostScript points (1/72 in): 841.89 × 1190.55, to a point.
    expect(Math.abs(Number(mediaBox?.[1]) - 841.89)).toBeLessThan(1);
    expect(Math.abs(Number(mediaBox?.[2]) - 1190.55)).toBeLessThan(1);
    await shootPrint('poster', A3_PX.width);
    await rig.page.setViewportSize({ width: 1280, height: 900 });
    expect(await seriousAxeViolations(rig.page)).toEqual([]);
    expect(rig.foreignRequests).toEqual([]);
  });
});

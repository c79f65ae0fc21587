import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { xlsxBytes } from '../study/community-files/fixtures.ts';
import { ARTIFACTS, offlineContext, seriousAxeViolations } from './helpers/chromium.ts';
import { browserService, sendFile } from './helpers/browser-service.ts';

/**
 * A village workbook into the demo study from the editor in Chromium, at desktop and phone
 * widths: its position columns are not recognised by name, so the page asks for them from the
 * file's own columns, keeps the file, and saves once they are chosen. The workbook is made by
 * the test (fixtures.ts); its places are invented, off the demo coast.
 */
const rig = browserService({
  tempPrefix: 'tremora-community-import-',
  database: 'import.db',
  context: false,
});

const WORKBOOK = xlsxBytes([
  ['Village', 'Pos S', 'Pos W', 'Site class', 'Clinic'],
  ['Kelp Landing', `47°18'S`, `150°54'W`, 'D', 'nurse visits monthly'],
  ['Upper Terrace', -47.35, -150.7, 'C', null],
]);

const document = async (): Promise<string> =>
  (await rig.service.fetch(`/api/studies/${rig.studyId}/document`)).text();

for (const width of [1100, 390]) {
  describe(`a village workbook at ${width} px`, { timeout: 120_000 }, () => {
    let context: BrowserContext;
    let foreign: string[];
    let page: Page;

    beforeAll(async () => {
      ({ context, foreignRequests: foreign } = await offlineContext(
        rig.chromium.browser,
        rig.service.url,
        {
          viewport: { width, height: 900 },
        },
      ));
      page = await context.newPage();
    });
    afterAll(async () => {
      await context.close();
    });

    test("unrecognised columns are picked from the file's own, then the villages are saved", async () => {
      const before = await document();
      await page.goto(`${rig.service.url}/studies/${rig.studyId}/edit`);
      await sendFile(page, 'communities', {
        name: 'villages.xlsx',
        mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
        text: WORKBOOK,
      });
      await page.waitForSelector('#pick-lat');
      expect(await document()).toBe(before);
      expect(await page.locator('#pick-lat option').allTextContents()).toEqual([
        '(choose a column)',
        'Village',
        'Pos S',
        'Pos W',
        'Site class',
        'Clinic',
      ]);
      await page.selectOption('#pick-lat', 'Pos S');
      await page.selectOption('#pick-lon', 'Pos W');
      await page.locator('#pick-lat').scrollIntoViewIfNeeded();
      await page.screenshot({
        path: join(ARTIFACTS, `community-import-pick-${width}.png`),
        fullPage: false,
      });
      const violations = await seriousAxeViolations(page);
      expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
      await page.locator('form.column-pick button[type="submit"]').click();
      await page.waitForURL(/\/edit\?saved=1(#|$)/);
      const csv = JSON.parse(await (await rig.service.fetch(`/api/studies/${rig.studyId}`)).text())
        .communitiesCsv as string;
      // 47°18'S = -47.3 and 150°54'W = -150.9 (degrees + minutes/60).
      expect(csv.split('\n').slice(0, 3)).toEqual([
        'id,name,lon,lat,vs30,siteClass,population,coastal,elevationM,Clinic',
        'kelp-landing,Kelp Landing,-150.9,-47.3,,D,,false,,nurse visits monthly',
        'upper-terrace,Upper Terrace,-150.7,-47.35,,C,,false,,',
      ]);
      expect(
        await page
          .locator('tr[data-community]')
          .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-community'))),
      ).toEqual(['kelp-landing', 'upper-terrace']);
    });

    test('no request left the origin', () => {
      expect(foreign).toEqual([]);
    });
  });
}

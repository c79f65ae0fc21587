import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { xlsxBytes } from '../study/community-files/fixtures.ts';
import { ARTIFACTS, seriousAxeViolations } from './helpers/chromium.ts';
import { browserService, describeContext, sendFile } from './helpers/browser-service.ts';

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

for (const width of [1100, 390]) {
  describe(`a village workbook at ${width} px`, { timeout: 120_000 }, () => {
    const own = describeContext(rig, {
      viewport: { width, height: 900 },
    });

    test("unrecognised columns are picked from the file's own, then the villages are saved", async () => {
      const before = await rig.document();
      await own.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit`);
      await sendFile(own.page, 'communities', {
        name: 'villages.xlsx',
        mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
        text: WORKBOOK,
      });
      await own.page.waitForSelector('#pick-lat');
      expect(await rig.document()).toBe(before);
      expect(await own.page.locator('#pick-lat option').allTextContents()).toEqual([
        '(choose a column)',
        'Village',
        'Pos S',
        'Pos W',
        'Site class',
        'Clinic',
      ]);
      await own.page.selectOption('#pick-lat', 'Pos S');
      await own.page.selectOption('#pick-lon', 'Pos W');
      await own.page.locator('#pick-lat').scrollIntoViewIfNeeded();
      await own.page.screenshot({
        path: join(ARTIFACTS, `community-import-pick-${width}.png`),
        fullPage: false,
      });
      const violations = await seriousAxeViolations(own.page);
      expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
      await own.page.locator('form.column-pick button[type="submit"]').click();
      await own.page.waitForURL(/\/edit\?saved=1(#|$)/);
      const csv = JSON.parse(await (await rig.service.fetch(`/api/studies/${rig.studyId}`)).text())
        .communitiesCsv as string;
      // 47°18'S = -47.3 and 150°54'W = -150.9 (degrees + minutes/60).
      expect(csv.split('\n').slice(0, 3)).toEqual([
        'id,name,lon,lat,vs30,siteClass,population,coastal,elevationM,Clinic',
        'kelp-landing,Kelp Landing,-150.9,-47.3,,D,,false,,nurse visits monthly',
        'upper-terrace,Upper Terrace,-150.7,-47.35,,C,,false,,',
      ]);
      expect(
        await own.page
          .locator('tr[data-community]')
          .evaluateAll((rows) => rows.map((r) => r.getAttribute('data-community'))),
      ).toEqual(['kelp-landing', 'upper-terrace']);
    });

    test('no request left the origin', () => {
      expect(own.foreignRequests).toEqual([]);
    });
  });
}

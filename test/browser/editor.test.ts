import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { translator } from '../../web/text/translator.ts';
import { ARTIFACTS, seriousAxeViolations, walkWithTab } from './helpers/chromium.ts';
import { browserService, describeContext, sendFile } from './helpers/browser-service.ts';
import { validStudy } from '../study/fixtures.ts';

/**
 * The study editor in Chromium, with and without script: uploads that do not validate show
 * their problems next to the upload (and save nothing); a community form shows each problem
 * under its field; a valid change is saved.
 */
const rig = browserService({
  tempPrefix: 'tremora-editor-',
  database: 'editor.db',
  context: false,
});
const en = translator('en');

/** A GeoJSON collection of one fault, the validation fixture's first, dipping 120°: beyond the 0–90° a dip can have. */
const [fault] = validStudy().sources.features;
const BROKEN_GEOJSON = JSON.stringify({
  type: 'FeatureCollection',
  features: [{ ...fault, properties: { ...fault.properties, id: 'steep-fault', dip: 120 } }],
});

for (const javaScriptEnabled of [true, false]) {
  describe(
    `the editor ${javaScriptEnabled ? 'with' : 'without'} script`,
    { timeout: 120_000 },
    () => {
      const own = describeContext(rig, { javaScriptEnabled });

      test('a broken GeoJSON upload shows the message next to the upload and saves nothing', async () => {
        const before = await rig.document();
        await own.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit`);
        await sendFile(own.page, 'sources', {
          name: 'sources.geojson',
          mimeType: 'application/geo+json',
          text: BROKEN_GEOJSON,
        });
        await own.page.waitForSelector('#sources-problems');
        // The message sits in the same field block as the upload, and the upload points to it.
        const message = await own.page
          .locator('.field:has(#sources-file) #sources-problems')
          .textContent();
        expect(message).toBe(
          'Feature 1 (steep-fault), dip: expected a number in (0, 90] degrees, got 120',
        );
        expect(await own.page.locator('#sources-file').getAttribute('aria-describedby')).toBe(
          'sources-help sources-problems',
        );
        expect(await own.page.getByRole('alert').first().textContent()).toBe(
          en.t('editor.notSaved'),
        );
        expect(await rig.document()).toBe(before);
        if (javaScriptEnabled) {
          await own.page.screenshot({
            path: join(ARTIFACTS, 'editor-problem.png'),
            fullPage: true,
          });
          const violations = await seriousAxeViolations(own.page);
          expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
          expect((await walkWithTab(own.page)).missed).toEqual([]);
        }
      });

      test('a communities CSV with a bad line names the line, shows it, and saves nothing', async () => {
        const before = await rig.document();
        await own.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit`);
        const csv =
          'id,name,lon,lat,vs30,population,coastal,elevationM\nnew-cove,New Cove,-150.9,-47.2,420,80,true,5\nhigh-farm,High Farm,-150.1,-47.25,420,eighty,false,300\n';
        await sendFile(own.page, 'communities', {
          name: 'villages.csv',
          mimeType: 'text/csv',
          text: csv,
        });
        await own.page.waitForSelector('#communities-problems');
        expect(
          await own.page
            .locator('.field:has(#communities-file) #communities-problems li')
            .first()
            .textContent(),
        ).toMatch(/^Line 3, population: /);
        expect(
          await own.page.locator('table.csv-lines tr.line-bad').getAttribute('data-line'),
        ).toBe('3');
        expect(await rig.document()).toBe(before);
      });

      test('a community form shows the problem under its field; once fixed, it is saved', async () => {
        await own.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit/communities/drumarrow`);
        await own.page.fill('#field-lat', '-91');
        await own.page.getByRole('button', { name: en.t('editor.save') }).click();
        await own.page.waitForSelector('#field-lat-problem');
        expect(
          await own.page.locator('.field:has(#field-lat) #field-lat-problem').textContent(),
        ).toMatch(/-91/);
        expect(await own.page.locator('#field-lat').getAttribute('aria-invalid')).toBe('true');
        expect(
          JSON.parse(await rig.document()).communities.find(
            (c: { id: string }) => c.id === 'drumarrow',
          ).lat,
        ).toBe(-47.3);
        const population = javaScriptEnabled ? '96' : '97';
        await own.page.fill('#field-lat', '-47.3');
        await own.page.fill('#field-population', population);
        await own.page.getByRole('button', { name: en.t('editor.save') }).click();
        await own.page.waitForURL(/\/edit\?saved=1$/);
        expect(await own.page.getByRole('status').textContent()).toBe(en.t('editor.saved'));
        expect(
          JSON.parse(await rig.document()).communities.find(
            (c: { id: string }) => c.id === 'drumarrow',
          ).population,
        ).toBe(Number(population));
      });

      test('no request left the origin', () => {
        expect(own.foreignRequests).toEqual([]);
      });
    },
  );
}

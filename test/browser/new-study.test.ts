import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { translator } from '../../web/text/translator.ts';
import { ARTIFACTS, seriousAxeViolations } from './helpers/chromium.ts';
import { browserService } from './helpers/browser-service.ts';
import { screenshotTwoWidths } from './helpers/browser-service.ts';
import { followRunToOverview } from './helpers/run-page.ts';

/**
 * A new study from nothing in Chromium: "Start a new study" with a small village CSV, the
 * editor saying a source is missing, a fault added from typed "lat, lon" coordinates, then a
 * screening, ending on the overview with every village banded. Screenshots at desktop width and
 * at 390 px.
 */
const en = translator('en');

// Two invented villages in the open-ocean demo region, with the spreadsheet header people use.
const VILLAGES_CSV =
  'Name,Latitude,Longitude,Site class,Population\nTest Cove,-47.40,-140.20,C,120\nFar Reef,-47.55,-140.45,D,60\n';

/**
 * The fault typed into the new-source form, in the form's order (the kind and the recurrence type
 * choose which fields follow): a select is chosen, any other field typed.
 */
const NEW_FAULT: [action: 'select' | 'fill', selector: string, value: string | number][] = [
  ['select', '#source-kind', 'fault'],
  ['fill', '#source-coordinates', '-47.30, -140.35\n-47.60, -140.15'],
  ['fill', '#source-id', 'reef-fault'],
  ['fill', '#source-name', 'Reef Fault'],
  ['select', '#source-setting', 'crustal'],
  ['select', '#source-mechanism', 'strike-slip'],
  ['fill', '#source-dip', 80],
  ['fill', '#source-lowerDepthKm', 15],
  ['select', '#source-recurrence-type', 'gutenberg-richter'],
  ['fill', '#source-recurrence-bValue', 1],
  ['fill', '#source-recurrence-mMin', 5],
  ['fill', '#source-recurrence-mMax', 7],
  ['fill', '#source-recurrence-rate', 0.02],
];

const rig = browserService({
  tempPrefix: 'tremora-new-study-',
  database: 'new-study.db',
  context: { javaScriptEnabled: true },
});

describe('a new study from the pages', { timeout: 400_000 }, () => {
  test('village CSV, then a fault by typed coordinates, then a screened study', async () => {
    await rig.page.goto(`${rig.service.url}/`);
    await rig.page.getByRole('link', { name: en.t('home.new') }).click();
    await rig.page.waitForURL(`${rig.service.url}/studies/new`);
    await rig.page.fill('#study-name', 'Reef villages');
    await rig.page.setInputFiles('#communities-file', {
      name: 'villages.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(VILLAGES_CSV),
    });
    await rig.page.screenshot({ path: join(ARTIFACTS, 'new-study.png'), fullPage: true });
    await rig.page.getByRole('button', { name: en.t('newStudy.button') }).click();
    await rig.page.waitForURL(/\/studies\/[^/]+\/edit$/);
    const studyUrl = rig.page.url().replace(/\/edit$/, '');
    expect(
      await rig.page
        .locator('[data-missing]')
        .evaluateAll((l) => l.map((e) => e.getAttribute('data-missing'))),
    ).toEqual(['sources']);
    expect(await rig.page.locator('tr[data-community]').count()).toBe(2);

    await rig.page.getByRole('link', { name: en.t('source.add') }).click();
    await rig.page.waitForURL(/\/edit\/new-source$/);
    for (const [action, selector, value] of NEW_FAULT) {
      if (action === 'select') await rig.page.selectOption(selector, String(value));
      else await rig.page.fill(selector, String(value));
    }
    await rig.page.screenshot({ path: join(ARTIFACTS, 'new-source.png'), fullPage: true });
    const violations = await seriousAxeViolations(rig.page);
    expect(violations, JSON.stringify(violations, null, 2)).toEqual([]);
    await rig.page.getByRole('button', { name: en.t('source.save') }).click();
    await rig.page.waitForURL(/\/edit\?saved=1/);
    expect(await rig.page.locator('[data-missing]').count()).toBe(0);
    expect(await rig.page.locator('tr[data-source="reef-fault"]').count()).toBe(1);
    expect(await rig.page.locator('.editor-preview svg').count()).toBe(1);
    await screenshotTwoWidths(rig.page, 'editor-with-fault');

    await rig.page.goto(studyUrl);
    await rig.page.getByRole('button', { name: en.t('overview.screenButton') }).click();
    await followRunToOverview(rig.page, rig.service, studyUrl, en);
    expect(await rig.page.locator('tr[data-community] [data-band]').count()).toBe(2);
    await screenshotTwoWidths(rig.page, 'new-study-screened');
  });
});

import { describe, expect, test } from 'vitest';
import { faultShapefileZip } from '../study/fault-files/fixtures.ts';
import { browserService } from './helpers/browser-service.ts';
import { screenshotTwoWidths } from './helpers/browser-service.ts';

/**
 * Faults from a zipped shapefile into the demo study from the editor in Chromium: the file is
 * shown with its guessed mapping and the one default it lacks (the largest magnitude) before
 * anything is saved; once given, the two faults are added beside the demo's own sources. The
 * shapefile is made by the test (test/study/fault-files/fixtures.ts); its faults are invented.
 */
const rig = browserService({
  tempPrefix: 'tremora-fault-import-',
  database: 'faults.db',
  context: { viewport: { width: 1280, height: 900 } },
});

const sourceIds = async (): Promise<string[]> =>
  (
    JSON.parse(await (await rig.service.fetch(`/api/studies/${rig.studyId}/document`)).text()) as {
      sources: { features: { properties: { id: string } }[] };
    }
  ).sources.features.map((f) => f.properties.id);

describe('faults from a regional file', { timeout: 120_000 }, () => {
  test('the file is shown before anything is saved, then its faults join the sources', async () => {
    const before = await sourceIds();
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/edit`);
    await rig.page.getByRole('link', { name: 'Add faults from a regional file' }).click();
    await rig.page.setInputFiles('#faults-file', {
      name: 'faults.zip',
      mimeType: 'application/zip',
      buffer: Buffer.from(faultShapefileZip()),
    });
    await rig.page.getByRole('button', { name: 'Read the file' }).click();
    await rig.page.waitForSelector('#default-mMax-problem');
    expect(await rig.page.locator('#map-slipRateMmYr').inputValue()).toBe('SLIP_RATE');
    expect(await sourceIds()).toEqual(before);
    await screenshotTwoWidths(rig.page, 'fault-import');
    await rig.page.fill('#default-mMax', '7');
    await rig.page.getByRole('button', { name: 'Add the 2 faults' }).click();
    await rig.page.waitForURL(/\/edit\?saved=1(#|$)/);
    expect(await sourceIds()).toEqual([...before, 'kessin-ridge-fault', 'marrow-flats-fault']);
  });
});

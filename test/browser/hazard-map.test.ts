import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, test } from 'vitest';
import { translator } from '../../web/text/translator.ts';
import { spreadStudy } from '../web/helpers/map-study.ts';
import { ARTIFACTS, seriousAxeViolations, walkWithTab } from './helpers/chromium.ts';
import { browserService, noScriptOverview, saveStudy } from './helpers/browser-service.ts';

/**
 * A hazard map from the overview in Chromium: a small study (two invented villages, one
 * source), the form with its suggested values, the progress page, then the layer and its
 * legend on the overview map; the same without script through the refresh link. Every view is
 * checked with axe-core and walked with the Tab key; no request may leave the service's origin.
 */
const en = translator('en');
const rig = browserService({
  tempPrefix: 'tremora-browser-maps-',
  database: 'maps.db',
  prepare: (service) => saveStudy(service, spreadStudy('Spread coast')),
});

type MapAnswer = { id: string; status: string; map: { count: number } | null };

async function checkView(view: Page, name: string): Promise<void> {
  const violations = await seriousAxeViolations(view);
  expect(
    violations,
    `${name}: serious or critical axe-core violations\n${JSON.stringify(violations, null, 2)}`,
  ).toEqual([]);
  const walk = await walkWithTab(view);
  expect(walk.missed, `${name}: controls Tab never reached`).toEqual([]);
  expect(walk.invisibleFocus, `${name}: controls focused without a visible focus ring`).toEqual([]);
}

const maps = async (): Promise<MapAnswer[]> =>
  (
    (await (await rig.service.fetch(`/api/studies/${rig.studyId}/maps`)).json()) as {
      maps: MapAnswer[];
    }
  ).maps;

const legendTitle = en.t('hazardMap.title.returnPeriod', {
  measure: en.t('hazardMap.measure.PGA'),
  years: '475',
  unit: 'g',
});

describe('a hazard map from the overview, in a browser', { timeout: 180_000 }, () => {
  test('the overview offers the form; computing follows the map and comes back to the layer and its legend', async () => {
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}`);
    expect(await rig.page.locator('svg.map .hazard-cells').count()).toBe(0);
    await checkView(rig.page, 'overview without a map');
    expect(await rig.page.locator('#hazard-map-spacing').inputValue()).toBe('1');
    await rig.page.selectOption('#hazard-map-return-period', '475');
    await rig.page.getByRole('button', { name: en.t('hazardMap.compute') }).click();
    await rig.page.waitForURL(/\/maps\/[\w-]+$/);
    // The page's script follows the map and goes to the overview's map when it is done.
    await rig.page.waitForURL(`${rig.service.url}/studies/${rig.studyId}#map-heading`, {
      timeout: 120_000,
    });
    const [map] = await maps();
    expect(map?.status).toBe('done');
    const cells = rig.page.locator('svg.map .hazard-cells rect');
    expect(await cells.count()).toBe(map?.map?.count);
    expect((await rig.page.locator('.hazard-legend .legend-title').textContent())?.trim()).toBe(
      legendTitle,
    );
    expect(
      await rig.page.locator('.hazard-legend .legend-classes li').count(),
    ).toBeGreaterThanOrEqual(2);
    expect(await rig.page.locator('.hazard-legend').textContent()).toContain(
      en.t('hazardMap.vs30', { vs30: '760' }),
    );
    expect(await rig.page.locator('.hazard-legend').textContent()).toContain(
      en.t('hazardMap.caution'),
    );
    // The layer's text alternative: the map names the summary, which links to the GeoJSON.
    expect(await rig.page.locator('svg.map').getAttribute('aria-describedby')).toBe(
      'overview-map-hazard-summary',
    );
    expect(
      await rig.page
        .locator(`#overview-map-hazard-summary a[href="/api/maps/${map?.id}/map.geojson"]`)
        .count(),
    ).toBe(1);
    await rig.page.screenshot({ path: join(ARTIFACTS, 'overview-hazard-map.png'), fullPage: true });
    await checkView(rig.page, 'overview with a hazard map');
    await rig.page.goto(`${rig.service.url}/studies/${rig.studyId}/maps/${map?.id}`);
    await checkView(rig.page, 'hazard map done');
  });

  test('without script: the form posts, the refresh link shows how far the map has got, and the done page links to the map', async () => {
    const {
      context: plain,
      page: noScript,
      foreignRequests: plainForeign,
    } = await noScriptOverview(rig);
    await noScript.selectOption('#hazard-map-return-period', '2475');
    await noScript.getByRole('button', { name: en.t('hazardMap.compute') }).click();
    await noScript.waitForURL(/\/maps\/[\w-]+$/);
    const progressUrl = noScript.url();
    for (
      let i = 0;
      i < 600 && (await noScript.locator('.run-status[data-status="done"]').count()) === 0;
      i++
    ) {
      await new Promise((r) => setTimeout(r, 200));
      const refresh = noScript.getByRole('link', { name: en.t('mapRun.refresh') });
      if ((await refresh.count()) === 1) await refresh.click();
      else await noScript.goto(progressUrl);
      await noScript.waitForLoadState();
    }
    expect(await noScript.locator('.run-status').getAttribute('data-status')).toBe('done');
    await noScript.getByRole('link', { name: en.t('mapRun.see') }).click();
    await noScript.waitForURL(`${rig.service.url}/studies/${rig.studyId}#map-heading`);
    const title = en.t('hazardMap.title.returnPeriod', {
      measure: en.t('hazardMap.measure.PGA'),
      years: '2,475',
      unit: 'g',
    });
    expect((await noScript.locator('.hazard-legend .legend-title').textContent())?.trim()).toBe(
      title,
    );
    expect(await noScript.locator('svg.map .hazard-cells rect').count()).toBe(
      (await maps()).at(-1)?.map?.count,
    );
    await plain.close();
    expect(plainForeign).toEqual([]);
  });

  test("no request left the service's origin", () => {
    expect(rig.foreignRequests).toEqual([]);
  });
});

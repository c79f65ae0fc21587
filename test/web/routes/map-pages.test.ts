import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { ServiceContext } from '../../../api/operations/service-context.ts';
import { MAX_DRAWN_POINTS } from '../../../web/data/map-data.ts';
import { suggestedMapSpacing } from '../../../web/data/map-spacing.ts';
import { DUSK } from '../../../web/style/palette.ts';
import type { TextKey } from '../../../web/text/text-key.ts';
import { EN } from '../helpers/bundles.ts';
import { translator } from '../../../web/text/translator.ts';
import { readStudy } from '../../../web/data/study-data.ts';
import { startPageApp, textOfId, type PageApp } from '../helpers/page-app.ts';
import { textLanguages } from '../helpers/text-languages.ts';
import { spreadStudy } from '../helpers/map-study.ts';
import { saveDemoStudy, saveStudy } from '../../service/helpers/saved-study.ts';

/**
 * Hazard maps from the overview, through app.request(): the form, its problems beside the
 * fields, the progress page, and the layer drawn on the overview map with its legend. The
 * numbers drawn are checked against the map's own GeoJSON in the store (the computation
 * itself is checked in test/service/routes/maps.test.ts against published formulas).
 */
let page: PageApp;
let spreadId: string;
let demoId: string;
let mapId: string;
const en = translator('en');

const get = (path: string, init?: RequestInit) => page.app.request(path, init);
const post = (path: string, fields: Record<string, string>) =>
  page.app.request(path, { method: 'POST', body: new URLSearchParams(fields) });

async function mapFinished(ctx: ServiceContext, id: string): Promise<string> {
  for (let i = 0; i < 1200; i++) {
    const run = ctx.store.maps.get(id);
    if (run && run.status !== 'queued' && run.status !== 'running') return run.status;
    await new Promise((r) => setTimeout(r, 50));
  }
  return ctx.store.maps.get(id)?.status ?? 'missing';
}

/** No inline script or style anywhere (the service's CSP forbids both), and no meta refresh. */
function expectPlainPage(html: string): void {
  expect(html).not.toMatch(/<script(?![^>]*\ssrc=)[^>]*>/);
  expect(html).not.toMatch(/\sstyle="/);
  expect(html).not.toMatch(/http-equiv="refresh"/i);
}

const count = (html: string, pattern: RegExp): number => (html.match(pattern) ?? []).length;

beforeAll(async () => {
  page = startPageApp();
  spreadId = saveStudy(page.ctx.store, spreadStudy('Spread fixture'));
  demoId = saveDemoStudy(page.ctx.store);
});
afterAll(async () => page.close());

/** A map record of the spread study (475 years, PGA) stored without computing it, at `spacingKm`. */
const storedMapRecord = (spacingKm: number) =>
  page.ctx.store.maps.create({
    studyId: spreadId,
    request: {
      measure: 'PGA',
      quantity: { kind: 'return-period', returnPeriodYears: 475 },
      spacingKm,
      vs30: 760,
    },
    inputHash: 'h',
  });

describe('the hazard map on the overview', () => {
  test("before any map: the form offers the study's measures and return periods, the suggested spacing with its rule, the grid's Vs30", async () => {
    const response = await get(`/studies/${demoId}`);
    expect(response.status).toBe(200);
    const html = await response.text();
    expectPlainPage(html);
    expect(html).toContain(en.t('map.noHazardLayer'));
    expect(html).not.toContain('class="hazard-cells"');
    const measures =
      [...html.matchAll(/<select id="hazard-map-measure"[^>]*>([\s\S]*?)<\/select>/g)][0]?.[1] ??
      '';
    expect([...measures.matchAll(/<option value="([^"]+)"/g)].map((m) => m[1])).toEqual([
      'PGA',
      'SA(0.2)',
      'SA(1.0)',
      'PGV',
    ]);
    expect(measures).toContain(
      `>${en.t('hazardMap.measure.SA', { period: '0.2', key: 'SA(0.2)' })}</option>`,
    );
    const periods =
      [
        ...html.matchAll(/<select id="hazard-map-return-period"[^>]*>([\s\S]*?)<\/select>/g),
      ][0]?.[1] ?? '';
    expect([...periods.matchAll(/<option value="([^"]+)"/g)].map((m) => m[1])).toEqual([
      '475',
      '2475',
    ]);
    const data = readStudy(page.ctx, demoId);
    const suggested = suggestedMapSpacing(data?.ok ? data.study : (undefined as never));
    expect(html).toMatch(new RegExp(`id="hazard-map-spacing"[^>]*value="${suggested.spacingKm}"`));
    expect(textOfId(html, 'hazard-map-spacing-help')).toBe(
      en.t('hazardMap.spacingHelp', {
        km: String(suggested.spacingKm),
        cells: '24',
        span: en.number(suggested.spanKm),
      }),
    );
    // The demo names a terrain grid: each point on land takes the slope–Vs30 proxy.
    expect(textOfId(html, 'hazard-map-vs30-help')).toBe(
      en.t('hazardMap.vs30Terrain', { vs30: '760' }),
    );
  });

  test('a form post records a queued map and goes to its progress page, which follows it with a link and no meta refresh', async () => {
    const response = await post(`/studies/${spreadId}/maps`, {
      measure: 'PGA',
      returnPeriodYears: '475',
      spacingKm: '1',
    });
    expect(response.status).toBe(303);
    const location = response.headers.get('location') as string;
    mapId = location.split('/').at(-1) as string;
    expect(location).toBe(`/studies/${spreadId}/maps/${mapId}`);
    expect(page.ctx.store.maps.get(mapId)?.request).toEqual({
      measure: 'PGA',
      quantity: { kind: 'return-period', returnPeriodYears: 475 },
      spacingKm: 1,
      vs30: 760,
    });
    const progress = await (await get(location)).text();
    expectPlainPage(progress);
    expect(progress).toContain(`data-status-url="/api/maps/${mapId}"`);
    expect(progress).toContain(`data-done-url="/studies/${spreadId}#map-heading"`);
    expect(progress).toContain(
      en.t('hazardMap.title.returnPeriod', {
        measure: en.t('hazardMap.measure.PGA'),
        years: '475',
        unit: 'g',
      }),
    );
    // The page of a map still queued (a record made here, so it stays queued while it is read): the bar and the refresh link.
    const waiting = storedMapRecord(1);
    const queued = await (await get(`/studies/${spreadId}/maps/${waiting.id}`)).text();
    expectPlainPage(queued);
    expect(queued).toContain('data-status="queued"');
    expect(queued).toContain(en.t('mapRun.queued'));
    expect(queued).toMatch(/<progress id="map-run-progress" max="1" value="0">0%<\/progress>/);
    expect(queued).toContain(
      `<a href="/studies/${spreadId}/maps/${waiting.id}">${en.t('mapRun.refresh')}</a>`,
    );
    page.ctx.store.maps.finishWithout(waiting.id, 'cancelled', 'cancelled on request');
    expect(await mapFinished(page.ctx, mapId)).toBe('done');
    const done = await (await get(location)).text();
    expect(done).toContain(en.t('mapRun.done'));
    expect(done).toContain(`<a href="/studies/${spreadId}#map-heading">${en.t('mapRun.see')}</a>`);
  });

  test("the overview draws the done map: a cell per point with a value, the legend's classes and counts, the summary, the download, the caution and the Vs30", async () => {
    const html = await (await get(`/studies/${spreadId}`)).text();
    expectPlainPage(html);
    const doc = JSON.parse(page.ctx.store.maps.geojson(mapId) as string) as {
      features: { properties: { value: number | null } }[];
    };
    const values = doc.features
      .map((f) => f.properties.value)
      .filter((v): v is number => v !== null);
    expect(values).toHaveLength(doc.features.length);
    const cells = [...html.matchAll(/<rect [^>]*fill="(#[0-9a-f]{6})" data-class="(\d)"/g)];
    expect(cells).toHaveLength(values.length);
    for (const [, fill] of cells) expect(DUSK.slice(1)).toContain(fill);
    const legend = [...html.matchAll(/<li data-class="(\d)" data-count="(\d+)">/g)].map((m) => ({
      index: m[1],
      count: Number(m[2]),
    }));
    expect(legend.length).toBeGreaterThanOrEqual(2);
    expect(legend.reduce((n, c) => n + c.count, 0)).toBe(values.length);
    for (const c of legend)
      expect(cells.filter((cell) => cell[2] === c.index)).toHaveLength(c.count);
    expect(html).toContain(
      `<h3 class="legend-title">${en.t('hazardMap.title.returnPeriod', { measure: en.t('hazardMap.measure.PGA'), years: '475', unit: 'g' })}</h3>`,
    );
    // Two significant figures of the smallest and largest values, in g (the spread map's values are a few tenths of a g).
    const [min, max] = [Math.min(...values), Math.max(...values)];
    expect(min).toBeGreaterThan(0.1);
    expect(max).toBeLessThan(1);
    expect(textOfId(html, 'overview-map-hazard-summary')).toBe(
      `${en.t('hazardMap.summary', { count: String(doc.features.length), spacing: '1', min: `${en.number(min, 2)} g`, max: `${en.number(max, 2)} g` })} ${en.t('hazardMap.download')}`,
    );
    expect(html).toMatch(/<svg class="map"[^>]*aria-describedby="overview-map-hazard-summary"/);
    expect(html).toContain(`href="/api/maps/${mapId}/map.geojson"`);
    expect(html).toContain(en.t('hazardMap.vs30', { vs30: '760' }));
    expect(html).toContain(en.t('hazardMap.caution'));
    expect(html).toContain(en.t('caution.text'));
    expect(html).not.toContain(en.t('map.noHazardLayer'));
  });

  test('problems come back beside the fields (422) and nothing is recorded', async () => {
    const before = page.ctx.store.maps.listForStudy(spreadId).length;
    const bad = await post(`/studies/${spreadId}/maps`, {
      measure: 'PGX',
      returnPeriodYears: '475',
      spacingKm: 'abc',
    });
    expect(bad.status).toBe(422);
    const html = await bad.text();
    expect(textOfId(html, 'hazard-map-spacingKm-problem')).toBe(
      'expected a number in [0.5, 200] km, got &quot;abc&quot;',
    );
    expect(html).toMatch(
      /id="hazard-map-spacing"[^>]*value="abc"[^>]*aria-describedby="hazard-map-spacing-help hazard-map-spacingKm-problem" aria-invalid="true"/,
    );
    // Each refused form, and the problem shown where it belongs: exact text, or its pattern.
    const refused = [
      {
        studyId: spreadId,
        form: { measure: 'PGX', spacingKm: '5' },
        problemId: 'hazard-map-measure-problem',
        problem: /^unsupported measure &quot;PGX&quot;: expected/,
      },
      {
        studyId: spreadId,
        form: { measure: 'PGA', spacingKm: '0,25' },
        problemId: 'hazard-map-spacingKm-problem',
        problem: 'expected a number in [0.5, 200] km, got 0.25',
      },
      {
        studyId: demoId,
        form: { measure: 'PGA', spacingKm: '0.5' },
        problemId: 'hazard-map-other-problems',
        problem:
          /^study is too large: map grid points at 0\.5 km spacing = \d+, over the budget of 250000$/,
      },
    ];
    for (const { studyId, form, problemId, problem } of refused) {
      const response = await post(`/studies/${studyId}/maps`, {
        ...form,
        returnPeriodYears: '475',
      });
      expect(response.status, problemId).toBe(422);
      const shown = textOfId(await response.text(), problemId);
      if (typeof problem === 'string') expect(shown).toBe(problem);
      else expect(shown).toMatch(problem);
    }
    expect(page.ctx.store.maps.listForStudy(spreadId)).toHaveLength(before);
    expect(page.ctx.store.maps.listForStudy(demoId)).toHaveLength(0);
  });

  test('the overview says when the study changed since its map, when the last map failed, and when a map is too large to draw', async () => {
    const record = page.ctx.store.studies.get(spreadId)!;
    const edited = spreadStudy('Spread fixture');
    (edited.communities as { vs30: number }[])[0]!.vs30 = 450;
    page.ctx.store.studies.replace(spreadId, {
      name: record.name,
      document: JSON.stringify(edited),
    });
    const failed = storedMapRecord(1);
    page.ctx.store.maps.finishWithout(failed.id, 'failed', 'a failure for the test');
    let html = await (await get(`/studies/${spreadId}`)).text();
    expect(html).toContain(en.t('hazardMap.stale'));
    expect(html).toContain(en.t('hazardMap.lastFailed', { error: 'a failure for the test' }));
    expect(html).toContain('class="hazard-cells"');

    // A stored map record standing in for one over the drawing limit (a page behaviour, not a computation).
    const big = storedMapRecord(0.5);
    const description = {
      measure: 'PGA',
      unit: 'g' as const,
      quantity: { kind: 'return-period' as const, returnPeriodYears: 475 },
      vs30: 760,
      spacingKm: 0.5,
      columns: 200,
      rows: 100,
      count: MAX_DRAWN_POINTS + 8000,
    };
    page.ctx.store.maps.markRunning(big.id, new Date().toISOString(), description);
    page.ctx.store.maps.finishDone(big.id, {
      geojson: '{"type":"FeatureCollection","features":[]}',
      warnings: [],
      provenanceJson: '{}',
      finishedAt: new Date().toISOString(),
    });
    html = await (await get(`/studies/${spreadId}`)).text();
    expect(html).toContain(
      en.t('hazardMap.tooMany', { count: en.number(MAX_DRAWN_POINTS + 8000) }),
    );
    expect(html).toContain(`href="/api/maps/${big.id}/map.geojson"`);
    expect(html).not.toContain('class="hazard-cells"');
    expect(html).not.toContain('aria-describedby="overview-map-hazard-summary"');
  });

  test('unknown studies and maps get a 404 page', async () => {
    expect(
      (
        await post('/studies/none-such/maps', {
          measure: 'PGA',
          returnPeriodYears: '475',
          spacingKm: '5',
        })
      ).status,
    ).toBe(404);
    expect((await get(`/studies/${spreadId}/maps/none-such`)).status).toBe(404);
    expect((await get(`/studies/${demoId}/maps/${mapId}`)).status).toBe(404);
  });

  test('on a French page, every hazard-map text English stands in for is marked lang="en"', async () => {
    const html = await (
      await get(`/studies/${spreadId}`, { headers: { cookie: 'tremora_lang=fr' } })
    ).text();
    expect(html).toContain('<html lang="fr">');
    const pieces = (Object.keys(EN) as TextKey[])
      .filter((key) => key.startsWith('hazardMap.') || key.startsWith('map.'))
      .flatMap((key) =>
        EN[key].split(/\{\w+\}/).map((p) => p.trim().replace(/^[\s,.:;()]+|[\s,.:;()]+$/g, '')),
      )
      .filter((p) => (p.match(/\p{L}+/gu) ?? []).length >= 2);
    const unmarked = textLanguages(html).filter(
      (t) => t.lang === 'fr' && pieces.some((p) => t.text.includes(p)),
    );
    expect(unmarked).toEqual([]);
    expect(count(html, /lang="en"/g)).toBeGreaterThan(0);
  });
});

import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { StudyResult } from '../../api/engine/results.ts';
import { DEMO_STUDY_URL } from '../../api/operations/demo-seed.ts';
import { translator } from '../../web/text/translator.ts';
import { smallStudy } from '../service/helpers/small-study.ts';
import { fileForm, runFinished, startPageApp, textOfId, type PageApp } from './helpers/page-app.ts';
import { saveDemoStudy, saveStudy } from '../service/helpers/saved-study.ts';

/**
 * The pages through app.request(): status codes, inline problems, nothing saved on a problem,
 * the language switch, and the headline number against the run's own result. The browser
 * tests (test/browser/) drive the same pages in Chromium.
 */
let page: PageApp;
let smallId: string;
let demoId: string;

beforeAll(async () => {
  page = startPageApp();
  smallId = saveStudy(page.ctx.store, smallStudy('Pages fixture'));
  demoId = saveDemoStudy(page.ctx.store);
});
afterAll(async () => page.close());

const get = (path: string, init?: RequestInit) => page.app.request(path, init);
const post = (path: string, body: FormData | URLSearchParams) =>
  page.app.request(path, { method: 'POST', body });

/** No inline script or style anywhere: the service's CSP forbids both. */
function expectNoInlineCode(html: string): void {
  expect(html).not.toMatch(/<script(?![^>]*\ssrc=)[^>]*>/);
  expect(html).not.toMatch(/\sstyle="/);
  expect(html).not.toMatch(/<style[\s>]/);
  expect(html).not.toMatch(/\son[a-z]+="/);
}

describe('pages', () => {
  test("the editor lists the sources' sanity warnings (an interface slipping 1.2 mm/yr), and none for the demo", async () => {
    const demo = JSON.parse(readFileSync(DEMO_STUDY_URL, 'utf8')) as {
      sources: { features: { properties: { id: string; recurrence: object } }[] };
    };
    for (const f of demo.sources.features)
      if (f.properties.id === 'orle-interface')
        f.properties.recurrence = { ...f.properties.recurrence, slipRateMmYr: 1.2 };
    const slowId = page.ctx.store.studies.create({
      name: 'Demo coast, slow interface',
      document: JSON.stringify({ ...demo, name: 'Demo coast, slow interface' }),
    }).id;
    const html = await (await get(`/studies/${slowId}/edit`)).text();
    expect(html).toContain('id="source-checks-heading"');
    // 1.2 mm/yr lies below the 10 mm/yr the check takes as the least convergence times coupling.
    expect(html).toContain(
      'source &quot;orle-interface&quot;: its slip rate of 1.2 mm/yr, outside the 10–150 mm/yr',
    );
    const demoHtml = await (await get(`/studies/${demoId}/edit`)).text();
    expect(demoHtml).not.toContain('id="source-checks-heading"');
  });

  test('the footer says the data are invented on the demo study only', async () => {
    const demoNote = translator('en').t('footer.demo');
    expect(await (await get(`/studies/${demoId}`)).text()).toContain(demoNote);
    expect(await (await get(`/studies/${smallId}`)).text()).not.toContain(demoNote);
    expect(await (await get('/')).text()).not.toContain(demoNote);
  });

  test('home lists the studies, with the security policy and no inline code', async () => {
    const response = await get('/');
    expect(response.status).toBe(200);
    expect(response.headers.get('content-security-policy')).toContain("script-src 'self'");
    const html = await response.text();
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain(`href="/studies/${smallId}"`);
    expectNoInlineCode(html);
  });

  test('screening from the overview: a form post starts a run, then the ranking and the community page show its numbers', async () => {
    const before = await (await get(`/studies/${smallId}`)).text();
    expect(before).toContain(translator('en').t('overview.notScreened'));
    const started = await post(`/studies/${smallId}/screen`, new URLSearchParams());
    expect(started.status).toBe(303);
    const location = started.headers.get('location') as string;
    const runId = location.split('/').at(-1) as string;
    expect(location).toBe(`/studies/${smallId}/runs/${runId}`);
    expect(await runFinished(page.ctx, runId)).toBe('done');
    const results = JSON.parse(page.ctx.store.runs.results(runId) as string) as StudyResult;
    const vii = results.communities[0]?.intensity.chanceOfReaching['50']?.VII as number;

    const overview = await (await get(`/studies/${smallId}`)).text();
    expectNoInlineCode(overview);
    expect(overview).toContain(`data-probability="${vii}"`);
    expect(overview).toContain('data-community="test-cove"');

    const community = await get(`/studies/${smallId}/communities/test-cove`);
    expect(community.status).toBe(200);
    const html = await community.text();
    expectNoInlineCode(html);
    expect(html).toMatch(new RegExp(`class="headline" data-probability="${vii}"`));
    const { frequency, percent } = translator('en').chance(vii);
    expect(html).toContain(`is ${frequency} over the next 50 years (${percent}).`);
    // The fixture community is coastal: the tsunami advice is there, and the caution.
    expect(html).toContain('id="tsunami-title"');
    expect(html).toContain(translator('en').t('caution.text'));
    expect(html).toContain(results.provenance.inputHash.slice(0, 12));
    // How firm the band is, in words, on the community page and the overview.
    expect(html).toContain('class="band-firmness"');
    expect(html).toContain('Of the weight of the choices behind these numbers,');
    expect(overview).toContain('<ul class="band-firmness">');

    const handout = await get(`/studies/${smallId}/communities/test-cove/handout`);
    expect(handout.status).toBe(200);
    const handoutHtml = await handout.text();
    expect(handoutHtml).toContain('<tfoot>');
    expect(handoutHtml).toContain(translator('en').t('caution.short'));
  });

  /** Posts an upload to the small study that is refused (422) and saves nothing; gives the page. */
  const refusedUpload = async (upload: string, form: FormData): Promise<string> => {
    const saved = page.ctx.store.studies.get(smallId)?.document;
    const response = await post(`/studies/${smallId}/edit/${upload}`, form);
    expect(response.status).toBe(422);
    expect(page.ctx.store.studies.get(smallId)?.document).toBe(saved);
    return response.text();
  };

  test('a broken GeoJSON upload shows its problem next to the upload and saves nothing', async () => {
    const bad =
      '{"type":"FeatureCollection","features":[{"type":"Feature","geometry":{"type":"Point","coordinates":[-140.2,-47.4]},"properties":{"id":"p","setting":"volcanic","mechanism":"normal","depthKm":8,"recurrence":{"type":"fixed","magnitude":6,"rate":0.01}}}]}';
    const html = await refusedUpload(
      'sources-geojson',
      fileForm('bad.geojson', 'application/geo+json', bad),
    );
    const problems = textOfId(html, 'sources-problems') as string;
    expect(problems).toContain('Feature 1 (p), setting');
    expect(html).toMatch(/id="sources-file"[^>]*aria-describedby="sources-help sources-problems"/);
  });

  test('malformed JSON is reported next to the upload too', async () => {
    const html = await refusedUpload(
      'sources-geojson',
      fileForm('broken.geojson', 'application/geo+json', '{"type": "FeatureCollection", '),
    );
    expect(textOfId(html, 'sources-problems')).toMatch(/^sources: expected valid JSON/);
  });

  test('a CSV with a bad line shows the line with its problem; nothing is saved', async () => {
    const csv =
      'id,name,lon,lat,vs30,population,coastal\ntest-cove,Test Cove,-140.2,-47.4,500,120,true\nfar-ridge,Far Ridge,-140.5,-47.6,abc,45,false\n';
    const html = await refusedUpload('communities-csv', fileForm('villages.csv', 'text/csv', csv));
    expect(textOfId(html, 'communities-problems')).toContain('Line 3, vs30:');
    expect(html).toMatch(/<tr class="line-bad" data-line="3">/);
  });

  test('adding a community: a bad field is shown under that field; a good one is saved', async () => {
    const saved = page.ctx.store.studies.get(smallId)?.document;
    const fields = {
      id: 'reef-end',
      name: 'Reef End',
      lon: '-140.4',
      lat: '-95',
      vs30: '400',
      siteClass: '',
      population: '30',
      elevationM: '3',
      coastal: 'true',
    };
    const bad = await post(`/studies/${smallId}/edit/new-community`, new URLSearchParams(fields));
    expect(bad.status).toBe(422);
    const html = await bad.text();
    expect(textOfId(html, 'field-lat-problem')).toMatch(/-95/);
    expect(html).toMatch(/id="field-lat"[^>]*aria-invalid="true"/);
    expect(page.ctx.store.studies.get(smallId)?.document).toBe(saved);

    const good = await post(
      `/studies/${smallId}/edit/new-community`,
      new URLSearchParams({ ...fields, lat: '-47.45' }),
    );
    expect(good.status).toBe(303);
    expect(good.headers.get('location')).toBe(`/studies/${smallId}/edit?saved=1`);
    const document = JSON.parse(page.ctx.store.studies.get(smallId)?.document as string) as {
      communities: { id: string; lat: number }[];
    };
    expect(document.communities.map((c) => c.id)).toEqual(['test-cove', 'reef-end']);
    // The study changed after its screening: the overview says so.
    expect(await (await get(`/studies/${smallId}`)).text()).toContain(
      translator('en').t('overview.stale'),
    );
  });

  test('the language switch sets a cookie and returns to a same-origin page in that language', async () => {
    const switched = await get('/language?lang=fr&back=/limits');
    expect(switched.status).toBe(303);
    expect(switched.headers.get('location')).toBe('/limits');
    const cookie = (switched.headers.get('set-cookie') as string).split(';')[0] as string;
    expect(cookie).toBe('tremora_lang=fr');
    const html = await (await get('/limits', { headers: { cookie } })).text();
    expect(html).toContain('<html lang="fr">');
    expect(html).toContain('<h1>Les limites d’une évaluation préliminaire</h1>');
    expect(html).toContain(translator('fr').t('limits.intro'));
    expect(html).not.toContain('lang="en"><');
    expect(
      (await get('/language?lang=fr&back=//elsewhere.example/x')).headers.get('location'),
    ).toBe('/');
    expect((await get('/limits?lang=en', { headers: { cookie } })).status).toBe(200);
  });

  test('unknown pages get a page; unknown API paths keep the JSON answer', async () => {
    const missing = await get('/no/such/page');
    expect(missing.status).toBe(404);
    expect(missing.headers.get('content-type')).toContain('text/html');
    const api = await get('/api/no-such-route');
    expect(api.status).toBe(404);
    expect(((await api.json()) as { error: string }).error).toMatch(
      /no route GET \/api\/no-such-route/,
    );
    expect((await get('/studies/nope')).status).toBe(404);
  });

  test('a scenario with a magnitude out of range shows the problem next to the magnitude', async () => {
    const response = await post(
      `/studies/${demoId}/scenario`,
      new URLSearchParams({ sourceId: 'vennick-fault', magnitude: '12' }),
    );
    expect(response.status).toBe(422);
    expect(textOfId(await response.text(), 'scenario-magnitude-problem')).toMatch(/12/);
  });

  test('a scenario on the demo coast gives each community its intensity and a map grid', async () => {
    const response = await post(
      `/studies/${demoId}/scenario`,
      new URLSearchParams({ sourceId: 'vennick-fault', magnitude: '6.8' }),
    );
    expect(response.status).toBe(200);
    const html = await response.text();
    expect((html.match(/<tr data-community="/g) ?? []).length).toBe(11);
    expect(html).toContain('class="scenario-cells"');
  });

  test('an uploaded catalog with bad lines is attached with the rest, and each rejected line is listed', async () => {
    const csv = readFileSync(
      new URL('../catalog/fixtures/small-catalog.csv', import.meta.url),
      'utf8',
    );
    const response = await post(
      `/studies/${smallId}/catalog`,
      fileForm('small-catalog.csv', 'text/csv', csv),
    );
    expect(response.status).toBe(303);
    const html = await (await get(`/studies/${smallId}/catalog`)).text();
    // The fixture's line 5 has month 13 (test/catalog/csv.test.ts reads the same file).
    expect(html).toContain('<table class="data-table rejected">');
    expect(html).toMatch(/<tr data-line="5"><th scope="row">line 5<\/th>/);
    expect(html).toMatch(/data-loaded="[1-9]\d*" data-rejected="[1-9]\d*"/);
    // Line 6 has no depth: loaded, and counted on the page.
    expect(html).toContain('<p data-without-depth="1">1 earthquake has no depth');
    expect(page.ctx.store.catalogs.get(smallId)?.fileName).toBe('small-catalog.csv');
  });

  test('a catalog file that loads no event is shown back with its problems and attaches nothing', async () => {
    const before = page.ctx.store.catalogs.get(smallId)?.content;
    const response = await post(
      `/studies/${smallId}/catalog`,
      fileForm('empty.csv', 'text/csv', 'time,lon,lat,depthKm,magnitude,magnitudeType,id\n'),
    );
    expect(response.status).toBe(422);
    expect(textOfId(await response.text(), 'catalog-problems')).toMatch(
      /expected at least one event/,
    );
    expect(page.ctx.store.catalogs.get(smallId)?.content).toBe(before);
  });

  test('the catalog view loads the demo catalog, fits it, and adds a zone only after validation', async () => {
    const loaded = await post(
      `/studies/${demoId}/catalog`,
      fileForm('x', 'text/plain', '', { demo: '1' }),
    );
    expect(loaded.status).toBe(303);
    const html = await (await get(`/studies/${demoId}/catalog`)).text();
    expect(html).toMatch(/data-loaded="\d+" data-rejected="0"/);
    expect(html).toContain('class="fit-line"');
    const zone = {
      polygon: 'orle-background',
      mMax: '6.5',
      depthKm: '8',
      id: 'fitted-zone',
      name: 'Fitted zone',
    };
    const fit = await post(
      `/studies/${demoId}/catalog/zone`,
      new URLSearchParams({ ...zone, action: 'fit' }),
    );
    expect(fit.status).toBe(200);
    expect(await fit.text()).toMatch(/class="zone-result" data-b="[\d.]+" data-rate="[\d.e-]+"/);
    const before = page.ctx.store.studies.get(demoId)?.document;
    const clash = await post(
      `/studies/${demoId}/catalog/zone`,
      new URLSearchParams({ ...zone, id: 'orle-background', action: 'add' }),
    );
    expect(clash.status).toBe(422);
    expect(textOfId(await clash.text(), 'zone-id-problem')).toMatch(/duplicate|orle-background/);
    expect(page.ctx.store.studies.get(demoId)?.document).toBe(before);
    const added = await post(
      `/studies/${demoId}/catalog/zone`,
      new URLSearchParams({ ...zone, action: 'add' }),
    );
    expect(added.status).toBe(303);
    const document = JSON.parse(page.ctx.store.studies.get(demoId)?.document as string) as {
      sources: { features: { properties: { id: string } }[] };
    };
    expect(document.sources.features.map((f) => f.properties.id)).toContain('fitted-zone');
  });

  test('the catalog view converts local magnitudes when asked, and counts them', async () => {
    // Project-made: 120 Mw events from 3.0 to 4.9 over 12 years and 6 ML events at 4.0.
    const rows = ['time,lon,lat,depthKm,magnitude,magnitudeType,id'];
    for (let i = 0; i < 120; i += 1)
      rows.push(
        `${2000 + Math.floor(i / 10)}-0${1 + (i % 9)}-1${i % 10}T00:00:00Z,-150.${i % 9},-47.${i % 7},10,${(3 + (i % 20) / 10).toFixed(1)},Mw,w${i}`,
      );
    for (let i = 0; i < 6; i += 1)
      rows.push(`201${i}-06-01T00:00:00Z,-150.5,-47.5,10,4.0,ML,l${i}`);
    const posted = await post(
      `/studies/${smallId}/catalog`,
      fileForm('mixed.csv', 'text/csv', rows.join('\n')),
    );
    expect(posted.status).toBe(303);
    const plain = await (await get(`/studies/${smallId}/catalog`)).text();
    expect(plain).not.toMatch(/class="converted"/);
    expect(plain).toMatch(/name="convert" value="grunthal2009-ml"/);
    const converted = await (
      await get(`/studies/${smallId}/catalog?convert=grunthal2009-ml`)
    ).text();
    expect(converted).toMatch(/data-relation="grunthal2009-ml">6 ML events converted/);
  });
});

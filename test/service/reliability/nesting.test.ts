import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { MAX_JSON_DEPTH } from '../../../api/study/json-text.ts';
import { fileForm, startPageApp, type PageApp } from '../../web/helpers/page-app.ts';
import { expectError } from '../helpers/assertions.ts';
import { smallStudy, sourcesCollection } from '../helpers/small-study.ts';

/**
 * An import at the nesting limit: the uploaded sources go one level down in the study
 * document, which is read back with the same limit. Such an import must be refused naming the
 * limit, and the study must stay readable.
 */
let page: PageApp;
beforeAll(() => {
  page = startPageApp();
});
afterAll(async () => {
  await page.close();
});

const nested = (levels: number): unknown => (levels === 0 ? 1 : [nested(levels - 1)]);

/** Sources whose text nests exactly `depth` levels: collection, features, feature, properties, then lists. */
function sourcesNested(depth: number): Record<string, unknown> {
  const collection = sourcesCollection() as { features: { properties: Record<string, unknown> }[] };
  const feature = collection.features[0] as { properties: Record<string, unknown> };
  feature.properties = { ...feature.properties, note: nested(depth - 4) };
  return collection;
}

const newStudy = () =>
  page.ctx.store.studies.create({ name: 'Deep', document: JSON.stringify(smallStudy('Deep')) }).id;

describe(`an import at the nesting limit (${MAX_JSON_DEPTH})`, () => {
  test('the API refuses it (422 at sources) and the study still reads', async () => {
    const id = newStudy();
    const body = JSON.stringify(sourcesNested(MAX_JSON_DEPTH));
    const refused = await expectError(
      await page.app.request(`/api/studies/${id}/sources`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/geo+json' },
        body,
      }),
      422,
    );
    expect(refused.issues[0]?.path).toBe('sources');
    expect(refused.issues[0]?.message).toContain(String(MAX_JSON_DEPTH));
    expect((await page.app.request(`/api/studies/${id}`)).status).toBe(200);
    expect((await page.app.request(`/studies/${id}`)).status).toBe(200);
  });

  test('one level less is accepted and reads back', async () => {
    const id = newStudy();
    const body = JSON.stringify(sourcesNested(MAX_JSON_DEPTH - 1));
    const accepted = await page.app.request(`/api/studies/${id}/sources`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/geo+json' },
      body,
    });
    expect(accepted.status, await accepted.clone().text()).toBe(200);
    expect((await page.app.request(`/api/studies/${id}`)).status).toBe(200);
  });

  test('the editor upload shows the problem and saves nothing', async () => {
    const id = newStudy();
    const before = page.ctx.store.studies.get(id)?.document;
    const form = fileForm(
      'deep.geojson',
      'application/geo+json',
      JSON.stringify(sourcesNested(MAX_JSON_DEPTH)),
    );
    const response = await page.app.request(`/studies/${id}/edit/sources-geojson`, {
      method: 'POST',
      body: form,
    });
    expect(response.status).toBe(422);
    expect(await response.text()).toContain(String(MAX_JSON_DEPTH));
    expect(page.ctx.store.studies.get(id)?.document).toBe(before);
    expect((await page.app.request(`/api/studies/${id}`)).status).toBe(200);
  });
});

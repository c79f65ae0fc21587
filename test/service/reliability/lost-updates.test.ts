import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { COMMUNITIES_CSV, smallStudy, sourcesCollection } from '../helpers/small-study.ts';
import { fileForm, startPageApp, type PageApp } from '../../web/helpers/page-app.ts';

/**
 * A write that reads the study must read it after its own body has arrived: a PUT answered
 * while the body of a form or an import is still on its way must not be overwritten by it.
 * Each case holds a body open, saves a new name with PUT meanwhile, then lets the body finish;
 * the name saved by the PUT must still be there.
 * (Content-Length is given, as browsers do, so the body-limit check does not read it ahead.)
 */
let page: PageApp;

beforeAll(() => {
  page = startPageApp();
});
afterAll(async () => {
  await page.close();
});

/** A request body that arrives only when `release` is called. */
function heldBody(bytes: Uint8Array): { body: ReadableStream<Uint8Array>; release: () => void } {
  let release = () => {};
  const gate = new Promise<void>((resolve) => (release = resolve));
  const body = new ReadableStream<Uint8Array>({
    async pull(controller) {
      await gate;
      controller.enqueue(bytes);
      controller.close();
    },
  });
  return { body, release };
}

const newStudy = () =>
  page.ctx.store.studies.create({ name: 'Held', document: JSON.stringify(smallStudy('Held')) }).id;
const savedName = (id: string) =>
  (JSON.parse(page.ctx.store.studies.get(id)?.document as string) as { name: string }).name;

async function bytesOf(
  form: FormData | URLSearchParams,
): Promise<{ bytes: Uint8Array; type: string }> {
  const encoded = new Response(form);
  return {
    bytes: new Uint8Array(await encoded.arrayBuffer()),
    type: encoded.headers.get('content-type') as string,
  };
}

/** Sends `path` with a held body, PUTs a renamed study meanwhile, releases; returns the write's status. */
async function raceWithPut(
  id: string,
  path: string,
  bytes: Uint8Array,
  type: string,
): Promise<number> {
  const held = heldBody(bytes);
  const pending = page.app.request(path, {
    method: 'POST',
    headers: { 'Content-Type': type, 'Content-Length': String(bytes.length) },
    body: held.body,
    duplex: 'half',
  } as RequestInit);
  // Let the held request run as far as it can before its body arrives.
  for (let i = 0; i < 5; i++) await new Promise((r) => setTimeout(r, 10));
  const put = await page.app.request(`/api/studies/${id}`, {
    method: 'PUT',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(smallStudy('Renamed meanwhile')),
  });
  expect(put.status).toBe(200);
  held.release();
  return (await pending).status;
}

/** The editor's community form for a coastal community. */
const coastalCommunityForm = (id: string, name: string, lon: string, lat: string, vs30: string) =>
  new URLSearchParams({ id, name, lon, lat, vs30, coastal: 'true' });

/** raceWithPut for a form, encoded with the content type a browser gives it. */
async function raceFormWithPut(
  id: string,
  path: string,
  form: FormData | URLSearchParams,
): Promise<number> {
  const { bytes, type } = await bytesOf(form);
  return raceWithPut(id, path, bytes, type);
}

describe('no lost update while a body is on its way', () => {
  test.each([
    { route: 'communities', body: COMMUNITIES_CSV, type: 'text/csv' },
    {
      route: 'sources',
      body: JSON.stringify(sourcesCollection()),
      type: 'application/geo+json',
    },
  ])('API $route import', async ({ route, body, type }) => {
    const id = newStudy();
    const status = await raceWithPut(
      id,
      `/api/studies/${id}/${route}`,
      new TextEncoder().encode(body),
      type,
    );
    expect(status).toBe(200);
    expect(savedName(id)).toBe('Renamed meanwhile');
  });

  // `saved`: what the form brings that the study must hold afterwards.
  test.each([
    {
      what: 'add a community',
      path: 'edit/new-community',
      form: coastalCommunityForm('second-cove', 'Second Cove', '-140.1', '-47.3', '400'),
      saved: 'second-cove',
    },
    {
      what: 'edit a community',
      path: 'edit/communities/test-cove',
      form: coastalCommunityForm('test-cove', 'Test Cove', '-140.2', '-47.4', '650'),
      saved: '650',
    },
    {
      what: 'sources upload',
      path: 'edit/sources-geojson',
      form: fileForm(
        'sources.geojson',
        'application/geo+json',
        JSON.stringify(sourcesCollection()),
      ),
      saved: 'spot-west',
    },
  ])('editor: $what', async ({ path, form, saved }) => {
    const id = newStudy();
    const status = await raceFormWithPut(id, `/studies/${id}/${path}`, form);
    expect(status).toBe(303);
    expect(savedName(id)).toBe('Renamed meanwhile');
    expect(page.ctx.store.studies.get(id)?.document).toContain(saved);
  });
});

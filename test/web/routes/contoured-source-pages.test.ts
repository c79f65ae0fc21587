import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { StudyResult } from '../../../api/engine/results.ts';
import { expectError } from '../../service/helpers/assertions.ts';
import { fileForm, runFinished, startPageApp, type PageApp } from '../helpers/page-app.ts';

/**
 * A study whose interface is given by depth contours (a MultiLineString, invented, in open
 * ocean) through the API, the editor's sources upload and the pages: the zone that follows the
 * slab gets its depths shown on the overview, and the community page says the slab lies below a
 * village only where the village stands over it.
 *
 * The contours run north-south at 140.6° W (5 km), 140.4° W (20 km) and 140.1° W (35 km)
 * (test/cli/fixtures/slab.study.json). Over Cove (140.3° W) stands over the mesh, one third of
 * the way from the 20 km contour to the 35 km one: the slab is 20 + 15/3 = 25 km below it (the
 * mesh is planar between two straight contours, so depth is linear across it; hand calculation).
 * Far Hill (139.7° W) is 0.4° of longitude east of the deepest contour, beyond the mesh's edge.
 */
const FIXTURE = new URL('../../cli/fixtures/slab.study.json', import.meta.url);
const GEOJSON = 'application/geo+json';
const slabStudy = (): Record<string, any> => JSON.parse(readFileSync(FIXTURE, 'utf8'));

let page: PageApp;
let id: string;
let results: StudyResult;

/** Sends `body` as JSON (or GeoJSON) to the API. */
const send = (method: string, path: string, body: unknown, type = 'application/json') =>
  page.app.request(path, {
    method,
    headers: { 'content-type': type },
    body: JSON.stringify(body),
  });

beforeAll(async () => {
  page = startPageApp();
  const created = await send('POST', '/api/studies', slabStudy());
  expect(created.status, await created.clone().text()).toBe(201);
  id = ((await created.json()) as { id: string }).id;
  const started = await page.app.request(`/studies/${id}/screen`, {
    method: 'POST',
    body: new URLSearchParams(),
  });
  const runId = (started.headers.get('location') as string).split('/').at(-1) as string;
  expect(await runFinished(page.ctx, runId)).toBe('done');
  results = (await (await page.app.request(`/api/runs/${runId}/results`)).json()) as StudyResult;
}, 120_000);
afterAll(async () => page?.close());

const html = async (path: string, lang = 'en') => {
  const response = await page.app.request(path, { headers: { cookie: `tremora_lang=${lang}` } });
  expect(response.status).toBe(200);
  return response.text();
};

/** The contours with line 1 turned round: it runs south while the others run north. */
function backwardsContours(): number[][][] {
  const lines = slabStudy().sources.features[0].geometry.coordinates as number[][][];
  return [lines[0] as number[][], [...(lines[1] as number[][])].reverse(), lines[2] as number[][]];
}

describe('a contoured source through the API', () => {
  test('a study with one is screened, and its zone depths follow the slab 10 km below it', () => {
    expect(results.communities.map((c) => c.communityId)).toEqual(['over-cove', 'far-hill']);
    const [zone] = results.diagnostics?.zoneDepths ?? [];
    expect(zone?.basis).toEqual({ depthFromSource: 'slab-top', offsetKm: 10 });
    // The slab's depth at a cell's longitude, linear between the contours (hand calculation);
    // 0.08 km allows for the depth taken to the nearest 0.1 km (FOLLOWED_DEPTH_STEP_KM, up to
    // 0.05 km), the report's rounding (1e-4°, about 0.01 km of depth) and the local projection
    // bending the meridians by metres over the zone.
    const slabKm = (lon: number) =>
      lon < -140.4 ? 5 + (15 * (lon + 140.6)) / 0.2 : 20 + (15 * (lon + 140.4)) / 0.3;
    expect(zone?.cells.length).toBeGreaterThan(4);
    for (const cell of zone?.cells ?? []) {
      expect(cell.depths).toHaveLength(1);
      expect(Math.abs((cell.depths[0]?.depthKm as number) - (10 + slabKm(cell.lon)))).toBeLessThan(
        0.08,
      );
    }
  });

  test('PUT with a contour running backwards is refused with 422, naming the line and its point; nothing is saved', async () => {
    const before = page.ctx.store.studies.get(id)?.document;
    const study = slabStudy();
    study.sources.features[0].geometry.coordinates = backwardsContours();
    const response = await send('PUT', `/api/studies/${id}`, study);
    const body = await expectError(response, 422);
    expect(body.issues).toContainEqual({
      path: 'sources.features[0].geometry.coordinates[1]',
      message: expect.stringMatching(
        /^line 1 runs backwards \(from point 0 at \[-140\.4, -47\.2\]/,
      ),
    });
    expect(page.ctx.store.studies.get(id)?.document).toBe(before);
  });

  test('POST of a sources file with contours is taken; one with a one-point line is refused naming it', async () => {
    const sources = slabStudy().sources;
    const taken = await send('POST', `/api/studies/${id}/sources`, sources, GEOJSON);
    expect(taken.status, await taken.clone().text()).toBe(200);
    expect(((await taken.json()) as { imported: { sources: number } }).imported.sources).toBe(2);

    sources.features[0].geometry.coordinates[2] = [[-140.1, -47.8]];
    const refused = await send('POST', `/api/studies/${id}/sources`, sources, GEOJSON);
    const body = await expectError(refused, 422);
    expect(body.issues).toContainEqual({
      path: 'sources.features[0].geometry.coordinates[2]',
      message: 'line 2 has 1 point; expected at least 2 points per contour',
    });
  });
});

describe('a contoured source through the editor upload', () => {
  const upload = (text: string) =>
    page.app.request(`/studies/${id}/edit/sources-geojson`, {
      method: 'POST',
      body: fileForm('slab.geojson', 'application/geo+json', text),
    });

  test('a sources file with contours is saved', async () => {
    const response = await upload(JSON.stringify(slabStudy().sources));
    expect(response.status).toBe(303);
    const saved = JSON.parse(page.ctx.store.studies.get(id)?.document as string);
    expect(saved.sources.features[0].properties.contourDepthsKm).toEqual([5, 20, 35]);
  });

  test('a file with a backwards contour is shown again with the line and point named; nothing is saved', async () => {
    const before = page.ctx.store.studies.get(id)?.document;
    const sources = slabStudy().sources;
    sources.features[0].geometry.coordinates = backwardsContours();
    const response = await upload(JSON.stringify(sources));
    expect(response.status).toBe(422);
    expect(await response.text()).toMatch(
      /line 1 runs backwards \(from point 0 at \[-140\.4, -47\.2\]/,
    );
    expect(page.ctx.store.studies.get(id)?.document).toBe(before);
  });
});

describe('the zone depths on the overview', () => {
  test('one row for the zone: its cells, shallowest, median and deepest depth and the surface it follows', async () => {
    const depths = (results.diagnostics?.zoneDepths[0]?.cells ?? [])
      .map((c) => c.depths[0]?.depthKm as number)
      .sort((a, b) => a - b);
    const page = await html(`/studies/${id}`);
    const row = /<tr data-source="slab-deep">([\s\S]*?)<\/tr>/.exec(page)?.[1] ?? '';
    const cells = [...row.matchAll(/<t[dh][^>]*>([^<]*)<\/t[dh]>/g)].map((m) => m[1]);
    expect(cells).toEqual([
      'Deep slab',
      String(depths.length),
      (depths[0] as number).toFixed(1),
      ((depths[(depths.length - 1) >> 1]! + depths[depths.length >> 1]!) / 2).toFixed(1),
      (depths.at(-1) as number).toFixed(1),
      '10 km under the surface Slab top',
    ]);
    // Every depth is the slab's (5 to 35 km) plus 10 km.
    expect(depths[0]).toBeGreaterThanOrEqual(15);
    expect(depths.at(-1)).toBeLessThanOrEqual(45);
  });

  test('in French', async () => {
    const page = await html(`/studies/${id}`, 'fr');
    expect(page).toContain('Profondeur des séismes des zones');
    expect(page).toContain('10 km sous la surface Slab top');
  });
});

describe('"below" only for a village over the slab', () => {
  /** The text of the nearest-faults item for the slab on a community page. */
  const slabLine = async (cid: string, lang: string) => {
    const text = await html(`/studies/${id}/communities/${cid}`, lang);
    const item = /<li data-source="slab-top">([\s\S]*?)<\/li>/.exec(text)?.[1] ?? '';
    return item.replace(/<[^>]+>/g, '');
  };

  test('over the mesh: its depth there, in English and French', async () => {
    expect(await slabLine('over-cove', 'en')).toBe('Slab top: about 25 km below this place');
    expect(await slabLine('over-cove', 'fr')).toBe('Slab top: à environ 25 km sous cet endroit');
  });

  test('beyond its edge: a distance and a direction, never "below" or "beneath"', async () => {
    // 0.4° of longitude at 47.5° S: 0.4 × 111.32 km × cos 47.5° = 30.1 km (spherical, hand).
    const en = await slabLine('far-hill', 'en');
    expect(en).toBe('Slab top: 30 km to the west');
    expect(en).not.toMatch(/below|beneath/);
    const fr = await slabLine('far-hill', 'fr');
    expect(fr).toBe('Slab top: à 30 km à l’ouest');
    expect(fr).not.toMatch(/sous/);
  });
});

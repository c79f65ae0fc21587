import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../api/service/app.ts';
import type { ServiceContext } from '../../../api/operations/service-context.ts';
import type { Store } from '../../../api/store/store.ts';
import { expectRelative } from '../../helpers/close.ts';
import { expectError } from '../helpers/assertions.ts';
import { tempDir } from '../helpers/service-process.ts';
import {
  EXCEEDANCE_AT_LEVELS,
  MEDIAN_PGA_G,
  RATE_PER_YEAR,
  poissonChance,
  smallStudy,
} from '../helpers/small-study.ts';
import { closeServiceContext, testServiceContext } from '../helpers/test-context.ts';
import { saveDemoStudy } from '../helpers/saved-study.ts';

/*
 * Map runs through app.request(), kept in the store. The small study (one earthquake straight
 * below one village, Cornell et al. 1979) has a study area of one point, so its map is one
 * point above the source: the chance of exceeding the median PGA there is the Poisson chance of
 * rate × 1/2 (half of the truncated normal lies above its median; small-study.ts), and the
 * level with a return period of 1 / (rate × that half) is the median itself.
 */
const dir = tempDir();
let store: Store;
let ctx: ServiceContext;
let studyId: string;
let demoId: string;

beforeAll(async () => {
  ctx = testServiceContext(`${dir.path}/maps.db`, 1e9);
  store = ctx.store;
  const created = await app().request('/api/studies', json('POST', smallStudy()));
  studyId = ((await created.json()) as { id: string }).id;
  demoId = saveDemoStudy(store);
});
afterAll(async () => {
  await closeServiceContext(ctx);
  dir.remove();
});

let shared: ReturnType<typeof createApp> | undefined;
const app = () => (shared ??= createApp(ctx, { logError: () => {} }));
const json = (method: string, body: unknown): RequestInit => ({
  method,
  headers: { 'Content-Type': 'application/json' },
  body: JSON.stringify(body),
});

async function finished(id: string): Promise<Record<string, any>> {
  for (let i = 0; i < 1200; i++) {
    const run = (await (await app().request(`/api/maps/${id}`)).json()) as Record<string, any>;
    if (run.status !== 'queued' && run.status !== 'running') return run;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('the map did not finish');
}

async function startMap(id: string, body: Record<string, unknown>): Promise<Record<string, any>> {
  const response = await app().request(`/api/studies/${id}/maps`, json('POST', body));
  const text = await response.text();
  expect(response.status, text).toBe(202);
  const started = JSON.parse(text) as Record<string, any>;
  expect(response.headers.get('location')).toBe(`/api/maps/${started.id}`);
  return started;
}

describe('map runs', () => {
  it('POST /api/studies/:id/maps records a queued run (202) whose status shows progress, then its GeoJSON, kept in the store', async () => {
    const started = await startMap(studyId, {
      level: MEDIAN_PGA_G,
      horizonYears: 50,
      spacingKm: 5,
    });
    expect(started).toMatchObject({
      studyId,
      status: 'queued',
      progress: 0,
      map: null,
      provenance: null,
      startedAt: null,
      finishedAt: null,
      links: { geojson: `/api/maps/${started.id}/map.geojson` },
    });
    expect(started.request).toEqual({
      measure: 'PGA',
      quantity: { kind: 'chance', level: MEDIAN_PGA_G, horizonYears: 50 },
      spacingKm: 5,
      vs30: 760,
    });
    const done = await finished(started.id);
    expect(done.error).toBeNull();
    expect(done).toMatchObject({
      status: 'done',
      progress: 1,
      error: null,
      warnings: [],
      map: {
        count: 1,
        measure: 'PGA',
        vs30: 760,
        quantity: { kind: 'chance', level: MEDIAN_PGA_G, horizonYears: 50 },
      },
    });
    expect(done.provenance).toMatchObject({
      tool: 'tremora',
      toolVersion: 'test',
      inputHash: done.inputHash,
      models: { crustal: [{ model: 'Cornell79', weight: 1 }] },
      map: started.request,
    });
    expect(done.startedAt <= done.finishedAt).toBe(true);

    const geo = await app().request(`/api/maps/${started.id}/map.geojson`);
    expect(geo.headers.get('content-type')).toMatch(/^application\/geo\+json/);
    const text = await geo.text();
    expect(text).toBe(store.maps.geojson(started.id));
    const doc = JSON.parse(text) as any;
    expect(doc.type).toBe('FeatureCollection');
    expect(doc.features).toHaveLength(1);
    expect(doc.features[0].properties.unit).toBe('probability');
    expectRelative(
      doc.features[0].properties.value,
      poissonChance(RATE_PER_YEAR * EXCEEDANCE_AT_LEVELS[1]!, 50),
      1e-9,
      'Poisson chance of rate × 1/2 over 50 years (Cornell et al. 1979 median; Baker 2008 Poisson)',
    );
    const list = (await (await app().request(`/api/studies/${studyId}/maps`)).json()) as {
      maps: { id: string; status: string }[];
    };
    expect(list.maps.map((m) => m.id)).toContain(started.id);
    expect(store.maps.get(started.id)?.status).toBe('done');
  });

  it('a return-period map at 1 / (rate × 1/2) years puts the median PGA at the point above the source', async () => {
    const years = 1 / (RATE_PER_YEAR * EXCEEDANCE_AT_LEVELS[1]!);
    const started = await startMap(studyId, { returnPeriodYears: years, spacingKm: 5, vs30: 500 });
    const done = await finished(started.id);
    expect(done).toMatchObject({
      status: 'done',
      map: { count: 1, unit: 'g', vs30: 500 },
      request: { vs30: 500, quantity: { kind: 'return-period', returnPeriodYears: years } },
    });
    const doc = JSON.parse(store.maps.geojson(started.id) as string) as any;
    expect(doc.features[0].properties.status).toBe('ok');
    // The curve's levels sit at the median and one sigma either side; the rate at the median is 1/years exactly, so log–log reading returns that level.
    expectRelative(
      doc.features[0].properties.value,
      MEDIAN_PGA_G,
      1e-9,
      'median PGA of Cornell et al. (1979) at R = 10 km, M 6.5 (Baker 2008, from memory), the level whose rate is rate × 1/2',
    );
  });

  it('lists every problem of a map request (422), in the one error shape, and records nothing', async () => {
    const before = store.maps.listForStudy(studyId).length;
    const body = await expectError(
      await app().request(
        `/api/studies/${studyId}/maps`,
        json('POST', {
          returnPeriodYears: 475,
          level: 0.1,
          horizonYears: 50,
          spacingKm: 0.01,
          colour: 'red',
        }),
      ),
      422,
    );
    expect(body.issues.map((i) => i.path).sort()).toEqual([
      'colour',
      'returnPeriodYears',
      'spacingKm',
    ]);
    expect(store.maps.listForStudy(studyId)).toHaveLength(before);
  });

  it('refuses a map over the work budget (422, size and budget) and records nothing', async () => {
    const tight = createApp({ ...ctx, workBudget: 10 }, { logError: () => {} });
    const before = store.maps.listForStudy(demoId).length;
    const body = await expectError(
      await tight.request(
        `/api/studies/${demoId}/maps`,
        json('POST', { returnPeriodYears: 475, spacingKm: 50 }),
      ),
      422,
    );
    expect(body.budget).toBe(10);
    expect(body.error).toMatch(/map points x \d+ ruptures x 7 levels read/);
    expect(store.maps.listForStudy(demoId)).toHaveLength(before);
  });

  it('404 for an unknown study or map; 409 for the GeoJSON of a map not done and for cancelling a finished one', async () => {
    await expectError(
      await app().request(
        '/api/studies/none-such/maps',
        json('POST', { returnPeriodYears: 475, spacingKm: 5 }),
      ),
      404,
    );
    await expectError(await app().request('/api/maps/none-such'), 404);
    await expectError(await app().request('/api/maps/none-such/map.geojson'), 404);
    await expectError(await app().request('/api/maps/none-such/cancel', { method: 'POST' }), 404);
    const { id } = await startMap(studyId, { returnPeriodYears: 475, spacingKm: 5 });
    const early = await app().request(`/api/maps/${id}/map.geojson`);
    if (early.status !== 200) await expectError(early, 409);
    await finished(id);
    await expectError(await app().request(`/api/maps/${id}/cancel`, { method: 'POST' }), 409);
  });

  it('cancels a map on request: cancelled, no GeoJSON in the store or the API, and it stays so', async () => {
    const { id } = await startMap(demoId, { returnPeriodYears: 475, spacingKm: 20 });
    const response = await app().request(`/api/maps/${id}/cancel`, { method: 'POST' });
    expect(response.status).toBe(202);
    const done = await finished(id);
    expect(done.status).toBe('cancelled');
    expect(done.error).toMatch(/^cancelled on request after \d+% of the points$/);
    expect(store.maps.geojson(id)).toBeUndefined();
    expect(
      (
        store.db.prepare('SELECT geojson FROM map_runs WHERE id = ?').get(id) as {
          geojson: string | null;
        }
      ).geojson,
    ).toBeNull();
    await expectError(await app().request(`/api/maps/${id}/map.geojson`), 409);
    await expectError(await app().request(`/api/maps/${id}/cancel`, { method: 'POST' }), 409);
  });

  it("lists a study's maps oldest first; deleting the study deletes its maps", async () => {
    const created = await app().request('/api/studies', json('POST', smallStudy('Goes away')));
    const goneId = ((await created.json()) as { id: string }).id;
    const first = await startMap(goneId, { level: MEDIAN_PGA_G, horizonYears: 50, spacingKm: 5 });
    const second = await startMap(goneId, { returnPeriodYears: 475, spacingKm: 5 });
    await finished(first.id);
    await finished(second.id);
    const list = (await (await app().request(`/api/studies/${goneId}/maps`)).json()) as {
      maps: { id: string }[];
    };
    expect(list.maps.map((m) => m.id)).toEqual([first.id, second.id]);
    expect((await app().request(`/api/studies/${goneId}`, { method: 'DELETE' })).status).toBe(204);
    await expectError(await app().request(`/api/maps/${first.id}`), 404);
    expect(store.maps.get(second.id)).toBeUndefined();
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { createApp } from '../../../api/service/app.ts';
import type { ServiceContext } from '../../../api/service/service-context.ts';
import { openStore, type Store } from '../../../api/store/store.ts';
import { RunScheduler } from '../../../api/workers/run-scheduler.ts';
import { WorkerPool } from '../../../api/workers/worker-pool.ts';
import { expectRelative } from '../../helpers/close.ts';
import { expectError } from '../helpers/assertions.ts';
import { tempDir } from '../helpers/service-process.ts';
import { EXCEEDANCE_AT_LEVELS, MEDIAN_PGA_G, RATE_PER_YEAR, poissonChance, smallStudy } from '../helpers/small-study.ts';

/*
 * Map runs through app.request(). The small study (one earthquake straight below one village,
 * Cornell et al. 1979) has a study area of one point, so its map is one point above the source:
 * the chance of exceeding the median PGA there is the Poisson chance of rate × 1/2 (half of the
 * truncated normal lies above its median; small-study.ts).
 */
const dir = tempDir();
let store: Store;
let ctx: ServiceContext;
let studyId: string;

beforeAll(async () => {
  store = openStore(`${dir.path}/maps.db`);
  const runPool = new WorkerPool({ size: 1, log: () => {} });
  const quickPool = new WorkerPool({ size: 1, log: () => {} });
  ctx = { store, runPool, quickPool, scheduler: new RunScheduler({ store, pool: runPool, toolVersion: 'test' }), models: modelCatalog, toolVersion: 'test', workBudget: 1e9 };
  const created = await app().request('/api/studies', json('POST', smallStudy()));
  studyId = ((await created.json()) as { id: string }).id;
});
afterAll(async () => {
  await Promise.all([ctx.runPool.close(), ctx.quickPool.close()]);
  store.close();
  dir.remove();
});

let shared: ReturnType<typeof createApp> | undefined;
const app = () => (shared ??= createApp(ctx, { logError: () => {} }));
const json = (method: string, body: unknown): RequestInit => ({ method, headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });

async function finished(id: string): Promise<Record<string, any>> {
  for (let i = 0; i < 600; i++) {
    const run = (await (await app().request(`/api/maps/${id}`)).json()) as Record<string, any>;
    if (run.status !== 'running') return run;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('the map did not finish');
}

describe('map runs', () => {
  it('POST /api/studies/:id/maps starts a run (202) whose status shows progress, then its GeoJSON', async () => {
    const response = await app().request(`/api/studies/${studyId}/maps`, json('POST', { level: MEDIAN_PGA_G, horizonYears: 50, spacingKm: 5 }));
    expect(response.status).toBe(202);
    const started = (await response.json()) as Record<string, any>;
    expect(response.headers.get('location')).toBe(`/api/maps/${started.id}`);
    expect(started).toMatchObject({ studyId, status: 'running', links: { geojson: `/api/maps/${started.id}/map.geojson` } });
    const done = await finished(started.id);
    expect(done.error).toBeNull();
    expect(done).toMatchObject({ status: 'done', progress: 1, error: null, map: { count: 1, measure: 'PGA', quantity: { kind: 'chance', level: MEDIAN_PGA_G, horizonYears: 50 } } });
    const geo = await app().request(`/api/maps/${started.id}/map.geojson`);
    expect(geo.headers.get('content-type')).toMatch(/^application\/geo\+json/);
    const doc = (await geo.json()) as any;
    expect(doc.type).toBe('FeatureCollection');
    expect(doc.features).toHaveLength(1);
    expect(doc.features[0].properties.unit).toBe('probability');
    expectRelative(doc.features[0].properties.value, poissonChance(RATE_PER_YEAR * EXCEEDANCE_AT_LEVELS[1]!, 50), 1e-9, 'Poisson chance of rate × 1/2 over 50 years (Cornell et al. 1979 median; Baker 2008 Poisson)');
    const list = (await (await app().request(`/api/studies/${studyId}/maps`)).json()) as { maps: { id: string }[] };
    expect(list.maps.map((m) => m.id)).toContain(started.id);
  });

  it('lists every problem of a map request (422), in the one error shape', async () => {
    const body = await expectError(await app().request(`/api/studies/${studyId}/maps`, json('POST', { returnPeriodYears: 475, level: 0.1, horizonYears: 50, spacingKm: 0.01, colour: 'red' })), 422);
    expect(body.issues.map((i) => i.path).sort()).toEqual(['colour', 'returnPeriodYears', 'spacingKm']);
  });

  it('404 for an unknown study or map; 409 for the GeoJSON of a map not done and for cancelling a finished one', async () => {
    await expectError(await app().request('/api/studies/none-such/maps', json('POST', { returnPeriodYears: 475, spacingKm: 5 })), 404);
    await expectError(await app().request('/api/maps/none-such'), 404);
    const response = await app().request(`/api/studies/${studyId}/maps`, json('POST', { returnPeriodYears: 475, spacingKm: 5 }));
    const { id } = (await response.json()) as { id: string };
    const early = await app().request(`/api/maps/${id}/map.geojson`);
    if (early.status !== 200) await expectError(early, 409);
    await finished(id);
    await expectError(await app().request(`/api/maps/${id}/cancel`, { method: 'POST' }), 409);
  });
});

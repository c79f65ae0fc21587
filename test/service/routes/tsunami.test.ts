import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TsunamiResult } from '../../../api/engine/tsunami/index.ts';
import { seedDemoStudy } from '../../../api/operations/demo-seed.ts';
import { startPageApp, type PageApp } from '../../web/helpers/page-app.ts';
import { smallStudy } from '../helpers/small-study.ts';

let page: PageApp;
let demoId: string;

beforeAll(() => {
  page = startPageApp();
  const seed = seedDemoStudy(page.ctx.store, page.ctx.models);
  if (!seed.seeded) throw new Error(JSON.stringify(seed.issues));
  demoId = seed.id;
});
afterAll(async () => page?.close());

describe('GET /api/studies/:id/tsunami', () => {
  it('gives each coastal village of the demo its first arrival, high ground and the caution', async () => {
    const response = await page.app.request(
      `/api/studies/${demoId}/tsunami?source=orle-interface&highGroundM=20`,
    );
    expect(response.status).toBe(200);
    const body = (await response.json()) as TsunamiResult & { caution: string };
    expect(body.communities.map((c) => c.id)).toEqual([
      'harbour-point',
      'orlemouth',
      'saltreach',
      'vennick-bay',
      'quillan-landing',
      'lisk-head',
    ]);
    for (const c of body.communities) expect(Number.isInteger(c.firstArrivalMinutes)).toBe(true);
    expect(body.highGroundM).toBe(20);
    // Lisk Head stands at 25 m (its elevationM), above 20 m.
    expect(body.communities.find((c) => c.id === 'lisk-head')?.highGround).toMatchObject({
      kind: 'already-above',
      elevationM: 25,
    });
    expect(body.caution).toMatch(/not a warning/);
  });

  it('answers bad requests and studies without terrain with 4xx and the error shape', async () => {
    const bad = await page.app.request(`/api/studies/${demoId}/tsunami?highGroundM=-3&depth=2`);
    expect(bad.status).toBe(422);
    const body = (await bad.json()) as { error: string; issues: { path: string }[] };
    expect(body.issues.map((i) => i.path).sort()).toEqual(['depth', 'highGroundM']);
    expect((await page.app.request('/api/studies/none-such/tsunami')).status).toBe(404);
    const { id } = page.ctx.store.studies.create({
      name: 'No terrain',
      document: JSON.stringify(smallStudy()),
    });
    const none = await page.app.request(`/api/studies/${id}/tsunami`);
    expect(none.status).toBe(422);
    expect(JSON.stringify(await none.json())).toMatch(/names no terrain grid/);
  });

  it('refuses a terrain name that is a path', async () => {
    const study = { ...smallStudy(), terrain: '../package.json' };
    const { id } = page.ctx.store.studies.create({
      name: 'Path terrain',
      document: JSON.stringify(study),
    });
    const response = await page.app.request(`/api/studies/${id}/tsunami`);
    expect(response.status).toBe(422);
    expect(JSON.stringify(await response.json())).toMatch(/bare file name/);
  });
});

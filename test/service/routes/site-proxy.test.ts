import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { expectRelative } from '../../helpers/close.ts';
import { runFinished, startPageApp, type PageApp } from '../../web/helpers/page-app.ts';
import { COMMUNITY, MEDIAN_PGA_G, smallStudy } from '../helpers/small-study.ts';

/**
 * A study stored through the service that names a terrain grid: its community without vs30 or
 * a site class takes the slope–Vs30 proxy, and the community page and the run's JSON and
 * GeoJSON exports say so. The grid is project-made: 0.01° cells from 141° W to 140° W and 48° S
 * to 47° S, land rising northwards by 0.03 m per metre, TREMORA_TERRAIN_DIR pointing at it.
 */
const SLOPE = 0.03;
/** Metres per degree of latitude on the mean sphere (R1 = 6,371,008.8 m, Moritz 2000). */
const METRES_PER_DEGREE = (6_371_008.8 * Math.PI) / 180;

function rampAscii(): string {
  const cell = 0.01;
  const lines: string[] = [];
  for (let r = 0; r < 100; r += 1) {
    const lat = -47 - (r + 0.5) * cell;
    const z = 50 + SLOPE * (lat + 48) * METRES_PER_DEGREE;
    lines.push(Array.from({ length: 100 }, () => z.toFixed(4)).join(' '));
  }
  return `ncols 100\nnrows 100\nxllcorner -141\nyllcorner -48\ncellsize 0.01\nNODATA_value -9999\n${lines.join('\n')}\n`;
}

let page: PageApp;
let terrainDir: string;
const before = process.env.TREMORA_TERRAIN_DIR;

beforeAll(() => {
  terrainDir = mkdtempSync(join(tmpdir(), 'tremora-terrain-'));
  writeFileSync(join(terrainDir, 'ramp.asc'), rampAscii());
  process.env.TREMORA_TERRAIN_DIR = terrainDir;
  page = startPageApp();
});
afterAll(async () => {
  await page.close();
  rmSync(terrainDir, { recursive: true, force: true });
  if (before === undefined) delete process.env.TREMORA_TERRAIN_DIR;
  else process.env.TREMORA_TERRAIN_DIR = before;
});

/** The small study with its community's vs30 left out and a terrain grid named. */
function studyOnTerrain(terrain: string): Record<string, unknown> {
  const doc = smallStudy('Proxy villages');
  const { vs30: _, ...bare } = COMMUNITY;
  return { ...doc, communities: [bare], terrain };
}

const create = (doc: Record<string, unknown>) =>
  page.app.request('/api/studies', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(doc),
  });

describe('stored studies and the slope–Vs30 proxy', () => {
  test('a community without a site takes the proxy, shown as such on its page and in the exports', async () => {
    const created = await create(studyOnTerrain('ramp.asc'));
    expect(created.status, await created.clone().text()).toBe(201);
    const { id } = (await created.json()) as { id: string };

    // A slope of 0.03 m/m lies in the 0.018–0.05 row of Wald & Allen (2007) Table 1 (active
    // regions; slope bounds from memory, as api/engine/terrain/slope-vs30.ts says), class C
    // 360–490 m/s. 0.03 = √(0.018 × 0.05), so the log–log interpolation gives √(360 × 490) m/s.
    const expectedVs30 = Math.sqrt(360 * 490);
    const editor = await (await page.app.request(`/studies/${id}/edit`)).text();
    expect(editor).toContain('420 m/s from the slope of the land (class C), not measured');
    const started = await page.app.request(`/api/studies/${id}/runs`, { method: 'POST' });
    expect(started.status).toBe(202);
    const runId = ((await started.json()) as { id: string }).id;
    expect(await runFinished(page.ctx, runId)).toBe('done');
    const results = (await (await page.app.request(`/api/runs/${runId}/results`)).json()) as {
      communities: { communityId: string; vs30Proxy?: Record<string, unknown> }[];
    };
    const result = results.communities.find((c) => c.communityId === COMMUNITY.id);
    expect(result?.vs30Proxy).toMatchObject({ siteClass: 'C', vs30Range: [360, 760] });
    expectRelative(Number(result?.vs30Proxy?.slope), SLOPE, 1e-6, 'the ramp of the grid');
    expectRelative(
      Number(result?.vs30Proxy?.vs30),
      expectedVs30,
      1e-5,
      'Wald & Allen (2007) Table 1',
    );
    const communityPage = await (
      await page.app.request(`/studies/${id}/communities/${COMMUNITY.id}`)
    ).text();
    expect(communityPage).toContain(
      'estimated from the slope of the land, not measured: class C, likely 360 to 760 m/s',
    );

    const geojson = (await (
      await page.app.request(`/api/runs/${runId}/results.geojson`)
    ).json()) as { features: { properties: Record<string, unknown> }[] };
    expect(geojson.features[0]?.properties.vs30Basis).toBe('slope-proxy');
  });

  test('a grid the service cannot read is named, with status 422', async () => {
    const response = await create(studyOnTerrain('missing.asc'));
    expect(response.status).toBe(422);
    const body = (await response.json()) as { issues: { path: string; message: string }[] };
    expect(body.issues.map((i) => i.path)).toContain('terrain');
    expect(body.issues.find((i) => i.path === 'terrain')?.message).toMatch(/missing\.asc/);
  });
  test('a hazard map without a Vs30 asked for takes the proxy at each point on land', async () => {
    // BSSA14 has a Vs30 term (Cornell79 has none), so the proxy shows in the values.
    const doc = {
      ...studyOnTerrain('ramp.asc'),
      groundMotion: { crustal: [{ model: 'BSSA14', weight: 1 }] },
    };
    const created = await create(doc);
    expect(created.status, await created.clone().text()).toBe(201);
    const { id } = (await created.json()) as { id: string };
    const map = async (vs30?: number) => {
      const response = await page.app.request(`/api/studies/${id}/maps`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({
          level: MEDIAN_PGA_G,
          horizonYears: 50,
          spacingKm: 5,
          ...(vs30 === undefined ? {} : { vs30 }),
        }),
      });
      expect(response.status, await response.clone().text()).toBe(202);
      const mapId = ((await response.json()) as { id: string }).id;
      let run: { status: string; warnings: string[] } = { status: 'queued', warnings: [] };
      for (let i = 0; i < 1200 && ['queued', 'running'].includes(run.status); i++) {
        await new Promise((r) => setTimeout(r, 50));
        run = (await (await page.app.request(`/api/maps/${mapId}`)).json()) as typeof run;
      }
      expect(run.status).toBe('done');
      const geojson = (await (await page.app.request(`/api/maps/${mapId}/map.geojson`)).json()) as {
        features: { properties: { value: number | null } }[];
      };
      return { warnings: run.warnings, values: geojson.features.map((f) => f.properties.value) };
    };
    const proxied = await map();
    expect(proxied.warnings.join(' ')).toMatch(/proxy from the topographic slope of ramp\.asc/);
    // The ramp is 0.03 m/m everywhere, so every point on it takes √(360 × 490) m/s (above).
    const atProxy = await map(Math.sqrt(360 * 490));
    const atDefault = await map(760);
    const inner = proxied.values.findIndex((v, i) => v !== atDefault.values[i]);
    expect(inner).toBeGreaterThanOrEqual(0);
    expectRelative(
      proxied.values[inner] as number,
      atProxy.values[inner] as number,
      // The grid's elevations are written to 0.1 mm, so its slope is 0.03 to about 1e-7.
      1e-6,
      'the same point mapped with the proxy Vs30 asked for',
    );
  });
});

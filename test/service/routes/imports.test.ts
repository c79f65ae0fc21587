import { describe, expect, it } from 'vitest';
import { expectError, expectSecurityHeaders } from '../helpers/assertions.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import { COMMUNITIES_CSV, smallStudy, sourcesCollection } from '../helpers/small-study.ts';

const service = serviceForFile('imports');

interface Imported {
  id: string;
  imported: { communities?: number; sources?: number };
  warnings: { path: string; message: string }[];
}

async function newStudy(): Promise<string> {
  const response = await service.fetch(
    '/api/studies',
    jsonInit('POST', smallStudy('Import target')),
  );
  return ((await response.json()) as { id: string }).id;
}

const document = async (id: string) =>
  await (await service.fetch(`/api/studies/${id}/document`)).text();
const csvInit = (text: string): RequestInit => ({
  method: 'POST',
  headers: { 'Content-Type': 'text/csv; charset=utf-8' },
  body: text,
});

describe('POST /api/studies/:id/communities (CSV)', () => {
  it("replaces the study's communities and keeps the CSV beside it", async () => {
    const id = await newStudy();
    const response = await service.fetch(
      `/api/studies/${id}/communities`,
      csvInit(COMMUNITIES_CSV),
    );
    expect(response.status).toBe(200);
    expectSecurityHeaders(response);
    const body = (await response.json()) as Imported;
    expect(body.imported).toEqual({ communities: 2 });
    const read = (await (await service.fetch(`/api/studies/${id}`)).json()) as {
      document: { communities: unknown };
      communitiesCsv: string;
    };
    expect(read.document.communities).toBe('communities.csv');
    expect(read.communitiesCsv).toBe(COMMUNITIES_CSV);
  });

  it('validates before writing: a bad row is a 422 naming its line, and nothing changes', async () => {
    const id = await newStudy();
    const before = await document(id);
    const bad = COMMUNITIES_CSV.replace('-47.6', '-147.6');
    const body = await expectError(
      await service.fetch(`/api/studies/${id}/communities`, csvInit(bad)),
      422,
    );
    expect(body.issues.map((i) => i.path)).toEqual(['communities[line 3].lat']);
    expect(await document(id)).toBe(before);
  });

  it('refuses another content type (415) and an unknown study (404)', async () => {
    const id = await newStudy();
    await expectError(
      await service.fetch(`/api/studies/${id}/communities`, jsonInit('POST', COMMUNITIES_CSV)),
      415,
    );
    await expectError(
      await service.fetch('/api/studies/none-such/communities', csvInit(COMMUNITIES_CSV)),
      404,
    );
  });
});

describe('POST /api/studies/:id/sources (GeoJSON)', () => {
  it("replaces the study's sources", async () => {
    const id = await newStudy();
    const response = await service.fetch(`/api/studies/${id}/sources`, {
      ...jsonInit('POST', sourcesCollection()),
      headers: { 'Content-Type': 'application/geo+json' },
    });
    expect(response.status).toBe(200);
    expect(((await response.json()) as Imported).imported).toEqual({ sources: 2 });
    const read = (await (await service.fetch(`/api/studies/${id}`)).json()) as {
      document: { sources: unknown };
    };
    expect(read.document.sources).toEqual(sourcesCollection());
  });

  it('validates before writing: every problem listed with its path in the study, nothing changes', async () => {
    const id = await newStudy();
    const before = await document(id);
    const bad = sourcesCollection() as { features: { properties: Record<string, unknown> }[] };
    bad.features[1]!.properties.setting = 'undersea';
    bad.features[1]!.properties.depthKm = -3;
    const body = await expectError(
      await service.fetch(`/api/studies/${id}/sources`, jsonInit('POST', bad)),
      422,
    );
    expect(body.issues.map((i) => i.path).sort()).toEqual([
      'sources.features[1].properties.depthKm',
      'sources.features[1].properties.setting',
    ]);
    expect(await document(id)).toBe(before);
  });

  it('400 for malformed GeoJSON text', async () => {
    const id = await newStudy();
    await expectError(
      await service.fetch(
        `/api/studies/${id}/sources`,
        jsonInit('POST', '{"type": "FeatureCollection", '),
      ),
      400,
    );
  });
});

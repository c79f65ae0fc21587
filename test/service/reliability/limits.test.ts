import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_SCENARIO_GRID_POINTS } from '../../../api/engine/scenario/index.ts';
import { DEFAULT_BODY_LIMIT_BYTES } from '../../../api/service/app.ts';
import { MAX_COMMUNITIES } from '../../../api/study/community-schema.ts';
import { MAX_LISTED_ISSUES } from '../../../api/study/issues.ts';
import { MAX_JSON_DEPTH } from '../../../api/study/json-text.ts';
import { MAX_RUPTURES } from '../../../api/study/rupture-estimate.ts';
import { MAX_STUDY_VERTICES, MAX_VERTICES } from '../../../api/study/source-geometry.ts';
import { MAX_SOURCES } from '../../../api/study/source-schema.ts';
import { serviceForFile } from '../helpers/service-process.ts';
import { smallStudy } from '../helpers/small-study.ts';
import { answerProblem } from './answer-checks.ts';
import { type Answer, closeClient, send } from './http-client.ts';
import { boxRing } from '../../helpers/box-ring.ts';

/**
 * Limits: body size, JSON nesting depth, vertices per geometry and per study,
 * communities and sources per study, scenario grid size, ruptures per study, issues listed.
 * Each is answered 413 or 422 with the limit named in the answer, and a request just within
 * it is accepted. The limits are read from the code that keeps them.
 */

const service = serviceForFile('limits', { TREMORA_WORKERS: '1' });
let studyId: string;
const figures: string[] = [];

beforeAll(async () => {
  const created = await post('/api/studies', smallStudy('Limits'));
  studyId = (JSON.parse(created.text) as { id: string }).id;
});
afterAll(() => {
  closeClient();
  console.log(`limits (status, limit named in the answer):\n  ${figures.join('\n  ')}`);
});

const utf8 = (text: string) => new TextEncoder().encode(text);

async function post(path: string, body: unknown, type = 'application/json'): Promise<Answer> {
  const text = typeof body === 'string' ? body : JSON.stringify(body);
  const answer = await send(service.url, {
    method: 'POST',
    path,
    headers: { 'content-type': type },
    body: utf8(text),
  });
  if ('error' in answer) throw new Error(`POST ${path}: no answer (${answer.error})`);
  return answer;
}

/** Asserts `answer` refuses with `status` in the error shape and names `limit` (and `path`, if given). */
function expectRefusal(
  label: string,
  answer: Answer,
  status: number,
  limit: number,
  path?: string,
): void {
  expect(answerProblem(answer, 'POST'), label).toBeUndefined();
  expect(answer.status, `${label}: ${answer.text.slice(0, 300)}`).toBe(status);
  const body = JSON.parse(answer.text) as {
    error: string;
    issues: { path: string; message: string }[];
  };
  const said = [body.error, ...body.issues.map((i) => `${i.path}: ${i.message}`)].join(' | ');
  expect(said, label).toContain(String(limit));
  if (path !== undefined)
    expect(
      body.issues.map((i) => i.path),
      label,
    ).toContain(path);
  figures.push(`${label}: ${status}, "${said.slice(0, 160)}${said.length > 160 ? '…' : ''}"`);
}

const pointSource = (i: number, lon = -140.2, lat = -47.4) => ({
  type: 'Feature',
  geometry: { type: 'Point', coordinates: [lon, lat] },
  properties: {
    id: `p${i}`,
    setting: 'crustal',
    mechanism: 'reverse',
    depthKm: 10,
    recurrence: { type: 'fixed', magnitude: 6, rate: 0.001 },
  },
});
const withSources = (features: unknown[]) => ({
  ...smallStudy('Limits'),
  sources: { type: 'FeatureCollection', features },
});
/** A straight trace of `n` vertices about 20 m apart, heading east. */
const trace = (n: number, lat = -47.4) =>
  Array.from({ length: n }, (_, i) => [-140.6 + i * 0.0003, lat]);
const fault = (id: string, coordinates: number[][]) => ({
  type: 'Feature',
  geometry: { type: 'LineString', coordinates },
  properties: {
    id,
    setting: 'crustal',
    mechanism: 'strike-slip',
    dip: 90,
    lowerDepthKm: 12,
    recurrence: { type: 'fixed', magnitude: 6, rate: 0.001 },
  },
});
const community = (i: number, lat = -47.4) => ({
  id: `c${i}`,
  name: `Village ${i}`,
  lon: -140.2,
  lat,
  vs30: 400,
});
const nested = (levels: number): unknown => (levels === 0 ? 1 : [nested(levels - 1)]);

describe('limits, each refused with the limit named', () => {
  it(`body size: over ${DEFAULT_BODY_LIMIT_BYTES} bytes is 413, with or without Content-Length`, async () => {
    const over = JSON.stringify({
      ...smallStudy('Big'),
      padding: 'x'.repeat(DEFAULT_BODY_LIMIT_BYTES),
    });
    expectRefusal(
      'body with Content-Length',
      await post('/api/studies', over),
      413,
      DEFAULT_BODY_LIMIT_BYTES,
    );
    const chunked = await fetch(`${service.url}/api/validate`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: new Blob([over]).stream(),
      duplex: 'half',
    } as RequestInit);
    expectRefusal(
      'chunked body',
      {
        status: chunked.status,
        headers: Object.fromEntries(chunked.headers),
        text: await chunked.text(),
      },
      413,
      DEFAULT_BODY_LIMIT_BYTES,
    );
    expectRefusal(
      'communities CSV body',
      await post(
        `/api/studies/${studyId}/communities`,
        'id,name,lon,lat,vs30\n' + 'x'.repeat(DEFAULT_BODY_LIMIT_BYTES),
        'text/csv',
      ),
      413,
      DEFAULT_BODY_LIMIT_BYTES,
    );
  });

  it(`JSON nesting: deeper than ${MAX_JSON_DEPTH} levels is 422; at the limit it is accepted`, async () => {
    // The document itself is level 1, so its key may hold MAX_JSON_DEPTH - 1 more levels.
    const atLimit = await post('/api/studies', {
      ...smallStudy('Nested'),
      extra: nested(MAX_JSON_DEPTH - 1),
    });
    expect(atLimit.status, atLimit.text).toBe(201);
    expectRefusal(
      'one level deeper',
      await post('/api/studies', { ...smallStudy('Nested'), extra: nested(MAX_JSON_DEPTH) }),
      422,
      MAX_JSON_DEPTH,
      '(body)',
    );
    expectRefusal(
      'a million levels',
      await post('/api/validate', `{"a":${'['.repeat(1_000_000)}${']'.repeat(1_000_000)}}`),
      422,
      MAX_JSON_DEPTH,
      '(body)',
    );
    expectRefusal(
      'deep scenario request',
      await post('/api/scenario', {
        study: smallStudy(),
        sourceId: 'spot-below',
        magnitude: 6,
        x: nested(100),
      }),
      422,
      MAX_JSON_DEPTH,
    );
  });

  it(`vertices: over ${MAX_VERTICES} in one geometry, or ${MAX_STUDY_VERTICES} over all sources, is 422`, async () => {
    const atLimit = await post('/api/validate', withSources([fault('long', trace(MAX_VERTICES))]));
    expect(atLimit.status, atLimit.text).toBe(200);
    expectRefusal(
      'one trace',
      await post('/api/validate', withSources([fault('long', trace(MAX_VERTICES + 1))])),
      422,
      MAX_VERTICES,
      'sources.features[0].geometry.coordinates',
    );
    const many = Array.from({ length: Math.ceil(MAX_STUDY_VERTICES / MAX_VERTICES) + 1 }, (_, k) =>
      fault(`f${k}`, trace(MAX_VERTICES, -47.4 + k * 0.02)),
    );
    expectRefusal(
      'all sources',
      await post('/api/validate', withSources(many)),
      422,
      MAX_STUDY_VERTICES,
      'sources.features',
    );
    const ring = Array.from({ length: MAX_STUDY_VERTICES + 1 }, (_, i) => [
      -140 + Math.cos((2 * Math.PI * i) / MAX_STUDY_VERTICES),
      -47 + Math.sin((2 * Math.PI * i) / MAX_STUDY_VERTICES),
    ]);
    expectRefusal(
      'outline',
      await post('/api/validate', {
        ...smallStudy(),
        outline: { type: 'Polygon', coordinates: [ring] },
      }),
      422,
      MAX_STUDY_VERTICES,
      'outline',
    );
  });

  it(`communities: over ${MAX_COMMUNITIES} in the document or the CSV is 422; ${MAX_COMMUNITIES} are accepted`, async () => {
    const atLimit = await post('/api/validate', {
      ...smallStudy(),
      communities: Array.from({ length: MAX_COMMUNITIES }, (_, i) => community(i)),
    });
    expect(atLimit.status, atLimit.text.slice(0, 300)).toBe(200);
    expectRefusal(
      'document',
      await post('/api/validate', {
        ...smallStudy(),
        communities: Array.from({ length: MAX_COMMUNITIES + 1 }, (_, i) => community(i)),
      }),
      422,
      MAX_COMMUNITIES,
      'communities',
    );
    const csv = [
      'id,name,lon,lat,vs30',
      ...Array.from(
        { length: MAX_COMMUNITIES + 1 },
        (_, i) => `c${i},Village ${i},-140.2,-47.4,400`,
      ),
    ].join('\n');
    expectRefusal(
      'CSV import',
      await post(`/api/studies/${studyId}/communities`, csv, 'text/csv'),
      422,
      MAX_COMMUNITIES,
      'communities',
    );
  });

  it(`sources: over ${MAX_SOURCES} is 422; ${MAX_SOURCES} are accepted`, async () => {
    const atLimit = await post(
      '/api/validate',
      withSources(Array.from({ length: MAX_SOURCES }, (_, i) => pointSource(i))),
    );
    expect(atLimit.status, atLimit.text.slice(0, 300)).toBe(200);
    expectRefusal(
      'document',
      await post(
        '/api/validate',
        withSources(Array.from({ length: MAX_SOURCES + 1 }, (_, i) => pointSource(i))),
      ),
      422,
      MAX_SOURCES,
      'sources.features',
    );
    const collection = {
      type: 'FeatureCollection',
      features: Array.from({ length: MAX_SOURCES + 1 }, (_, i) => pointSource(i)),
    };
    expectRefusal(
      'GeoJSON import',
      await post(`/api/studies/${studyId}/sources`, collection, 'application/geo+json'),
      422,
      MAX_SOURCES,
      'sources.features',
    );
  });

  it(`scenario grid: over ${MAX_SCENARIO_GRID_POINTS} points is 422 with the count and the limit`, async () => {
    // Communities 2° apart: at 0.5 km spacing the map grid would hold about 10^5 points.
    const wide = {
      ...smallStudy(),
      communities: [
        community(1, -47.4),
        community(2, -46.4),
        { ...community(3, -47.4), lon: -138.2 },
      ],
    };
    const coarse = await post('/api/scenario', {
      study: wide,
      sourceId: 'spot-below',
      magnitude: 6,
      gridSpacingKm: 20,
    });
    expect(coarse.status, coarse.text.slice(0, 300)).toBe(200);
    expectRefusal(
      'grid',
      await post('/api/scenario', {
        study: wide,
        sourceId: 'spot-below',
        magnitude: 6,
        gridSpacingKm: 0.5,
      }),
      422,
      MAX_SCENARIO_GRID_POINTS,
    );
  });

  it(`ruptures: a study that would make over ${MAX_RUPTURES} ruptures is 422 before any is built`, async () => {
    const zone = {
      type: 'Feature',
      geometry: {
        type: 'Polygon',
        coordinates: [boxRing(-144, -51, -136, -43)],
      },
      properties: {
        id: 'wide-zone',
        setting: 'crustal',
        mechanism: 'reverse',
        depthKm: 10,
        recurrence: { type: 'gutenberg-richter', bValue: 1, mMin: 0, mMax: 10, rate: 1 },
      },
    };
    const study = {
      ...withSources([zone]),
      settings: { measures: ['PGA'], zoneCellKm: 1, magnitudeStep: 0.01 },
    };
    expectRefusal('validate', await post('/api/validate', study), 422, MAX_RUPTURES, 'sources');
    expectRefusal(
      'scenario',
      await post('/api/scenario', { study, sourceId: 'wide-zone', magnitude: 6 }),
      422,
      MAX_RUPTURES,
      'study.sources',
    );
    // The service is free at once: the refusal came before any work was queued.
    const health = (await (await service.fetch('/api/health')).json()) as {
      workers: { quick: { busy: number; queued: number } };
    };
    expect(health.workers.quick).toMatchObject({ busy: 0, queued: 0 });
  });

  it(`issues: at most ${MAX_LISTED_ISSUES} problems and ${MAX_LISTED_ISSUES} warnings are listed, then one line saying so`, async () => {
    const bad = {
      ...smallStudy(),
      communities: Array.from({ length: MAX_COMMUNITIES }, (_, i) => ({
        ...community(i),
        lat: 99,
        lon: 999,
      })),
    };
    const answer = await post('/api/validate', bad);
    expectRefusal('problems', answer, 422, MAX_LISTED_ISSUES);
    expect((JSON.parse(answer.text) as { issues: unknown[] }).issues).toHaveLength(
      MAX_LISTED_ISSUES + 1,
    );
    const noisy = {
      ...smallStudy(),
      communities: [
        {
          ...community(1),
          ...Object.fromEntries(Array.from({ length: 50_000 }, (_, i) => [`k${i}`, i])),
        },
      ],
    };
    const warned = await post('/api/validate', noisy);
    expect(warned.status).toBe(200);
    const warnings = (JSON.parse(warned.text) as { warnings: { message: string }[] }).warnings;
    expect(warnings).toHaveLength(MAX_LISTED_ISSUES + 1);
    expect(warnings.at(-1)?.message).toContain(String(MAX_LISTED_ISSUES));
    figures.push(
      `warnings: 200 with ${warnings.length} warnings for 50,000 unknown keys (answer ${warned.text.length} bytes)`,
    );
  });
});

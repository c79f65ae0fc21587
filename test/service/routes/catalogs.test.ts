import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../api/service/app.ts';
import type { ServiceContext } from '../../../api/operations/service-context.ts';
import {
  DEFAULT_FIT,
  EAST_ZONE,
  EAST_ZONE_FIT,
  FELT_CATALOG_CSV,
  FELT_EXPECTED,
  feltStudy,
  FIT_CATALOG_CSV,
} from '../../helpers/catalog-fixtures.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { expectError, expectSecurityHeaders } from '../helpers/assertions.ts';
import { expectOnePeriodWeichert } from '../helpers/one-period-weichert.ts';
import { demoStudyId } from '../helpers/runs.ts';
import {
  jsonInit,
  type ServiceProcess,
  startService,
  tempDir,
} from '../helpers/service-process.ts';
import { closeServiceContext, testServiceContext } from '../helpers/test-context.ts';

/** The catalog routes through app.request(), and one happy path against a started server. */
const dir = tempDir();
let ctx: ServiceContext;

beforeAll(() => {
  ctx = testServiceContext(`${dir.path}/catalogs.db`, 1_000);
});
afterAll(async () => {
  await closeServiceContext(ctx);
  dir.remove();
});

const app = () => createApp(ctx);
const fixture = (name: string): string =>
  readFileSync(new URL(`../../catalog/fixtures/${name}`, import.meta.url), 'utf8');
const raw = (method: string, type: string, body: string): RequestInit => ({
  method,
  headers: { 'Content-Type': type },
  body,
});

/** PUTs a catalog body of the given content type to a study's catalog (`query` after the path). */
const putCatalog = (studyId: string, type: string, body: string, query = '') =>
  app().request(`/api/studies/${studyId}/catalog${query}`, raw('PUT', type, body));

async function newStudy(): Promise<string> {
  const response = await app().request('/api/studies', jsonInit('POST', feltStudy()));
  expect(response.status).toBe(201);
  return ((await response.json()) as { id: string }).id;
}

interface CatalogAnswer {
  studyId: string;
  fileName: string;
  format: string;
  importedAt: string;
  summary: {
    loaded: number;
    rejected: number;
    byMagnitudeType: Record<string, number>;
    nonMoment: number;
  };
  rejected: { where: string; line?: number; reasons: string[] }[];
  description: string;
  links: Record<string, string>;
  events?: {
    id: string;
    time: string;
    lon: number;
    lat: number;
    depthKm: number;
    magnitude: number;
    magnitudeType: string;
  }[];
}

/** A new study with a catalog PUT to it, which must be answered 201 (created). */
async function newStudyWithCatalog(type: string, catalog: string) {
  const id = await newStudy();
  const response = await putCatalog(id, type, catalog);
  expect(response.status).toBe(201);
  return { id, response, body: (await response.json()) as CatalogAnswer };
}

describe('PUT /api/studies/:id/catalog', () => {
  it('attaches a CSV catalog (201, Location), then replaces it (200)', async () => {
    const {
      id,
      response: first,
      body,
    } = await newStudyWithCatalog('text/csv; charset=utf-8', FELT_CATALOG_CSV);
    expectSecurityHeaders(first);
    expect(first.headers.get('location')).toBe(`/api/studies/${id}/catalog`);
    expect(body).toMatchObject({
      studyId: id,
      fileName: 'catalog.csv',
      format: 'csv',
      summary: { loaded: 4, rejected: 0, byMagnitudeType: { Mw: 3, ML: 1 }, nonMoment: 1 },
      rejected: [],
      links: {
        self: `/api/studies/${id}/catalog`,
        felt: `/api/studies/${id}/felt`,
        study: `/api/studies/${id}`,
      },
    });
    const second = await putCatalog(
      id,
      'text/csv',
      FIT_CATALOG_CSV,
      '?fileName=network%202024.csv',
    );
    expect(second.status).toBe(200);
    expect(((await second.json()) as CatalogAnswer).fileName).toBe('network 2024.csv');
  });

  it('takes FDSN event text as text/plain and reports the rejected lines', async () => {
    const { body } = await newStudyWithCatalog('text/plain', fixture('small-catalog.txt'));
    // test/catalog/fixtures/small-catalog.txt: lines 4 (30 February), 5 (latitude −95) and 6 (too few fields) are bad.
    expect(body).toMatchObject({
      format: 'fdsn-text',
      fileName: 'catalog.txt',
      summary: {
        loaded: 4,
        rejected: 3,
        byMagnitudeType: { Mw: 1, ML: 1, Mwc: 1, unknown: 1 },
        nonMoment: 2,
      },
    });
    expect(body.rejected.map((r) => r.where)).toEqual(['line 4', 'line 5', 'line 6']);
    expect(body.description).toMatch(/^Loaded 4 events; rejected 3\. Rejected: line 4: /);
  });

  it('takes QuakeML as application/xml, and JSON { fileName, format, text }', async () => {
    const { id, body: quakeml } = await newStudyWithCatalog(
      'application/xml',
      fixture('small-catalog.quakeml'),
    );
    // test/catalog/fixtures/small-catalog.quakeml: events 1, 2 and 5 (no depth) load; 3 (no such origin) and 4 (a quarry blast) do not.
    expect(quakeml).toMatchObject({
      format: 'quakeml',
      fileName: 'catalog.xml',
      summary: { loaded: 3, rejected: 2, withoutDepth: 1 },
    });
    expect(quakeml.rejected.map((r) => r.where)).toEqual([
      'event 3 (smi:local/event/3)',
      'event 4 (smi:local/event/4)',
    ]);
    const json = await app().request(
      `/api/studies/${id}/catalog`,
      jsonInit('PUT', { fileName: 'felt.csv', format: 'csv', text: FELT_CATALOG_CSV }),
    );
    expect(json.status).toBe(200);
    expect((await json.json()) as CatalogAnswer).toMatchObject({
      fileName: 'felt.csv',
      format: 'csv',
      summary: { loaded: 4 },
    });
  });

  it('validates before writing: bad catalogs are 4xx naming the line, and the attached catalog stays', async () => {
    const id = await newStudy();
    await putCatalog(id, 'text/csv', FELT_CATALOG_CSV);
    const cases: [RequestInit, number, string[]][] = [
      [raw('PUT', 'text/csv', 'when,where\n2001,x\n'), 422, ['catalog[line 1]']],
      [
        raw(
          'PUT',
          'text/csv',
          'time,lon,lat,depthKm,magnitude,magnitudeType\n2001-01-01,-139,-95,10,4,Mw\n2001-13-01,-139,-50,10,4,Mw\n',
        ),
        422,
        ['catalog[line 2]', 'catalog[line 3]'],
      ],
      [raw('PUT', 'text/csv', '  \n'), 422, ['catalog']],
      [raw('PUT', 'application/xml', '<q:quakeml><eventParameters>'), 422, ['catalog[line 1]']],
      [jsonInit('PUT', { text: 42, colour: 'red' }), 422, ['colour', 'text']],
      [
        jsonInit('PUT', { text: FELT_CATALOG_CSV, format: 'xlsx', fileName: '' }),
        422,
        ['fileName', 'format'],
      ],
      [jsonInit('PUT', '{"text": '), 400, ['(body)']],
      [raw('PUT', 'application/octet-stream', FELT_CATALOG_CSV), 415, []],
    ];
    for (const [init, status, paths] of cases) {
      const body = await expectError(
        await app().request(`/api/studies/${id}/catalog`, init),
        status,
      );
      expect(body.issues.map((i) => i.path).sort(), JSON.stringify(body)).toEqual(paths);
    }
    const notText = await expectError(
      await app().request(`/api/studies/${id}/catalog`, jsonInit('PUT', { text: 42 })),
      422,
    );
    expect(notText.issues).toEqual([
      {
        path: 'text',
        message:
          'expected the catalog text (QuakeML 1.2, FDSN event text or our CSV) as a string, got 42',
      },
    ]);
    const unsupported = await putCatalog(id, 'application/octet-stream', FELT_CATALOG_CSV);
    expect(unsupported.headers.get('accept')).toBe(
      'application/xml, text/xml, text/plain, text/csv, application/json',
    );
    const badName = await expectError(
      await putCatalog(id, 'text/csv', FIT_CATALOG_CSV, '?fileName=a%07b.csv'),
      422,
    );
    expect(badName.issues).toEqual([
      { path: 'fileName', message: 'expected a file name without control characters' },
    ]);
    const read = (await (
      await app().request(`/api/studies/${id}/catalog`)
    ).json()) as CatalogAnswer;
    expect(read.summary.loaded).toBe(4);
    expect(read.events?.map((e) => e.id)).toEqual([
      'moderate',
      'small-far',
      'near-strong',
      'local-scale',
    ]);
  });

  it('names the unknown study (404)', async () => {
    const body = await expectError(
      await putCatalog('none-such', 'text/csv', FELT_CATALOG_CSV),
      404,
    );
    expect(body.error).toBe('no study with id "none-such"');
  });
});

describe('GET and DELETE /api/studies/:id/catalog', () => {
  it('gives the summary and the events in the catalog CSV names; DELETE detaches it', async () => {
    const id = await newStudy();
    await putCatalog(id, 'text/csv', FIT_CATALOG_CSV);
    const response = await app().request(`/api/studies/${id}/catalog`);
    expect(response.status).toBe(200);
    const body = (await response.json()) as CatalogAnswer;
    expect(body.summary).toEqual({
      loaded: 14,
      rejected: 0,
      byMagnitudeType: { Mw: 13, ML: 1 },
      nonMoment: 1,
      withoutDepth: 0,
    });
    expect(body.events?.[7]).toEqual({
      id: 'ev-08',
      time: '2006-07-01T00:00:00.000Z',
      lon: -141,
      lat: -50,
      depthKm: 10,
      magnitude: 4.7,
      magnitudeType: 'ML',
    });
    const deleted = await app().request(`/api/studies/${id}/catalog`, { method: 'DELETE' });
    expect(deleted.status).toBe(204);
    const gone = await expectError(await app().request(`/api/studies/${id}/catalog`), 404);
    expect(gone.error).toBe(
      `study "${id}" has no catalog attached; attach one with PUT /api/studies/${id}/catalog`,
    );
    await expectError(await app().request(`/api/studies/${id}/catalog`, { method: 'DELETE' }), 404);
    await expectError(await app().request('/api/studies/none-such/catalog'), 404);
  });

  it('goes with its study', async () => {
    const id = await newStudy();
    await putCatalog(id, 'text/csv', FIT_CATALOG_CSV);
    expect((await app().request(`/api/studies/${id}`, { method: 'DELETE' })).status).toBe(204);
    const body = await expectError(await app().request(`/api/studies/${id}/catalog`), 404);
    expect(body.error).toBe(`no study with id "${id}"`);
  });
});

interface FeltAnswer {
  studyId: string;
  catalog: { fileName: string; format: string };
  eventCount: number;
  excludedNonMoment: number;
  communities: {
    communityId: string;
    consideredEvents: number;
    felt: {
      eventId: string;
      mmi: number;
      pgaG: number;
      roman: string;
      distanceKm: number;
      compass: string;
      date: string;
    }[];
    stronglyFelt: { eventId: string }[];
  }[];
}

function expectFeltAtCove(cove: FeltAnswer['communities'][number] | undefined): void {
  expect(cove?.communityId).toBe('test-cove');
  expect(cove?.felt.map((e) => e.eventId)).toEqual(['moderate', 'near-strong']);
  expect(cove?.stronglyFelt.map((e) => e.eventId)).toEqual(['near-strong']);
  for (const e of cove?.felt ?? []) {
    const hand = FELT_EXPECTED[e.eventId as 'moderate' | 'near-strong'];
    expectRelative(
      e.pgaG,
      hand.pgaG,
      1e-4,
      `Cornell et al. (1979) median PGA, hand computation (${e.eventId})`,
    );
    expectClose(e.mmi, hand.mmi, 1e-3, `Worden et al. (2012) MMI, hand computation (${e.eventId})`);
    expect([e.roman, e.compass]).toEqual([hand.roman, hand.compass]);
    expectClose(
      e.distanceKm,
      hand.distanceKm,
      1e-4,
      `geodesic distance of the placed event (${e.eventId})`,
    );
  }
}

describe('GET /api/studies/:id/felt', () => {
  it("gives each community's likely felt and strongly felt events", async () => {
    const id = await newStudy();
    await putCatalog(id, 'text/csv', FELT_CATALOG_CSV, '?fileName=felt.csv');
    const response = await app().request(`/api/studies/${id}/felt`);
    expect(response.status).toBe(200);
    const body = (await response.json()) as FeltAnswer;
    expect(body).toMatchObject({
      studyId: id,
      catalog: { fileName: 'felt.csv', format: 'csv' },
      eventCount: 3,
      excludedNonMoment: 1,
    });
    expectFeltAtCove(body.communities[0]);
    expect(body.communities[1]).toMatchObject({
      communityId: 'distant-shoal',
      consideredEvents: 0,
      felt: [],
    });
    const one = (await (
      await app().request(`/api/studies/${id}/felt?community=test-cove&magnitudes=all`)
    ).json()) as FeltAnswer;
    expect(one.communities.map((c) => c.communityId)).toEqual(['test-cove']);
    expect(one.communities[0]?.stronglyFelt.map((e) => e.eventId)).toEqual([
      'near-strong',
      'local-scale',
    ]);
    expectClose(
      one.communities[0]?.felt[2]?.mmi ?? NaN,
      FELT_EXPECTED['local-scale'].mmi,
      1e-3,
      'Worden et al. (2012) MMI, hand computation (local-scale)',
    );
  });

  it('is a clear 404 without a catalog, and names a bad query', async () => {
    const id = await newStudy();
    const none = await expectError(await app().request(`/api/studies/${id}/felt`), 404);
    expect(none.error).toBe(
      `study "${id}" has no catalog attached; attach one with PUT /api/studies/${id}/catalog`,
    );
    await putCatalog(id, 'text/csv', FELT_CATALOG_CSV);
    const community = await expectError(
      await app().request(`/api/studies/${id}/felt?community=nowhere`),
      404,
    );
    expect(community.issues).toEqual([
      { path: 'community', message: 'expected one of test-cove, distant-shoal, got "nowhere"' },
    ]);
    const magnitudes = await expectError(
      await app().request(`/api/studies/${id}/felt?magnitudes=local`),
      422,
    );
    expect(magnitudes.issues.map((i) => i.path)).toEqual(['magnitudes']);
    await expectError(await app().request('/api/studies/none-such/felt'), 404);
  });
});

interface FitAnswer {
  catalog: { summary: { loaded: number } };
  akiUtsu: { bValue: number; sigmaB: number; rateAtReference: number; eventCount: number };
  weichert: { bValue: number; rateAtReference: number; method: string } | null;
  periods: { magnitude: number; start: string }[] | null;
  completeness: {
    method: string;
    mc: number;
    windows: { eventCount: number; mc: number }[] | null;
  };
  zone: { given: boolean; eventsInZone: number; eventsOutside: number };
  recurrence: {
    method: string;
    recurrence: { bValue: number; mMin: number; mMax: number; rate: number };
  } | null;
  frequencyMagnitude: {
    bins: unknown[];
    fittedLine: { magnitude: number; cumulativeAnnualRate: number }[] | null;
  };
}

const fit = async (body: Record<string, unknown>) =>
  app().request('/api/catalog/fit', jsonInit('POST', body));

describe('POST /api/catalog/fit', () => {
  it('fits a posted catalog inside a zone polygon and gives the recurrence', async () => {
    const response = await fit({ text: FIT_CATALOG_CSV, polygon: EAST_ZONE, mMax: 7 });
    expect(response.status).toBe(200);
    const body = (await response.json()) as FitAnswer;
    expect(body.catalog.summary.loaded).toBe(14);
    expect(body.zone).toEqual({ given: true, eventsInZone: 8, eventsOutside: 4 });
    expect(body.akiUtsu.eventCount).toBe(EAST_ZONE_FIT.n);
    expectClose(
      body.akiUtsu.bValue,
      EAST_ZONE_FIT.bValue,
      1e-6,
      'Aki–Utsu hand computation inside the east box (catalog-fixtures.ts)',
    );
    expectClose(
      body.akiUtsu.sigmaB,
      EAST_ZONE_FIT.sigmaB,
      1e-6,
      'Shi & Bolt (1982) hand computation inside the east box',
    );
    expect(body.recurrence?.recurrence).toMatchObject({ mMin: 4.15, mMax: 7 });
    expectClose(
      body.recurrence?.recurrence.rate ?? NaN,
      EAST_ZONE_FIT.rate,
      1e-6,
      '5 events in 10.997947 years',
    );
    // The fitted line from 4.15 to one bin past the top edge 4.95, 10^(a − b m) (Gutenberg & Richter).
    const line = body.frequencyMagnitude.fittedLine ?? [];
    expectClose(line[0]?.magnitude ?? NaN, 4.15, 1e-9, 'lowest fitted bin edge');
    expectClose(line[1]?.magnitude ?? NaN, 5.05, 1e-9, 'one bin past the top edge');
    expectRelative(
      line[0]?.cumulativeAnnualRate ?? NaN,
      EAST_ZONE_FIT.rate,
      1e-6,
      'the line passes through the observed rate at 4.15',
    );
    expectRelative(
      line[1]?.cumulativeAnnualRate ?? NaN,
      EAST_ZONE_FIT.rate * 10 ** (-EAST_ZONE_FIT.bValue * 0.9),
      1e-6,
      'rate · 10^(−b · 0.9) at 5.05',
    );
  });

  it('gives a recurrence a study accepts as it is, on a zone source', async () => {
    const body = (await (
      await fit({ text: FIT_CATALOG_CSV, polygon: EAST_ZONE, mMax: 7 })
    ).json()) as FitAnswer;
    const study = feltStudy();
    const zoneSource = {
      ...EAST_ZONE,
      properties: {
        id: 'east-box',
        name: 'East box',
        setting: 'crustal',
        mechanism: 'strike-slip',
        depthKm: 10,
        recurrence: body.recurrence?.recurrence,
      },
    };
    const response = await app().request(
      '/api/studies',
      jsonInit('POST', {
        ...study,
        sources: { type: 'FeatureCollection', features: [zoneSource] },
      }),
    );
    const created = (await response.json()) as { warnings: unknown[] };
    expect(response.status, JSON.stringify(created)).toBe(201);
    expect(created.warnings.filter((w) => JSON.stringify(w).includes('recurrence'))).toEqual([]);
  });

  it('adds Weichert (1980) with completeness periods; with one period it is the binned Aki–Utsu estimate', async () => {
    const response = await fit({
      text: FIT_CATALOG_CSV,
      mMax: 9.5,
      completeness: { periods: [{ magnitude: 4.2, start: '2001-01-15T00:00:00Z' }] },
    });
    const body = (await response.json()) as FitAnswer;
    expect(response.status, JSON.stringify(body)).toBe(200);
    expectClose(
      body.akiUtsu.bValue,
      DEFAULT_FIT.bValue,
      1e-6,
      'Aki–Utsu hand computation (catalog-fixtures.ts)',
    );
    expectOnePeriodWeichert(body.weichert);
    expect(body.recurrence?.method).toBe('weichert');
    expect(body.periods).toEqual([{ magnitude: 4.2, start: '2001-01-15T00:00:00.000Z' }]);
  });

  it('proposes completeness periods from Mc over time windows', async () => {
    const response = await fit({
      text: FIT_CATALOG_CSV,
      completeness: { periods: 'proposed', eventsPerWindow: 10 },
    });
    const body = (await response.json()) as FitAnswer;
    expect(response.status, JSON.stringify(body)).toBe(200);
    // Twelve mainshocks make one window of at least 10: its Mc is the whole catalog's (4.2), from its first event.
    expect(body.completeness.windows).toEqual([
      {
        start: '2001-01-15T00:00:00.000Z',
        end: '2012-01-15T00:00:00.000Z',
        eventCount: 12,
        mc: 4.2,
      },
    ]);
    expect(body.periods).toEqual([{ magnitude: 4.2, start: '2001-01-15T00:00:00.000Z' }]);
    expect(body.weichert?.method).toBe('weichert');
  });

  it('takes a fixed Mc and the observation span', async () => {
    const response = await fit({
      text: FIT_CATALOG_CSV,
      completeness: { method: 'fixed', mc: 4.1 },
      startTime: '2001-01-01T00:00:00Z',
      endTime: '2013-01-01T00:00:00Z',
    });
    const body = (await response.json()) as FitAnswer;
    expect(response.status, JSON.stringify(body)).toBe(200);
    // Mc 4.1: 5.0, 4.1, 4.4, 4.2, 4.6, 4.3, 4.8, 4.2 (n = 8, sum 35.6, mean 4.45);
    // b = 0.4342945 / (4.45 − 4.05) = 1.0857362; 8 events in 12 Julian years (4383 days)
    // (hand computation, Aki 1965 / Utsu 1965).
    expect(body.completeness).toMatchObject({ method: 'fixed', mc: 4.1 });
    expect(body.akiUtsu.eventCount).toBe(8);
    expectClose(body.akiUtsu.bValue, 1.0857362, 1e-6, 'Aki–Utsu hand computation with Mc 4.1');
    expectClose(body.akiUtsu.rateAtReference, 8 / 12, 1e-12, '8 events in 12 years');
  });

  it('refuses bad requests with 4xx naming the field', async () => {
    const cases: [Record<string, unknown>, number, string[]][] = [
      [{}, 422, ['text']],
      [{ text: FIT_CATALOG_CSV, mMax: '7', colour: 'red' }, 422, ['colour', 'mMax']],
      [
        { text: FIT_CATALOG_CSV, polygon: { type: 'LineString', coordinates: [] } },
        422,
        ['polygon.type'],
      ],
      [
        {
          text: FIT_CATALOG_CSV,
          polygon: {
            type: 'Polygon',
            coordinates: [
              [
                [0, 0],
                [1, 0],
                [0, 95],
                [0, 0],
              ],
            ],
          },
        },
        422,
        ['polygon.coordinates[0][2]'],
      ],
      [
        {
          text: FIT_CATALOG_CSV,
          polygon: {
            type: 'Polygon',
            coordinates: [
              [
                [10, 10],
                [11, 10],
                [11, 11],
                [10, 10],
              ],
            ],
          },
        },
        422,
        ['polygon'],
      ],
      [{ text: FIT_CATALOG_CSV, completeness: { method: 'fixed' } }, 422, ['completeness.mc']],
      [
        {
          text: FIT_CATALOG_CSV,
          completeness: { periods: [{ magnitude: 4.2, start: 'last spring' }] },
        },
        422,
        ['completeness.periods[0].start'],
      ],
      [
        {
          text: FIT_CATALOG_CSV,
          completeness: { periods: [{ magnitude: 4.2, start: '2030-01-01T00:00:00Z' }] },
        },
        422,
        ['completeness.periods[0].start'],
      ],
      [
        { text: FIT_CATALOG_CSV, completeness: { periods: 'proposed' } },
        422,
        ['completeness.eventsPerWindow'],
      ],
      [
        { text: FIT_CATALOG_CSV, completeness: { periods: [4.2] } },
        422,
        ['completeness.periods[0]'],
      ],
      [{ text: FIT_CATALOG_CSV, startTime: '2001-01-01T00:00:00Z' }, 422, ['endTime']],
      [{ text: FIT_CATALOG_CSV.split('\n').slice(0, 2).join('\n') }, 422, ['startTime']],
      [{ text: FIT_CATALOG_CSV, mMax: 4.0 }, 422, ['mMax']],
      [{ text: FIT_CATALOG_CSV.replace(/,Mw,/g, ',mb,') }, 422, ['magnitudes']],
      [{ text: 'time,lon,lat\n' }, 422, ['catalog[line 1]']],
    ];
    for (const [request, status, paths] of cases) {
      const body = await expectError(await fit(request), status);
      expect(body.issues.map((i) => i.path).sort(), JSON.stringify(request).slice(0, 120)).toEqual(
        paths,
      );
    }
    await expectError(
      await app().request('/api/catalog/fit', raw('POST', 'text/csv', FIT_CATALOG_CSV)),
      415,
    );
  });
});

describe('against a started server', () => {
  const serverDir = tempDir();
  let service: ServiceProcess;
  beforeAll(async () => {
    service = await startService({ databasePath: `${serverDir.path}/catalogs.db` });
  });
  afterAll(async () => {
    await service?.stop();
    serverDir.remove();
  });

  it('has the demo catalog attached to the demo study (a smoke run: the demo is never a check value)', async () => {
    const id = await demoStudyId(service);
    const catalog = await service.fetch(`/api/studies/${id}/catalog`);
    expect(catalog.status).toBe(200);
    const body = (await catalog.json()) as CatalogAnswer;
    expect(body).toMatchObject({
      fileName: 'catalog.csv',
      format: 'csv',
      summary: { rejected: 0 },
    });
    expect(body.summary.loaded).toBeGreaterThan(0);
    const felt = await service.fetch(`/api/studies/${id}/felt?community=harbour-point`);
    expect(felt.status).toBe(200);
    expect(((await felt.json()) as FeltAnswer).communities.map((c) => c.communityId)).toEqual([
      'harbour-point',
    ]);
  });

  it('attaches a catalog and gives the felt history over HTTP', async () => {
    const created = await service.fetch('/api/studies', jsonInit('POST', feltStudy()));
    const { id } = (await created.json()) as { id: string };
    const put = await service.fetch(
      `/api/studies/${id}/catalog`,
      raw('PUT', 'text/csv', FELT_CATALOG_CSV),
    );
    expect(put.status).toBe(201);
    const felt = await service.fetch(`/api/studies/${id}/felt`);
    expect(felt.status).toBe(200);
    expectSecurityHeaders(felt);
    expectFeltAtCove(((await felt.json()) as FeltAnswer).communities[0]);
  });
});

describe('POST /api/catalog/fit with magnitude conversions', () => {
  // Project-made: two Mw events, three mb (one at 6.5, outside Scordilis's mb 3.5–6.2) and one ML.
  const MIXED = [
    'time,lon,lat,depthKm,magnitude,magnitudeType,id',
    '2001-01-01T00:00:00Z,-150.1,-47.2,10,4.6,Mw,a',
    '2002-01-01T00:00:00Z,-150.2,-47.3,10,4.0,mb,b',
    '2003-01-01T00:00:00Z,-150.3,-47.4,10,5.0,mb,c',
    '2004-01-01T00:00:00Z,-150.4,-47.5,10,6.5,mb,d',
    '2005-01-01T00:00:00Z,-150.5,-47.6,10,3.8,ML,e',
    '2006-01-01T00:00:00Z,-150.6,-47.7,10,4.9,Mw,f',
  ].join('\n');

  it('converts the chosen scale, counts what it converted and what it could not', async () => {
    const response = await fit({ text: MIXED, conversions: ['scordilis2006-mb'] });
    expect(response.status).toBe(200);
    const body = (await response.json()) as {
      conversion: { converted: Record<string, number>; outsideRange: Record<string, number> };
      catalog: { summary: { nonMoment: number } };
    };
    expect(body.conversion).toEqual({
      converted: { 'scordilis2006-mb': 2 },
      outsideRange: { 'scordilis2006-mb': 1 },
    });
    expect(body.catalog.summary.nonMoment).toBe(4);
  });

  it('converts nothing by default', async () => {
    const body = (await (await fit({ text: MIXED })).json()) as Record<string, unknown>;
    expect(body.conversion ?? null).toBeNull();
  });

  it('refuses an unknown relation and two relations for one scale, naming the entry', async () => {
    const unknown = await expectError(await fit({ text: MIXED, conversions: ['nobody-ml'] }), 422);
    expect(unknown.issues[0]?.path).toBe('conversions[0]');
    const twice = await expectError(
      await fit({ text: MIXED, conversions: ['scordilis2006-mb', 'scordilis2006-mb'] }),
      422,
    );
    expect(twice.issues[0]?.path).toBe('conversions[1]');
  });
});

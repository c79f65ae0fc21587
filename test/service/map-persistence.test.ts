import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { INTERRUPTED_MESSAGE } from '../../api/store/run-repository.ts';
import { expectRelative } from '../helpers/close.ts';
import { expectError } from './helpers/assertions.ts';
import { demoStudyId, expectInterrupted, waitForAnswer } from './helpers/runs.ts';
import { jsonInit, restartableService, type ServiceProcess } from './helpers/service-process.ts';
import {
  EXCEEDANCE_AT_LEVELS,
  MEDIAN_PGA_G,
  RATE_PER_YEAR,
  smallStudy,
} from './helpers/small-study.ts';

/**
 * Hazard maps outlive the service: a started server computes a small map, is killed
 * (SIGKILL: no chance to clean up) while a second map is computing, and started again on the
 * same database; the finished map is there, byte for byte, and the one in flight is marked
 * interrupted. The small map's one value is checked against the published formula so the
 * map that survives is known to be the right one (small-study.ts, Cornell et al. 1979).
 */
const { databasePath, start } = restartableService('maps');

type MapAnswer = {
  id: string;
  status: string;
  progress: number;
  error: string | null;
  [key: string]: unknown;
};

const getMap = async (service: ServiceProcess, id: string): Promise<MapAnswer> =>
  (await (await service.fetch(`/api/maps/${id}`)).json()) as MapAnswer;

async function startMap(
  service: ServiceProcess,
  studyId: string,
  body: Record<string, unknown>,
): Promise<MapAnswer> {
  const response = await service.fetch(`/api/studies/${studyId}/maps`, jsonInit('POST', body));
  const text = await response.text();
  expect(response.status, text).toBe(202);
  return JSON.parse(text) as MapAnswer;
}

async function waitForMap(
  service: ServiceProcess,
  id: string,
  statuses: readonly string[],
): Promise<MapAnswer> {
  return waitForAnswer(`map ${id}`, () => getMap(service, id), statuses);
}

const rowOf = (id: string) => {
  const db = new Database(databasePath, { readonly: true });
  try {
    return db
      .prepare('SELECT status, geojson IS NULL AS noGeojson FROM map_runs WHERE id = ?')
      .get(id);
  } finally {
    db.close();
  }
};

describe('hazard maps across a restart of the service', () => {
  it('a done map survives SIGKILL unchanged; the map in flight is marked interrupted', async () => {
    const first = await start();
    const created = await first.fetch(
      '/api/studies',
      jsonInit('POST', smallStudy('Map survives a crash')),
    );
    const studyId = ((await created.json()) as { id: string }).id;
    const years = 1 / (RATE_PER_YEAR * EXCEEDANCE_AT_LEVELS[1]!);
    const small = await startMap(first, studyId, { returnPeriodYears: years, spacingKm: 5 });
    const done = await waitForMap(first, small.id, ['done', 'failed', 'cancelled', 'interrupted']);
    expect(done.status).toBe('done');
    const geojsonBefore = await (await first.fetch(`/api/maps/${small.id}/map.geojson`)).text();
    const value = (JSON.parse(geojsonBefore) as { features: { properties: { value: number } }[] })
      .features[0]?.properties.value as number;
    expectRelative(
      value,
      MEDIAN_PGA_G,
      1e-9,
      'median PGA of Cornell et al. (1979) at R = 10 km, M 6.5 (Baker 2008, from memory): the level whose annual rate is 1/years',
    );

    const demoId = await demoStudyId(first);
    const inFlight = await startMap(first, demoId, { returnPeriodYears: 475, spacingKm: 20 });
    await waitForMap(first, inFlight.id, ['running']);
    await first.kill();

    const second = await start();
    expect(await getMap(second, small.id)).toEqual(done);
    expect(await (await second.fetch(`/api/maps/${small.id}/map.geojson`)).text()).toBe(
      geojsonBefore,
    );
    const interrupted = await getMap(second, inFlight.id);
    expectInterrupted(interrupted);
    await expectError(await second.fetch(`/api/maps/${inFlight.id}/map.geojson`), 409);
    await expectError(
      await second.fetch(`/api/maps/${inFlight.id}/cancel`, { method: 'POST' }),
      409,
    );
    const list = (await (await second.fetch(`/api/studies/${studyId}/maps`)).json()) as {
      maps: { id: string }[];
    };
    expect(list.maps.map((m) => m.id)).toEqual([small.id]);
    expect(await second.stop()).toBe(0);
    expect(rowOf(inFlight.id)).toEqual({ status: 'interrupted', noGeojson: 1 });
  });

  it('a clean stop (SIGTERM) with a map in flight exits 0 with the map marked interrupted, as the next start shows', async () => {
    const service = await start();
    const map = await startMap(service, await demoStudyId(service), {
      returnPeriodYears: 475,
      spacingKm: 20,
    });
    await waitForMap(service, map.id, ['running']);
    expect(await service.stop()).toBe(0);
    expect(rowOf(map.id)).toEqual({ status: 'interrupted', noGeojson: 1 });
    const again = await start();
    expect(await getMap(again, map.id)).toMatchObject({
      status: 'interrupted',
      error: INTERRUPTED_MESSAGE,
    });
    expect(await again.stop()).toBe(0);
  });
});

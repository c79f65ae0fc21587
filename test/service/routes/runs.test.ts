import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import type { StudyResult } from '../../../api/engine/results.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { expectError, expectSecurityHeaders } from '../helpers/assertions.ts';
import { demoStudyId, getRun, startRun, waitForStatus } from '../helpers/runs.ts';
import { jsonInit, serviceForFile } from '../helpers/service-process.ts';
import {
  COMMUNITY,
  EXCEEDANCE_AT_LEVELS,
  LEVELS_G,
  poissonChance,
  RATE_PER_YEAR,
  smallStudy,
} from '../helpers/small-study.ts';
import { VIRTUAL_STRIKE_COUNT } from '../../../api/engine/ruptures/virtual-ruptures.ts';

// One worker, so a second run waits behind the first whatever the machine's cores.
const service = serviceForFile('runs', { TREMORA_WORKERS: '1' });
let studyId: string;

beforeAll(async () => {
  const created = await service.fetch('/api/studies', jsonInit('POST', smallStudy('Run me')));
  studyId = ((await created.json()) as { id: string }).id;
});

const results = async (runId: string): Promise<{ response: Response; text: string }> => {
  const response = await service.fetch(`/api/runs/${runId}/results`);
  return { response, text: await response.text() };
};

describe('a run of a saved study', () => {
  let runId: string;
  let result: StudyResult;

  it('is accepted (202) with its work and budget, then runs to done with progress 1', async () => {
    const response = await service.fetch(`/api/studies/${studyId}/runs`, { method: 'POST' });
    expect(response.status).toBe(202);
    expectSecurityHeaders(response);
    const accepted = (await response.json()) as {
      id: string;
      status: string;
      work: { size: number; detail: string };
    };
    expect(['queued', 'running']).toContain(accepted.status);
    // 1 community x 3 levels x the M 6.5 point's virtual ruptures (ruptures/virtual-ruptures.ts).
    expect(accepted.work.size).toBe(3 * VIRTUAL_STRIKE_COUNT);
    runId = accepted.id;
    const run = await waitForStatus(service, runId);
    expect(run).toMatchObject({ status: 'done', progress: 1, error: null, studyId });
    expect(run.startedAt! <= run.finishedAt!).toBe(true);
  });

  it('has results that match the hand calculation', async () => {
    const { response, text } = await results(runId);
    expect(response.status).toBe(200);
    result = JSON.parse(text) as StudyResult;
    const community = result.communities[0]!;
    expect(community.communityId).toBe(COMMUNITY.id);
    const curve = community.curves.PGA!;
    curve.levels.forEach((level, i) =>
      expectRelative(level, LEVELS_G[i] as number, 1e-12, 'levels are those the study gave'),
    );
    EXCEEDANCE_AT_LEVELS.forEach((p, i) =>
      expectRelative(
        curve.annualRate[i] as number,
        RATE_PER_YEAR * p,
        1e-6,
        `Cornell et al. (1979) median, truncated normal at +-3 sigma (Abramowitz & Stegun 1964 Table 26.1), level ${i}`,
      ),
    );
    const chance50 = community.chanceOfExceeding['50']!.PGA!;
    chance50.forEach((p, i) =>
      expectClose(
        p,
        poissonChance(RATE_PER_YEAR * (EXCEEDANCE_AT_LEVELS[i] as number), 50),
        1e-8,
        `Poisson chance in 50 years (Baker 2008), level ${i}`,
      ),
    );
  });

  it('records its provenance: tool version, input hash, models, settings, start and end', async () => {
    const run = await getRun(service, runId);
    const validated = (await (
      await service.fetch('/api/validate', jsonInit('POST', smallStudy('Run me')))
    ).json()) as { inputHash: string };
    expect(run.inputHash).toBe(validated.inputHash);
    expect(run.provenance).toEqual(result.provenance);
    expect(result.provenance).toMatchObject({
      tool: 'tremora',
      inputHash: validated.inputHash,
      models: { crustal: [{ model: 'Cornell79', weight: 1 }] },
      settings: {
        measures: ['PGA'],
        truncationSigma: 3,
        horizonsYears: [50],
        returnPeriodsYears: [475],
      },
    });
    expect(result.provenance.startedAt <= result.provenance.finishedAt).toBe(true);
  });

  it('gives identical numbers when run again on the same inputs', async () => {
    const again = await waitForStatus(service, (await startRun(service, studyId)).id);
    expect(again.status).toBe('done');
    expect(again.inputHash).toBe((await getRun(service, runId)).inputHash);
    const second = JSON.parse((await results(again.id)).text) as StudyResult;
    expect(second.communities).toEqual(result.communities);
    const list = (await (await service.fetch(`/api/studies/${studyId}/runs`)).json()) as {
      runs: { id: string }[];
    };
    expect(list.runs.map((r) => r.id)).toEqual([runId, again.id]);
  });

  it('exports CSV: one row per community with the results', async () => {
    const response = await service.fetch(`/api/runs/${runId}/results.csv`);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    expectSecurityHeaders(response);
    const parsed = Papa.parse<Record<string, string>>((await response.text()).trim(), {
      header: true,
    });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([
      'communityId',
      'name',
      'lon',
      'lat',
      'vs30',
      'band',
      'bandLabel',
      'PGA_475yr_g',
      'MMI_475yr',
      'chance_MMI_VI_50yr',
      'chance_MMI_VII_50yr',
      'chance_MMI_VIII_50yr',
      'nearestFault',
      'nearestFault_km',
      'bandShare_refer-first',
      'bandShare_refer-soon',
      'bandShare_prepare',
      'bandShare_inform',
      'bandHinge',
      'bandHinge_mmiShift',
      'bandHinge_alternatives',
      'warnings',
    ]);
    const row = parsed.data[0]!;
    const community = result.communities[0]!;
    expect(row).toMatchObject({
      communityId: COMMUNITY.id,
      name: COMMUNITY.name,
      lon: String(COMMUNITY.lon),
      lat: String(COMMUNITY.lat),
      vs30: String(COMMUNITY.vs30),
      band: community.band.id,
    });
    expect(row.PGA_475yr_g).toBe(String(community.atReturnPeriod['475']!.PGA ?? ''));
    expect(row.chance_MMI_VII_50yr).toBe(String(community.intensity.chanceOfReaching['50']!.VII));
    const shares = community.bandRobustness!.bandShares;
    expect(row['bandShare_refer-first']).toBe(String(shares['refer-first']));
  });

  it('exports GeoJSON: communities as points with their results and the provenance', async () => {
    const response = await service.fetch(`/api/runs/${runId}/results.geojson`);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/geo+json; charset=utf-8');
    const collection = (await response.json()) as {
      type: string;
      features: {
        type: string;
        geometry: { type: string; coordinates: number[] };
        properties: Record<string, unknown>;
      }[];
      provenance: unknown;
    };
    expect(collection.type).toBe('FeatureCollection');
    expect(collection.provenance).toEqual(result.provenance);
    expect(collection.features).toHaveLength(1);
    const feature = collection.features[0]!;
    expect(feature.geometry).toEqual({
      type: 'Point',
      coordinates: [COMMUNITY.lon, COMMUNITY.lat],
    });
    expect(feature.properties).toMatchObject({
      communityId: COMMUNITY.id,
      vs30: COMMUNITY.vs30,
      atReturnPeriod: result.communities[0]!.atReturnPeriod,
      band: result.communities[0]!.band,
    });
  });

  it('refuses to cancel a finished run (409)', async () => {
    const body = await expectError(
      await service.fetch(`/api/runs/${runId}/cancel`, { method: 'POST' }),
      409,
    );
    expect(body.error).toBe(
      `run "${runId}" is already done; only a queued or running run can be cancelled`,
    );
  });
});

describe('runs that are not done', () => {
  it('answers 409 for results until done, and cancels a queued run', async () => {
    const heavy = await startRun(service, await demoStudyId(service));
    const queued = await startRun(service, studyId);
    expect((await getRun(service, queued.id)).status).toBe('queued');
    for (const suffix of ['results', 'results.csv', 'results.geojson']) {
      const body = await expectError(await service.fetch(`/api/runs/${queued.id}/${suffix}`), 409);
      expect(body.error).toBe(`run "${queued.id}" is queued; results exist only once it is done`);
    }
    const cancelled = await service.fetch(`/api/runs/${queued.id}/cancel`, { method: 'POST' });
    expect(cancelled.status).toBe(202);
    const stopped = await waitForStatus(service, queued.id);
    expect(stopped).toMatchObject({
      status: 'cancelled',
      error: 'cancelled on request after 0% of the work',
    });
    await service.fetch(`/api/runs/${heavy.id}/cancel`, { method: 'POST' });
    expect((await waitForStatus(service, heavy.id)).status).toBe('cancelled');
    const body = await expectError(await service.fetch(`/api/runs/${heavy.id}/results`), 409);
    expect(body.error).toMatch(
      /is cancelled; results exist only once it is done \(cancelled on request after \d+% of the work\)/,
    );
  });

  it('404 for an unknown run or study', async () => {
    await expectError(await service.fetch('/api/runs/no-such-run'), 404);
    await expectError(await service.fetch('/api/runs/no-such-run/results'), 404);
    await expectError(await service.fetch('/api/runs/no-such-run/cancel', { method: 'POST' }), 404);
    await expectError(
      await service.fetch('/api/studies/no-such-study/runs', { method: 'POST' }),
      404,
    );
    await expectError(await service.fetch('/api/studies/no-such-study/runs'), 404);
  });
});

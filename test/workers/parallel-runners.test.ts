import { afterAll, describe, expect, it } from 'vitest';
import { Cancelled } from '../../api/engine/errors.ts';
import { hazardMap, type MapPoint } from '../../api/engine/map/hazard-map.ts';
import type { Study } from '../../api/engine/model.ts';
import { screenStudy } from '../../api/engine/screen-study.ts';
import { hazardMapOnPool } from '../../api/workers/parallel-map.ts';
import {
  screenStudyOnPool,
  screeningJson,
  screeningOutput,
} from '../../api/workers/parallel-screen.ts';
import { tableOnPool } from '../../api/workers/shared-table.ts';
import { WorkerPool } from '../../api/workers/worker-pool.ts';
import { studyRuptureTable } from '../../api/engine/hazard/study-rupture-table.ts';
import { RunScheduler } from '../../api/jobs/run-scheduler.ts';
import { openStore } from '../../api/store/store.ts';
import { tempDir } from '../service/helpers/service-process.ts';
import { allKindsStudy } from '../engine/fixtures/all-kinds-study.ts';

// The parallel runners against the single-thread engine functions they share the work of: the
// same engine code community by community and point by point, so the same numbers exactly.
const pool = new WorkerPool({ size: 2, log: () => {} });
afterAll(() => pool.close());

const base = allKindsStudy({ measures: ['PGA', 'SA(1.0)'] });
const study: Study = { ...base, sources: base.sources.filter((s) => s.id !== 'background') };

describe('tableOnPool', () => {
  it('lays out the table one thread lays out, its sources in parts over two threads, on shared memory', async () => {
    const whole = allKindsStudy();
    expect(whole.sources.length).toBeGreaterThan(1);
    const table = await tableOnPool(pool, whole).result;
    const expected = studyRuptureTable(whole).table;
    expect(table.count).toBe(expected.count);
    expect(table.sourceIds).toEqual(expected.sourceIds);
    for (const [name, column] of Object.entries(expected)) {
      if (!ArrayBuffer.isView(column)) continue;
      const got = table[name as keyof typeof table] as typeof column;
      expect(got.buffer, name).toBeInstanceOf(SharedArrayBuffer);
      expect(Array.from(got as Float64Array), name).toEqual(Array.from(column as Float64Array));
    }
  });
});

describe('screenStudyOnPool', () => {
  it("gives screenStudy's results, communities in study order, chunk by chunk over two threads", async () => {
    const progress: number[] = [];
    const text = await screenStudyOnPool(pool, study, {
      chunkSize: 2,
      onProgress: (s) => progress.push(s),
    }).result;
    expect(screeningOutput(text)).toEqual(screenStudy(study));
    expect(progress.at(-1)).toBe(1);
    const provenance = {
      tool: 'tremora' as const,
      toolVersion: 't',
      inputHash: 'h',
      models: {},
      settings: {},
      startedAt: 's',
      finishedAt: 'f',
    };
    expect(JSON.parse(screeningJson(text, provenance))).toEqual({
      ...screenStudy(study),
      provenance,
    });
  });

  it('stops with Cancelled when cancelled', async () => {
    const handle = screenStudyOnPool(pool, study, { chunkSize: 1 });
    handle.cancel();
    await expect(handle.result).rejects.toBeInstanceOf(Cancelled);
  });
});

describe('hazardMapOnPool', () => {
  const map = {
    measure: 'PGA',
    quantity: { kind: 'return-period' as const, returnPeriodYears: 475 },
    spacingKm: 40,
  };

  it("gives hazardMap's points in grid order, in chunks, with the same summary", async () => {
    const single: MapPoint[] = [];
    const singleSummary = hazardMap(study, map, (points) => single.push(...points));
    const parallel: MapPoint[] = [];
    const shares: number[] = [];
    let described = 0;
    const summary = await hazardMapOnPool(pool, study, map, {
      chunkPoints: 7,
      onStart: (d) => (described = d.count),
      onPoints: (points, share) => {
        parallel.push(...points);
        shares.push(share);
      },
    }).result;
    expect(parallel).toEqual(single);
    expect(summary).toEqual(singleSummary);
    expect(described).toBe(single.length);
    expect(shares).toEqual([...shares].sort((a, b) => a - b));
    expect(shares.at(-1)).toBe(1);
  });
});

describe('RunScheduler spreading runs over the pool', () => {
  it("records a done run whose results are screenStudy's, with provenance", async () => {
    const dir = tempDir();
    const store = openStore(`${dir.path}/spread.db`);
    try {
      const scheduler = new RunScheduler({
        store,
        pool,
        toolVersion: '1.2.3',
        spreadOverPool: true,
      });
      const studyId = store.studies.create({ name: 'S', document: '{}' }).id;
      const run = store.runs.create({ studyId, document: '{}', inputHash: 'hash-spread' });
      scheduler.start(run, study);
      for (
        let i = 0;
        i < 600 &&
        store.runs.get(run.id)!.status !== 'done' &&
        store.runs.get(run.id)!.status !== 'failed';
        i++
      )
        await new Promise((r) => setTimeout(r, 50));
      const record = store.runs.get(run.id)!;
      expect(record).toMatchObject({ status: 'done', progress: 1, error: null });
      const results = JSON.parse(store.runs.results(run.id)!);
      const { provenance, ...rest } = results;
      expect(rest).toEqual(JSON.parse(JSON.stringify(screenStudy(study))));
      expect(provenance).toMatchObject({
        tool: 'tremora',
        toolVersion: '1.2.3',
        inputHash: 'hash-spread',
      });
    } finally {
      store.close();
      dir.remove();
    }
  });
});

import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { MapDescription } from '../../api/engine/map/map-geojson.ts';
import { MapRunRepository, type MapRunRequest } from '../../api/store/map-run-repository.ts';
import { migrate, readMigrations } from '../../api/store/migrate.ts';
import { INTERRUPTED_MESSAGE, RunRepository } from '../../api/store/run-repository.ts';
import { openStore } from '../../api/store/store.ts';
import { StudyRepository } from '../../api/store/study-repository.ts';

let db: Database.Database;
let maps: MapRunRepository;
let studies: StudyRepository;
let studyId: string;

beforeEach(() => {
  db = new Database(':memory:');
  db.pragma('foreign_keys = ON');
  migrate(db);
  maps = new MapRunRepository(db);
  studies = new StudyRepository(db);
  studyId = studies.create({ name: 'S', document: '{}' }).id;
});

const byReturnPeriod: MapRunRequest = {
  measure: 'PGA',
  quantity: { kind: 'return-period', returnPeriodYears: 475 },
  spacingKm: 10,
  vs30: 760,
};
const byChance: MapRunRequest = {
  measure: 'SA(1.0)',
  quantity: { kind: 'chance', level: 0.1, horizonYears: 50 },
  spacingKm: 2.5,
  vs30: 400,
  bounds: [-141, -48, -140, -47],
};
const description: MapDescription = {
  measure: 'PGA',
  unit: 'g',
  quantity: { kind: 'return-period', returnPeriodYears: 475 },
  vs30: 760,
  spacingKm: 10,
  columns: 3,
  rows: 2,
  count: 6,
};
const outputs = {
  geojson: '{"type":"FeatureCollection","features":[]}',
  warnings: ['a note'],
  provenanceJson: '{"inputHash":"h"}',
  finishedAt: '2000-01-01T00:00:10.000Z',
};

describe('migration 003 (map_runs)', () => {
  it('adds map_runs to a database at version 2, keeping its studies and runs', () => {
    const old = new Database(':memory:');
    old.pragma('foreign_keys = ON');
    const shipped = readMigrations();
    expect(shipped.map((m) => m.name)).toContain('003-map-runs.sql');
    migrate(old, shipped.slice(0, 2));
    const study = new StudyRepository(old).create({ name: 'Kept', document: '{"name":"Kept"}' });
    const run = new RunRepository(old).create({
      studyId: study.id,
      document: '{}',
      inputHash: 'h',
    });
    expect(migrate(old, shipped)).toEqual({ fromVersion: 2, toVersion: shipped.length });
    expect(new StudyRepository(old).get(study.id)?.document).toBe('{"name":"Kept"}');
    expect(new RunRepository(old).get(run.id)?.status).toBe('queued');
    const created = new MapRunRepository(old).create({
      studyId: study.id,
      request: byReturnPeriod,
      inputHash: 'h',
    });
    expect(created.status).toBe('queued');
  });

  it('keeps one quantity per map: a return period, or a level with a horizon', () => {
    const insert = (rp: number | null, level: number | null, horizon: number | null) =>
      db
        .prepare(
          "INSERT INTO map_runs (id, study_id, status, measure, return_period_years, level, horizon_years, spacing_km, vs30, input_hash, created_at) VALUES (?, ?, 'queued', 'PGA', ?, ?, ?, 5, 760, 'h', 'x')",
        )
        .run(`m${rp}${level}${horizon}`, studyId, rp, level, horizon);
    expect(() => insert(475, 0.1, 50)).toThrow(/CHECK constraint failed/);
    expect(() => insert(null, null, null)).toThrow(/CHECK constraint failed/);
    expect(() => insert(null, 0.1, null)).toThrow(/CHECK constraint failed/);
    expect(() => insert(475, null, null)).not.toThrow();
    expect(() => insert(null, 0.1, 50)).not.toThrow();
  });
});

describe('MapRunRepository', () => {
  it('keeps the request as given, with its quantity and box', () => {
    const a = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h1' });
    const b = maps.create({ studyId, request: byChance, inputHash: 'h2' });
    expect(a.request).toEqual(byReturnPeriod);
    expect(b.request).toEqual(byChance);
    expect(maps.listForStudy(studyId).map((r) => r.id)).toEqual([a.id, b.id]);
  });

  it('follows a map from queued through running to done, the GeoJSON written with the status', () => {
    const run = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    expect(run).toMatchObject({
      status: 'queued',
      progress: 0,
      inputHash: 'h',
      description: null,
      warnings: [],
      provenance: null,
      startedAt: null,
      finishedAt: null,
      error: null,
    });
    expect(maps.finishDone(run.id, outputs)).toBe(false);
    expect(maps.markRunning(run.id, '2000-01-01T00:00:00.000Z', description)).toBe(true);
    expect(maps.markRunning(run.id, '2000-01-01T00:00:01.000Z', description)).toBe(false);
    maps.setProgress(run.id, 0.5);
    maps.setProgress(run.id, 0.25);
    expect(maps.get(run.id)).toMatchObject({
      status: 'running',
      progress: 0.5,
      description,
      startedAt: '2000-01-01T00:00:00.000Z',
    });
    expect(maps.geojson(run.id)).toBeUndefined();
    expect(maps.finishDone(run.id, outputs)).toBe(true);
    expect(maps.get(run.id)).toMatchObject({
      status: 'done',
      progress: 1,
      warnings: ['a note'],
      provenance: outputs.provenanceJson,
      finishedAt: outputs.finishedAt,
      error: null,
    });
    expect(maps.geojson(run.id)).toBe(outputs.geojson);
  });

  it('never changes a finished map: the repository skips it and the trigger refuses direct updates', () => {
    const run = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    maps.markRunning(run.id, '2000-01-01T00:00:00.000Z', description);
    maps.finishDone(run.id, outputs);
    expect(maps.finishWithout(run.id, 'failed', 'late')).toBe(false);
    maps.setProgress(run.id, 0.1);
    expect(maps.interruptUnfinished()).toBe(0);
    expect(() => db.prepare("UPDATE map_runs SET geojson = '{}' WHERE id = ?").run(run.id)).toThrow(
      'a finished map run cannot be changed',
    );
    expect(() =>
      db.prepare("UPDATE map_runs SET status = 'running' WHERE id = ?").run(run.id),
    ).toThrow('a finished map run cannot be changed');
    const failed = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    maps.finishWithout(failed.id, 'failed', 'boom');
    expect(() =>
      db.prepare('UPDATE map_runs SET error = NULL WHERE id = ?').run(failed.id),
    ).toThrow('a finished map run cannot be changed');
    expect(maps.geojson(run.id)).toBe(outputs.geojson);
    expect(maps.get(failed.id)?.error).toBe('boom');
  });

  it('refuses GeoJSON on a map that is not done, and a done map without it', () => {
    const run = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    expect(() => db.prepare("UPDATE map_runs SET geojson = '{}' WHERE id = ?").run(run.id)).toThrow(
      /CHECK constraint failed/,
    );
    expect(() =>
      db.prepare("UPDATE map_runs SET status = 'done' WHERE id = ?").run(run.id),
    ).toThrow(/CHECK constraint failed/);
  });

  it('records failure, cancellation and interruption with their message', () => {
    const failed = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    const cancelled = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    const left = maps.create({ studyId, request: byChance, inputHash: 'h' });
    maps.markRunning(failed.id, '2000-01-01T00:00:00.000Z', description);
    expect(maps.finishWithout(failed.id, 'failed', 'boom')).toBe(true);
    expect(maps.finishWithout(cancelled.id, 'cancelled', 'on request')).toBe(true);
    expect(maps.interruptUnfinished()).toBe(1);
    expect(maps.get(failed.id)).toMatchObject({ status: 'failed', error: 'boom' });
    expect(maps.get(cancelled.id)).toMatchObject({ status: 'cancelled', error: 'on request' });
    expect(maps.get(left.id)).toMatchObject({ status: 'interrupted', error: INTERRUPTED_MESSAGE });
  });

  it('refuses a map of a study that does not exist, and goes with its study when that is deleted', () => {
    expect(() =>
      maps.create({ studyId: 'missing', request: byReturnPeriod, inputHash: 'h' }),
    ).toThrow(/FOREIGN KEY/);
    const run = maps.create({ studyId, request: byReturnPeriod, inputHash: 'h' });
    maps.markRunning(run.id, '2000-01-01T00:00:00.000Z', description);
    maps.finishDone(run.id, outputs);
    expect(studies.delete(studyId)).toBe(true);
    expect(maps.get(run.id)).toBeUndefined();
  });
});

describe('openStore and map runs', () => {
  const dirs: string[] = [];
  afterEach(() => dirs.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true })));

  it('marks map runs left queued or running by a previous process interrupted, keeping done maps and their GeoJSON', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tremora-maps-'));
    dirs.push(dir);
    const path = join(dir, 'tremora.db');
    const first = openStore(path);
    const study = first.studies.create({ name: 'S', document: '{}' });
    const queued = first.maps.create({
      studyId: study.id,
      request: byReturnPeriod,
      inputHash: 'h',
    });
    const running = first.maps.create({ studyId: study.id, request: byChance, inputHash: 'h' });
    first.maps.markRunning(running.id, '2000-01-01T00:00:00.000Z', description);
    first.maps.setProgress(running.id, 0.4);
    const done = first.maps.create({ studyId: study.id, request: byReturnPeriod, inputHash: 'h' });
    first.maps.markRunning(done.id, '2000-01-01T00:00:00.000Z', description);
    first.maps.finishDone(done.id, outputs);
    const doneBefore = first.maps.get(done.id);
    first.close();

    const second = openStore(path);
    expect(second.mapRunsInterruptedAtOpen).toBe(2);
    expect(second.interruptedAtOpen).toBe(0);
    for (const id of [queued.id, running.id]) {
      expect(second.maps.get(id)).toMatchObject({
        status: 'interrupted',
        error: INTERRUPTED_MESSAGE,
      });
      expect(second.maps.geojson(id)).toBeUndefined();
    }
    expect(second.maps.get(running.id)?.progress).toBe(0.4);
    expect(second.maps.get(done.id)).toEqual(doneBefore);
    expect(second.maps.geojson(done.id)).toBe(outputs.geojson);
    second.close();

    const third = openStore(path);
    expect(third.mapRunsInterruptedAtOpen).toBe(0);
    third.close();
  });
});

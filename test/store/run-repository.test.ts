import Database from 'better-sqlite3';
import { beforeEach, describe, expect, it } from 'vitest';
import { openStore } from '../../api/store/store.ts';
import { type RunRepository } from '../../api/store/run-repository.ts';
import { type StudyRepository } from '../../api/store/study-repository.ts';

let db: Database.Database;
let runs: RunRepository;
let studies: StudyRepository;
let studyId: string;

beforeEach(() => {
  ({ db, runs, studies } = openStore(':memory:'));
  studyId = studies.create({ name: 'S', document: '{}' }).id;
});

const outputs = {
  resultsJson: '{"communities":[]}',
  provenanceJson: '{"inputHash":"h"}',
  finishedAt: '2000-01-01T00:00:10.000Z',
};

describe('RunRepository', () => {
  it('follows a run from queued through running to done, results written with the status', () => {
    const run = runs.create({
      studyId,
      document: '{"name":"S"}',
      communitiesCsv: 'id,name',
      inputHash: 'h',
    });
    expect(run).toMatchObject({
      status: 'queued',
      progress: 0,
      inputHash: 'h',
      startedAt: null,
      finishedAt: null,
      provenance: null,
    });
    expect(runs.inputs(run.id)).toEqual({ document: '{"name":"S"}', communitiesCsv: 'id,name' });
    expect(runs.finishDone(run.id, outputs)).toBe(false);
    expect(runs.markRunning(run.id, '2000-01-01T00:00:00.000Z')).toBe(true);
    runs.setProgress(run.id, 0.5);
    runs.setProgress(run.id, 0.25);
    expect(runs.get(run.id)?.progress).toBe(0.5);
    expect(runs.results(run.id)).toBeUndefined();
    expect(runs.finishDone(run.id, outputs)).toBe(true);
    expect(runs.get(run.id)).toMatchObject({
      status: 'done',
      progress: 1,
      provenance: outputs.provenanceJson,
      finishedAt: outputs.finishedAt,
      error: null,
    });
    expect(runs.results(run.id)).toBe(outputs.resultsJson);
    expect(runs.listForStudy(studyId).map((r) => r.id)).toEqual([run.id]);
  });

  it('never changes a finished run: the repository skips it and the trigger refuses direct updates', () => {
    const run = runs.create({ studyId, document: '{}', inputHash: 'h' });
    runs.markRunning(run.id, '2000-01-01T00:00:00.000Z');
    runs.finishDone(run.id, outputs);
    expect(runs.finishWithout(run.id, 'failed', 'late')).toBe(false);
    expect(runs.markRunning(run.id, 'x')).toBe(false);
    runs.setProgress(run.id, 0.1);
    expect(runs.interruptUnfinished()).toBe(0);
    expect(() => db.prepare("UPDATE runs SET results = '{}' WHERE id = ?").run(run.id)).toThrow(
      'a finished run cannot be changed',
    );
    expect(runs.results(run.id)).toBe(outputs.resultsJson);
  });

  it('refuses results on a run that is not done', () => {
    const run = runs.create({ studyId, document: '{}', inputHash: 'h' });
    expect(() => db.prepare("UPDATE runs SET results = '{}' WHERE id = ?").run(run.id)).toThrow(
      /CHECK constraint failed/,
    );
  });

  it('records failure, cancellation and interruption with their message', () => {
    const failed = runs.create({ studyId, document: '{}', inputHash: 'h' });
    const cancelled = runs.create({ studyId, document: '{}', inputHash: 'h' });
    const left = runs.create({ studyId, document: '{}', inputHash: 'h' });
    runs.markRunning(failed.id, '2000-01-01T00:00:00.000Z');
    expect(runs.finishWithout(failed.id, 'failed', 'boom')).toBe(true);
    expect(runs.finishWithout(cancelled.id, 'cancelled', 'on request')).toBe(true);
    expect(runs.interruptUnfinished()).toBe(1);
    expect(runs.get(failed.id)).toMatchObject({ status: 'failed', error: 'boom' });
    expect(runs.get(cancelled.id)).toMatchObject({ status: 'cancelled', error: 'on request' });
    expect(runs.get(left.id)?.status).toBe('interrupted');
  });

  it('refuses a run of a study that does not exist (foreign key)', () => {
    expect(() => runs.create({ studyId: 'missing', document: '{}', inputHash: 'h' })).toThrow(
      /FOREIGN KEY/,
    );
  });
});

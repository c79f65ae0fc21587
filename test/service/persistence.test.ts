import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { expectError } from './helpers/assertions.ts';
import { saveHeavyStudy } from './helpers/heavy-study.ts';
import { expectInterrupted, getRun, startRun, waitForStatus } from './helpers/runs.ts';
import { jsonInit, restartableService } from './helpers/service-process.ts';
import { smallStudy } from './helpers/small-study.ts';

const { databasePath, start } = restartableService('persist');

const integrity = (): string => {
  const db = new Database(databasePath, { readonly: true });
  try {
    return db.pragma('integrity_check', { simple: true }) as string;
  } finally {
    db.close();
  }
};

describe('a crash of the service (SIGKILL)', () => {
  it('keeps saved studies and finished runs, and marks the run in flight interrupted', async () => {
    const first = await start();
    const text = JSON.stringify(smallStudy('Survives a crash'), null, 2);
    const created = await first.fetch('/api/studies', jsonInit('POST', text));
    const studyId = ((await created.json()) as { id: string }).id;
    const finished = await waitForStatus(first, (await startRun(first, studyId)).id);
    expect(finished.status).toBe('done');
    const resultsBefore = await (await first.fetch(`/api/runs/${finished.id}/results`)).text();
    const heavyId = await saveHeavyStudy(first);
    const studiesBefore = await (await first.fetch('/api/studies')).json();

    const inFlight = await startRun(first, heavyId);
    await waitForStatus(first, inFlight.id, ['running']);
    await first.kill();

    expect(integrity()).toBe('ok');

    const second = await start();
    expect(second.output()).toMatch(
      /1 run\(s\) left unfinished by the previous process are marked interrupted/,
    );
    expect(await (await second.fetch('/api/studies')).json()).toEqual(studiesBefore);
    expect(await (await second.fetch(`/api/studies/${studyId}/document`)).text()).toBe(text);
    expect(await getRun(second, finished.id)).toEqual(finished);
    expect(await (await second.fetch(`/api/runs/${finished.id}/results`)).text()).toBe(
      resultsBefore,
    );

    const interrupted = await getRun(second, inFlight.id);
    expectInterrupted(interrupted);
    await expectError(await second.fetch(`/api/runs/${inFlight.id}/results`), 409);

    expect(await second.stop()).toBe(0);
    const db = new Database(databasePath, { readonly: true });
    const row = db.prepare('SELECT status, results FROM runs WHERE id = ?').get(inFlight.id);
    db.close();
    expect(row).toEqual({ status: 'interrupted', results: null });
    expect(integrity()).toBe('ok');
  });

  it('a clean stop (SIGTERM) marks a run in flight interrupted and exits 0', async () => {
    const service = await start();
    const run = await startRun(service, await saveHeavyStudy(service));
    await waitForStatus(service, run.id, ['running']);
    expect(await service.stop()).toBe(0);
    const db = new Database(databasePath, { readonly: true });
    const row = db.prepare('SELECT status, results FROM runs WHERE id = ?').get(run.id);
    db.close();
    expect(row).toEqual({ status: 'interrupted', results: null });
  });
});

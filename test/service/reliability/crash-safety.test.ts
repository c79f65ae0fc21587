import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { TREMORA_APPLICATION_ID } from '../../../api/store/database-file.ts';
import {
  jsonInit,
  type ServiceProcess,
  startService,
  tempDir,
} from '../helpers/service-process.ts';
import { COMMUNITIES_CSV, smallStudy } from '../helpers/small-study.ts';
import { Tally } from './answer-checks.ts';

/**
 * Crash safety: the service is killed with SIGKILL at a random moment while clients
 * save, update and import studies and start runs, 20 times over on one database. After each
 * kill the database passes PRAGMA integrity_check; after each restart every save that was
 * acknowledged is there exactly as sent (or as a later update still in flight left it), every
 * acknowledged run is there and finished, and no run has half-written results.
 */

const ROUNDS = 20;
/** Seed of the kill moments (mulberry32 below). */
const SEED = 0x5eed;
/** Clients writing at once. */
const WRITERS = 4;

const dir = tempDir('tremora-crash-');
const databasePath = `${dir.path}/crash.db`;
let current: ServiceProcess | undefined;
afterAll(async () => {
  if (current && current.child.exitCode === null && current.child.signalCode === null)
    await current.stop();
  dir.remove();
});

/** mulberry32 (Tommy Ettinger's 32-bit generator, public domain): a seeded stream in [0, 1). */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** What the clients were told was saved, and what they sent that was not (yet) acknowledged. */
interface Ledger {
  /** Study id -> the document text of its latest acknowledged write. */
  readonly documents: Map<string, string>;
  /** Study id -> document texts of writes sent after that and never answered. */
  readonly inFlight: Map<string, string[]>;
  /** Study id -> the communities CSV of its latest acknowledged import. */
  readonly csv: Map<string, string>;
  /** Acknowledged run ids (202) and their study. */
  readonly runs: Map<string, string>;
  /** Study id -> the writer that created it (the only one that changes it). */
  readonly owner: Map<string, number>;
}

/** Writes against `service` until it dies; each write is recorded when acknowledged. */
async function writeUntilKilled(
  service: ServiceProcess,
  ledger: Ledger,
  random: () => number,
  ops: Tally,
  killed: () => boolean,
): Promise<void> {
  // Each writer changes only the studies it created, so one study's writes are answered in
  // the order they were committed and the ledger can follow them.
  const pick = (w: number) => {
    const own = [...ledger.owner.entries()].filter(([, o]) => o === w).map(([id]) => id);
    return own[Math.floor(random() * own.length)];
  };
  let n = 0;
  const writer = async (w: number): Promise<void> => {
    for (;;) {
      const roll = random();
      const id = pick(w);
      try {
        if (roll < 0.35 || !id) {
          const text = JSON.stringify(smallStudy(`Crash study ${w}-${n++}`), null, 1);
          const response = await service.fetch('/api/studies', jsonInit('POST', text));
          if (response.status !== 201)
            throw new Error(`create: ${response.status} ${await response.text()}`);
          const created = ((await response.json()) as { id: string }).id;
          ledger.documents.set(created, text);
          ledger.owner.set(created, w);
          ops.add('create');
        } else if (roll < 0.6) {
          const text = JSON.stringify(smallStudy(`Crash update ${w}-${n++}`), null, 1);
          ledger.inFlight.set(id, [...(ledger.inFlight.get(id) ?? []), text]);
          const response = await service.fetch(`/api/studies/${id}`, jsonInit('PUT', text));
          if (response.status !== 200)
            throw new Error(`update: ${response.status} ${await response.text()}`);
          ledger.documents.set(id, text);
          ledger.csv.delete(id);
          ledger.inFlight.set(
            id,
            (ledger.inFlight.get(id) ?? []).filter((t) => t !== text),
          );
          ops.add('update');
        } else if (roll < 0.7) {
          // The service keeps the document with `communities` naming the imported file (routes/imports.ts).
          const document = JSON.stringify(
            {
              ...(JSON.parse(ledger.documents.get(id) as string) as object),
              communities: 'communities.csv',
            },
            null,
            2,
          );
          ledger.inFlight.set(id, [...(ledger.inFlight.get(id) ?? []), document]);
          const response = await service.fetch(`/api/studies/${id}/communities`, {
            method: 'POST',
            headers: { 'content-type': 'text/csv' },
            body: COMMUNITIES_CSV,
          });
          if (response.status !== 200)
            throw new Error(`import: ${response.status} ${await response.text()}`);
          ledger.documents.set(id, document);
          ledger.inFlight.set(
            id,
            (ledger.inFlight.get(id) ?? []).filter((t) => t !== document),
          );
          ledger.csv.set(id, COMMUNITIES_CSV);
          ops.add('import');
        } else {
          const response = await service.fetch(`/api/studies/${id}/runs`, { method: 'POST' });
          if (response.status !== 202)
            throw new Error(`run: ${response.status} ${await response.text()}`);
          ledger.runs.set(((await response.json()) as { id: string }).id, id);
          ops.add('run');
        }
      } catch (error) {
        // The kill: connections are refused or reset. Anything else is a failure of the test.
        if (!killed()) throw error;
        return;
      }
    }
  };
  await Promise.all(Array.from({ length: WRITERS }, (_, w) => writer(w)));
}

function inspect(): {
  integrity: string;
  applicationId: number;
  halfWritten: number;
  doneWithout: number;
  unfinished: number;
} {
  const db = new Database(databasePath, { readonly: true });
  try {
    const count = (sql: string) => (db.prepare(sql).get() as { n: number }).n;
    return {
      integrity: db.pragma('integrity_check', { simple: true }) as string,
      applicationId: db.pragma('application_id', { simple: true }) as number,
      halfWritten: count(
        "SELECT COUNT(*) AS n FROM runs WHERE status <> 'done' AND (results IS NOT NULL OR provenance IS NOT NULL)",
      ),
      doneWithout: count(
        "SELECT COUNT(*) AS n FROM runs WHERE status = 'done' AND (results IS NULL OR provenance IS NULL OR finished_at IS NULL)",
      ),
      unfinished: count("SELECT COUNT(*) AS n FROM runs WHERE status IN ('queued', 'running')"),
    };
  } finally {
    db.close();
  }
}

/** The saved studies (document, latest imported CSV) and runs, read straight from the file. */
function readDatabase() {
  const db = new Database(databasePath, { readonly: true });
  try {
    const studies = new Map(
      (
        db.prepare('SELECT id, document FROM studies').all() as { id: string; document: string }[]
      ).map((r) => [r.id, r.document]),
    );
    const csv = new Map<string, string>();
    for (const r of db
      .prepare(
        "SELECT study_id, content FROM study_files WHERE kind = 'communities-csv' ORDER BY id",
      )
      .all() as { study_id: string; content: string }[])
      csv.set(r.study_id, r.content);
    const rows = db.prepare('SELECT id, study_id, status, results FROM runs').all() as {
      id: string;
      study_id: string;
      status: string;
      results: string | null;
    }[];
    const runs = new Map(
      rows.map((r) => [r.id, { studyId: r.study_id, status: r.status, results: r.results }]),
    );
    return { studies, csv, runs };
  } finally {
    db.close();
  }
}

/**
 * After a kill: every acknowledged save is in the file as acknowledged, or as a write still
 * in flight at the kill left it (the ledger then follows the file); every acknowledged run is
 * there, and each done run's results are whole (they parse, with communities and provenance).
 */
function checkSaves(ledger: Ledger, kill: number, checkedRuns: Set<string>): void {
  const stored = readDatabase();
  for (const [id, text] of ledger.documents) {
    const saved = stored.studies.get(id);
    expect(saved, `study ${id} after kill ${kill}`).toBeDefined();
    expect(
      [text, ...(ledger.inFlight.get(id) ?? [])],
      `study ${id} after kill ${kill} holds ${saved?.slice(0, 200)}`,
    ).toContain(saved);
    if (saved !== text) ledger.documents.set(id, saved as string);
    const csv = ledger.csv.get(id);
    if (csv !== undefined && saved === text)
      expect(stored.csv.get(id), `CSV of study ${id}`).toBe(csv);
  }
  ledger.inFlight.clear();
  for (const [runId, studyId] of ledger.runs) {
    const run = stored.runs.get(runId);
    expect(run?.studyId, `run ${runId} after kill ${kill}`).toBe(studyId);
    if (run?.status !== 'done' || checkedRuns.has(runId)) continue;
    const results = JSON.parse(run.results as string) as {
      communities: unknown[];
      provenance: unknown;
    };
    expect(results.communities.length, `results of run ${runId}`).toBeGreaterThan(0);
    expect(results.provenance, `provenance of run ${runId}`).toBeTruthy();
    checkedRuns.add(runId);
  }
}

describe('SIGKILL during saves and runs', () => {
  it(`loses no acknowledged save and leaves no half-written run over ${ROUNDS} rounds`, async () => {
    const random = mulberry32(SEED);
    const ledger: Ledger = {
      documents: new Map(),
      inFlight: new Map(),
      csv: new Map(),
      runs: new Map(),
      owner: new Map(),
    };
    const ops = new Tally();
    const runStates = new Tally();
    let interruptedAtStart = 0;
    const killMs: number[] = [];
    const checkedRuns = new Set<string>();

    for (let round = 0; round <= ROUNDS; round++) {
      const service = await startService({ databasePath, env: { TREMORA_WORKERS: '1' } });
      current = service;
      interruptedAtStart += Number(
        /(\d+) run\(s\) left unfinished/.exec(service.output())?.[1] ?? 0,
      );

      // After the restart: every acknowledged run is there and finished (unfinished ones were
      // marked interrupted at start), and the API reads back a saved study and a finished run.
      const stored = readDatabase();
      for (const [runId, studyId] of ledger.runs) {
        const run = stored.runs.get(runId);
        expect(run?.studyId, `run ${runId} after restart ${round}`).toBe(studyId);
        expect(
          ['done', 'failed', 'cancelled', 'interrupted'],
          `run ${runId} after restart ${round}`,
        ).toContain(run?.status);
        if (round === ROUNDS) runStates.add(run?.status ?? 'missing');
      }
      const someStudy = [...ledger.documents.keys()][Math.floor(random() * ledger.documents.size)];
      if (someStudy)
        expect(await (await service.fetch(`/api/studies/${someStudy}/document`)).text()).toBe(
          ledger.documents.get(someStudy),
        );
      const someDone = [...stored.runs].find(([, r]) => r.status === 'done')?.[0];
      if (someDone)
        expect((await service.fetch(`/api/runs/${someDone}/results.csv`)).status).toBe(200);
      if (round === ROUNDS) {
        await service.stop();
        break;
      }

      // The worker threads load their code in a second or so; until then no run could start.
      const warm = await service.fetch('/api/validate', jsonInit('POST', smallStudy('Warm-up')));
      expect(warm.status).toBe(200);
      const wait = 150 + Math.floor(random() * 1_500);
      killMs.push(wait);
      let killed = false;
      const writing = writeUntilKilled(service, ledger, random, ops, () => killed);
      // A failure of a write before the kill fails the test; the race only holds it until then.
      const early = await Promise.race([
        writing.then(() => 'ended'),
        new Promise((r) => setTimeout(() => r('time'), wait)),
      ]);
      expect(early, 'the writers stopped before the kill').toBe('time');
      killed = true;
      await service.kill();
      await writing;

      const after = inspect();
      expect(after.integrity, `integrity after kill ${round + 1}`).toBe('ok');
      // The file stays marked as Tremora's, so the next start accepts it (database-file.ts).
      expect(after.applicationId, `application_id after kill ${round + 1}`).toBe(
        TREMORA_APPLICATION_ID,
      );
      expect(after.halfWritten, `runs with results but not done after kill ${round + 1}`).toBe(0);
      expect(after.doneWithout, `done runs missing results after kill ${round + 1}`).toBe(0);
      checkSaves(ledger, round + 1, checkedRuns);
    }

    console.log(
      `crash safety: ${ROUNDS} SIGKILL rounds (seed ${SEED}, kill after ${Math.min(...killMs)}–${Math.max(...killMs)} ms of writing)\n` +
        `  acknowledged: ${ops}; studies checked each round: ${ledger.documents.size} at the end\n` +
        `  runs at the end: ${runStates}; marked interrupted at restarts: ${interruptedAtStart}; integrity_check ok after every kill`,
    );
    expect(ops.count('create')).toBeGreaterThan(0);
    expect(ops.count('run')).toBeGreaterThan(0);
  }, 600_000);
});

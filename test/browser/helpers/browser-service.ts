import { join } from 'node:path';
import type { BrowserContext, BrowserContextOptions, Page } from 'playwright-core';
import { afterAll, beforeAll, expect } from 'vitest';
import { demoStudyId, startRun, waitForStatus } from '../../service/helpers/runs.ts';
import {
  jsonInit,
  startService,
  tempDir,
  type ServiceProcess,
} from '../../service/helpers/service-process.ts';
import { ARTIFACTS, launchChromium, offlineContext, type LaunchedBrowser } from './chromium.ts';

export interface BrowserServiceOptions {
  /** Prefix of the temporary folder that holds the service's database. */
  readonly tempPrefix: string;
  /** The database file's name inside that folder. */
  readonly database: string;
  readonly env?: Readonly<Record<string, string>>;
  /**
   * Runs once the service is up, before Chromium starts (saving a study, screening it), and
   * gives the id of the study the tests work on; by default the demo saved on first start.
   */
  readonly prepare?: (service: ServiceProcess) => Promise<string>;
  /**
   * Options of the one offline context (and its page) shared by the file's tests; `false` when
   * each describe opens its own context (one per width or per script setting).
   */
  readonly context?: BrowserContextOptions | false;
  /** The set-up's time limit, for a set-up that screens a study. */
  readonly setupTimeoutMs?: number;
}

/**
 * What a browser test file shares, filled in by its beforeAll: the service, Chromium and, unless
 * the file opens its own, an offline context with one page and the foreign requests it refused.
 */
export interface BrowserService {
  service: ServiceProcess;
  /** The study the tests work on (see BrowserServiceOptions.prepare). */
  studyId: string;
  chromium: LaunchedBrowser;
  context: BrowserContext;
  page: Page;
  foreignRequests: string[];
  /** The text of the study's document as the API gives it (to see that nothing was saved). */
  document(): Promise<string>;
}

/**
 * Registers the file's beforeAll and afterAll: a service on a fresh database, Chromium with a
 * fresh profile (launchChromium) and the offline context; afterAll closes them in reverse order
 * and removes the folder, also after a set-up that failed part way.
 */
export function browserService(options: BrowserServiceOptions): BrowserService {
  const dir = tempDir(options.tempPrefix);
  // Filled in by beforeAll; afterAll closes only what was opened.
  const shared: Partial<BrowserService> = {
    document: async () => {
      const service = shared.service as ServiceProcess;
      return (await service.fetch(`/api/studies/${shared.studyId}/document`)).text();
    },
  };
  beforeAll(async () => {
    const service = await startService({
      databasePath: join(dir.path, options.database),
      env: options.env,
    });
    shared.service = service;
    shared.studyId = await (options.prepare ?? demoStudyId)(service);
    const chromium = await launchChromium();
    shared.chromium = chromium;
    if (options.context === false) return;
    const guarded = await offlineContext(chromium.browser, service.url, options.context);
    shared.context = guarded.context;
    shared.foreignRequests = guarded.foreignRequests;
    shared.page = await guarded.context.newPage();
  }, options.setupTimeoutMs);
  afterAll(async () => {
    await shared.context?.close();
    await shared.chromium?.close();
    await shared.service?.stop();
    dir.remove();
  });
  return shared as BrowserService;
}

/** A describe's own offline context, its one page and the foreign requests it refused. */
export interface DescribeContext {
  context: BrowserContext;
  page: Page;
  foreignRequests: string[];
}

/**
 * For a file whose describes each open their own context (`context: false`): registers the
 * describe's beforeAll, which opens an offline context with `options` and one page, and its
 * afterAll, which closes the context.
 */
export function describeContext(
  rig: BrowserService,
  options?: BrowserContextOptions,
): DescribeContext {
  // Filled in by beforeAll.
  const own: Partial<DescribeContext> = {};
  beforeAll(async () => {
    const guarded = await offlineContext(rig.chromium.browser, rig.service.url, options);
    own.context = guarded.context;
    own.foreignRequests = guarded.foreignRequests;
    own.page = await guarded.context.newPage();
  });
  afterAll(async () => {
    await own.context?.close();
  });
  return own as DescribeContext;
}

/**
 * Inside a test: a second offline context without script, its page already on the study's
 * overview, and the foreign requests it refused (the test closes the context).
 */
export async function noScriptOverview(
  rig: BrowserService,
): Promise<{ context: BrowserContext; page: Page; foreignRequests: string[] }> {
  const { context, foreignRequests } = await offlineContext(rig.chromium.browser, rig.service.url, {
    javaScriptEnabled: false,
  });
  const page = await context.newPage();
  await page.goto(`${rig.service.url}/studies/${rig.studyId}`);
  return { context, page, foreignRequests };
}

/** Saves a study through the API (201) and returns its id. */
export async function saveStudy(service: ServiceProcess, study: unknown): Promise<string> {
  const created = await service.fetch('/api/studies', jsonInit('POST', study));
  expect(created.status, await created.clone().text()).toBe(201);
  return ((await created.json()) as { id: string }).id;
}

/** Screens a saved study and waits until the run is done. */
export async function screenStudy(service: ServiceProcess, studyId: string): Promise<void> {
  const run = await startRun(service, studyId);
  expect((await waitForStatus(service, run.id)).status).toBe('done');
}

/**
 * Full-page screenshots to test-artifacts/ at desktop width (`<name>.png`) and at a phone's
 * 390 px (`<name>-390.png`), leaving the page at desktop width again.
 */
export async function screenshotTwoWidths(
  page: Page,
  name: string,
  desktopPx = 1280,
): Promise<void> {
  const desktop = { width: desktopPx, height: 900 };
  await page.setViewportSize(desktop);
  await page.screenshot({ path: join(ARTIFACTS, `${name}.png`), fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: join(ARTIFACTS, `${name}-390.png`), fullPage: true });
  await page.setViewportSize(desktop);
}

/** Chooses a file in a page's upload field `#<upload>-file` and sends the field's form. */
export async function sendFile(
  page: Page,
  upload: string,
  file: { readonly name: string; readonly mimeType: string; readonly text: string | Uint8Array },
): Promise<void> {
  await page.setInputFiles(`#${upload}-file`, {
    name: file.name,
    mimeType: file.mimeType,
    buffer: Buffer.from(file.text),
  });
  await page.locator(`form:has(#${upload}-file) button[type="submit"]`).click();
}

import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  chromium,
  type Browser,
  type BrowserContext,
  type BrowserContextOptions,
  type Page,
} from 'playwright-core';
import { REPO_ROOT } from '../../service/helpers/service-process.ts';

/** Debian's Chromium (installed by .ci/run); never a downloaded browser. */
export const CHROMIUM = '/usr/bin/chromium';

/** The flags Chromium is started with, exactly; playwright's own defaults are not used. */
export const CHROMIUM_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
] as const;

/** Where screenshots and PDFs go (git-ignored). */
export const ARTIFACTS = join(REPO_ROOT, 'test-artifacts');

export interface LaunchedBrowser {
  readonly browser: Browser;
  close(): Promise<void>;
}

/**
 * Chromium with CHROMIUM_FLAGS and a fresh profile. ignoreDefaultArgs drops playwright's
 * flags; the one it cannot do without is the pipe it drives the browser through.
 */
export async function launchChromium(): Promise<LaunchedBrowser> {
  const profile = mkdtempSync(join(tmpdir(), 'tremora-chromium-'));
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    ignoreDefaultArgs: true,
    args: [...CHROMIUM_FLAGS, `--user-data-dir=${profile}`, '--remote-debugging-pipe'],
  });
  mkdirSync(ARTIFACTS, { recursive: true });
  return {
    browser,
    close: async () => {
      await browser.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export interface GuardedContext {
  readonly context: BrowserContext;
  /** Every request the pages made to another origin (each was refused). */
  readonly foreignRequests: string[];
}

/** A browser context that refuses, and records, any request leaving `origin`. */
export async function offlineContext(
  browser: Browser,
  origin: string,
  options: BrowserContextOptions = {},
): Promise<GuardedContext> {
  const context = await browser.newContext({ viewport: { width: 1100, height: 900 }, ...options });
  const foreignRequests: string[] = [];
  await context.route('**/*', async (route) => {
    const url = route.request().url();
    if (url.startsWith('data:') || new URL(url).origin === origin) return route.continue();
    foreignRequests.push(url);
    return route.abort('blockedbyclient');
  });
  return { context, foreignRequests };
}

const AXE_SOURCE = readFileSync(join(REPO_ROOT, 'node_modules/axe-core/axe.min.js'), 'utf8');

export interface AxeViolation {
  readonly id: string;
  readonly impact: string | null;
  readonly help: string;
  readonly nodes: readonly string[];
}

/**
 * axe-core's violations of serious or critical impact on the page. axe is evaluated through
 * the DevTools protocol, which the page's Content-Security-Policy does not govern, so the
 * page's own policy stays in force.
 */
export async function seriousAxeViolations(page: Page): Promise<AxeViolation[]> {
  await page.evaluate(AXE_SOURCE);
  const violations =
    (await page.evaluate(`axe.run(document, { resultTypes: ['violations'] }).then((result) =>
    result.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.map((n) => JSON.stringify(n.target)) })))`)) as AxeViolation[];
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

export interface TabWalk {
  /** Every visible, enabled control that can take focus, by its description. */
  readonly controls: readonly string[];
  /** The controls Tab did not reach. */
  readonly missed: readonly string[];
  /** Controls that had focus without a visible outline or ring. */
  readonly invisibleFocus: readonly string[];
}

/**
 * In the page: marks every visible, enabled control that can take focus (data-tab-walk) and
 * returns a description of each. Text, not a function, as the type-check has no DOM library.
 */
const COLLECT_CONTROLS = `(() => {
  const selector = 'a[href], button, input:not([type="hidden"]), select, textarea, summary, [tabindex]:not([tabindex="-1"])';
  const all = Array.from(document.querySelectorAll(selector)).filter((el) => {
    if (el.disabled) return false;
    const style = getComputedStyle(el);
    if (style.visibility === 'hidden' || style.display === 'none') return false;
    if (el.closest('details:not([open])') && el.tagName !== 'SUMMARY') return false;
    return el.getClientRects().length > 0;
  });
  return all.map((el, i) => {
    el.setAttribute('data-tab-walk', String(i));
    const label = (el.getAttribute('aria-label') || el.textContent || '').trim().replace(/\\s+/g, ' ').slice(0, 40);
    return el.tagName.toLowerCase() + (el.id ? '#' + el.id : '') + ' "' + label + '"';
  });
})()`;

/** In the page: which marked control has focus, and whether its focus shows (outline or ring). */
const FOCUS_STATE = `(() => {
  const el = document.activeElement;
  const index = el ? el.getAttribute('data-tab-walk') : null;
  if (index === null) return null;
  const style = getComputedStyle(el);
  const shown = (style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) > 0) || style.boxShadow !== 'none';
  return { index: Number(index), shown };
})()`;

/**
 * Presses Tab from the top of the page until focus has gone round once (or twice the number of
 * controls), and reports the controls it never reached and those whose focus was not shown.
 */
export async function walkWithTab(page: Page): Promise<TabWalk> {
  const controls = (await page.evaluate(COLLECT_CONTROLS)) as string[];
  await page.evaluate(
    'document.activeElement && document.activeElement.blur(); window.scrollTo(0, 0)',
  );
  const reached = new Set<number>();
  const invisible = new Set<number>();
  for (let i = 0; i < controls.length * 2 + 2; i++) {
    await page.keyboard.press('Tab');
    const state = (await page.evaluate(FOCUS_STATE)) as { index: number; shown: boolean } | null;
    if (!state) continue;
    if (reached.has(state.index) && reached.size === controls.length) break;
    reached.add(state.index);
    if (!state.shown) invisible.add(state.index);
  }
  return {
    controls,
    missed: controls.filter((_, i) => !reached.has(i)),
    invisibleFocus: controls.filter((_, i) => invisible.has(i)),
  };
}

/** Pages in a PDF: the page objects of its page tree (`/Type /Page`, not `/Pages`). */
export function pdfPageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g) ?? []).length;
}

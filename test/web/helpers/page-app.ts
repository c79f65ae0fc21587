import type { Hono } from 'hono';
import { afterAll, beforeAll, expect } from 'vitest';
import { createApp } from '../../../api/service/app.ts';
import type { ServiceContext } from '../../../api/operations/service-context.ts';
import { createPages } from '../../../web/pages.tsx';
import { tempDir } from '../../service/helpers/service-process.ts';
import { smallStudy } from '../../service/helpers/small-study.ts';
import { closeServiceContext, testServiceContext } from '../../service/helpers/test-context.ts';
import { saveStudy } from '../../service/helpers/saved-study.ts';

/** The service with its pages, in-process (app.request), on a temporary database. */
export interface PageApp {
  readonly app: Hono;
  readonly ctx: ServiceContext;
  /** The data folder: the database, and text/ for imported translations. */
  readonly dataDir: string;
  close(): Promise<void>;
}

export interface StartPageAppOptions {
  /** The service's TREMORA_TOKEN, for both the token check and the access page. */
  readonly token?: string;
  /** The shipped text bundles' folder (default: web/text/bundles/). */
  readonly textDir?: string;
}

export function startPageApp(options: StartPageAppOptions = {}): PageApp {
  const dir = tempDir('tremora-pages-');
  const ctx = testServiceContext(`${dir.path}/pages.db`, 1_000_000_000);
  const app = createApp(ctx, {
    pages: createPages(ctx, {
      token: options.token,
      textDir: options.textDir,
      importedTextDir: `${dir.path}/text`,
    }),
    logError: () => {},
    ...(options.token === undefined ? {} : { token: options.token }),
  });
  return {
    app,
    ctx,
    dataDir: dir.path,
    close: async () => {
      await closeServiceContext(ctx);
      dir.remove();
    },
  };
}

/** Waits until a run has finished (no time is asserted). */
export async function runFinished(ctx: ServiceContext, runId: string): Promise<string> {
  for (let i = 0; i < 1200; i++) {
    const run = ctx.store.runs.get(runId);
    if (run && !['queued', 'running'].includes(run.status)) return run.status;
    await new Promise((r) => setTimeout(r, 50));
  }
  return ctx.store.runs.get(runId)?.status ?? 'missing';
}

/** A multipart form with one file field `file`. */
export function fileForm(
  name: string,
  type: string,
  content: string,
  fields: Record<string, string> = {},
): FormData {
  const form = new FormData();
  form.set('file', new File([content], name, { type }));
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return form;
}

/** The inner text of the first element with `id`, tags stripped (enough for these pages' simple markup). */
export function textOfId(html: string, id: string): string | undefined {
  const start = html.indexOf(`id="${id}"`);
  if (start < 0) return undefined;
  const open = html.lastIndexOf('<', start);
  const tag = /^<(\w+)/.exec(html.slice(open))?.[1] as string;
  const end = html.indexOf(`</${tag}>`, start);
  return html.slice(html.indexOf('>', start) + 1, end).replace(/<[^>]+>/g, '');
}

/** What a route test file shares: the pages on a temporary database with one small study saved. */
export interface SmallStudyPages {
  page: PageApp;
  studyId: string;
}

/**
 * Registers the file's beforeAll and afterAll: the pages (startPageApp) with smallStudy(name)
 * saved in the store, filled in before the file's tests run and closed after them.
 */
export function pagesWithSmallStudy(name: string): SmallStudyPages {
  const shared: Partial<SmallStudyPages> = {};
  beforeAll(() => {
    shared.page = startPageApp();
    shared.studyId = saveStudy(shared.page.ctx.store, smallStudy(name));
  });
  afterAll(async () => shared.page?.close());
  return shared as SmallStudyPages;
}

/**
 * Saves `study` in the pages' store and screens it with the overview's button (a form post),
 * waiting until the run is done; gives the study's and the run's ids.
 */
export async function saveAndScreen(
  page: PageApp,
  study: { readonly name: string },
): Promise<{ readonly id: string; readonly runId: string }> {
  const id = saveStudy(page.ctx.store, study);
  const started = await page.app.request(`/studies/${id}/screen`, {
    method: 'POST',
    body: new URLSearchParams(),
  });
  const runId = (started.headers.get('location') as string).split('/').at(-1) as string;
  expect(await runFinished(page.ctx, runId)).toBe('done');
  return { id, runId };
}

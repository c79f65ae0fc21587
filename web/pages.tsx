import { Hono } from 'hono';
import type { ServiceContext } from '../api/operations/service-context.ts';
import { accessPages } from './routes/access-pages.tsx';
import { catalogPages } from './routes/catalog-pages.tsx';
import { editorPages } from './routes/editor-pages.tsx';
import { languagePages } from './routes/language-pages.tsx';
import { LANGUAGE_COOKIE, pageKit, safeBackPath } from './routes/page-kit.ts';
import { scenarioPages } from './routes/scenario-pages.tsx';
import { staticFiles } from './routes/static-files.ts';
import { studyPages } from './routes/study-pages.tsx';
import { studyRecordPages } from './routes/study-record-pages.tsx';
import { visitPages } from './routes/visit-pages.tsx';
import { loadTextBundles } from './text/text-bundles.ts';
import { HomeView } from './views/home-view.tsx';
import { LimitsView } from './views/limits-view.tsx';
import { notFoundPage } from './routes/message-pages.tsx';

/** How long the language choice is kept, seconds (a year). */
const LANGUAGE_COOKIE_MAX_AGE_S = 365 * 24 * 3600;

export interface CreatePagesOptions {
  /** The service's TREMORA_TOKEN, when it has one: the access page checks it (routes/access-pages.tsx). */
  readonly token?: string | undefined;
  /** The shipped text bundles' folder (default: TREMORA_TEXT_DIR, else web/text/bundles/). */
  readonly textDir?: string | undefined;
  /**
   * Where translations imported from the Languages page are kept and read from at start-up
   * (the service gives its data folder's text/, beside the SQLite file); undefined: imports
   * are refused.
   */
  readonly importedTextDir?: string | undefined;
}

/**
 * The pages, server-rendered, mounted at "/" by createApp (api/service/app.ts), which gives
 * them the service's security headers and limits. They read studies and runs in-process from
 * the store and start work through the same scheduler and pools as the API.
 */
export function createPages(ctx: ServiceContext, options: CreatePagesOptions = {}): Hono {
  const app = new Hono();
  const folders = { textDir: options.textDir, importedDir: options.importedTextDir };
  const kit = pageKit(ctx, loadTextBundles(folders));

  staticFiles(app);

  app.get('/', (c) => {
    return kit.render(
      c,
      <HomeView
        page={kit.page(c)}
        studies={ctx.store.studies.list()}
        deleted={c.req.query('deleted') === '1'}
      />,
    );
  });

  app.get('/limits', (c) => kit.render(c, <LimitsView page={kit.page(c)} />));

  // The language switch: a plain GET form, so it works without script; the choice is a cookie.
  app.get('/language', (c) => {
    const lang = c.req.query('lang');
    const back = safeBackPath(c.req.query('back'));
    if (kit.bundles.has(lang)) {
      c.header(
        'Set-Cookie',
        `${LANGUAGE_COOKIE}=${lang}; Path=/; Max-Age=${LANGUAGE_COOKIE_MAX_AGE_S}; SameSite=Lax`,
      );
    }
    return c.redirect(back, 303);
  });

  accessPages(app, kit, options.token);
  // Before the study pages, so that /studies/new is not read as a study's id.
  studyRecordPages(app, kit);
  studyPages(app, kit);
  scenarioPages(app, kit);
  editorPages(app, kit);
  catalogPages(app, kit);
  visitPages(app, kit);
  languagePages(app, kit, folders);

  // Unknown pages get a page; unknown API paths keep the API's JSON 404.
  app.get('*', (c) => {
    if (c.req.path.startsWith('/api/') || c.req.path === '/api') return c.notFound();
    return notFoundPage(kit, c);
  });

  return app;
}

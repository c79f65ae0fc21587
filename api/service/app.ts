import { Hono } from 'hono';
import { prepareTerrain } from './prepare-terrain.ts';
import { bodyLimit } from 'hono/body-limit';
import { methodNotAllowed } from 'hono/method-not-allowed';
import { allowedHosts } from './allowed-hosts.ts';
import { errorHandler, logToStderr, notFoundHandler, type LogError } from './error-handler.ts';
import { errorBody } from './http-error.ts';
import { requireToken } from './require-token.ts';
import { catalogRoutes } from './routes/catalogs.ts';
import { computeRoutes } from './routes/compute.ts';
import { healthRoutes } from './routes/health.ts';
import { importRoutes } from './routes/imports.ts';
import { mapRoutes } from './routes/maps.ts';
import { probeRoutes } from './routes/probe.ts';
import { runRoutes } from './routes/runs.ts';
import { scenarioRoutes } from './routes/scenario.ts';
import { studyRoutes } from './routes/studies.ts';
import { tsunamiRoutes } from './routes/tsunami.ts';
import { visitRoutes } from './routes/visits.ts';
import { sameOriginWrites } from './same-origin.ts';
import { securityHeaders } from './security-headers.ts';
import type { ServiceContext } from '../operations/service-context.ts';

/**
 * Largest request body accepted, bytes. A study at the schema's limits (500 sources, the
 * communities limit) with detailed fault traces and zone outlines stays well under this.
 */
export const DEFAULT_BODY_LIMIT_BYTES = 5 * 1024 * 1024;

export interface CreateAppOptions {
  /** The pages, mounted at `/`; the API's headers, limits and error answers apply to them too. */
  readonly pages?: Hono;
  /** When set, every request that writes or computes must carry it (require-token.ts). */
  readonly token?: string;
  readonly bodyLimitBytes?: number;
  /** When set, requests whose Host names anything else are refused with 421 (allowed-hosts.ts). */
  readonly allowedHosts?: readonly string[];
  readonly logError?: LogError;
}

/** The whole HTTP service: JSON API under /api/, optional pages at /, one error shape. */
export function createApp(ctx: ServiceContext, options: CreateAppOptions = {}): Hono {
  const app = new Hono();
  const maxSize = options.bodyLimitBytes ?? DEFAULT_BODY_LIMIT_BYTES;

  app.use(securityHeaders());
  if (options.allowedHosts !== undefined) app.use(allowedHosts(options.allowedHosts));
  app.use(
    methodNotAllowed({
      app,
      onMethodNotAllowed: (c, methods) =>
        c.json(
          errorBody(
            `${c.req.method} is not allowed on ${c.req.path}; expected ${methods.join(', ')}`,
          ),
          405,
          { Allow: methods.join(', ') },
        ),
    }),
  );
  app.use(sameOriginWrites());
  if (options.token !== undefined) app.use(requireToken(options.token, ctx.store.pageAccess));
  app.use(
    bodyLimit({
      maxSize,
      onError: (c) =>
        c.json(errorBody(`the request body is over the limit of ${maxSize} bytes`), 413),
    }),
  );

  app.use(prepareTerrain(ctx));

  const api = new Hono();
  for (const routes of [
    healthRoutes,
    studyRoutes,
    importRoutes,
    runRoutes,
    mapRoutes,
    computeRoutes,
    scenarioRoutes,
    probeRoutes,
    catalogRoutes,
    tsunamiRoutes,
    visitRoutes,
  ]) {
    api.route('/', routes(ctx));
  }
  app.route('/api', api);
  if (options.pages) app.route('/', options.pages);

  app.onError(
    errorHandler(options.logError ?? logToStderr, (error) => ctx.store.noteWriteFailure(error)),
  );
  app.notFound(notFoundHandler);
  return app;
}

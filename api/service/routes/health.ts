import { Hono } from 'hono';
import type { ServiceContext } from '../../operations/service-context.ts';

/**
 * GET /api/health: the service answers, its database answers ("full" while writes fail for
 * want of disk space), and how busy its workers are.
 */
export function healthRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  app.get('/health', (c) => {
    const runWorkers = ctx.runPool.stats();
    const quickWorkers = ctx.quickPool.stats();
    const database = !ctx.store.ping() ? 'unavailable' : ctx.store.diskFull() ? 'full' : 'ok';
    const ok = database === 'ok' && runWorkers.alive > 0 && quickWorkers.alive > 0;
    return c.json(
      {
        status: ok ? 'ok' : 'degraded',
        tool: 'tremora',
        version: ctx.toolVersion,
        database,
        workers: { runs: runWorkers, quick: quickWorkers },
        activeRuns: ctx.scheduler.activeCount,
      },
      ok ? 200 : 503,
    );
  });
  return app;
}

import { Hono } from 'hono';
import { probeMotion } from '../../engine/motion/probe.ts';
import { readProbeRequest } from '../../operations/probe-request.ts';
import { readJsonObject } from '../request-body.ts';
import type { ServiceContext } from '../../operations/service-context.ts';

/**
 * POST /api/probe: one ground-motion model at one stated geometry. A handful of model
 * evaluations, so it runs on the request thread.
 */
export function probeRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  app.post('/probe', async (c) => {
    const { value } = await readJsonObject(
      c,
      'a ground-motion probe request ({ "model": ..., "magnitude": ..., "rjbKm": ... })',
    );
    return c.json(probeMotion(readProbeRequest(value, ctx.models), ctx.models));
  });
  return app;
}

import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { readJsonObject } from '../request-body.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { inputHash } from '../../results/input-hash.ts';
import { validateStudy, terrainFiles } from '../../operations/study-input.ts';
import { measureStudy } from '../../operations/study-size.ts';

/** Stateless work on a posted study: validate only, or screen it without saving anything. */
export function computeRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();

  app.post('/validate', async (c) => {
    const { value } = await readJsonObject(c, 'a study document');
    await terrainGridsOf(ctx).prepare(value);
    const { study, warnings } = validateStudy(
      value,
      ctx.models,
      terrainFiles(value, terrainGridsOf(ctx)),
    );
    const work = await measureStudy(ctx, study, c.req.raw.signal);
    return c.json({
      valid: true,
      name: study.name,
      communities: study.communities.length,
      sources: study.sources.length,
      measures: study.settings.measures,
      work: {
        size: work.size,
        budget: ctx.workBudget,
        ruptures: work.ruptures,
        detail: work.detail,
      },
      inputHash: inputHash(study),
      warnings,
    });
  });

  app.post('/compute', async (c) => {
    const { value } = await readJsonObject(c, 'a study document');
    await terrainGridsOf(ctx).prepare(value);
    const { study } = validateStudy(value, ctx.models, terrainFiles(value, terrainGridsOf(ctx)));
    await measureStudy(ctx, study, c.req.raw.signal);
    const handle = ctx.runPool.run({
      kind: 'screen',
      study,
      inputHash: inputHash(study),
      toolVersion: ctx.toolVersion,
    });
    // Nobody is left to read the answer of a request the client gave up on.
    c.req.raw.signal.addEventListener('abort', () => handle.cancel(), { once: true });
    const { resultsJson } = await handle.result;
    return c.body(resultsJson, 200, { 'Content-Type': 'application/json; charset=utf-8' });
  });

  return app;
}

import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { z } from 'zod';
import { InvalidInput } from '../../engine/errors.ts';
import { SLOW_WALK_MS } from '../../engine/tsunami/index.ts';
import { identifier, numberIn } from '../../study/fields.ts';
import { IssueList } from '../../study/issues.ts';
import { found } from '../http-error.ts';
import { inputHash } from '../../results/input-hash.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { storedInputs, validateStudy } from '../../operations/study-input.ts';
import { tsunamiTimesOf } from '../../operations/tsunami-times.ts';

/** The caution every tsunami answer carries (SAFETY.md, "Tsunami time-to-act"). */
export const TSUNAMI_CAUTION =
  'Rough screening estimates, not a warning. After strong or long shaking, the sea drawing back or a roar from the sea, go to high ground at once; official warnings and local evacuation plans come first and decide the routes. A tsunami from an undersea landslide can arrive sooner.';

const querySchema = z.object({
  source: z.array(identifier()).optional(),
  // Heights counted as high ground: above sea level, at most a hill's worth.
  highGroundM: numberIn({ min: 1, max: 1000, unit: 'm' }).optional(),
});

/** GET /api/studies/:id/tsunami?source=ID&highGroundM=30: first arrivals and high ground of a saved study's coastal communities. */
export function tsunamiRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();
  app.get('/studies/:id/tsunami', async (c) => {
    const id = c.req.param('id');
    const record = found(ctx.store.studies.get(id), 'study', id);
    const issues = new IssueList();
    for (const key of Object.keys(c.req.queries()))
      if (key !== 'source' && key !== 'highGroundM')
        issues.add([key], 'unknown query parameter; expected source or highGroundM');
    const height = c.req.query('highGroundM');
    const query = issues.parse(
      querySchema,
      {
        source: c.req.queries('source'),
        highGroundM: height === undefined ? undefined : Number(height),
      },
      [],
    );
    if (issues.issues.length > 0 || !query)
      throw new InvalidInput(issues.issues, 'invalid tsunami request');
    const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
    const { study } = validateStudy(inputs.raw, ctx.models, inputs);
    const result = await tsunamiTimesOf(ctx).forStudy(study, inputHash(study), {
      ...(query.source ? { sourceIds: query.source } : {}),
      ...(query.highGroundM !== undefined ? { highGroundM: query.highGroundM } : {}),
    });
    return c.json({ ...result, walkingPaceMS: SLOW_WALK_MS, caution: TSUNAMI_CAUTION });
  });
  return app;
}

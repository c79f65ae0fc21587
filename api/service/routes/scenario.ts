import { Hono } from 'hono';
import { terrainGridsOf } from '../../operations/terrain-grids.ts';
import { InvalidInput, type InputIssue } from '../../engine/errors.ts';
import type { Study } from '../../engine/model.ts';
import type { ScenarioRequest } from '../../engine/scenario/index.ts';
import { found } from '../http-error.ts';
import { readJsonObject } from '../request-body.ts';
import { readScenarioRequest } from '../../operations/scenario-request.ts';
import { runQuickTask } from '../../operations/quick-task.ts';
import type { ServiceContext } from '../../operations/service-context.ts';
import { storedInputs, terrainFiles, validateStudy } from '../../operations/study-input.ts';

/** Runs `work`, adding its InvalidInput issues to `issues` instead of throwing them. */
function collect<T>(issues: InputIssue[], work: () => T): T | undefined {
  try {
    return work();
  } catch (error) {
    if (!(error instanceof InvalidInput)) throw error;
    issues.push(...error.issues);
    return undefined;
  }
}

/** Deterministic shaking of one rupture: of a posted study, or of a saved one. */
export function scenarioRoutes(ctx: ServiceContext): Hono {
  const app = new Hono();

  const answer = async (study: Study, request: ScenarioRequest, signal: AbortSignal) => {
    const { resultJson } = await runQuickTask(ctx, { kind: 'scenario', study, request }, signal);
    return resultJson;
  };

  app.post('/scenario', async (c) => {
    const { value } = await readJsonObject(
      c,
      'a scenario request with its study ({ "study": {...}, "sourceId": ..., "magnitude": ... })',
    );
    const issues: InputIssue[] = [];
    const { study: studyDocument, ...fields } = value;
    await terrainGridsOf(ctx).prepare(studyDocument);
    const valid = collect(issues, () =>
      validateStudy(
        studyDocument,
        ctx.models,
        terrainFiles(studyDocument, terrainGridsOf(ctx)),
        'study',
      ),
    );
    const request = collect(issues, () => readScenarioRequest(fields));
    if (issues.length > 0 || !valid || !request) throw new InvalidInput(issues, 'invalid scenario');
    return c.body(await answer(valid.study, request, c.req.raw.signal), 200, {
      'Content-Type': 'application/json; charset=utf-8',
    });
  });

  app.post('/studies/:id/scenario', async (c) => {
    const id = c.req.param('id');
    const record = found(ctx.store.studies.get(id), 'study', id);
    const { value } = await readJsonObject(
      c,
      'a scenario request ({ "sourceId": ..., "magnitude": ... })',
    );
    const request = readScenarioRequest(value);
    const inputs = storedInputs(ctx.store, record, terrainGridsOf(ctx));
    const { study } = validateStudy(inputs.raw, ctx.models, inputs);
    return c.body(await answer(study, request, c.req.raw.signal), 200, {
      'Content-Type': 'application/json; charset=utf-8',
    });
  });

  return app;
}

import { runQuickTask } from '../../api/operations/quick-task.ts';
import type { Context, Hono } from 'hono';
import { InvalidInput, StudyTooLarge, type InputIssue } from '../../api/engine/errors.ts';
import type { Source, Study } from '../../api/engine/model.ts';
import type { ScenarioResult } from '../../api/engine/scenario/index.ts';
import { readScenarioRequest } from '../../api/operations/scenario-request.ts';
import { readStudy } from '../data/study-data.ts';
import { scenarioTsunamiTimes, type TsunamiPageResult } from '../data/tsunami-data.ts';
import { studyPoints } from '../../api/engine/geometry/study-points.ts';
import { mapFrame } from '../maps/map-frame.ts';
import { ScenarioView } from '../views/scenario-view.tsx';
import { field, type PageKit } from './page-kit.ts';
import { OVERVIEW_MAP } from './study-pages.tsx';
import { studyNotFoundPage } from './message-pages.tsx';

/** Cells across the scenario map's longer side: enough to show the pattern, few enough for a light page. */
const GRID_CELLS_ACROSS = 64;

/** Grid spacing (km) giving about GRID_CELLS_ACROSS cells over the study's extent, 1 km at the finest. */
export function scenarioSpacingKm(study: Study): number {
  const frame = mapFrame(study, OVERVIEW_MAP);
  const points = studyPoints(study).map((p) => frame.local.toLocal(p));
  const span = Math.max(
    Math.max(...points.map((p) => p.x)) - Math.min(...points.map((p) => p.x)),
    Math.max(...points.map((p) => p.y)) - Math.min(...points.map((p) => p.y)),
  );
  // The engine's grid adds a 10 km margin on each side (scenario-grid.ts).
  return Math.max(1, Math.round(((span + 20) / GRID_CELLS_ACROSS) * 2) / 2);
}

/** A magnitude to start from: the source's largest, less half a unit, to one decimal. */
export function defaultMagnitude(source: Source | undefined): number {
  if (!source) return 6.5;
  const r = source.recurrence;
  if (r.type === 'fixed') return r.magnitude;
  return Math.max(r.mMin, Math.round((r.mMax - 0.5) * 10) / 10);
}

/**
 * The scenario view: GET shows the form (`?sourceId=` picks the source, as the community page's
 * link does with the community's main source); POST computes on the quick pool and shows the
 * map and the table.
 */
export function scenarioPages(app: Hono, kit: PageKit): void {
  const { ctx } = kit;

  const page = async (c: Context, form?: { sourceId: string; magnitude: string }) => {
    const id = c.req.param('id') as string;
    const data = readStudy(ctx, id);
    if (!data || !data.ok) return studyNotFoundPage(kit, c);
    const { study } = data;
    const first = study.sources[0];
    const asked = c.req.query('sourceId');
    const sourceId =
      form?.sourceId ??
      (study.sources.some((s) => s.id === asked) ? (asked as string) : (first?.id ?? ''));
    const magnitude =
      form?.magnitude ?? String(defaultMagnitude(study.sources.find((s) => s.id === sourceId)));
    let issues: InputIssue[] = [];
    let result: ScenarioResult | undefined;
    let tsunami: TsunamiPageResult | undefined;
    if (form) {
      const magnitudeValue =
        form.magnitude.trim() === '' ? undefined : Number(form.magnitude.replace(',', '.'));
      try {
        const request = readScenarioRequest({
          sourceId: form.sourceId,
          magnitude: magnitudeValue ?? form.magnitude,
          gridSpacingKm: scenarioSpacingKm(study),
        });
        if (!study.sources.some((s) => s.id === request.sourceId)) {
          issues = [{ path: 'sourceId', message: `unknown source "${request.sourceId}"` }];
        } else {
          const { resultJson } = await runQuickTask(
            ctx,
            { kind: 'scenario', study, request },
            c.req.raw.signal,
          );
          result = JSON.parse(resultJson) as ScenarioResult;
          tsunami = await scenarioTsunamiTimes(ctx, study, request);
        }
      } catch (error) {
        if (error instanceof InvalidInput) issues = [...error.issues];
        else if (error instanceof StudyTooLarge)
          issues = [{ path: '(scenario)', message: error.message }];
        else throw error;
      }
    }
    const corners = result?.grid
      ? [
          [result.grid.lon[0], result.grid.lat[0]] as const,
          [result.grid.lon.at(-1), result.grid.lat.at(-1)] as const,
        ]
      : [];
    return kit.render(
      c,
      <ScenarioView
        page={kit.page(c)}
        studyId={id}
        study={study}
        sourceId={sourceId}
        magnitude={magnitude}
        issues={issues}
        {...(tsunami ? { tsunami } : {})}
        {...(result
          ? {
              result,
              frame: mapFrame(study, {
                ...OVERVIEW_MAP,
                fit: 'communities',
                include: corners as [number, number][],
              }),
            }
          : {})}
      />,
      issues.length > 0 ? 422 : 200,
    );
  };

  app.get('/studies/:id/scenario', (c) => page(c));
  app.post('/studies/:id/scenario', async (c) => {
    const form = await c.req.parseBody();
    return page(c, {
      sourceId: field(form, 'sourceId') ?? '',
      magnitude: field(form, 'magnitude') ?? '',
    });
  });
}

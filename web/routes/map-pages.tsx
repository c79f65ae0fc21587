import type { Context, Hono } from 'hono';
import { InvalidInput, TremoraError } from '../../api/engine/errors.ts';
import { readMapRequest } from '../../api/operations/map-request.ts';
import { startMapRun } from '../../api/operations/start-map-run.ts';
import type { MapFormState } from '../views/hazard-map-panel.tsx';
import { MapRunView } from '../views/map-run-view.tsx';
import { field, type PageKit } from './page-kit.ts';
import { notFoundPage, studyNotFoundPage } from './message-pages.tsx';

/** The overview rendered again with the hazard-map form's problems (study-pages.tsx). */
export type OverviewWithMapForm = (
  c: Context,
  options: { readonly mapForm: MapFormState },
) => Response | Promise<Response>;

/** A form number as the request wants it: a number when it reads as one ("12,5" too), else the text, for the message to quote. */
function formNumber(text: string): number | string {
  const trimmed = text.trim().replace(',', '.');
  const value = Number(trimmed);
  return trimmed !== '' && Number.isFinite(value) ? value : text;
}

/**
 * Hazard maps from the overview: POST computes one (as POST /api/studies/{id}/maps does, with
 * the same checks; problems come back on the overview beside the fields), then the map's
 * progress page, which the overview's map shows when it is done.
 */
export function mapPages(app: Hono, kit: PageKit, overview: OverviewWithMapForm): void {
  const { ctx } = kit;

  const notFound = (c: Context) => studyNotFoundPage(kit, c);

  app.post('/studies/:id/maps', async (c) => {
    const id = c.req.param('id');
    const record = ctx.store.studies.get(id);
    if (!record) return notFound(c);
    const form = await c.req.parseBody();
    const sent = {
      measure: field(form, 'measure') ?? '',
      returnPeriodYears: field(form, 'returnPeriodYears') ?? '',
      spacingKm: field(form, 'spacingKm') ?? '',
    };
    try {
      const request = readMapRequest({
        measure: sent.measure,
        returnPeriodYears: formNumber(sent.returnPeriodYears),
        spacingKm: formNumber(sent.spacingKm),
      });
      const run = await startMapRun(ctx, record, request);
      if (!run) return notFound(c);
      return c.redirect(`/studies/${id}/maps/${run.id}`, 303);
    } catch (error) {
      if (error instanceof InvalidInput)
        return overview(c, { mapForm: { ...sent, issues: error.issues } });
      // Over the work budget, too many points, a model without the measure: said beside the form.
      if (error instanceof TremoraError)
        return overview(c, {
          mapForm: { ...sent, issues: [{ path: '(map)', message: error.message }] },
        });
      throw error;
    }
  });

  app.get('/studies/:id/maps/:mapId', (c) => {
    const id = c.req.param('id');
    const record = ctx.store.studies.get(id);
    const run = ctx.store.maps.get(c.req.param('mapId'));
    if (!record || !run || run.studyId !== id) return notFoundPage(kit, c);
    return kit.render(
      c,
      <MapRunView page={kit.page(c)} studyId={id} studyName={record.name} run={run} />,
    );
  });
}

import type { Context, Hono } from 'hono';
import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import { InvalidInput, type InputIssue } from '../../api/engine/errors.ts';
import { planTrip } from '../../api/engine/trip/visit-order.ts';
import { readVisit } from '../../api/operations/visit-input.ts';
import { readRuns, readStudy } from '../data/study-data.ts';
import { DeleteVisitView } from '../views/delete-visit-view.tsx';
import { MessageView } from '../views/message-view.tsx';
import { TripView } from '../views/trip-view.tsx';
import { VisitFormView, type VisitFormValues } from '../views/visit-records.tsx';
import { notFoundPage } from './message-pages.tsx';
import { field, type PageKit } from './page-kit.ts';

/** The visit form's text fields. */
const VISIT_FIELDS = ['visitedOn', 'language', 'peopleReached', 'topics', 'followUps', 'referral'];

/** The form's fields as the visit the API takes: people reached as a number when it is one. */
function visitFromForm(values: VisitFormValues, communityId: string): Record<string, unknown> {
  const people = values['peopleReached']?.trim() ?? '';
  return {
    ...values,
    communityId,
    peopleReached: /^\d+$/.test(people) ? Number(people) : people === '' ? undefined : people,
  };
}

/** The trip plan of chosen villages, the form that records a visit, and deleting one. */
export function visitPages(app: Hono, kit: PageKit): void {
  const { ctx } = kit;

  // A GET, so a plan is a link that can be shared or printed again: ?c=id&c=id&start=id&return=1.
  app.get('/studies/:id/trip', (c) => {
    const tr = kit.tr(c);
    const id = c.req.param('id');
    const data = readStudy(ctx, id);
    const problem = (text: ReturnType<typeof tr.text>, status: 404 | 422) =>
      kit.render(
        c,
        <MessageView
          page={kit.page(c)}
          title={tr.t('trip.title', { name: data?.record.name ?? id })}
          text={text}
        />,
        status,
      );
    if (!data || !data.ok) return problem(tr.text('error.studyNotFound', { id }), 404);
    const byId = new Map(data.study.communities.map((x) => [x.id, x]));
    const start = c.req.query('start') || undefined;
    const chosen = [...new Set([...(start ? [start] : []), ...(c.req.queries('c') ?? [])])];
    const unknown = chosen.find((cid) => !byId.has(cid));
    if (unknown !== undefined) return problem(tr.text('trip.unknown', { id: unknown }), 422);
    if (chosen.length === 0) return problem(tr.text('trip.noneChosen'), 422);
    const returnToStart = c.req.query('return') === '1';
    const plan = planTrip(
      chosen.map((cid) => {
        const community = byId.get(cid);
        return { id: cid, lon: community?.lon ?? 0, lat: community?.lat ?? 0 };
      }),
      { ...(start ? { startId: start } : {}), returnToStart },
    );
    const runs = readRuns(ctx, kit.results, id, data.hash);
    const bands = new Map<string, ScreeningBandId>(
      (runs.screening?.results.communities ?? []).map((r) => [
        r.communityId,
        r.band.id as ScreeningBandId,
      ]),
    );
    return kit.render(
      c,
      <TripView
        page={kit.page(c)}
        studyId={id}
        studyName={data.study.name}
        plan={plan}
        returnToStart={returnToStart}
        names={new Map(data.study.communities.map((x) => [x.id, x.name]))}
        bands={bands}
      />,
    );
  });

  /** The study and community of the path (`:id`, `:cid`), undefined when either is missing. */
  const findCommunity = (c: Context) => {
    const data = readStudy(ctx, c.req.param('id') as string);
    const community = data?.ok
      ? data.study.communities.find((x) => x.id === c.req.param('cid'))
      : undefined;
    return data?.ok && community ? { data, community } : undefined;
  };

  const visitForm = (c: Context, values: VisitFormValues, issues: readonly InputIssue[]) => {
    const tr = kit.tr(c);
    const communityId = c.req.param('cid') as string;
    const found = findCommunity(c);
    if (!found)
      return notFoundPage(kit, c, tr.text('error.communityNotFound', { id: communityId }));
    const { data, community } = found;
    const id = data.record.id;
    return kit.render(
      c,
      <VisitFormView
        page={kit.page(c)}
        studyId={id}
        studyName={data.study.name}
        communityId={communityId}
        communityName={community.name}
        values={values}
        issues={issues}
      />,
      issues.length > 0 ? 422 : 200,
    );
  };

  app.get('/studies/:id/communities/:cid/visits/new', (c) =>
    visitForm(c, { visitedOn: new Date().toISOString().slice(0, 10) }, []),
  );

  app.post('/studies/:id/communities/:cid/visits', async (c) => {
    const id = c.req.param('id');
    const communityId = c.req.param('cid');
    const form = await c.req.parseBody();
    const values: Record<string, string> = {};
    for (const name of VISIT_FIELDS) {
      const value = field(form, name);
      if (value !== undefined) values[name] = value;
    }
    const data = readStudy(ctx, id);
    if (!data?.ok) return visitForm(c, values, []);
    try {
      const visit = readVisit(visitFromForm(values, communityId), data.study);
      if (!ctx.store.visits.add(id, visit)) return visitForm(c, values, []);
    } catch (error) {
      if (error instanceof InvalidInput) return visitForm(c, values, error.issues);
      throw error;
    }
    return c.redirect(`/studies/${id}/communities/${communityId}#visits-heading`, 303);
  });

  /** The study, community and visit of the path (`:id`, `:cid`, `:vid`), undefined when one is missing. */
  const findVisit = (c: Context) => {
    const found = findCommunity(c);
    const visit = found
      ? ctx.store.visits
          .list(found.data.record.id, found.community.id)
          .find((v) => v.id === c.req.param('vid'))
      : undefined;
    return found && visit ? { ...found, visit } : undefined;
  };

  app.get('/studies/:id/communities/:cid/visits/:vid/delete', (c) => {
    const found = findVisit(c);
    if (!found) return notFoundPage(kit, c);
    const { data, community, visit } = found;
    return kit.render(
      c,
      <DeleteVisitView
        page={kit.page(c)}
        study={{ id: data.record.id, name: data.record.name }}
        community={{ id: community.id, name: community.name }}
        visit={visit}
      />,
    );
  });

  app.post('/studies/:id/communities/:cid/visits/:vid/delete', (c) => {
    const found = findVisit(c);
    if (!found) return notFoundPage(kit, c);
    const { data, community, visit } = found;
    ctx.store.visits.delete(data.record.id, visit.id);
    return c.redirect(`/studies/${data.record.id}/communities/${community.id}#visits-heading`, 303);
  });
}

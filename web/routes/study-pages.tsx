import type { Context, Hono } from 'hono';
import { terrainGridsOf } from '../../api/operations/terrain-grids.ts';
import type { Child } from 'hono/jsx';
import { InvalidInput, StudyTooLarge, TremoraError } from '../../api/engine/errors.ts';
import { runStudy } from '../../api/operations/study-input.ts';
import { communityPageData } from '../data/community-data.ts';
import { MapLayerCache, readMaps } from '../data/map-data.ts';
import { suggestedMapSpacing } from '../data/map-spacing.ts';
import {
  FIRST_DIRECTION,
  isSortKey,
  leadHorizonYears,
  rankCommunities,
  sortRanked,
  type SortDirection,
} from '../data/ranking.ts';
import { priorityRows, weightsFromQuery } from '../data/visit-priority-data.ts';
import { feltData, studyCatalog } from '../data/study-catalog.ts';
import { rankByTimeToAct, studyTsunami } from '../data/tsunami-data.ts';
import { startScreening } from '../../api/operations/start-screening.ts';
import { readRuns, readStudy, type StudyData } from '../data/study-data.ts';
import { mapFrame } from '../maps/map-frame.ts';
import { CommunityView } from '../views/community-view.tsx';
import { HandoutView } from '../views/handout-view.tsx';
import type { MapFormState } from '../views/hazard-map-panel.tsx';
import { DraftNotice } from '../views/draft-notice.tsx';
import { MessageView } from '../views/message-view.tsx';
import { OverviewView } from '../views/overview-view.tsx';
import { RunView } from '../views/run-view.tsx';
import { mapPages } from './map-pages.tsx';
import { communitySheet, materialPages } from './material-pages.tsx';
import type { PageKit } from './page-kit.ts';
import { notFoundPage, invalidStudyPage } from './message-pages.tsx';

/** Map sizes, px: the overview's map and the community page's smaller one. */
export const OVERVIEW_MAP = { width: 760, maxHeight: 620, padding: 28 } as const;
export const COMMUNITY_MAP = {
  width: 560,
  maxHeight: 460,
  padding: 30,
  fit: 'communities',
} as const;

/** Visits recorded per community. */
const visitCounts = (visits: readonly { readonly communityId: string }[]) => {
  const counts = new Map<string, number>();
  for (const v of visits) counts.set(v.communityId, (counts.get(v.communityId) ?? 0) + 1);
  return counts;
};

/** What the overview shows again after a form post with problems. */
interface OverviewAgain {
  /** A problem starting a screening. */
  readonly problem?: string;
  readonly mapForm?: MapFormState;
}

/** Overview (with its hazard maps), screening runs, community pages and handouts. */
export function studyPages(app: Hono, kit: PageKit): void {
  const { ctx } = kit;
  const layers = new MapLayerCache();

  const notFound = (c: Context, text: Child) => notFoundPage(kit, c, text);
  const invalid = (c: Context, data: StudyData & { ok: false }) => {
    const tr = kit.tr(c);
    if (data.missing.length > 0)
      return kit.render(
        c,
        <MessageView page={kit.page(c)} title={data.record.name} text="">
          <DraftNotice tr={tr} studyId={data.record.id} missing={data.missing} />
        </MessageView>,
      );
    return invalidStudyPage(kit, c, data);
  };

  const overview = async (c: Context, again: OverviewAgain = {}) => {
    const { problem, mapForm } = again;
    const tr = kit.tr(c);
    const id = c.req.param('id') as string;
    const data = readStudy(ctx, id);
    if (!data) return notFound(c, tr.text('error.studyNotFound', { id }));
    if (!data.ok) return invalid(c, data);
    const runs = readRuns(ctx, kit.results, id, data.hash);
    const askedSort = c.req.query('sort');
    const sort = isSortKey(askedSort) ? askedSort : 'rank';
    const askedDir = c.req.query('dir');
    const direction: SortDirection =
      askedDir === 'ascending' || askedDir === 'descending' ? askedDir : FIRST_DIRECTION[sort];
    const rows = runs.screening
      ? sortRanked(rankCommunities(data.study, runs.screening.results), sort, direction)
      : undefined;
    const asked = weightsFromQuery((key) => c.req.query(key));
    const priority = runs.screening
      ? {
          rows: priorityRows(data.study, runs.screening.results, asked.weights),
          weights: asked.weights,
          problems: asked.problems,
          visitCounts: visitCounts(ctx.store.visits.list(id)),
        }
      : undefined;
    const tsunami = await studyTsunami(ctx, data.study);
    return kit.render(
      c,
      <OverviewView
        page={kit.page(c)}
        studyId={id}
        study={data.study}
        runs={runs}
        frame={mapFrame(data.study, OVERVIEW_MAP)}
        {...(rows ? { rows } : {})}
        {...(priority ? { priority } : {})}
        years={leadHorizonYears(data.study.settings.horizonsYears)}
        sort={sort}
        direction={direction}
        {...(problem ? { problem } : {})}
        maps={readMaps(ctx, layers, id, data.hash)}
        mapSpacing={suggestedMapSpacing(data.study)}
        {...(mapForm ? { mapForm } : {})}
        {...(tsunami
          ? {
              tsunami: {
                times: tsunami,
                ranked: tsunami.ok ? rankByTimeToAct(tsunami.result) : [],
              },
            }
          : {})}
      />,
      problem || mapForm ? 422 : 200,
    );
  };

  app.get('/studies/:id', (c) => overview(c));
  mapPages(app, kit, overview);

  app.post('/studies/:id/screen', async (c) => {
    const id = c.req.param('id');
    const record = ctx.store.studies.get(id);
    if (!record) return notFound(c, kit.tr(c).text('error.studyNotFound', { id }));
    try {
      const started = await startScreening(ctx, record);
      if (!started) return notFound(c, kit.tr(c).text('error.studyNotFound', { id }));
      return c.redirect(`/studies/${id}/runs/${started.run.id}`, 303);
    } catch (error) {
      if (error instanceof InvalidInput)
        return overview(c, {
          problem: error.issues.map((i) => `${i.path}: ${i.message}`).join('; '),
        });
      if (error instanceof StudyTooLarge || error instanceof TremoraError)
        return overview(c, { problem: error.message });
      throw error;
    }
  });

  app.get('/studies/:id/runs/:runId', (c) => {
    const tr = kit.tr(c);
    const id = c.req.param('id');
    const record = ctx.store.studies.get(id);
    const run = ctx.store.runs.get(c.req.param('runId'));
    if (!record || !run || run.studyId !== id) return notFound(c, tr.text('error.notFoundText'));
    return kit.render(
      c,
      <RunView page={kit.page(c)} studyId={id} studyName={record.name} run={run} />,
    );
  });

  /** A community of a study's newest done run, with everything its page and handout need. */
  const communityContext = (c: Context) => {
    const tr = kit.tr(c);
    const id = c.req.param('id') as string;
    const communityId = c.req.param('cid') as string;
    const data = readStudy(ctx, id);
    if (!data)
      return {
        kind: 'response' as const,
        response: notFound(c, tr.text('error.studyNotFound', { id })),
      };
    if (!data.ok) return { kind: 'response' as const, response: invalid(c, data) };
    const runs = readRuns(ctx, kit.results, id, data.hash);
    const screening = runs.screening;
    const result = screening?.results.communities.find((r) => r.communityId === communityId);
    // The run's own inputs say where the community was when it was screened.
    const runInputs = screening ? ctx.store.runs.inputs(screening.run.id) : undefined;
    const ranStudy = runInputs
      ? runStudy(runInputs, ctx.models, terrainGridsOf(ctx)).study
      : undefined;
    const community =
      ranStudy?.communities.find((x) => x.id === communityId) ??
      data.study.communities.find((x) => x.id === communityId);
    if (!community)
      return {
        kind: 'response' as const,
        response: notFound(c, tr.text('error.communityNotFound', { id: communityId })),
      };
    if (!screening || !result || !ranStudy) {
      const latest = runs.latest;
      const underWay =
        latest !== undefined && (latest.status === 'queued' || latest.status === 'running');
      const text = underWay ? (
        <>
          {tr.text('community.runUnderWay', { percent: Math.round(latest.progress * 100) })}{' '}
          <a href={`/studies/${id}/runs/${latest.id}`}>{tr.text('overview.runningLink')}</a>
        </>
      ) : (
        tr.text('community.noRun')
      );
      return {
        kind: 'response' as const,
        response: kit.render(
          c,
          <MessageView page={kit.page(c)} title={community.name} text={text} />,
          409,
        ),
      };
    }
    const felt = feltData(ctx, ranStudy, studyCatalog(ctx, id));
    const history =
      felt?.kind === 'history'
        ? felt.history.communities.find((h) => h.communityId === communityId)
        : undefined;
    return {
      kind: 'page' as const,
      tr,
      id,
      study: ranStudy,
      screening,
      page: communityPageData(ranStudy, community, result),
      ...(felt?.kind === 'history' && history
        ? { felt: { history, eventCount: felt.history.eventCount } }
        : {}),
      feltTooMany: felt?.kind === 'too-many',
    };
  };

  app.get('/studies/:id/communities/:cid', async (c) => {
    const found = communityContext(c);
    if (found.kind === 'response') return found.response;
    const { id, study, screening, page } = found;
    const tsunami = page.community.coastal ? await studyTsunami(ctx, study) : undefined;
    return kit.render(
      c,
      <CommunityView
        page={kit.page(c)}
        studyId={id}
        study={study}
        data={page}
        provenance={screening.results.provenance}
        frame={mapFrame(study, COMMUNITY_MAP)}
        {...(found.felt ? { felt: found.felt } : {})}
        feltTooMany={found.feltTooMany}
        {...(tsunami ? { tsunami } : {})}
        visits={ctx.store.visits.list(id, page.community.id)}
      />,
    );
  });

  app.get('/studies/:id/communities/:cid/handout', async (c) => {
    const found = communityContext(c);
    if (found.kind === 'response') return found.response;
    const { study, page } = found;
    const tsunami = page.community.coastal ? await studyTsunami(ctx, study) : undefined;
    return kit.render(
      c,
      <HandoutView {...communitySheet(kit, c, found)} felt={found.felt} tsunami={tsunami} />,
    );
  });

  materialPages(app, kit, communityContext);
}

import type { Child } from 'hono/jsx';
import type { Study } from '../../api/engine/model.ts';
import type { MapState } from '../data/map-data.ts';
import type { SuggestedSpacing } from '../data/map-spacing.ts';
import type { TsunamiCommunity } from '../../api/engine/tsunami/index.ts';
import type { TsunamiPageResult } from '../data/tsunami-data.ts';
import { TsunamiRanking } from './tsunami-time.tsx';
import {
  FIRST_DIRECTION,
  type RankedCommunity,
  type SortDirection,
  type SortKey,
} from '../data/ranking.ts';
import type { RunState } from '../data/study-data.ts';
import { BandSwatch } from '../layout/band-swatch.tsx';
import { bandFirmnessText } from './band-firmness.tsx';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { HazardLayer, HazardMapLegend, layerClasses } from '../maps/hazard-layer.tsx';
import type { MapFrame } from '../maps/map-frame.ts';
import { StudyMap, StudyMapLegend } from '../maps/study-map.tsx';
import type { Translator } from '../text/translator.ts';
import { HazardMapPanel, type MapFormState } from './hazard-map-panel.tsx';
import { VisitPriorityPanel, type VisitPriorityPanelProps } from './visit-priority-panel.tsx';
import { ScreeningStatus } from './screening-status.tsx';
import { ZoneDepthsSection } from './zone-depths-section.tsx';
import { zoneDepthSummaries } from '../data/zone-depth-summary.ts';

export interface OverviewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly study: Study;
  readonly runs: RunState;
  readonly frame: MapFrame;
  /** Rows in display order, or undefined before a screening. */
  readonly rows?: readonly RankedCommunity[];
  readonly years: number;
  readonly sort: SortKey;
  readonly direction: SortDirection;
  readonly problem?: string;
  readonly maps: MapState;
  readonly mapSpacing: SuggestedSpacing;
  /** The hazard-map form as sent, when it had problems. */
  readonly mapForm?: MapFormState;
  /** The visit priority, once the study is screened. */
  readonly priority?: Omit<VisitPriorityPanelProps, 'tr' | 'studyId' | 'years'>;
  /** Coastal communities by tsunami time to act, when the study has a terrain grid. */
  readonly tsunami?: {
    readonly times: TsunamiPageResult;
    readonly ranked: readonly TsunamiCommunity[];
  };
}

/** Id of the hazard layer's summary, the map's description for assistive technology. */
const HAZARD_SUMMARY_ID = 'overview-map-hazard-summary';

const COLUMNS: readonly {
  readonly key: SortKey;
  readonly text: (tr: Translator, years: number) => Child;
  readonly numeric?: boolean;
}[] = [
  { key: 'rank', text: (tr) => tr.text('overview.col.rank'), numeric: true },
  { key: 'name', text: (tr) => tr.text('overview.col.community') },
  { key: 'band', text: (tr) => tr.text('overview.col.band') },
  { key: 'chance', text: (tr, years) => tr.text('overview.col.chance', { years }), numeric: true },
  { key: 'people', text: (tr) => tr.text('overview.col.people'), numeric: true },
  { key: 'fault', text: (tr) => tr.text('overview.col.fault') },
];

/**
 * The study overview: status, the map with the newest hazard map as its layer, the form that
 * computes a hazard map, and the ranking table, sortable by links (and by script).
 */
export function OverviewView(props: OverviewProps) {
  const { tr } = props.page;
  const { study, studyId, rows } = props;
  const bands = new Map(rows?.map((r) => [r.communityId, r.bandId]) ?? []);
  const shown = props.maps.shown;
  const zoneDepths = zoneDepthSummaries(
    props.runs.screening?.results.diagnostics?.zoneDepths ?? [],
    study.sources,
  );
  // A map with too many points to draw is offered as a download only (hazard-map-panel.tsx).
  const drawn = shown?.layer
    ? { run: shown.run, layer: shown.layer, classes: layerClasses(shown.layer.points) }
    : undefined;
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: study.name }}
      section="overview"
      showsNumbers={rows !== undefined || drawn !== undefined || props.tsunami !== undefined}
    >
      <ScreeningStatus
        tr={tr}
        studyId={studyId}
        runs={props.runs}
        {...(props.problem ? { problem: props.problem } : {})}
      />
      <section aria-labelledby="map-heading" class="map-section">
        <h2 id="map-heading">{tr.text('overview.map')}</h2>
        <figure class="map-figure">
          <StudyMap
            tr={tr}
            study={study}
            frame={props.frame}
            idPrefix="overview-map"
            bands={bands}
            hazardLayer={
              drawn?.classes ? (
                <HazardLayer
                  points={drawn.layer.points}
                  classes={drawn.classes}
                  spacingKm={drawn.run.description.spacingKm}
                  frame={props.frame}
                />
              ) : undefined
            }
            {...(drawn ? { describedBy: HAZARD_SUMMARY_ID } : {})}
          />
          <figcaption>
            {drawn ? (
              <HazardMapLegend
                tr={tr}
                description={drawn.run.description}
                {...(drawn.classes ? { classes: drawn.classes } : {})}
                geojsonUrl={`/api/maps/${drawn.run.id}/map.geojson`}
                summaryId={HAZARD_SUMMARY_ID}
              />
            ) : (
              !shown && <p class="legend-note">{tr.text('map.noHazardLayer')}</p>
            )}
            <StudyMapLegend
              tr={tr}
              idPrefix="overview-map"
              bands={rows !== undefined}
              study={study}
            />
          </figcaption>
        </figure>
        <HazardMapPanel
          tr={tr}
          studyId={studyId}
          study={study}
          maps={props.maps}
          suggestion={props.mapSpacing}
          {...(props.mapForm ? { form: props.mapForm } : {})}
        />
      </section>
      <section aria-labelledby="ranking-heading">
        <h2 id="ranking-heading">{tr.text('overview.ranking')}</h2>
        {rows === undefined ? (
          <p>{tr.text('overview.noRunTable')}</p>
        ) : (
          <>
            <p>{tr.text('overview.rankingRule', { years: props.years })}</p>
            <table
              class="data-table ranking"
              data-sortable="true"
              data-label-ascending={tr.t('overview.sorted.ascending')}
              data-label-descending={tr.t('overview.sorted.descending')}
            >
              <caption>{tr.text('overview.ranking')}</caption>
              <thead>
                <tr>
                  {COLUMNS.map((col) => {
                    const active = props.sort === col.key;
                    const next: SortDirection = active
                      ? props.direction === 'ascending'
                        ? 'descending'
                        : 'ascending'
                      : FIRST_DIRECTION[col.key];
                    return (
                      <th
                        scope="col"
                        aria-sort={active ? props.direction : undefined}
                        class={col.numeric ? 'numeric' : undefined}
                      >
                        <a
                          href={`/studies/${studyId}?sort=${col.key}&dir=${next}#ranking-heading`}
                          data-sort={col.key}
                          data-first={FIRST_DIRECTION[col.key]}
                        >
                          {col.text(tr, props.years)}
                          {/* The script rewrites this text from the table's data-label-* attributes, which share a bundle. */}
                          <span
                            class="sort-state"
                            lang={tr.fallbackLang('overview.sorted.ascending')}
                          >
                            {active ? ` (${tr.t(`overview.sorted.${props.direction}`)})` : ''}
                          </span>
                        </a>
                      </th>
                    );
                  })}
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => {
                  const chance = tr.chance(r.chanceVii);
                  return (
                    <tr data-community={r.communityId}>
                      <td
                        class="numeric"
                        data-key="rank"
                        data-value={r.rank}
                        data-label={tr.t('overview.col.rank')}
                      >
                        {r.rank}
                      </td>
                      <th scope="row" data-key="name" data-value={r.name}>
                        <a href={`/studies/${studyId}/communities/${r.communityId}`}>{r.name}</a>
                      </th>
                      <td
                        data-key="band"
                        data-value={['refer-first', 'refer-soon', 'prepare', 'inform'].indexOf(
                          r.bandId,
                        )}
                        data-band={r.bandId}
                        data-label={tr.t('overview.col.band')}
                      >
                        <BandSwatch tr={tr} bandId={r.bandId} />
                      </td>
                      <td
                        class="numeric"
                        data-key="chance"
                        data-value={r.chanceVii}
                        data-probability={r.chanceVii}
                        data-label={tr.t('overview.col.chance', { years: props.years })}
                      >
                        {chance.frequency} <span class="percent">({chance.percent})</span>
                      </td>
                      <td
                        class="numeric"
                        data-key="people"
                        data-value={r.population ?? ''}
                        data-label={tr.t('overview.col.people')}
                      >
                        {r.population === undefined
                          ? tr.text('overview.unknownPeople')
                          : tr.number(r.population)}
                      </td>
                      <td
                        data-key="fault"
                        data-label={tr.t('overview.col.fault')}
                        data-value={
                          r.nearestFault === undefined
                            ? ''
                            : (r.nearestFault.rrupKm ?? r.nearestFault.distanceKm)
                        }
                      >
                        {r.nearestFault
                          ? `${r.nearestFault.name}, ${tr.place(r.nearestFault.distanceKm, r.nearestFault.bearingDeg, r.nearestFault.depthBelowKm)}`
                          : tr.text('overview.noFault')}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
            <p class="band-rule">{tr.text('band.rule')}</p>
            {rows.some((r) => r.result.bandRobustness) && (
              <>
                <h3>{tr.text('firmness.overview')}</h3>
                <ul class="band-firmness">
                  {rows.map(
                    (r) =>
                      r.result.bandRobustness && (
                        <li data-community={r.communityId}>
                          {r.name}: {bandFirmnessText(tr, r.result.bandRobustness)}
                        </li>
                      ),
                  )}
                </ul>
              </>
            )}
            {props.runs.screening && (
              <p>
                {tr.text('overview.downloads')}:{' '}
                <a href={`/api/runs/${props.runs.screening.run.id}/results.csv`}>
                  {tr.text('overview.csv')}
                </a>{' '}
                ·{' '}
                <a href={`/api/runs/${props.runs.screening.run.id}/results.geojson`}>
                  {tr.text('overview.geojson')}
                </a>
              </p>
            )}
          </>
        )}
      </section>
      {zoneDepths.length > 0 && props.runs.screening && (
        <ZoneDepthsSection
          tr={tr}
          zones={zoneDepths}
          resultsUrl={`/api/runs/${props.runs.screening.run.id}/results`}
        />
      )}
      {props.priority && (
        <VisitPriorityPanel tr={tr} studyId={studyId} years={props.years} {...props.priority} />
      )}
      {props.tsunami && (
        <TsunamiRanking
          tr={tr}
          studyId={studyId}
          tsunami={props.tsunami.times}
          ranked={props.tsunami.ranked}
        />
      )}
    </StudyPage>
  );
}

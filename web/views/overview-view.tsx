import type { Child } from 'hono/jsx';
import type { Study } from '../../api/engine/model.ts';
import { FIRST_DIRECTION, type RankedCommunity, type SortDirection, type SortKey } from '../data/ranking.ts';
import type { RunState } from '../data/study-data.ts';
import { BandSwatch } from '../layout/band-swatch.tsx';
import { PageShell } from '../layout/page-shell.tsx';
import type { MapFrame } from '../maps/map-frame.ts';
import { StudyMap, StudyMapLegend } from '../maps/study-map.tsx';
import type { Translator } from '../text/translator.ts';
import { ScreeningStatus } from './screening-status.tsx';

export interface OverviewProps {
  readonly tr: Translator;
  readonly path: string;
  readonly toolVersion: string;
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
}

const COLUMNS: readonly { readonly key: SortKey; readonly text: (tr: Translator, years: number) => Child; readonly numeric?: boolean }[] = [
  { key: 'rank', text: (tr) => tr.text('overview.col.rank'), numeric: true },
  { key: 'name', text: (tr) => tr.text('overview.col.community') },
  { key: 'band', text: (tr) => tr.text('overview.col.band') },
  { key: 'chance', text: (tr, years) => tr.text('overview.col.chance', { years }), numeric: true },
  { key: 'people', text: (tr) => tr.text('overview.col.people'), numeric: true },
  { key: 'fault', text: (tr) => tr.text('overview.col.fault') },
];

/** The study overview: status, map and the ranking table, sortable by links (and by script). */
export function OverviewView(props: OverviewProps) {
  const { tr, study, studyId, rows } = props;
  const bands = new Map(rows?.map((r) => [r.communityId, r.bandId]) ?? []);
  return (
    <PageShell
      tr={tr}
      title={tr.t('overview.title', { name: study.name })}
      titleLang={tr.fallbackLang('overview.title')}
      path={props.path}
      toolVersion={props.toolVersion}
      study={{ id: studyId, name: study.name }}
      section="overview"
      showsNumbers={rows !== undefined}
    >
      <h1>{tr.text('overview.title', { name: study.name })}</h1>
      <ScreeningStatus tr={tr} studyId={studyId} runs={props.runs} {...(props.problem ? { problem: props.problem } : {})} />
      <section aria-labelledby="map-heading" class="map-section">
        <h2 id="map-heading">{tr.text('overview.map')}</h2>
        <figure class="map-figure">
          <StudyMap tr={tr} study={study} frame={props.frame} idPrefix="overview-map" bands={bands} hazardLayer={undefined} />
          <figcaption>
            <StudyMapLegend tr={tr} idPrefix="overview-map" bands={rows !== undefined} study={study} />
            <p class="legend-note">{tr.text('map.noHazardLayer')}</p>
          </figcaption>
        </figure>
      </section>
      <section aria-labelledby="ranking-heading">
        <h2 id="ranking-heading">{tr.text('overview.ranking')}</h2>
        {rows === undefined ? (
          <p>{tr.text('overview.noRunTable')}</p>
        ) : (
          <>
            <p>{tr.text('overview.rankingRule', { years: props.years })}</p>
            <table class="data-table ranking" data-sortable="true" data-label-ascending={tr.t('overview.sorted.ascending')} data-label-descending={tr.t('overview.sorted.descending')}>
              <caption>{tr.text('overview.ranking')}</caption>
              <thead>
                <tr>
                  {COLUMNS.map((col) => {
                    const active = props.sort === col.key;
                    const next: SortDirection = active ? (props.direction === 'ascending' ? 'descending' : 'ascending') : FIRST_DIRECTION[col.key];
                    return (
                      <th scope="col" aria-sort={active ? props.direction : undefined} class={col.numeric ? 'numeric' : undefined}>
                        <a href={`/studies/${studyId}?sort=${col.key}&dir=${next}#ranking-heading`} data-sort={col.key} data-first={FIRST_DIRECTION[col.key]}>
                          {col.text(tr, props.years)}
                          {/* The script rewrites this text from the table's data-label-* attributes, which share a bundle. */}
                          <span class="sort-state" lang={tr.fallbackLang('overview.sorted.ascending')}>
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
                      <td class="numeric" data-key="rank" data-value={r.rank}>
                        {r.rank}
                      </td>
                      <th scope="row" data-key="name" data-value={r.name}>
                        <a href={`/studies/${studyId}/communities/${r.communityId}`}>{r.name}</a>
                      </th>
                      <td data-key="band" data-value={['refer-first', 'refer-soon', 'prepare', 'inform'].indexOf(r.bandId)} data-band={r.bandId}>
                        <BandSwatch tr={tr} bandId={r.bandId} />
                      </td>
                      <td class="numeric" data-key="chance" data-value={r.chanceVii} data-probability={r.chanceVii}>
                        {chance.frequency} <span class="percent">({chance.percent})</span>
                      </td>
                      <td class="numeric" data-key="people" data-value={r.population ?? ''}>
                        {r.population === undefined ? tr.text('overview.unknownPeople') : tr.number(r.population)}
                      </td>
                      <td data-key="fault" data-value={r.nearestFault?.distanceKm ?? ''}>
                        {r.nearestFault ? `${r.nearestFault.name}, ${tr.place(r.nearestFault.distanceKm, r.nearestFault.bearingDeg)}` : tr.text('overview.noFault')}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
            <p class="band-rule">{tr.text('band.rule')}</p>
            {props.runs.screening && (
              <p>
                {tr.text('overview.downloads')}: <a href={`/api/runs/${props.runs.screening.run.id}/results.csv`}>{tr.text('overview.csv')}</a> ·{' '}
                <a href={`/api/runs/${props.runs.screening.run.id}/results.geojson`}>{tr.text('overview.geojson')}</a>
              </p>
            )}
          </>
        )}
      </section>
    </PageShell>
  );
}

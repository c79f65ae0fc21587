import { compassPoint } from '../../api/engine/catalog/felt-history.ts';
import type { TsunamiCommunity, TsunamiResult } from '../../api/engine/tsunami/index.ts';
import type { TsunamiPageResult } from '../data/tsunami-data.ts';
import type { Translator } from '../text/translator.ts';
import type { SheetBlockProps } from './sheet-block.ts';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

/** Distances to high ground in km with one decimal under this, whole km above. */
const DECIMAL_KM_BELOW = 10;

const km = (tr: Translator, value: number) => tr.number(value, value < DECIMAL_KM_BELOW ? 1 : 0);

/** The plain-words sentence and the high ground for one coastal community. */
function TimeToAct(props: {
  readonly tr: Translator;
  readonly community: TsunamiCommunity;
  readonly result: TsunamiResult;
  readonly compact: boolean;
}) {
  const { tr, community: c, result } = props;
  const ground = c.highGround;
  return (
    <>
      {c.firstArrivalMinutes === null || c.latestMinutes === null ? (
        <p class="tsunami-problem">
          {tr.text('tsunami.time.problem', { problem: tr.english(c.problems.join('; ')) })}
        </p>
      ) : (
        <p
          class="tsunami-sentence"
          data-first-arrival-minutes={c.firstArrivalMinutes}
          data-latest-minutes={c.latestMinutes}
        >
          <strong>
            {tr.text(
              c.firstArrivalMinutes === 0 ? 'tsunami.time.sentenceNow' : 'tsunami.time.sentence',
              { from: tr.number(c.firstArrivalMinutes), to: tr.number(c.latestMinutes) },
            )}
          </strong>{' '}
          {ground?.kind === 'found' &&
            tr.text('tsunami.time.ground', {
              km: km(tr, ground.distanceKm),
              direction: tr.toward(compassPoint(ground.bearingDeg)),
            })}
        </p>
      )}
      {ground?.kind === 'found' && (
        <p
          class="tsunami-ground"
          data-high-ground-km={ground.distanceKm}
          data-walking-minutes={ground.walkingMinutes}
        >
          {c.firstArrivalMinutes === null &&
            tr.text('tsunami.time.ground', {
              km: km(tr, ground.distanceKm),
              direction: tr.toward(compassPoint(ground.bearingDeg)),
            })}{' '}
          {tr.text('tsunami.time.walk', { minutes: tr.number(ground.walkingMinutes) })}{' '}
          {tr.text('tsunami.time.height', { height: tr.number(result.highGroundM) })}
        </p>
      )}
      {ground && ground.kind !== 'found' && (
        <p class="tsunami-ground">
          {ground.kind === 'already-above'
            ? tr.text('tsunami.time.above', {
                elevation: tr.number(ground.elevationM),
                height: tr.number(ground.heightM),
              })
            : tr.text('tsunami.time.none', {
                height: tr.number(ground.heightM),
                km: tr.number(ground.searchKm),
              })}
        </p>
      )}
      {!props.compact && (
        <p class="technical">
          {tr.text('tsunami.time.technical', {
            sources: result.sources.map((s) => s.name).join(', '),
            grid: result.terrain.label,
            km: tr.number(result.terrain.spacingKm, 1),
          })}
        </p>
      )}
    </>
  );
}

/** The community page's and handout's tsunami block: time to act, high ground and the caution. */
export function TsunamiTime(
  props: SheetBlockProps & { readonly communityId: string; readonly tsunami: TsunamiPageResult },
) {
  const { tr, tsunami } = props;
  const H = props.headingLevel === 2 ? 'h2' : 'h3';
  const community = tsunami.ok
    ? tsunami.result.communities.find((c) => c.id === props.communityId)
    : undefined;
  if (tsunami.ok && !community) return <></>;
  return (
    <section class="tsunami-time" aria-labelledby="tsunami-time-title">
      <H id="tsunami-time-title">{tr.text('tsunami.time.title')}</H>
      {tsunami.ok && community ? (
        <TimeToAct
          tr={tr}
          community={community}
          result={tsunami.result}
          compact={props.compact === true}
        />
      ) : (
        <p class="tsunami-problem">
          {tr.text('tsunami.time.problem', {
            problem: tr.english(tsunami.ok ? '' : tsunami.problem),
          })}
        </p>
      )}
      <p class="tsunami-caution">{tr.text('tsunami.time.caution')}</p>
    </section>
  );
}

/** A table of coastal communities' tsunami times, in the order given (the overview ranks them). */
export function TsunamiTable(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly communities: readonly TsunamiCommunity[];
  readonly caption: string;
  readonly id: string;
}) {
  const { tr } = props;
  return (
    <DataTable
      tr={tr}
      class="tsunami-table"
      id={props.id}
      scroll
      caption={props.caption}
      columns={['tsunami.rank.place', 'tsunami.rank.arrival', 'tsunami.rank.ground']}
    >
      {props.communities.map((c) => {
        const g = c.highGround;
        return (
          <tr data-community={c.id} data-first-arrival-minutes={c.firstArrivalMinutes ?? ''}>
            <th scope="row">
              <a href={`/studies/${props.studyId}/communities/${c.id}`}>{c.name}</a>
            </th>
            <LabelledCell tr={tr} column="tsunami.rank.arrival">
              {c.firstArrivalMinutes === null || c.latestMinutes === null
                ? tr.text('tsunami.rank.none')
                : tr.text('tsunami.rank.minutes', {
                    from: tr.number(c.firstArrivalMinutes),
                    to: tr.number(c.latestMinutes),
                  })}
            </LabelledCell>
            <LabelledCell tr={tr} column="tsunami.rank.ground">
              {g?.kind === 'found' &&
                tr.text('tsunami.rank.groundAway', {
                  km: km(tr, g.distanceKm),
                  direction: tr.compass(compassPoint(g.bearingDeg)),
                  minutes: tr.number(g.walkingMinutes),
                })}
              {g?.kind === 'already-above' &&
                tr.text('tsunami.rank.groundAbove', { height: tr.number(g.heightM) })}
              {g?.kind === 'none' &&
                tr.text('tsunami.rank.groundNone', { km: tr.number(g.searchKm) })}
            </LabelledCell>
          </tr>
        );
      })}
    </DataTable>
  );
}

/**
 * A section of coastal communities' tsunami times with the caution: `id` names its class and
 * table (`tsunami-<id>`), `text` its texts (`tsunami.<text>.title`, `.intro`).
 */
function TsunamiSection(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly tsunami: TsunamiPageResult;
  readonly communities: readonly TsunamiCommunity[];
  readonly id: 'ranking' | 'scenario';
  readonly text: 'rank' | 'scenario';
}) {
  const { tr, tsunami, text } = props;
  const headingId = `tsunami-${text}-heading`;
  return (
    <section class={`tsunami-${props.id}`} aria-labelledby={headingId}>
      <h2 id={headingId}>{tr.text(`tsunami.${text}.title`)}</h2>
      <p>{tr.text(`tsunami.${text}.intro`)}</p>
      {tsunami.ok ? (
        <TsunamiTable
          tr={tr}
          studyId={props.studyId}
          communities={props.communities}
          caption={tr.t(`tsunami.${text}.title`)}
          id={`tsunami-${props.id}`}
        />
      ) : (
        <p class="tsunami-problem">
          {tr.text('tsunami.time.problem', { problem: tr.english(tsunami.problem) })}
        </p>
      )}
      <p class="tsunami-caution">{tr.text('tsunami.time.caution')}</p>
    </section>
  );
}

/** The overview's section: coastal communities ranked by time to act (data/tsunami-data.ts). */
export function TsunamiRanking(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly tsunami: TsunamiPageResult;
  readonly ranked: readonly TsunamiCommunity[];
}) {
  return <TsunamiSection {...props} communities={props.ranked} id="ranking" text="rank" />;
}

/** The scenario page's section: each coastal community's first arrival from the chosen rupture. */
export function TsunamiScenario(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly tsunami: TsunamiPageResult;
}) {
  const { tsunami } = props;
  const communities = tsunami.ok ? tsunami.result.communities : [];
  return <TsunamiSection {...props} communities={communities} id="scenario" text="scenario" />;
}

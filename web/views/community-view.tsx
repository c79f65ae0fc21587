import type { CommunityFeltHistory } from '../../api/engine/catalog/felt-history.ts';
import type { Study } from '../../api/engine/model.ts';
import type { Provenance } from '../../api/engine/results.ts';
import { INTENSITY_MEASURE } from '../../api/engine/intensity/site-intensity.ts';
import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import { HASH_PREFIX_LENGTH, modelsLine, type CommunityPageData } from '../data/community-data.ts';
import { BandSwatch } from '../layout/band-swatch.tsx';
import { BandFirmness } from './band-firmness.tsx';
import { type PageContext, PageShell } from '../layout/page-shell.tsx';
import type { MapFrame } from '../maps/map-frame.ts';
import { StudyMap } from '../maps/study-map.tsx';
import { CommunityCurvePlot } from '../plots/community-curve-plot.tsx';
import { HazardCurveLegend } from '../plots/hazard-curve-plot.tsx';
import { ShareBars } from '../plots/share-bars.tsx';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';
import type { SheetBlockProps } from './sheet-block.ts';
import { FeltList } from './felt-list.tsx';
import { NearestFaults } from './nearest-faults.tsx';
import { SafetyAdvice } from './safety-advice.tsx';
import type { TsunamiPageResult } from '../data/tsunami-data.ts';
import { TsunamiTime } from './tsunami-time.tsx';
import { CommunityDetails } from './community-details.tsx';
import { VisitRecords } from './visit-records.tsx';
import { SlideImageLinks } from './slide-image-links.tsx';
import type { VisitRecord } from '../../api/store/visit-repository.ts';
import { DataTable, LabelledCell } from '../components/data-table.tsx';
import { WarningDetails } from '../components/warning-details.tsx';
import { LimitsList } from './limits-view.tsx';

export interface CommunityViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly study: Study;
  readonly data: CommunityPageData;
  readonly provenance: Provenance;
  readonly frame: MapFrame;
  readonly felt?: { readonly history: CommunityFeltHistory; readonly eventCount: number };
  /** The attached catalog is too large for a felt history on a page. */
  readonly feltTooMany?: boolean;
  /** Tsunami time to act, for a coastal community of a study with a terrain grid. */
  readonly tsunami?: TsunamiPageResult;
  /** The visits recorded here, newest first. */
  readonly visits: readonly VisitRecord[];
}

const mmiKey = (level: number, part: 'name' | 'feel' | 'buildings') =>
  `mmi.${level}.${part}` as TextKey;

/** The headline and the other chances, with the raw probabilities in data attributes. */
export function Headline(props: {
  readonly tr: Translator;
  readonly data: CommunityPageData;
  readonly name: string;
  /** The longer explanation of MMI (the handout and poster give their own one sentence). */
  readonly explainMmi?: boolean;
}) {
  const { tr, data } = props;
  const vii = tr.chance(data.chances.VII);
  return (
    <div class="headline-block">
      <p class="headline" data-probability={data.chances.VII} data-years={data.years}>
        {tr.text('community.headline', {
          name: props.name,
          chance: vii.frequency,
          years: data.years,
          percent: vii.percent,
        })}
      </p>
      <p>{tr.text('community.headlineStrongWhat')}</p>
      {props.explainMmi !== false && <p class="mmi-explain">{tr.text('mmi.explain')}</p>}
      <p class="other-chances-title">{tr.text('community.otherChances', { years: data.years })}</p>
      <ul class="other-chances">
        {(['VI', 'VII', 'VIII'] as const).map((roman) => {
          const c = tr.chance(data.chances[roman]);
          return (
            <li data-mmi={roman} data-probability={data.chances[roman]}>
              {tr.text('community.chanceOf', { roman, frequency: c.frequency, percent: c.percent })}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

/** What the shaking at each return-period level feels like and does, in our own words. */
export function ShakingLevels(props: SheetBlockProps & { readonly data: CommunityPageData }) {
  const { tr, data } = props;
  const H = props.headingLevel === 2 ? 'h3' : 'h4';
  return (
    <div class="levels">
      {data.levels.map((level) => {
        const chance = tr.chance(level.chance);
        return (
          <section
            class="level-card"
            data-return-period={level.returnPeriodYears}
            aria-labelledby={`level-${level.returnPeriodYears}`}
          >
            <H id={`level-${level.returnPeriodYears}`}>
              {tr.text('community.level', { period: tr.number(level.returnPeriodYears) })}
            </H>
            <p class="level-chance">
              {tr.text('community.levelChance', {
                frequency: chance.frequency,
                years: data.years,
                percent: chance.percent,
              })}
            </p>
            {level.mmiLevel === null ? (
              <p>{tr.text('community.levelOffCurve')}</p>
            ) : (
              <>
                <p class="level-mmi" data-mmi={level.mmi}>
                  {tr.text('community.levelMmi', {
                    mmi: tr.mmi(level.mmi ?? level.mmiLevel),
                    name: tr.text(mmiKey(level.mmiLevel, 'name')),
                  })}
                </p>
                <p>
                  <strong>{tr.text('community.feels')}:</strong>{' '}
                  {tr.text(mmiKey(level.mmiLevel, 'feel'))}
                </p>
                <p>
                  <strong>{tr.text('community.buildings')}:</strong>{' '}
                  {tr.text(mmiKey(level.mmiLevel, 'buildings'))}
                </p>
                {!props.compact && level.pgaG !== null && (
                  <p class="technical">
                    {tr.text('community.pga', { g: tr.number(level.pgaG, 2) })}
                  </p>
                )}
              </>
            )}
          </section>
        );
      })}
    </div>
  );
}

/** The provenance line: date, tool version, input hash prefix and models. */
export function ProvenanceLine(props: {
  readonly tr: Translator;
  readonly provenance: Provenance;
}) {
  const { tr, provenance } = props;
  return (
    <p class="provenance" data-input-hash={provenance.inputHash}>
      {tr.text('provenance.line', {
        date: tr.date(provenance.finishedAt),
        version: provenance.toolVersion,
        hash: provenance.inputHash.slice(0, HASH_PREFIX_LENGTH),
        models: modelsLine(provenance),
      })}
    </p>
  );
}

/** The community page: headline, shaking levels, sources, faults, curve, felt history, advice, limits. */
export function CommunityView(props: CommunityViewProps) {
  const { tr } = props.page;
  const { data, study, studyId } = props;
  const { community, result } = data;
  const bandId = result.band.id as ScreeningBandId;
  const curve = result.curves[INTENSITY_MEASURE];
  return (
    <PageShell
      page={props.page}
      title={community.name}
      study={{ id: studyId, name: study.name }}
      showsNumbers={false}
    >
      <h1>{community.name}</h1>
      <p class="band-line">
        {tr.text('band.label')}: <BandSwatch tr={tr} bandId={bandId} /> —{' '}
        {tr.text(`band.${bandId}.meaning` as TextKey)}
      </p>
      <BandFirmness tr={tr} robustness={result.bandRobustness} />
      <p class="facts">
        {community.population !== undefined && (
          <>{tr.text('community.people', { people: tr.number(community.population) })} </>
        )}
        {community.coastal && <>{tr.text('community.coastal')} </>}
        {tr.text('community.site', {
          vs30: tr.number(community.vs30),
          basis:
            community.vs30Basis === 'measured'
              ? tr.text('community.site.measured')
              : community.vs30Proxy !== undefined
                ? tr.text('community.site.slope-proxy', {
                    siteClass: community.vs30Proxy.siteClass,
                    min: tr.number(community.vs30Proxy.vs30Range[0]),
                    max: tr.number(community.vs30Proxy.vs30Range[1]),
                  })
                : tr.text('community.site.site-class', { siteClass: community.siteClass ?? '' }),
        })}
      </p>
      <Headline tr={tr} data={data} name={community.name} />
      <aside class="caution" aria-label={tr.t('caution.title')}>
        <p class="caution-title">{tr.text('caution.title')}</p>
        <p>
          {tr.text('caution.text')} <a href="/limits">{tr.text('caution.limitsLink')}</a>.
        </p>
      </aside>
      {props.tsunami && (
        <TsunamiTime tr={tr} communityId={community.id} tsunami={props.tsunami} headingLevel={2} />
      )}
      <p class="actions">
        <a class="button" href={`/studies/${studyId}/communities/${community.id}/handout`}>
          {tr.text('community.handout')}
        </a>{' '}
        <a class="button" href={`/studies/${studyId}/communities/${community.id}/poster`}>
          {tr.text('material.poster')}
        </a>{' '}
        <a
          class="button"
          href={`/studies/${studyId}/scenario${data.sources[0]?.sourceId ? `?sourceId=${encodeURIComponent(data.sources[0].sourceId)}` : ''}`}
        >
          {tr.text('community.scenario')}
        </a>
      </p>
      <section aria-labelledby="levels-heading">
        <h2 id="levels-heading">{tr.text('community.levels')}</h2>
        <p>{tr.text('community.levelIntro')}</p>
        <ShakingLevels tr={tr} data={data} headingLevel={2} />
      </section>
      <section aria-labelledby="sources-heading">
        <h2 id="sources-heading">{tr.text('community.sources')}</h2>
        {data.sourcesReturnPeriod !== undefined && (
          <p>
            {tr.text('community.sourcesIntro', { period: tr.number(data.sourcesReturnPeriod) })}
          </p>
        )}
        <ShareBars
          tr={tr}
          labelledBy="sources-heading"
          bars={data.sources.map((s) => ({
            label: s.sourceId === null ? tr.text('community.sourcesOther') : s.name,
            share: s.share,
          }))}
        />
        {data.meanMagnitude !== undefined && data.meanDistanceKm !== undefined && (
          <p>
            {tr.text('community.sourcesMean', {
              magnitude: tr.number(data.meanMagnitude, 1),
              km: tr.number(data.meanDistanceKm),
            })}
          </p>
        )}
      </section>
      <section aria-labelledby="faults-heading">
        <h2 id="faults-heading">{tr.text('community.faults')}</h2>
        {result.nearestFaults.length === 0 ? (
          <p>{tr.text('community.faultsNone')}</p>
        ) : (
          <NearestFaults tr={tr} faults={result.nearestFaults} />
        )}
        <figure class="map-figure map-small">
          <StudyMap
            tr={tr}
            study={study}
            frame={props.frame}
            idPrefix="community-map"
            highlight={community.id}
            bands={new Map([[community.id, bandId]])}
          />
        </figure>
      </section>
      {curve && (
        <section aria-labelledby="curve-heading">
          <h2 id="curve-heading">{tr.text('community.curve')}</h2>
          <p>{tr.text('community.curveIntro')}</p>
          <figure class="plot-figure">
            <CommunityCurvePlot tr={tr} study={study} result={result} curve={curve} />
            <figcaption>
              <HazardCurveLegend
                tr={tr}
                branches={curve.branches?.length ?? 0}
                fractiles={Object.keys(curve.fractiles ?? {})}
              />
            </figcaption>
          </figure>
          {data.spread && (
            <p data-spread-low={data.spread.lowG} data-spread-high={data.spread.highG}>
              {tr.text('community.spread', {
                period: tr.number(data.spread.returnPeriodYears),
                low: tr.number(data.spread.lowG, 2),
                high: tr.number(data.spread.highG, 2),
              })}
            </p>
          )}
          <details class="curve-numbers">
            <summary>{tr.text('community.curveTable')}</summary>
            <DataTable
              tr={tr}
              caption={tr.text('community.curveTableCaption')}
              columns={[
                { key: 'plot.pga', numeric: true },
                { key: 'plot.annualRate', numeric: true },
              ]}
            >
              {curve.levels.map((level, i) => (
                <tr>
                  <th scope="row" class="numeric">
                    {String(level)}
                  </th>
                  <LabelledCell tr={tr} column="plot.annualRate" numeric>
                    {(curve.annualRate[i] ?? 0).toPrecision(3)}
                  </LabelledCell>
                </tr>
              ))}
            </DataTable>
          </details>
        </section>
      )}
      <SlideImageLinks
        tr={tr}
        studyId={studyId}
        communityId={community.id}
        hasCurve={curve !== undefined}
      />
      <FeltList
        tr={tr}
        studyId={studyId}
        communityName={community.name}
        {...(props.felt ? { felt: props.felt } : {})}
        tooMany={props.feltTooMany === true}
        limit={8}
        headingLevel={2}
      />
      <CommunityDetails tr={tr} details={community.details} />
      <VisitRecords
        tr={tr}
        studyId={props.studyId}
        communityId={community.id}
        visits={props.visits}
      />
      <section aria-labelledby="todo-heading">
        <h2 id="todo-heading">{tr.text('community.todo')}</h2>
        <SafetyAdvice tr={tr} coastal={community.coastal} headingLevel={3} />
      </section>
      <section aria-labelledby="limits-heading">
        <h2 id="limits-heading">{tr.text('limits.title')}</h2>
        <LimitsList tr={tr} />
        <p>
          <a href="/limits">{tr.text('caution.limitsLink')}</a>
        </p>
        <WarningDetails tr={tr} summary="community.warnings" warnings={result.warnings} />
        <ProvenanceLine tr={tr} provenance={props.provenance} />
      </section>
    </PageShell>
  );
}

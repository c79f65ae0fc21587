import type { CommunityFeltHistory } from '../../api/engine/catalog/felt-history.ts';
import type { Study } from '../../api/engine/model.ts';
import type { Provenance } from '../../api/engine/results.ts';
import { INTENSITY_MEASURE } from '../../api/engine/intensity/site-intensity.ts';
import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import { HASH_PREFIX_LENGTH, modelsLine, type CommunityPageData } from '../data/community-data.ts';
import { BandSwatch } from '../layout/band-swatch.tsx';
import { PageShell } from '../layout/page-shell.tsx';
import type { MapFrame } from '../maps/map-frame.ts';
import { StudyMap } from '../maps/study-map.tsx';
import { HazardCurveLegend, HazardCurvePlot } from '../plots/hazard-curve-plot.tsx';
import { ShareBars } from '../plots/share-bars.tsx';
import type { TextKey } from '../text/en.ts';
import type { Translator } from '../text/translator.ts';
import { FeltList } from './felt-list.tsx';
import { SafetyAdvice } from './safety-advice.tsx';

export interface CommunityViewProps {
  readonly tr: Translator;
  readonly path: string;
  readonly toolVersion: string;
  readonly studyId: string;
  readonly study: Study;
  readonly data: CommunityPageData;
  readonly provenance: Provenance;
  readonly frame: MapFrame;
  readonly felt?: { readonly history: CommunityFeltHistory; readonly eventCount: number };
  /** The attached catalog is too large for a felt history on a page. */
  readonly feltTooMany?: boolean;
}

const mmiKey = (level: number, part: 'name' | 'feel' | 'buildings') => `mmi.${level}.${part}` as TextKey;

/** The headline and the other chances, with the raw probabilities in data attributes. */
export function Headline(props: { readonly tr: Translator; readonly data: CommunityPageData; readonly name: string }) {
  const { tr, data } = props;
  const vii = tr.chance(data.chances.VII);
  return (
    <div class="headline-block">
      <p class="headline" data-probability={data.chances.VII} data-years={data.years}>
        {tr.t('community.headline', { name: props.name, chance: vii.frequency, years: data.years, percent: vii.percent })}
      </p>
      <p>{tr.t('community.headlineStrongWhat')}</p>
      <p class="other-chances-title">{tr.t('community.otherChances', { years: data.years })}</p>
      <ul class="other-chances">
        {(['VI', 'VII', 'VIII'] as const).map((roman) => {
          const c = tr.chance(data.chances[roman]);
          return (
            <li data-mmi={roman} data-probability={data.chances[roman]}>
              {tr.t('community.chanceOf', { roman, frequency: c.frequency, percent: c.percent })}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

/** What the shaking at each return-period level feels like and does, in our own words. */
export function ShakingLevels(props: { readonly tr: Translator; readonly data: CommunityPageData; readonly headingLevel: 2 | 3; readonly compact?: boolean }) {
  const { tr, data } = props;
  const H = props.headingLevel === 2 ? 'h3' : 'h4';
  return (
    <div class="levels">
      {data.levels.map((level) => {
        const chance = tr.chance(level.chance);
        return (
          <section class="level-card" data-return-period={level.returnPeriodYears} aria-labelledby={`level-${level.returnPeriodYears}`}>
            <H id={`level-${level.returnPeriodYears}`}>{tr.t('community.level', { period: tr.number(level.returnPeriodYears) })}</H>
            <p class="level-chance">{tr.t('community.levelChance', { frequency: chance.frequency, years: data.years, percent: chance.percent })}</p>
            {level.mmiLevel === null ? (
              <p>{tr.t('community.levelOffCurve')}</p>
            ) : (
              <>
                <p class="level-mmi" data-mmi={level.mmi}>
                  {tr.t('community.levelMmi', { roman: level.roman ?? '', name: tr.t(mmiKey(level.mmiLevel, 'name')) })}
                </p>
                <p>
                  <strong>{tr.t('community.feels')}:</strong> {tr.t(mmiKey(level.mmiLevel, 'feel'))}
                </p>
                <p>
                  <strong>{tr.t('community.buildings')}:</strong> {tr.t(mmiKey(level.mmiLevel, 'buildings'))}
                </p>
                {!props.compact && level.pgaG !== null && <p class="technical">{tr.t('community.pga', { g: tr.number(level.pgaG, 2) })}</p>}
              </>
            )}
          </section>
        );
      })}
    </div>
  );
}

/** The provenance line: date, tool version, input hash prefix and models. */
export function ProvenanceLine(props: { readonly tr: Translator; readonly provenance: Provenance }) {
  const { tr, provenance } = props;
  return (
    <p class="provenance" data-input-hash={provenance.inputHash}>
      {tr.t('provenance.line', {
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
  const { tr, data, study, studyId } = props;
  const { community, result } = data;
  const bandId = result.band.id as ScreeningBandId;
  const curve = result.curves[INTENSITY_MEASURE];
  const rpLevels = Object.fromEntries(study.settings.returnPeriodsYears.map((t) => [String(t), result.atReturnPeriod[String(t)]?.[INTENSITY_MEASURE] ?? null]));
  return (
    <PageShell tr={tr} title={community.name} path={props.path} toolVersion={props.toolVersion} study={{ id: studyId, name: study.name }} showsNumbers={false}>
      <h1>{community.name}</h1>
      <p class="band-line">
        {tr.t('band.label')}: <BandSwatch tr={tr} bandId={bandId} /> — {tr.t(`band.${bandId}.meaning` as TextKey)}
      </p>
      <p class="facts">
        {community.population !== undefined && `${tr.t('community.people', { people: tr.number(community.population) })} `}
        {community.coastal && `${tr.t('community.coastal')} `}
        {tr.t('community.site', {
          vs30: tr.number(community.vs30),
          basis: community.vs30Basis === 'measured' ? tr.t('community.site.measured') : tr.t('community.site.site-class', { siteClass: community.siteClass ?? '' }),
        })}
      </p>
      <Headline tr={tr} data={data} name={community.name} />
      <aside class="caution" aria-label={tr.t('caution.title')}>
        <p class="caution-title">{tr.t('caution.title')}</p>
        <p>
          {tr.t('caution.text')} <a href="/limits">{tr.t('caution.limitsLink')}</a>.
        </p>
      </aside>
      <p class="actions">
        <a class="button" href={`/studies/${studyId}/communities/${community.id}/handout`}>
          {tr.t('community.handout')}
        </a>{' '}
        <a class="button" href={`/studies/${studyId}/scenario${data.sources[0]?.sourceId ? `?sourceId=${encodeURIComponent(data.sources[0].sourceId)}` : ''}`}>
          {tr.t('community.scenario')}
        </a>
      </p>
      <section aria-labelledby="levels-heading">
        <h2 id="levels-heading">{tr.t('community.levels')}</h2>
        <p>{tr.t('community.levelIntro')}</p>
        <ShakingLevels tr={tr} data={data} headingLevel={2} />
      </section>
      <section aria-labelledby="sources-heading">
        <h2 id="sources-heading">{tr.t('community.sources')}</h2>
        {data.sourcesReturnPeriod !== undefined && <p>{tr.t('community.sourcesIntro', { period: tr.number(data.sourcesReturnPeriod) })}</p>}
        <ShareBars tr={tr} label={tr.t('community.sources')} bars={data.sources.map((s) => ({ label: s.sourceId === null ? tr.t('community.sourcesOther') : s.name, share: s.share }))} />
        {data.meanMagnitude !== undefined && data.meanDistanceKm !== undefined && (
          <p>{tr.t('community.sourcesMean', { magnitude: tr.number(data.meanMagnitude, 1), km: tr.number(data.meanDistanceKm) })}</p>
        )}
      </section>
      <section aria-labelledby="faults-heading">
        <h2 id="faults-heading">{tr.t('community.faults')}</h2>
        {result.nearestFaults.length === 0 ? (
          <p>{tr.t('community.faultsNone')}</p>
        ) : (
          <ul class="faults">
            {result.nearestFaults.map((f) => (
              <li data-source={f.sourceId}>
                <strong>{f.name}</strong>: {tr.place(f.distanceKm, f.bearingDeg)}
              </li>
            ))}
          </ul>
        )}
        <figure class="map-figure map-small">
          <StudyMap tr={tr} study={study} frame={props.frame} idPrefix="community-map" highlight={community.id} bands={new Map([[community.id, bandId]])} />
        </figure>
      </section>
      {curve && (
        <section aria-labelledby="curve-heading">
          <h2 id="curve-heading">{tr.t('community.curve')}</h2>
          <p>{tr.t('community.curveIntro')}</p>
          <figure class="plot-figure">
            <HazardCurvePlot tr={tr} curve={curve} returnPeriodsYears={study.settings.returnPeriodsYears} levelsAtReturnPeriods={rpLevels} idPrefix="curve" />
            <figcaption>
              <HazardCurveLegend tr={tr} branches={curve.branches?.length ?? 0} />
            </figcaption>
          </figure>
          {data.spread && (
            <p data-spread-low={data.spread.lowG} data-spread-high={data.spread.highG}>
              {tr.t('community.spread', { period: tr.number(data.spread.returnPeriodYears), low: tr.number(data.spread.lowG, 2), high: tr.number(data.spread.highG, 2) })}
            </p>
          )}
          <details class="curve-numbers">
            <summary>{tr.t('community.curveTable')}</summary>
            <table class="data-table">
              <caption>{tr.t('community.curveTableCaption')}</caption>
              <thead>
                <tr>
                  <th scope="col" class="numeric">
                    {tr.t('plot.pga')}
                  </th>
                  <th scope="col" class="numeric">
                    {tr.t('plot.annualRate')}
                  </th>
                </tr>
              </thead>
              <tbody>
                {curve.levels.map((level, i) => (
                  <tr>
                    <th scope="row" class="numeric">
                      {String(level)}
                    </th>
                    <td class="numeric">{(curve.annualRate[i] ?? 0).toPrecision(3)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </details>
        </section>
      )}
      <FeltList tr={tr} studyId={studyId} communityName={community.name} {...(props.felt ? { felt: props.felt } : {})} tooMany={props.feltTooMany === true} limit={8} headingLevel={2} />
      <section aria-labelledby="todo-heading">
        <h2 id="todo-heading">{tr.t('community.todo')}</h2>
        <SafetyAdvice tr={tr} coastal={community.coastal} headingLevel={3} />
      </section>
      <section aria-labelledby="limits-heading">
        <h2 id="limits-heading">{tr.t('limits.title')}</h2>
        <ul class="limits">
          {tr
            .t('limits.list')
            .split('\n')
            .map((item) => (
              <li>{item}</li>
            ))}
        </ul>
        <p>
          <a href="/limits">{tr.t('caution.limitsLink')}</a>
        </p>
        {result.warnings.length > 0 && (
          <details>
            <summary>{tr.t('community.warnings')}</summary>
            <ul>
              {result.warnings.map((w) => (
                <li>{w}</li>
              ))}
            </ul>
          </details>
        )}
        <ProvenanceLine tr={tr} provenance={props.provenance} />
      </section>
    </PageShell>
  );
}

import type { Child } from 'hono/jsx';
import type { InputIssue } from '../../api/engine/errors.ts';
import { MAP_VS30 } from '../../api/engine/map/hazard-map.ts';
import type { Study } from '../../api/engine/model.ts';
import { MAX_DRAWN_POINTS, type MapState } from '../data/map-data.ts';
import type { SuggestedSpacing } from '../data/map-spacing.ts';
import { measureWords } from '../maps/hazard-layer.tsx';
import type { Translator } from '../text/translator.ts';
import { NumberField } from '../components/form-rows.tsx';
import { WarningDetails } from '../components/warning-details.tsx';
import { FieldProblems } from './field-problems.tsx';
import { SelectField } from './select-field.tsx';

/** The hazard-map form as sent, with its problems, when it is shown again. */
export interface MapFormState {
  readonly measure: string;
  readonly returnPeriodYears: string;
  readonly spacingKm: string;
  readonly issues: readonly InputIssue[];
}

export interface HazardMapPanelProps {
  readonly tr: Translator;
  readonly studyId: string;
  readonly study: Study;
  readonly maps: MapState;
  readonly suggestion: SuggestedSpacing;
  readonly form?: MapFormState;
}

const FIELDS = ['measure', 'returnPeriodYears', 'spacingKm'] as const;

/**
 * Where the study's hazard maps stand, and the form that computes one (a plain form post):
 * a measure and a return period from the study's settings, the grid spacing with the
 * suggested value and its rule, and the one Vs30 of the grid stated.
 */
export function HazardMapPanel(props: HazardMapPanelProps) {
  const { tr, studyId, study, maps, suggestion } = props;
  const issues = props.form?.issues ?? [];
  const issuesAt = (path: string) => issues.filter((i) => i.path === path);
  const others = issues.filter((i) => !(FIELDS as readonly string[]).includes(i.path));
  const describedBy = (path: string) =>
    issuesAt(path).length > 0 ? `hazard-map-${path}-problem` : undefined;
  /** A choice of the form: the field `path`, its select's id and label, its problems. */
  const choice = (path: string, id: string, label: Child) => ({
    tr,
    id,
    name: path,
    label,
    describedBy: describedBy(path),
    invalid: issuesAt(path).length > 0,
    problemId: `hazard-map-${path}-problem`,
    issues: issuesAt(path),
  });
  const latest = maps.latest;
  const shown = maps.shown;
  const unfinished = latest && (latest.status === 'queued' || latest.status === 'running');
  const failed = latest && !unfinished && latest.status !== 'done';
  const measure =
    props.form?.measure ?? shown?.run.request.measure ?? study.settings.measures[0] ?? 'PGA';
  const shownYears =
    shown?.run.request.quantity.kind === 'return-period'
      ? String(shown.run.request.quantity.returnPeriodYears)
      : undefined;
  const years =
    props.form?.returnPeriodYears ??
    shownYears ??
    String(study.settings.returnPeriodsYears[0] ?? 475);
  const spacing = props.form?.spacingKm ?? String(suggestion.spacingKm);
  return (
    <section aria-labelledby="hazard-map-heading" id="hazard-map" class="hazard-map-panel">
      <h3 id="hazard-map-heading">{tr.text('hazardMap.heading')}</h3>
      {(unfinished || failed || shown) && (
        <div class="status-box">
          {unfinished ? (
            <p>
              {latest.status === 'queued'
                ? tr.text('hazardMap.queued')
                : tr.text('hazardMap.running', { percent: Math.round(latest.progress * 100) })}{' '}
              <a href={`/studies/${studyId}/maps/${latest.id}`}>{tr.text('hazardMap.follow')}</a>
            </p>
          ) : (
            failed && (
              <p class="problem">
                {tr.text('hazardMap.lastFailed', {
                  error: tr.english(latest.error ?? latest.status),
                })}
              </p>
            )
          )}
          {shown ? (
            <>
              <p>
                {tr.text('hazardMap.computedOn', {
                  date: tr.date(shown.run.finishedAt ?? shown.run.createdAt),
                })}
              </p>
              {!shown.current && <p class="notice">{tr.text('hazardMap.stale')}</p>}
              {!shown.layer && shown.run.description.count > MAX_DRAWN_POINTS && (
                <p class="notice">
                  {tr.text('hazardMap.tooMany', { count: tr.number(shown.run.description.count) })}{' '}
                  <a href={`/api/maps/${shown.run.id}/map.geojson`}>
                    {tr.text('hazardMap.download')}
                  </a>
                </p>
              )}
              <WarningDetails tr={tr} summary="hazardMap.warnings" warnings={shown.run.warnings} />
            </>
          ) : null}
        </div>
      )}
      <p>{tr.text('hazardMap.intro')}</p>
      <form method="post" action={`/studies/${studyId}/maps`} class="hazard-map-form" novalidate>
        <SelectField {...choice('measure', 'hazard-map-measure', tr.text('hazardMap.measure'))}>
          {study.settings.measures.map((m) => (
            <option
              value={m}
              selected={m === measure}
              lang={tr.fallbackLang(
                m.startsWith('SA')
                  ? 'hazardMap.measure.SA'
                  : m === 'PGV'
                    ? 'hazardMap.measure.PGV'
                    : 'hazardMap.measure.PGA',
              )}
            >
              {measureWords(tr, m, true)}
            </option>
          ))}
        </SelectField>
        <SelectField
          {...choice(
            'returnPeriodYears',
            'hazard-map-return-period',
            tr.text('hazardMap.returnPeriod'),
          )}
        >
          {study.settings.returnPeriodsYears.map((y) => (
            <option
              value={String(y)}
              selected={String(y) === years}
              lang={tr.fallbackLang('hazardMap.returnPeriodOption')}
            >
              {tr.t('hazardMap.returnPeriodOption', { years: tr.number(y) })}
            </option>
          ))}
        </SelectField>
        <NumberField
          id="hazard-map-spacing"
          helpId="hazard-map-spacing-help"
          name="spacingKm"
          label={tr.text('hazardMap.spacing')}
          range={{ min: '0.5', max: '200', step: '0.5' }}
          value={spacing}
          problemId={issuesAt('spacingKm').length ? 'hazard-map-spacingKm-problem' : undefined}
        >
          <p class="help" id="hazard-map-spacing-help">
            {tr.text('hazardMap.spacingHelp', {
              km: tr.number(suggestion.spacingKm),
              cells: tr.number(suggestion.cellsAcross),
              span: tr.number(suggestion.spanKm),
            })}
          </p>
          <FieldProblems tr={tr} id="hazard-map-spacingKm-problem" issues={issuesAt('spacingKm')} />
        </NumberField>
        <p class="help" id="hazard-map-vs30-help">
          {props.study.terrain === undefined
            ? tr.text('hazardMap.vs30Form', { vs30: tr.number(MAP_VS30) })
            : tr.text('hazardMap.vs30Terrain', { vs30: tr.number(MAP_VS30) })}
        </p>
        <FieldProblems tr={tr} id="hazard-map-other-problems" issues={others} />
        <button type="submit" class="button-primary">
          {tr.text('hazardMap.compute')}
        </button>
      </form>
    </section>
  );
}

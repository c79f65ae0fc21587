import type { Child } from 'hono/jsx';
import { StepActions } from '../components/step-actions.tsx';
import { MAGNITUDE_RELATIONS } from '../../api/engine/catalog/magnitude-conversion.ts';
import type { ZoneRecurrence } from '../../api/engine/catalog/zone-recurrence.ts';
import type { InputIssue } from '../../api/engine/errors.ts';
import type { Study } from '../../api/engine/model.ts';
import { chosenFit, type CatalogAnalysis } from '../data/catalog-analysis.ts';
import type { AttachedCatalog } from '../data/study-catalog.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import {
  FrequencyMagnitudeLegend,
  FrequencyMagnitudePlot,
} from '../plots/frequency-magnitude-plot.tsx';
import { FieldProblems } from './field-problems.tsx';
import { Notice } from '../components/notice.tsx';
import { DataTable } from '../components/data-table.tsx';
import { FileField } from '../components/form-rows.tsx';

/** The zone form's values, as posted. */
export interface ZoneForm {
  readonly polygon: string;
  readonly mMax: string;
  readonly depthKm: string;
  readonly id: string;
  readonly name: string;
}

/** The outline choice of the zone form (the study's own zones are chosen by their ids). */
export const OUTLINE_CHOICE = '(outline)';

export interface CatalogViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly study: Study;
  readonly catalog?: AttachedCatalog;
  readonly analysis?: CatalogAnalysis & { ok: true };
  readonly zone: ZoneForm;
  readonly zoneFit?: ZoneRecurrence;
  readonly zoneIssues: readonly InputIssue[];
  readonly uploadIssues: readonly InputIssue[];
  readonly zoneAdded?: boolean;
  /** Relation ids converting ML, mb or Ms to Mw, as chosen on the page (none by default). */
  readonly conversions: readonly string[];
}

/** The catalog view: load, summary with rejected lines, frequency–magnitude plot with the fit, and the zone. */
export function CatalogView(props: CatalogViewProps) {
  const { tr } = props.page;
  const { study, studyId, analysis, catalog } = props;
  const result = analysis?.fit;
  const fit = result ? chosenFit(result) : undefined;
  const zoneIssue = (name: string) => props.zoneIssues.filter((i) => i.path === name);
  const otherZoneIssues = props.zoneIssues.filter(
    (i) => !['polygon', 'mMax', 'depthKm', 'id', 'name'].includes(i.path),
  );
  const polygons = [
    ...study.sources.filter((s) => s.kind === 'zone').map((s) => ({ value: s.id, label: s.name })),
    ...((study.outline?.length ?? 0) > 0
      ? [
          {
            value: OUTLINE_CHOICE,
            label: tr.t('catalog.zoneOutline'),
            lang: tr.fallbackLang('catalog.zoneOutline'),
          },
        ]
      : []),
  ];
  const zoneField = (name: keyof ZoneForm, label: Child, inputmode?: 'decimal') => (
    <div class="field">
      <label for={`zone-${name}`}>{label}</label>
      <input
        id={`zone-${name}`}
        name={name}
        type="text"
        value={props.zone[name]}
        inputmode={inputmode}
        aria-invalid={zoneIssue(name).length > 0 ? 'true' : undefined}
        aria-describedby={zoneIssue(name).length > 0 ? `zone-${name}-problem` : undefined}
      />
      <FieldProblems tr={tr} id={`zone-${name}-problem`} issues={zoneIssue(name)} />
    </div>
  );
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: study.name }}
      section="catalog"
      showsNumbers={fit !== undefined}
    >
      <p>{tr.text('catalog.intro')}</p>
      {props.zoneAdded && <Notice>{tr.text('catalog.zoneAdded')}</Notice>}
      {catalog ? (
        <p>{tr.text('catalog.attached', { file: catalog.fileName, format: catalog.format })}</p>
      ) : (
        <p>{tr.text('catalog.none')}</p>
      )}

      <section aria-labelledby="catalog-upload-heading" class="upload">
        <h2 id="catalog-upload-heading">{tr.text('catalog.upload')}</h2>
        <form method="post" action={`/studies/${studyId}/catalog`} enctype="multipart/form-data">
          <FileField
            tr={tr}
            upload="catalog"
            text={{ label: 'catalog.file', help: 'catalog.uploadHelp' }}
            problems={props.uploadIssues.length > 0}
          >
            <FieldProblems tr={tr} id="catalog-problems" issues={props.uploadIssues} />
          </FileField>
          <button type="submit">{tr.text('catalog.load')}</button>
        </form>
        <form
          method="post"
          action={`/studies/${studyId}/catalog`}
          enctype="multipart/form-data"
          class="inline-form"
        >
          <input type="hidden" name="demo" value="1" />
          <button type="submit">{tr.text('catalog.useDemo')}</button>
        </form>
        <p class="help">{tr.text('catalog.demoOnly')}</p>
      </section>

      {analysis && (
        <section aria-labelledby="catalog-summary-heading">
          <h2 id="catalog-summary-heading">{tr.text('catalog.summary')}</h2>
          <p
            data-loaded={analysis.load.summary.loaded}
            data-rejected={analysis.load.summary.rejected}
          >
            {tr.text('catalog.loaded', {
              loaded: tr.number(analysis.load.summary.loaded),
              rejected: tr.number(analysis.load.summary.rejected),
            })}
          </p>
          {analysis.load.summary.nonMoment > 0 && (
            <p>{tr.plural('catalog.nonMoment', analysis.load.summary.nonMoment)}</p>
          )}
          {analysis.load.summary.nonMoment > 0 && (
            <form method="get" action={`/studies/${studyId}/catalog`} class="conversion-form">
              <fieldset>
                <legend>{tr.text('catalog.convert.legend')}</legend>
                {MAGNITUDE_RELATIONS.map((r) => (
                  <label>
                    <input
                      type="checkbox"
                      name="convert"
                      value={r.id}
                      checked={props.conversions.includes(r.id)}
                    />{' '}
                    {r.scale}: {r.source} ({r.scale} {r.min}–{r.max})
                  </label>
                ))}
                <button type="submit">{tr.text('catalog.convert.submit')}</button>
              </fieldset>
            </form>
          )}
          {MAGNITUDE_RELATIONS.filter(
            (r) =>
              (result?.conversion?.converted[r.id] ?? 0) > 0 ||
              (result?.conversion?.outsideRange[r.id] ?? 0) > 0,
          ).map((r) => (
            <p class="converted" data-relation={r.id}>
              {tr.text('catalog.convert.done', {
                n: tr.number(result?.conversion?.converted[r.id] ?? 0),
                scale: r.scale,
                source: r.source,
                outside: tr.number(result?.conversion?.outsideRange[r.id] ?? 0),
              })}
            </p>
          ))}
          {analysis.load.summary.withoutDepth > 0 && (
            <p data-without-depth={analysis.load.summary.withoutDepth}>
              {tr.plural('catalog.withoutDepth', analysis.load.summary.withoutDepth)}
            </p>
          )}
          {analysis.load.rejected.length > 0 && (
            <DataTable
              tr={tr}
              class="rejected"
              caption={tr.text('catalog.rejectedCaption')}
              columns={['catalog.col.where', 'catalog.col.why']}
            >
              {analysis.load.rejected.slice(0, 100).map((r) => (
                <tr data-line={r.line}>
                  <th scope="row">{r.where}</th>
                  <td>{tr.english(r.reasons.join('; '))}</td>
                </tr>
              ))}
            </DataTable>
          )}
          {result?.declustering && (
            <p>
              {tr.text('catalog.declustered', {
                main: tr.number(result.declustering.mainshocks.length),
                removed: tr.number(result.declustering.removed.length),
              })}
            </p>
          )}
          {analysis.problem && (
            <p class="problem">{tr.text('catalog.tooFew', { reason: analysis.problem })}</p>
          )}
        </section>
      )}

      {fit && result && (
        <section aria-labelledby="catalog-fit-heading">
          <h2 id="catalog-fit-heading">{tr.text('catalog.fit')}</h2>
          <p
            class="fit-values"
            data-b={fit.bValue}
            data-sigma-b={fit.sigmaB}
            data-mc={result.completeness.mc}
          >
            {result.periods && result.periods.length > 0
              ? tr.text('catalog.periods', {
                  periods: result.periods.map((p, i) => (
                    <>
                      {i > 0 && '; '}
                      {tr.text('catalog.period', {
                        m: tr.number(p.magnitude, 1),
                        year: new Date(p.startMs).getUTCFullYear(),
                      })}
                    </>
                  )),
                })
              : tr.text('catalog.mc', { mc: tr.number(result.completeness.mc, 1) })}{' '}
            {tr.text(
              fit.method === 'weichert' ? 'catalog.method.weichert' : 'catalog.method.akiUtsu',
            )}{' '}
            {tr.text('catalog.fitValues', {
              b: tr.number(fit.bValue, 2),
              sigma: tr.number(fit.sigmaB, 2),
              a: tr.number(fit.aValue, 2),
              rate: fit.rateAtReference.toPrecision(2),
              mRef: tr.number(fit.referenceMagnitude, 2),
            })}
          </p>
          {result.warnings.length > 0 && (
            <ul class="problems fit-warnings">
              {result.warnings.map((w) => (
                <li>{tr.english(w)}</li>
              ))}
            </ul>
          )}
          <figure class="plot-figure">
            <FrequencyMagnitudePlot
              tr={tr}
              data={result.frequencyMagnitude}
              mc={result.periods?.[0]?.magnitude ?? result.completeness.mc}
              idPrefix="fmd"
            />
            <figcaption>
              <FrequencyMagnitudeLegend tr={tr} />
            </figcaption>
          </figure>
        </section>
      )}

      {fit && (
        <section aria-labelledby="catalog-zone-heading">
          <h2 id="catalog-zone-heading">{tr.text('catalog.zone')}</h2>
          <p>{tr.text('catalog.zoneIntro')}</p>
          {polygons.length === 0 ? (
            <p>{tr.text('catalog.noPolygon')}</p>
          ) : (
            <form
              method="post"
              action={`/studies/${studyId}/catalog/zone`}
              class="zone-form"
              novalidate
            >
              <div class="field">
                <label for="zone-polygon">{tr.text('catalog.zonePolygon')}</label>
                <select id="zone-polygon" name="polygon">
                  {polygons.map((p) => (
                    <option
                      value={p.value}
                      selected={p.value === props.zone.polygon}
                      lang={'lang' in p ? p.lang : undefined}
                    >
                      {p.label}
                    </option>
                  ))}
                </select>
                <FieldProblems tr={tr} id="zone-polygon-problem" issues={zoneIssue('polygon')} />
              </div>
              {zoneField('mMax', tr.text('catalog.zoneMMax'), 'decimal')}
              {zoneField('depthKm', tr.text('catalog.zoneDepth'), 'decimal')}
              {zoneField('id', tr.text('catalog.zoneId'))}
              {zoneField('name', tr.text('catalog.zoneName'))}
              <FieldProblems
                tr={tr}
                id="zone-problems"
                issues={otherZoneIssues}
                describe={(i) => tr.english(`${i.path}: ${i.message}`)}
              />
              {props.zoneFit && (
                <p class="zone-result" data-b={props.zoneFit.bValue} data-rate={props.zoneFit.rate}>
                  {tr.text('catalog.zoneResult', { summary: props.zoneFit.summary })}
                </p>
              )}
              <StepActions
                name="action"
                check={{ value: 'fit', label: tr.text('catalog.zoneFit') }}
                next={{ value: 'add', label: tr.text('catalog.zoneAdd') }}
              />
            </form>
          )}
        </section>
      )}
    </StudyPage>
  );
}

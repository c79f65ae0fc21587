import type { InputIssue } from '../../api/engine/errors.ts';
import { intensityWords } from '../format/intensity-words.ts';
import type { Study } from '../../api/engine/model.ts';
import type { ScenarioResult } from '../../api/engine/scenario/index.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import type { MapFrame } from '../maps/map-frame.ts';
import { ScenarioLayer, ScenarioLegend } from '../maps/scenario-layer.tsx';
import { StudyMap } from '../maps/study-map.tsx';
import { FieldProblems } from './field-problems.tsx';
import { SelectField } from './select-field.tsx';
import type { TsunamiPageResult } from '../data/tsunami-data.ts';
import { TsunamiScenario } from './tsunami-time.tsx';
import { DataTable, LabelledCell } from '../components/data-table.tsx';
import { NumberField } from '../components/form-rows.tsx';
import { WarningDetails } from '../components/warning-details.tsx';

export interface ScenarioViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly study: Study;
  readonly sourceId: string;
  readonly magnitude: string;
  readonly issues: readonly InputIssue[];
  readonly result?: ScenarioResult;
  readonly frame?: MapFrame;
  /** Tsunami first arrivals of this rupture, for an interface source of a study with a terrain grid. */
  readonly tsunami?: TsunamiPageResult;
}

/** Pick a source and magnitude (a plain form post), then the map of shaking and each community's intensity. */
export function ScenarioView(props: ScenarioViewProps) {
  const { tr } = props.page;
  const { study, studyId, result } = props;
  const issuesAt = (path: string) => props.issues.filter((i) => i.path === path);
  const others = props.issues.filter((i) => i.path !== 'sourceId' && i.path !== 'magnitude');
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: study.name }}
      section="scenario"
      showsNumbers={result !== undefined}
    >
      <p>{tr.text('scenario.intro')}</p>
      <form method="post" action={`/studies/${studyId}/scenario`} class="scenario-form" novalidate>
        <SelectField
          tr={tr}
          id="scenario-source"
          name="sourceId"
          label={tr.text('scenario.source')}
          describedBy={issuesAt('sourceId').length ? 'scenario-source-problem' : undefined}
          problemId="scenario-source-problem"
          issues={issuesAt('sourceId')}
        >
          {study.sources.map((s) => (
            <option value={s.id} selected={s.id === props.sourceId}>
              {s.name}
            </option>
          ))}
        </SelectField>
        <NumberField
          id="scenario-magnitude"
          name="magnitude"
          label={tr.text('scenario.magnitude')}
          range={{ min: '3', max: '9.6', step: '0.1' }}
          value={props.magnitude}
          problemId={issuesAt('magnitude').length ? 'scenario-magnitude-problem' : undefined}
        >
          <FieldProblems tr={tr} id="scenario-magnitude-problem" issues={issuesAt('magnitude')} />
        </NumberField>
        <FieldProblems tr={tr} id="scenario-other-problems" issues={others} />
        <button type="submit" class="button-primary">
          {tr.text('scenario.run')}
        </button>
      </form>
      {result && props.frame && (
        <>
          <section aria-labelledby="scenario-map-heading">
            <h2 id="scenario-map-heading">{tr.text('scenario.map')}</h2>
            <p>
              {result.sourceName}, M {tr.number(result.magnitude, 1)}.{' '}
              {tr.text('scenario.position', { position: tr.text('scenario.positionMiddle') })}
            </p>
            <figure class="map-figure">
              <StudyMap
                tr={tr}
                study={study}
                frame={props.frame}
                idPrefix="scenario-map"
                showZones={false}
                labelSuffix={
                  new Map(
                    result.communities.map((c) => [
                      c.communityId,
                      ` · ${intensityWords(c.mmi.median).roman}`,
                    ]),
                  )
                }
                hazardLayer={
                  result.grid ? <ScenarioLayer grid={result.grid} frame={props.frame} /> : undefined
                }
              />
              <figcaption>
                <ScenarioLegend tr={tr} />
                {result.grid && (
                  <p class="legend-note">
                    {tr.text('scenario.gridNote', { vs30: tr.number(result.grid.vs30) })}
                  </p>
                )}
              </figcaption>
            </figure>
          </section>
          <section aria-labelledby="scenario-table-heading">
            <h2 id="scenario-table-heading">{tr.text('scenario.table')}</h2>
            <DataTable
              tr={tr}
              class="scenario-table"
              caption={tr.text('scenario.table')}
              columns={[
                'scenario.col.community',
                { key: 'scenario.col.distance', numeric: true },
                'scenario.col.median',
                'scenario.col.high',
                { key: 'scenario.col.pga', numeric: true },
              ]}
            >
              {[...result.communities]
                .sort((a, b) => b.mmi.median - a.mmi.median)
                .map((c) => (
                  <tr data-community={c.communityId} data-mmi={c.mmi.median}>
                    <th scope="row">
                      <a href={`/studies/${studyId}/communities/${c.communityId}`}>{c.name}</a>
                    </th>
                    <LabelledCell tr={tr} column="scenario.col.distance" numeric>
                      {tr.number(c.rrupKm)}
                    </LabelledCell>
                    <LabelledCell tr={tr} column="scenario.col.median">
                      {tr.mmi(c.mmi.median)} ·{' '}
                      {tr.text(
                        `mmi.${Math.min(10, Math.max(1, Math.floor(c.mmi.median)))}.name` as 'mmi.1.name',
                      )}
                    </LabelledCell>
                    <LabelledCell tr={tr} column="scenario.col.high">
                      {tr.mmi(c.mmi.p84)} ·{' '}
                      {tr.text(
                        `mmi.${Math.min(10, Math.max(1, Math.floor(c.mmi.p84)))}.name` as 'mmi.1.name',
                      )}
                    </LabelledCell>
                    <LabelledCell tr={tr} column="scenario.col.pga" numeric>
                      {tr.number(c.motions.PGA?.median ?? 0, 3)}
                    </LabelledCell>
                  </tr>
                ))}
            </DataTable>
            <WarningDetails tr={tr} summary="scenario.warnings" warnings={result.warnings} />
          </section>
        </>
      )}
      {result && props.tsunami && (
        <TsunamiScenario tr={tr} studyId={studyId} tsunami={props.tsunami} />
      )}
    </StudyPage>
  );
}

import {
  DEFAULT_PRIORITY_WEIGHTS,
  PRIORITY_COMPONENTS,
  type PriorityComponent,
  type PriorityComponentId,
  type PriorityWeights,
} from '../../api/results/visit-priority.ts';
import type { PriorityRow } from '../data/visit-priority-data.ts';
import { BandSwatch } from '../layout/band-swatch.tsx';
import type { Translator } from '../text/translator.ts';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

export interface VisitPriorityPanelProps {
  readonly tr: Translator;
  readonly studyId: string;
  readonly rows: readonly PriorityRow[];
  readonly weights: PriorityWeights;
  readonly years: number;
  /** Weights in the query that were not numbers from 0 to 10 (they kept their default). */
  readonly problems: readonly { readonly path: string; readonly message: string }[];
  /** Visits recorded per community (the column shows when given). */
  readonly visitCounts?: ReadonlyMap<string, number>;
}

/** A component's value as the page shows it, with its unit. */
function componentValue(tr: Translator, c: PriorityComponent): string {
  if (c.value === undefined) return tr.t('priority.unknown');
  switch (c.id) {
    case 'chance':
      return tr.chance(c.value).percent;
    case 'firmness':
      return tr.t('priority.firmnessValue', { percent: tr.number(Math.round(c.value * 100)) });
    case 'isolation':
      return tr.t('priority.km', { km: tr.number(c.value) });
    default:
      return tr.number(c.value);
  }
}

const componentName = (tr: Translator, id: PriorityComponentId, years: number) =>
  tr.text(`priority.component.${id}`, { years });

/**
 * The visit priority beside the screening band: the weights form (a GET, so a chosen weighting
 * is a link that can be shared), then every community with its score and each component's
 * value, share of the largest and points, and a box to add it to a trip plan.
 */
export function VisitPriorityPanel(props: VisitPriorityPanelProps) {
  const { tr, studyId, rows, weights, years } = props;
  const unused = PRIORITY_COMPONENTS.filter(
    (id) => rows[0]?.priority.components.find((c) => c.id === id)?.used === false,
  );
  return (
    <section aria-labelledby="priority-heading" class="visit-priority">
      <h2 id="priority-heading">{tr.text('priority.heading')}</h2>
      <p>{tr.text('priority.intro')}</p>
      <p>{tr.text('priority.rule')}</p>
      <form method="get" action={`/studies/${studyId}#priority-heading`} class="priority-weights">
        <fieldset>
          <legend>{tr.text('priority.weights')}</legend>
          {props.problems.length > 0 && (
            <ul class="field-problems" role="alert">
              {props.problems.map((p) => (
                <li>{tr.english(`${p.path}: ${p.message}`)}</li>
              ))}
            </ul>
          )}
          {PRIORITY_COMPONENTS.map((id) => (
            <label class="weight-field">
              <span>{componentName(tr, id, years)}</span>
              <input
                type="number"
                name={`w-${id}`}
                min="0"
                max="10"
                step="0.5"
                value={String(weights[id])}
                inputmode="decimal"
              />
              <span class="hint">
                {tr.text('priority.default', { weight: DEFAULT_PRIORITY_WEIGHTS[id] })}
              </span>
            </label>
          ))}
          <button type="submit">{tr.text('priority.apply')}</button>
        </fieldset>
      </form>
      {unused.length > 0 && (
        <p class="legend-note">
          {tr.text('priority.unusedNote', {
            names: unused.map((id) => tr.t(`priority.component.${id}`, { years })).join(', '),
          })}
        </p>
      )}
      <form method="get" action={`/studies/${studyId}/trip`} class="trip-choice">
        <DataTable
          tr={tr}
          class="priority-table"
          caption={tr.text('priority.tableCaption')}
          columns={[
            'priority.col.choose',
            { key: 'overview.col.rank', numeric: true },
            'overview.col.community',
            { key: 'priority.col.score', numeric: true },
            ...PRIORITY_COMPONENTS.map((id) => ({
              label: componentName(tr, id, years),
              numeric: true as const,
            })),
            'overview.col.band',
            ...(props.visitCounts ? [{ key: 'priority.col.visits', numeric: true } as const] : []),
          ]}
        >
          {rows.map((row) => (
            <tr data-community={row.priority.communityId}>
              <td>
                <input
                  type="checkbox"
                  name="c"
                  value={row.priority.communityId}
                  id={`trip-${row.priority.communityId}`}
                  aria-label={tr.t('priority.chooseOne', { name: row.name })}
                />
              </td>
              <LabelledCell tr={tr} column="overview.col.rank" numeric>
                {row.rank}
              </LabelledCell>
              <th scope="row">
                <a href={`/studies/${studyId}/communities/${row.priority.communityId}`}>
                  {row.name}
                </a>
              </th>
              <td class="numeric priority-score" data-label={tr.t('priority.col.score')}>
                {tr.number(row.priority.score, 0)}
              </td>
              {row.priority.components.map((c) => (
                <td
                  class="numeric"
                  data-component={c.id}
                  data-label={tr.t(`priority.component.${c.id}`, { years })}
                >
                  {componentValue(tr, c)}
                  {c.used && (
                    <span class="component-share">
                      {tr.text('priority.share', {
                        share: tr.number(Math.round(c.share * 100)),
                        points: tr.number(c.points, 1),
                      })}
                    </span>
                  )}
                </td>
              ))}
              <LabelledCell tr={tr} column="overview.col.band">
                <BandSwatch tr={tr} bandId={row.bandId} />
              </LabelledCell>
              {props.visitCounts && (
                <td class="numeric" data-key="visits" data-label={tr.t('priority.col.visits')}>
                  {tr.number(props.visitCounts.get(row.priority.communityId) ?? 0)}
                </td>
              )}
            </tr>
          ))}
        </DataTable>
        <fieldset class="trip-options">
          <legend>{tr.text('trip.options')}</legend>
          <label>
            {tr.text('trip.startFrom')}{' '}
            <select name="start">
              <option value="">{tr.text('trip.startFirst')}</option>
              {rows.map((row) => (
                <option value={row.priority.communityId}>{row.name}</option>
              ))}
            </select>
          </label>
          <label>
            <input type="checkbox" name="return" value="1" /> {tr.text('trip.returnToStart')}
          </label>
          <button type="submit">{tr.text('trip.plan')}</button>
        </fieldset>
      </form>
      <p>
        <a href={`/api/studies/${studyId}/visits.csv`}>{tr.text('visits.download')}</a>
      </p>
    </section>
  );
}

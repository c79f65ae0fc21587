import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import type { TripPlan } from '../../api/engine/trip/visit-order.ts';
import { BandSwatch } from '../layout/band-swatch.tsx';
import type { PageContext } from '../layout/page-shell.tsx';
import { StudyPage } from '../layout/titled-page.tsx';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

export interface TripViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  readonly plan: TripPlan;
  readonly returnToStart: boolean;
  /** Names and bands of the stops (bands only once the study is screened). */
  readonly names: ReadonlyMap<string, string>;
  readonly bands: ReadonlyMap<string, ScreeningBandId>;
}

/**
 * A trip plan: the chosen villages in visiting order with the straight-line distance of each
 * leg and the total, ready to print (the print rules of tremora.css leave the page's frame and forms off the paper).
 */
export function TripView(props: TripViewProps) {
  const { tr } = props.page;
  const { plan, studyId } = props;
  let sumKm = 0;
  const km = (value: number) => tr.t('priority.km', { km: tr.number(value, 1) });
  return (
    <StudyPage
      page={props.page}
      study={{ id: studyId, name: props.studyName }}
      titleKey="trip.title"
      section="overview"
      bodyClass="trip-page"
      showsNumbers={true}
    >
      <p>{tr.text('trip.method')}</p>
      <DataTable
        tr={tr}
        class="trip-table"
        caption={tr.text('trip.caption')}
        columns={[
          { key: 'trip.col.stop', numeric: true },
          'overview.col.community',
          'overview.col.band',
          { key: 'trip.col.leg', numeric: true },
          { key: 'trip.col.sofar', numeric: true },
        ]}
        foot={
          <tr>
            <th scope="row" colspan={3}>
              {tr.text('trip.total')}
            </th>
            <td class="numeric trip-total" colspan={2}>
              {km(plan.totalKm)}
            </td>
          </tr>
        }
      >
        {plan.stops.map((stop, i) => {
          const legKm = i === 0 ? undefined : plan.legsKm[i - 1];
          sumKm += legKm ?? 0;
          const band = props.bands.get(stop.id);
          return (
            <tr data-community={stop.id}>
              <LabelledCell tr={tr} column="trip.col.stop" numeric>
                {i + 1}
              </LabelledCell>
              <th scope="row">
                <a href={`/studies/${studyId}/communities/${stop.id}`}>
                  {props.names.get(stop.id) ?? stop.id}
                </a>
              </th>
              <LabelledCell tr={tr} column="overview.col.band">
                {band ? <BandSwatch tr={tr} bandId={band} /> : ''}
              </LabelledCell>
              <LabelledCell tr={tr} column="trip.col.leg" numeric>
                {legKm === undefined ? tr.text('trip.start') : km(legKm)}
              </LabelledCell>
              <LabelledCell tr={tr} column="trip.col.sofar" numeric>
                {km(sumKm)}
              </LabelledCell>
            </tr>
          );
        })}
        {props.returnToStart && plan.stops.length > 1 && (
          <tr>
            <td class="numeric">{plan.stops.length + 1}</td>
            <th scope="row">
              {tr.text('trip.backTo', {
                name: props.names.get(plan.stops[0]?.id ?? '') ?? '',
              })}
            </th>
            <td></td>
            <td class="numeric">{km(plan.legsKm.at(-1) ?? 0)}</td>
            <td class="numeric">{km(plan.totalKm)}</td>
          </tr>
        )}
      </DataTable>
      <p class="legend-note">{tr.text('trip.straightLine')}</p>
      <p class="no-print">
        <a href={`/studies/${studyId}#priority-heading`}>{tr.text('trip.back')}</a>
      </p>
    </StudyPage>
  );
}

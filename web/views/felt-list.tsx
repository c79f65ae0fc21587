import type { CommunityFeltHistory, FeltEstimate } from '../../api/engine/catalog/felt-history.ts';
import type { SheetBlockProps } from './sheet-block.ts';
import { DataTable } from '../components/data-table.tsx';

export interface FeltListProps extends SheetBlockProps {
  readonly studyId: string;
  readonly communityName: string;
  /** Undefined when the study has no catalog. */
  readonly felt?: { readonly history: CommunityFeltHistory; readonly eventCount: number };
  /** Rows shown, strongest first. */
  readonly limit: number;
  /** The study has a catalog, too large for this page. */
  readonly tooMany?: boolean;
}

/** The strongest of the events likely felt, strongest first, then the most recent. */
export function strongestFelt(history: CommunityFeltHistory, limit: number): FeltEstimate[] {
  return [...history.felt].sort((a, b) => b.mmi - a.mmi || b.timeMs - a.timeMs).slice(0, limit);
}

/** "Earthquakes people here have likely felt" (feltHistory, api/engine/catalog/felt-history.ts). */
export function FeltList(props: FeltListProps) {
  const { tr, felt } = props;
  const H = props.headingLevel === 2 ? 'h2' : 'h3';
  return (
    <section aria-labelledby="felt-heading" class="felt">
      <H id="felt-heading">{tr.text('community.felt')}</H>
      {props.tooMany ? (
        <p>{tr.text('community.feltTooMany')}</p>
      ) : !felt ? (
        <p>
          {tr.text('community.feltNoCatalog')}{' '}
          {!props.compact && (
            <a href={`/studies/${props.studyId}/catalog`}>{tr.text('community.feltAttach')}</a>
          )}
        </p>
      ) : felt.history.felt.length === 0 ? (
        <p>{tr.text('community.feltNone', { events: tr.number(felt.eventCount) })}</p>
      ) : (
        <>
          {!props.compact && <p>{tr.text('community.feltIntro')}</p>}
          <p
            data-felt={felt.history.felt.length}
            data-strongly-felt={felt.history.stronglyFelt.length}
          >
            {tr.text('community.feltCounts', {
              felt: tr.count(felt.history.felt.length),
              strong: tr.count(felt.history.stronglyFelt.length),
            })}
          </p>
          <DataTable
            tr={tr}
            class="felt-table"
            caption={tr.text('community.feltCaption', { name: props.communityName })}
            columns={[
              'community.feltCol.date',
              { key: 'community.feltCol.magnitude', numeric: true },
              'community.feltCol.where',
              'community.feltCol.mmi',
            ]}
          >
            {strongestFelt(felt.history, props.limit).map((e) => (
              <tr data-event={e.eventId}>
                <th scope="row">{tr.date(e.timeMs)}</th>
                <td class="numeric">{`M ${tr.number(e.magnitude, 1)}`}</td>
                <td>{tr.place(e.distanceKm, e.bearingDeg)}</td>
                <td>
                  {tr.mmi(e.mmi)} ·{' '}
                  {tr.text(
                    `mmi.${Math.min(10, Math.max(1, Math.floor(e.mmi)))}.name` as 'mmi.1.name',
                  )}
                </td>
              </tr>
            ))}
          </DataTable>
        </>
      )}
    </section>
  );
}

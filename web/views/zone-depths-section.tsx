import type { ZoneDepthSummary } from '../data/zone-depth-summary.ts';
import type { Translator } from '../text/translator.ts';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

export interface ZoneDepthsSectionProps {
  readonly tr: Translator;
  readonly zones: readonly ZoneDepthSummary[];
  /** The screening's JSON results, where every cell's depths are listed. */
  readonly resultsUrl: string;
}

/** Depths to one decimal: the report keeps 0.01 km, more than a slab's depth is known to. */
const km = (tr: Translator, value: number) => tr.number(value, 1);

function basisText(tr: Translator, basis: ZoneDepthSummary['basis']): string {
  if (basis.kind === 'list') return tr.t('zoneDepths.list');
  const { surface, offsetKm } = basis;
  if (offsetKm === 0) return tr.t('zoneDepths.on', { surface });
  return tr.t(offsetKm > 0 ? 'zoneDepths.under' : 'zoneDepths.over', {
    surface,
    km: tr.number(Math.abs(offsetKm), Number.isInteger(offsetKm) ? 0 : 1),
  });
}

/**
 * The depths the screening gave the earthquakes of each zone whose depths follow a contoured
 * surface or come as a list: cells, shallowest, median and deepest, and what they follow.
 */
export function ZoneDepthsSection(props: ZoneDepthsSectionProps) {
  const { tr, zones } = props;
  return (
    <section aria-labelledby="zone-depths-heading" class="zone-depths">
      <h2 id="zone-depths-heading">{tr.text('zoneDepths.heading')}</h2>
      <p>
        {tr.text('zoneDepths.intro')} <a href={props.resultsUrl}>{tr.text('zoneDepths.json')}</a>
      </p>
      <DataTable
        tr={tr}
        class="zone-depths-table"
        caption={tr.text('zoneDepths.heading')}
        columns={[
          'zoneDepths.col.zone',
          { key: 'zoneDepths.col.cells', numeric: true },
          { key: 'zoneDepths.col.shallowest', numeric: true },
          { key: 'zoneDepths.col.median', numeric: true },
          { key: 'zoneDepths.col.deepest', numeric: true },
          'zoneDepths.col.from',
        ]}
      >
        {zones.map((z) => (
          <tr data-source={z.sourceId}>
            <th scope="row">{z.name}</th>
            <LabelledCell tr={tr} column="zoneDepths.col.cells" numeric>
              {tr.number(z.cells)}
            </LabelledCell>
            <LabelledCell tr={tr} column="zoneDepths.col.shallowest" numeric>
              {km(tr, z.shallowestKm)}
            </LabelledCell>
            <LabelledCell tr={tr} column="zoneDepths.col.median" numeric>
              {km(tr, z.medianKm)}
            </LabelledCell>
            <LabelledCell tr={tr} column="zoneDepths.col.deepest" numeric>
              {km(tr, z.deepestKm)}
            </LabelledCell>
            <LabelledCell tr={tr} column="zoneDepths.col.from">
              {basisText(tr, z.basis)}
            </LabelledCell>
          </tr>
        ))}
      </DataTable>
    </section>
  );
}

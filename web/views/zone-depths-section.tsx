import type { ZoneDepthSummary } from '../data/zone-depth-summary.ts';
import type { Translator } from '../text/translator.ts';

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
  const col = (key: Parameters<Translator['t']>[0]) => tr.t(key);
  return (
    <section aria-labelledby="zone-depths-heading" class="zone-depths">
      <h2 id="zone-depths-heading">{tr.text('zoneDepths.heading')}</h2>
      <p>
        {tr.text('zoneDepths.intro')} <a href={props.resultsUrl}>{tr.text('zoneDepths.json')}</a>
      </p>
      <table class="data-table zone-depths-table">
        <caption>{tr.text('zoneDepths.heading')}</caption>
        <thead>
          <tr>
            <th scope="col">{tr.text('zoneDepths.col.zone')}</th>
            <th scope="col" class="numeric">
              {tr.text('zoneDepths.col.cells')}
            </th>
            <th scope="col" class="numeric">
              {tr.text('zoneDepths.col.shallowest')}
            </th>
            <th scope="col" class="numeric">
              {tr.text('zoneDepths.col.median')}
            </th>
            <th scope="col" class="numeric">
              {tr.text('zoneDepths.col.deepest')}
            </th>
            <th scope="col">{tr.text('zoneDepths.col.from')}</th>
          </tr>
        </thead>
        <tbody>
          {zones.map((z) => (
            <tr data-source={z.sourceId}>
              <th scope="row">{z.name}</th>
              <td class="numeric" data-label={col('zoneDepths.col.cells')}>
                {tr.number(z.cells)}
              </td>
              <td class="numeric" data-label={col('zoneDepths.col.shallowest')}>
                {km(tr, z.shallowestKm)}
              </td>
              <td class="numeric" data-label={col('zoneDepths.col.median')}>
                {km(tr, z.medianKm)}
              </td>
              <td class="numeric" data-label={col('zoneDepths.col.deepest')}>
                {km(tr, z.deepestKm)}
              </td>
              <td data-label={col('zoneDepths.col.from')}>{basisText(tr, z.basis)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}

import type { ScenarioGrid } from '../../api/engine/scenario/index.ts';
import { LegendBox, LegendSymbol } from '../components/legend-symbol.tsx';
import { DUSK, MMI_CLASSES, mmiClass } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { GridCell } from './grid-cell.tsx';
import type { MapFrame } from './map-frame.ts';

/**
 * A scenario's grid of median MMI as square cells of the study's local frame (the grid is laid
 * out in that frame, api/engine/scenario/scenario-grid.ts), coloured by MMI class on the dusk
 * scale. The classes are also named in the legend and at each community, not by colour alone.
 */
export function ScenarioLayer(props: { readonly grid: ScenarioGrid; readonly frame: MapFrame }) {
  const { grid, frame } = props;
  const side = grid.spacingKm * frame.scale;
  const cells = [];
  for (let i = 0; i < grid.lon.length; i++) {
    const [x, y] = frame.project([grid.lon[i] as number, grid.lat[i] as number]);
    const step = mmiClass(grid.mmiMedian[i] as number).step;
    cells.push(<GridCell x={x} y={y} sidePx={side} fill={DUSK[step]} />);
  }
  return (
    <g class="scenario-cells" opacity={0.85} shape-rendering="crispEdges">
      {cells}
    </g>
  );
}

/** The MMI classes of the scenario map, in words. */
export function ScenarioLegend(props: { readonly tr: Translator }) {
  const { tr } = props;
  return (
    <div class="map-legend">
      <h3 class="legend-title">{tr.text('map.shaking')}</h3>
      <ul class="legend-classes">
        {MMI_CLASSES.map((c) => (
          <li>
            <LegendSymbol height={16}>
              <LegendBox fill={DUSK[c.step]} stroke="#5d5a6b" />
            </LegendSymbol>{' '}
            {`MMI ${c.label}`} · {tr.text(`mmi.${c.from === 1 ? 2 : c.from}.name` as 'mmi.1.name')}
          </li>
        ))}
      </ul>
    </div>
  );
}

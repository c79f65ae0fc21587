import { scaleLinear, scaleLog } from 'd3-scale';
import type { Child } from 'hono/jsx';
import { line } from 'd3-shape';
import type { FrequencyMagnitude } from '../../api/engine/catalog/frequency-magnitude.ts';
import { DUSK, INK, MAP_COLOURS, PAPER } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { LegendLine, LegendSymbol } from '../components/legend-symbol.tsx';
import { logFrameAxis, PLOT_MARGIN, PlotFrame, titleText } from './plot-frame.tsx';
import { PlotLegend } from './plot-legend.tsx';

const MARGIN = PLOT_MARGIN;

/**
 * The frequency–magnitude distribution: annual rates at or above each magnitude (filled
 * circles) and in each bin (open squares) on a log axis, the fitted Gutenberg–Richter line, and
 * the magnitude of completeness as a dashed line. Shapes tell the series apart, not colour.
 */
export function FrequencyMagnitudePlot(props: {
  readonly tr: Translator;
  readonly data: FrequencyMagnitude;
  readonly mc: number;
  readonly idPrefix: string;
}) {
  const { tr, data } = props;
  const width = 640;
  const height = 380;
  const bins = data.bins;
  const rates = bins.flatMap((b) => [b.cumulativeAnnualRate, b.annualRate]).filter((r) => r > 0);
  const step =
    bins.length > 1
      ? (bins[1] as { magnitude: number }).magnitude - (bins[0] as { magnitude: number }).magnitude
      : 0.1;
  const mLow = Math.min(...bins.map((b) => b.lowerEdge), props.mc) - step;
  const mHigh = Math.max(...bins.map((b) => b.magnitude)) + 2 * step;
  const x = scaleLinear()
    .domain([mLow, mHigh])
    .range([MARGIN.left, width - MARGIN.right]);
  const y = scaleLog()
    .domain([Math.min(...rates), Math.max(...rates)])
    .range([height - MARGIN.bottom, MARGIN.top])
    .nice();
  const fitPath = data.fittedLine
    ? line<{ magnitude: number; cumulativeAnnualRate: number }>()
        .x((d) => x(d.magnitude))
        .y((d) => y(d.cumulativeAnnualRate))
        .digits(1)([...data.fittedLine])
    : null;
  return (
    <PlotFrame
      width={width}
      height={height}
      idPrefix={props.idPrefix}
      {...titleText(tr, 'catalog.plot')}
      x={{
        ticks: x.ticks(8),
        position: x,
        label: (v) => tr.number(v, 1),
        ...titleText(tr, 'plot.magnitude'),
      }}
      y={logFrameAxis(tr, y, 'plot.perYear')}
    >
      <line
        x1={x(props.mc)}
        x2={x(props.mc)}
        y1={MARGIN.top}
        y2={height - MARGIN.bottom}
        stroke={MAP_COLOURS.returnPeriod}
        stroke-dasharray="6 4"
        stroke-width={1.2}
      />
      <text
        x={x(props.mc) + 4}
        y={MARGIN.top + 14}
        font-size={12}
        fill={MAP_COLOURS.axis}
        lang={tr.fallbackLang('plot.mcLine')}
      >
        {`${tr.t('plot.mcLine')} M ${tr.number(props.mc, 1)}`}
      </text>
      {fitPath && (
        <path d={fitPath} stroke={DUSK[5]} stroke-width={2.5} fill="none" class="fit-line" />
      )}
      <g class="incremental">
        {bins
          .filter((b) => b.annualRate > 0)
          .map((b) => (
            <rect
              x={x(b.magnitude) - 3.5}
              y={y(b.annualRate) - 3.5}
              width={7}
              height={7}
              fill={PAPER}
              stroke={INK}
              stroke-width={1.2}
            />
          ))}
      </g>
      <g class="cumulative">
        {bins
          .filter((b) => b.cumulativeAnnualRate > 0)
          .map((b) => (
            <circle cx={x(b.lowerEdge)} cy={y(b.cumulativeAnnualRate)} r={3.8} fill={DUSK[6]} />
          ))}
      </g>
    </PlotFrame>
  );
}

/** The plot's legend in words, with the symbols. */
export function FrequencyMagnitudeLegend(props: { readonly tr: Translator }) {
  const { tr } = props;
  const symbol = (content: Child) => <LegendSymbol height={12}>{content}</LegendSymbol>;
  return (
    <PlotLegend tr={tr} nameId="fm-legend-name">
      <li>
        {symbol(<circle cx={14} cy={6} r={4} fill={DUSK[6]} />)} {tr.text('plot.cumulative')}
      </li>
      <li>
        {symbol(<rect x={10} y={2} width={8} height={8} fill={PAPER} stroke={INK} />)}{' '}
        {tr.text('plot.incremental')}
      </li>
      <li>
        {symbol(<LegendLine height={12} stroke={DUSK[5]} strokeWidth={2.5} />)}{' '}
        {tr.text('plot.fitLine')}
      </li>
      <li>
        {symbol(<LegendLine height={12} stroke={MAP_COLOURS.returnPeriod} strokeDasharray="6 4" />)}{' '}
        {tr.text('plot.mcLine')}
      </li>
    </PlotLegend>
  );
}

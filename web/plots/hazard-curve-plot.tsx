import { scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import type { HazardCurve } from '../../api/engine/results.ts';
import { MAP_COLOURS, PAPER } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { LegendLine, LegendSymbol } from '../components/legend-symbol.tsx';
import { logFrameAxis, PLOT_MARGIN, PlotFrame, titleText } from './plot-frame.tsx';
import { PlotLegend } from './plot-legend.tsx';

export interface HazardCurvePlotProps {
  readonly tr: Translator;
  readonly curve: HazardCurve;
  readonly returnPeriodsYears: readonly number[];
  /** The mean curve's level at each return period (g), where on the curve. */
  readonly levelsAtReturnPeriods: Readonly<Record<string, number | null>>;
  readonly idPrefix: string;
  readonly width?: number;
  readonly height?: number;
}

/** Lowest rate drawn, per year: below one in a million years a screening says nothing useful. */
const MIN_RATE = 1e-6;
const MARGIN = PLOT_MARGIN;
/** Dotted, so the fractiles read apart from the mean without colour (greyscale prints). */
const FRACTILE_DASH = '1.5 3';

/**
 * The hazard curve on log–log axes (d3-scale, d3-shape): the mean curve dark, each logic-tree
 * branch lighter beneath it, the fractile curves of the whole logic tree (settings.fractiles)
 * dotted in the mean's colour, dashed lines at the return periods with their level marked.
 * Rates of zero (past the truncation) cannot sit on a log axis and are left off.
 */
export function HazardCurvePlot(props: HazardCurvePlotProps) {
  const { tr, curve } = props;
  const width = props.width ?? 640;
  const height = props.height ?? 380;
  const fractiles = Object.entries(curve.fractiles ?? {});
  const all = [
    curve.annualRate,
    ...(curve.branches ?? []).map((b) => b.annualRate),
    ...fractiles.map(([, rates]) => rates),
  ];
  const positive = all.flat().filter((r) => r > 0);
  const maxRate = Math.max(...positive, (1 / Math.min(...props.returnPeriodsYears)) * 10);
  const minRate = Math.max(
    MIN_RATE,
    Math.min(...positive, ...props.returnPeriodsYears.map((t) => 1 / t / 10)),
  );
  const levels = curve.levels;
  const x = scaleLog()
    .domain([levels[0] as number, levels[levels.length - 1] as number])
    .range([MARGIN.left, width - MARGIN.right]);
  const y = scaleLog()
    .domain([minRate, maxRate])
    .range([height - MARGIN.bottom, MARGIN.top])
    .nice();
  const [yLow] = y.domain() as [number, number];
  const path = line<[number, number]>()
    .x((d) => x(d[0]))
    .y((d) => y(d[1]))
    .digits(1);
  const pointsOf = (rates: readonly number[]) =>
    levels.map((l, i) => [l, rates[i] as number] as [number, number]).filter((d) => d[1] >= yLow);
  return (
    <PlotFrame
      width={width}
      height={height}
      idPrefix={props.idPrefix}
      {...titleText(tr, 'community.curve')}
      description={{
        text: `${tr.t('plot.pga')}; ${tr.t('plot.annualRate')}.`,
        lang: tr.fallbackLang('plot.pga'),
      }}
      x={logFrameAxis(tr, x, 'plot.pga')}
      y={logFrameAxis(tr, y, 'plot.annualRate')}
    >
      <g class="branches">
        {(curve.branches ?? []).map((b) => (
          <path
            d={path(pointsOf(b.annualRate)) ?? ''}
            fill="none"
            stroke={MAP_COLOURS.branch}
            stroke-width={1.6}
            data-branch={b.label}
          />
        ))}
      </g>
      <g class="fractiles">
        {fractiles.map(([fractile, rates]) => (
          <path
            d={path(pointsOf(rates)) ?? ''}
            fill="none"
            stroke={MAP_COLOURS.mean}
            stroke-width={1.4}
            stroke-dasharray={FRACTILE_DASH}
            data-fractile={fractile}
          />
        ))}
      </g>
      <path
        class="mean-curve"
        d={path(pointsOf(curve.annualRate)) ?? ''}
        fill="none"
        stroke={MAP_COLOURS.mean}
        stroke-width={2.2}
      />
      <g class="return-periods">
        {props.returnPeriodsYears.map((years) => {
          const rate = 1 / years;
          if (rate < yLow) return null;
          const level = props.levelsAtReturnPeriods[String(years)];
          const yy = y(rate);
          return (
            <g data-return-period={years}>
              <line
                x1={MARGIN.left}
                x2={width - MARGIN.right}
                y1={yy}
                y2={yy}
                stroke={MAP_COLOURS.returnPeriod}
                stroke-width={1.2}
                stroke-dasharray="6 4"
              />
              <text
                x={width - MARGIN.right - 4}
                y={yy - 5}
                text-anchor="end"
                font-size={12}
                fill={MAP_COLOURS.axis}
                paint-order="stroke"
                stroke={PAPER}
                stroke-width={3}
                lang={tr.fallbackLang('plot.returnPeriod')}
              >
                {tr.t('plot.returnPeriod', { years: tr.number(years) })}
              </text>
              {level != null && level >= (levels[0] as number) && (
                <>
                  <line
                    x1={x(level)}
                    x2={x(level)}
                    y1={yy}
                    y2={height - MARGIN.bottom}
                    stroke={MAP_COLOURS.returnPeriod}
                    stroke-width={1}
                    stroke-dasharray="2 3"
                  />
                  <circle
                    cx={x(level)}
                    cy={yy}
                    r={4.5}
                    fill={PAPER}
                    stroke={MAP_COLOURS.mean}
                    stroke-width={2}
                  />
                </>
              )}
            </g>
          );
        })}
      </g>
    </PlotFrame>
  );
}

/** The plot's legend in words. */
export function HazardCurveLegend(props: {
  readonly tr: Translator;
  readonly branches: number;
  /** The fractiles drawn, as written in the settings ("0.16", "0.5", "0.84"). */
  readonly fractiles?: readonly string[];
}) {
  const { tr } = props;
  const sample = (stroke: string, w: number, dash?: string) => (
    <LegendSymbol height={12}>
      <LegendLine height={12} stroke={stroke} strokeWidth={w} strokeDasharray={dash} />
    </LegendSymbol>
  );
  return (
    <PlotLegend tr={tr} nameId="curve-legend-name">
      <li>
        {sample(MAP_COLOURS.mean, 3)} {tr.text('plot.mean')}
      </li>
      {props.branches > 0 && (
        <li>
          {sample(MAP_COLOURS.branch, 1.5)}{' '}
          {tr.plural('plot.branch', props.branches, { n: tr.count(props.branches) })}
        </li>
      )}
      {props.fractiles && props.fractiles.length > 0 && (
        <li>
          {sample(MAP_COLOURS.mean, 1.4, FRACTILE_DASH)}{' '}
          {tr.text('plot.fractiles', {
            list: props.fractiles.map((f) => tr.chance(Number(f)).percent).join(', '),
          })}
        </li>
      )}
      <li>
        {sample(MAP_COLOURS.returnPeriod, 1.2, '6 4')} {tr.text('plot.returnPeriodLegend')}
      </li>
    </PlotLegend>
  );
}

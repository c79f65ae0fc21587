import type { Child } from 'hono/jsx';
import type { MapDescription } from '../../api/engine/map/map-geojson.ts';
import { parseMeasure } from '../../api/engine/motion/measure.ts';
import { LegendBox, LegendSymbol } from '../components/legend-symbol.tsx';
import type { LayerPoint } from '../data/map-data.ts';
import { DUSK, MAP_COLOURS } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';
import { classIndex, valueClasses, type ValueClass } from './hazard-classes.ts';
import { GridCell } from './grid-cell.tsx';
import type { MapFrame } from './map-frame.ts';

/** A map's points in classes: those with a value, those above the curve (in the top class) and those below it (left clear). */
export interface LayerClasses {
  readonly classes: readonly ValueClass[];
  readonly limits: readonly number[];
  /** Range of the values known (points above the curve have none). */
  readonly min: number;
  readonly max: number;
  /** Points whose level is below the lowest level computed: drawn as no cell. */
  readonly clear: number;
}

/** The classes of a done map's points; undefined when no point has a value. */
export function layerClasses(points: readonly LayerPoint[]): LayerClasses | undefined {
  const values = points.flatMap((p) => (p.value === null ? [] : [p.value]));
  if (values.length === 0) return undefined;
  const found = valueClasses(values);
  const above = points.filter((p) => p.value === null && p.status === 'above-highest-level').length;
  const classes = found.classes.map((c, i) =>
    i === found.classes.length - 1 ? { ...c, count: c.count + above } : c,
  );
  return {
    classes,
    limits: found.limits,
    min: found.min,
    max: found.max,
    clear: points.filter((p) => p.value === null && p.status !== 'above-highest-level').length,
  };
}

/**
 * A done hazard map as square cells of the study's local frame (the map's grid is laid out in
 * that frame, api/engine/map/map-grid.ts), filled by class on the dusk scale, opaque so the
 * shade alone reads in greyscale; the coast, sources and communities are drawn above it.
 */
export function HazardLayer(props: {
  readonly points: readonly LayerPoint[];
  readonly classes: LayerClasses;
  readonly spacingKm: number;
  readonly frame: MapFrame;
}) {
  const { points, classes, frame } = props;
  const side = props.spacingKm * frame.scale;
  const top = classes.classes.length - 1;
  const cells = [];
  for (const p of points) {
    const index =
      p.value !== null
        ? classIndex(classes.limits, p.value)
        : p.status === 'above-highest-level'
          ? top
          : -1;
    if (index < 0) continue;
    const [x, y] = frame.project([p.lon, p.lat]);
    cells.push(
      <GridCell
        x={x}
        y={y}
        sidePx={side}
        fill={DUSK[(classes.classes[index] as ValueClass).step]}
        valueClass={index}
      />,
    );
  }
  return (
    <g class="hazard-cells" shape-rendering="crispEdges">
      {cells}
    </g>
  );
}

/** Decimal places that show round number `x` exactly (up to 6). */
function exactDecimals(x: number): number {
  for (let d = 0; d < 6; d++) if (Number(x.toFixed(d)) === x) return d;
  return 6;
}

/** Decimal places for two significant figures of `x`. */
const twoFigures = (x: number): number =>
  x === 0 ? 0 : Math.max(0, 1 - Math.floor(Math.log10(Math.abs(x))));

/** A value of the map in words: "0.15 g", "12 cm/s", or a percentage for a chance map. */
export function mapValueText(tr: Translator, value: number, unit: string, round: boolean): string {
  if (unit === 'probability') {
    const percent = value * 100;
    return tr.t('chance.percent', {
      p: tr.number(
        percent,
        round ? exactDecimals(Number(percent.toPrecision(6))) : twoFigures(percent),
      ),
    });
  }
  return `${tr.number(value, round ? exactDecimals(value) : twoFigures(value))} ${unit}`;
}

/** The measure of a map in words ("Peak ground acceleration (PGA)"); `plain` for attributes and options. */
export function measureWords(tr: Translator, key: string, plain: true): string;
export function measureWords(tr: Translator, key: string, plain?: false): Child;
export function measureWords(tr: Translator, key: string, plain = false): Child {
  const m = parseMeasure(key);
  if (m.kind === 'SA')
    return plain
      ? tr.t('hazardMap.measure.SA', {
          period: tr.number(m.periodS, exactDecimals(m.periodS)),
          key,
        })
      : tr.text('hazardMap.measure.SA', {
          period: tr.number(m.periodS, exactDecimals(m.periodS)),
          key,
        });
  const textKey = m.kind === 'PGA' ? 'hazardMap.measure.PGA' : 'hazardMap.measure.PGV';
  return plain ? tr.t(textKey) : tr.text(textKey);
}

/** What a map shows, in words with its unit and return period or horizon. */
export function mapTitle(
  tr: Translator,
  d: Pick<MapDescription, 'measure' | 'unit' | 'quantity'>,
): Child {
  const measure = measureWords(tr, d.measure);
  return d.quantity.kind === 'return-period'
    ? tr.text('hazardMap.title.returnPeriod', {
        measure,
        years: tr.number(d.quantity.returnPeriodYears),
        unit: d.unit,
      })
    : tr.text('hazardMap.title.chance', {
        measure,
        level: tr.number(d.quantity.level, twoFigures(d.quantity.level)),
        unit: d.unit,
        years: tr.number(d.quantity.horizonYears),
      });
}

export interface HazardMapLegendProps {
  readonly tr: Translator;
  readonly description: MapDescription;
  /** Undefined when no point has a value (every one below the computed curve). */
  readonly classes?: LayerClasses;
  readonly geojsonUrl: string;
  /** Id of the summary, which the map's SVG names as its description. */
  readonly summaryId: string;
}

/**
 * The legend of a hazard-map layer in words: what it shows with its unit and return period,
 * each class with its shade and how many grid points it holds, the cells left clear, the one
 * Vs30 of the grid, the caution, and a summary of the range with the GeoJSON to download
 * (the layer's text alternative).
 */
export function HazardMapLegend(props: HazardMapLegendProps) {
  const { tr, description: d, classes } = props;
  const unit = d.quantity.kind === 'chance' ? 'probability' : d.unit;
  const say = (v: number) => mapValueText(tr, v, unit, true);
  const label = (c: ValueClass): Child => {
    if (c.from === null && c.to === null)
      return tr.text('hazardMap.class.between', {
        from: mapValueText(tr, classes?.min ?? 0, unit, false),
        to: mapValueText(tr, classes?.max ?? 0, unit, false),
      });
    if (c.from === null) return tr.text('hazardMap.class.below', { to: say(c.to as number) });
    if (c.to === null) return tr.text('hazardMap.class.from', { from: say(c.from) });
    return tr.text('hazardMap.class.between', { from: say(c.from), to: say(c.to) });
  };
  return (
    <div class="map-legend hazard-legend">
      <h3 class="legend-title">{mapTitle(tr, d)}</h3>
      {classes && (
        <ul class="legend-classes">
          {classes.classes.map((c, i) => (
            <li data-class={i} data-count={c.count}>
              <LegendSymbol height={16}>
                <LegendBox fill={DUSK[c.step]} stroke={MAP_COLOURS.returnPeriod} />
              </LegendSymbol>{' '}
              {label(c)} ({tr.plural('hazardMap.class.points', c.count)})
            </li>
          ))}
        </ul>
      )}
      {(classes?.clear ?? d.count) > 0 && (
        <p class="legend-note">{tr.plural('hazardMap.clear', classes?.clear ?? d.count)}</p>
      )}
      <p class="legend-note">
        {tr.text(
          d.quantity.kind === 'chance'
            ? 'hazardMap.darker.chance'
            : 'hazardMap.darker.returnPeriod',
        )}
      </p>
      <p class="legend-note">{tr.text('hazardMap.vs30', { vs30: tr.number(d.vs30) })}</p>
      <p class="legend-note" id={props.summaryId}>
        {classes
          ? tr.text('hazardMap.summary', {
              count: tr.number(d.count),
              spacing: tr.number(d.spacingKm, exactDecimals(d.spacingKm)),
              min: mapValueText(tr, classes.min, unit, false),
              max: mapValueText(tr, classes.max, unit, false),
            })
          : tr.text('hazardMap.summaryNone', {
              count: tr.number(d.count),
              spacing: tr.number(d.spacingKm, exactDecimals(d.spacingKm)),
            })}{' '}
        <a href={props.geojsonUrl}>{tr.text('hazardMap.download')}</a>
      </p>
      <p class="legend-note hazard-caution">
        <strong>{tr.text('hazardMap.caution')}</strong>
      </p>
    </div>
  );
}

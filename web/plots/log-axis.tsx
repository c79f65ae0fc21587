import type { ScaleLogarithmic } from 'd3-scale';
import { MAP_COLOURS } from '../style/palette.ts';

/**
 * Ticks of a log axis: every power of ten, and 2 and 5 times it when the axis spans three
 * decades or fewer (more would crowd the labels).
 */
export function logTicks(scale: ScaleLogarithmic<number, number>): number[] {
  const [a, b] = scale.domain() as [number, number];
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const decades = Math.log10(hi / lo);
  const steps = decades <= 3 ? [1, 2, 5] : [1];
  const ticks: number[] = [];
  for (let p = Math.floor(Math.log10(lo)); p <= Math.ceil(Math.log10(hi)); p++) {
    for (const s of steps) {
      const v = s * 10 ** p;
      if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) ticks.push(Number(v.toPrecision(3)));
    }
  }
  return ticks;
}

/** Ticks below this make an axis label every tick as a power of ten. */
export const POWER_LABELS_BELOW = 1e-3;

/**
 * Short label of a positive number for an axis, in one style per axis (`axisTicks`, the axis's
 * ticks): decimals (0.001, 0.02, 1, 10) when every tick is at least 0.001, else every tick as a
 * power of ten (10⁻⁵, 10⁻⁴, 2×10⁻⁴, 10⁰), so one axis never mixes 0.0001 with 10⁻⁵.
 */
export function tickLabel(
  value: number,
  locale: string,
  axisTicks: readonly number[] = [value],
): string {
  if (axisTicks.some((t) => t < POWER_LABELS_BELOW)) {
    const power = Math.floor(Math.log10(value) + 1e-9);
    const mantissa = Math.round(value / 10 ** power);
    return `${mantissa === 1 ? '' : `${mantissa}×`}10${superscript(power)}`;
  }
  return new Intl.NumberFormat(locale, { maximumSignificantDigits: 2 }).format(value);
}

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};
const superscript = (n: number): string =>
  [...String(n)].map((ch) => SUPERSCRIPT[ch] ?? ch).join('');

export interface AxisProps {
  readonly orientation: 'bottom' | 'left';
  readonly ticks: readonly number[];
  readonly position: (value: number) => number;
  readonly label: (value: number) => string;
  /** The other axis's extent, px: grid lines run across it. */
  readonly across: readonly [number, number];
  /** Where the axis line sits, px (y for bottom, x for left). */
  readonly at: number;
  readonly title: string;
  /** "en" when the title is English standing in for a missing translation. */
  readonly titleLang?: string | undefined;
  readonly titleAt: readonly [x: number, y: number];
}

/** An axis with ticks, grid lines, labels and a title. */
export function Axis(props: AxisProps) {
  const bottom = props.orientation === 'bottom';
  return (
    <g class={`axis axis-${props.orientation}`} font-size={12} fill={MAP_COLOURS.axis}>
      {props.ticks.map((t) => {
        const p = props.position(t);
        // A line at the tick, from one coordinate to another along the other direction: a bottom
        // axis's ticks stand at an x, a left axis's at a y.
        const tickLine = (from: number, to: number) =>
          bottom ? { x1: p, x2: p, y1: from, y2: to } : { y1: p, y2: p, x1: from, x2: to };
        return (
          <g>
            <line
              {...tickLine(props.across[0], props.across[1])}
              stroke={MAP_COLOURS.grid}
              stroke-width={1}
            />
            <line
              {...(bottom ? tickLine(props.at, props.at + 5) : tickLine(props.at - 5, props.at))}
              stroke={MAP_COLOURS.axis}
            />
            <text
              {...(bottom
                ? { x: p, y: props.at + 18, 'text-anchor': 'middle' }
                : { x: props.at - 8, y: p + 4, 'text-anchor': 'end' })}
            >
              {props.label(t)}
            </text>
          </g>
        );
      })}
      <text
        x={props.titleAt[0]}
        y={props.titleAt[1]}
        text-anchor="middle"
        font-size={13}
        transform={bottom ? undefined : `rotate(-90 ${props.titleAt[0]} ${props.titleAt[1]})`}
        lang={props.titleLang}
      >
        {props.title}
      </text>
    </g>
  );
}

import type { ScaleLogarithmic } from 'd3-scale';
import type { Child } from 'hono/jsx';
import { MAP_COLOURS } from '../style/palette.ts';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';
import { Axis, logTicks, tickLabel } from './log-axis.tsx';

/** Space around a plot's area, px: room for tick labels and the axis titles. */
export const PLOT_MARGIN = { top: 16, right: 24, bottom: 52, left: 78 } as const;

/** One axis of a plot: where its ticks go and what they and the axis are called. */
export interface FrameAxis {
  readonly ticks: readonly number[];
  readonly position: (value: number) => number;
  readonly label: (value: number) => string;
  readonly title: string;
  /** "en" when the title is English standing in for a missing translation. */
  readonly titleLang?: string | undefined;
}

/** A title in the reader's language, with the language of an English stand-in. */
export function titleText(
  tr: Translator,
  key: TextKey,
): { readonly title: string; readonly titleLang: string | undefined } {
  return { title: tr.t(key), titleLang: tr.fallbackLang(key) };
}

/**
 * A log axis of a plot: ticks at the powers of ten (and 2 and 5 times them on a short axis),
 * every label in the one style those ticks call for.
 */
export function logFrameAxis(
  tr: Translator,
  scale: ScaleLogarithmic<number, number>,
  title: TextKey,
): FrameAxis {
  const ticks = logTicks(scale);
  return {
    ticks,
    position: scale,
    label: (v) => tickLabel(v, tr.locale, ticks),
    ...titleText(tr, title),
  };
}

export interface PlotFrameProps {
  readonly width: number;
  readonly height: number;
  readonly idPrefix: string;
  readonly title: string;
  readonly titleLang?: string | undefined;
  /** A sentence a screen reader gives after the title. */
  readonly description?: { readonly text: string; readonly lang?: string | undefined };
  readonly x: FrameAxis;
  readonly y: FrameAxis;
  readonly children?: Child;
}

/**
 * The frame both plots share: the named SVG, the bottom and left axes with their grids and
 * titles, the plotted content, and the border of the plot area drawn last so it stays on top.
 */
export function PlotFrame(props: PlotFrameProps) {
  const { width, height } = props;
  const m = PLOT_MARGIN;
  const titleId = `${props.idPrefix}-title`;
  const descId = `${props.idPrefix}-desc`;
  return (
    <svg
      class="plot"
      viewBox={`0 0 ${width} ${height}`}
      width={width}
      height={height}
      role="img"
      aria-labelledby={props.description ? `${titleId} ${descId}` : titleId}
    >
      <title id={titleId} lang={props.titleLang}>
        {props.title}
      </title>
      {props.description && (
        <desc id={descId} lang={props.description.lang}>
          {props.description.text}
        </desc>
      )}
      <Axis
        orientation="bottom"
        {...props.x}
        across={[m.top, height - m.bottom]}
        at={height - m.bottom}
        titleAt={[(m.left + width - m.right) / 2, height - 10]}
      />
      <Axis
        orientation="left"
        {...props.y}
        across={[m.left, width - m.right]}
        at={m.left}
        titleAt={[18, (m.top + height - m.bottom) / 2]}
      />
      {props.children}
      <rect
        x={m.left}
        y={m.top}
        width={width - m.left - m.right}
        height={height - m.top - m.bottom}
        fill="none"
        stroke={MAP_COLOURS.axis}
      />
    </svg>
  );
}

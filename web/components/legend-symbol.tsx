import type { Child } from 'hono/jsx';

/**
 * The small picture at the start of a legend entry, 28 px wide. Hidden from screen readers:
 * the entry's words say what it stands for.
 */
export function LegendSymbol(props: {
  /** 16 px for the maps' legends, 12 px for the plots' (their symbols are lines and dots). */
  readonly height: 12 | 16;
  readonly children?: Child;
}) {
  return (
    <svg
      class="legend-symbol"
      viewBox={`0 0 28 ${props.height}`}
      width="28"
      height={String(props.height)}
      aria-hidden="true"
      focusable="false"
    >
      {props.children}
    </svg>
  );
}

/** A filled box inside a 16 px `LegendSymbol`: an area of the map, or a class of values. */
export function LegendBox(props: {
  readonly fill: string | undefined;
  readonly stroke: string;
  readonly fillOpacity?: number;
  readonly strokeDasharray?: string;
}) {
  return (
    <rect
      x={1}
      y={1}
      width={26}
      height={14}
      fill={props.fill}
      fill-opacity={props.fillOpacity}
      stroke={props.stroke}
      stroke-dasharray={props.strokeDasharray}
    />
  );
}

/**
 * A line across the middle of a `LegendSymbol` of that height: a fault or a contour on the maps
 * (2 px short of either side), a curve or a marked value on the plots (1 px short).
 */
export function LegendLine(props: {
  readonly height: 12 | 16;
  readonly stroke: string | undefined;
  readonly strokeWidth?: number;
  readonly strokeDasharray?: string | undefined;
}) {
  const inset = props.height === 16 ? 2 : 1;
  const y = props.height / 2;
  return (
    <line
      x1={inset}
      y1={y}
      x2={28 - inset}
      y2={y}
      stroke={props.stroke}
      stroke-width={props.strokeWidth}
      stroke-dasharray={props.strokeDasharray}
    />
  );
}

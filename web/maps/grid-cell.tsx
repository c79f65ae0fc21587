/**
 * One square cell of a gridded layer, centred on its grid point (x, y, px). Drawn 0.6 px wider
 * than the grid spacing so that neighbouring cells overlap and no hairline of the base map shows
 * between them.
 */
export function GridCell(props: {
  readonly x: number;
  readonly y: number;
  /** The grid spacing on the map, px. */
  readonly sidePx: number;
  readonly fill: string | undefined;
  /** The value class the cell is coloured by, for the hazard layer's legend and tests. */
  readonly valueClass?: number;
}) {
  const { x, y, sidePx } = props;
  return (
    <rect
      x={(x - sidePx / 2).toFixed(1)}
      y={(y - sidePx / 2).toFixed(1)}
      width={(sidePx + 0.6).toFixed(1)}
      height={(sidePx + 0.6).toFixed(1)}
      fill={props.fill}
      data-class={props.valueClass}
    />
  );
}

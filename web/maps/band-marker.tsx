import { INK, PAPER } from '../style/palette.ts';
import type { BandStyle } from '../style/palette.ts';

interface MarkerProps {
  readonly shape: BandStyle['shape'];
  readonly fill: string;
  readonly size: number;
  readonly x?: number;
  readonly y?: number;
  /**
   * A wide paper-white rim under the outline, for markers drawn over a coloured layer (a hazard
   * map uses the same colour scale as the bands, where a bare marker would vanish).
   */
  readonly halo?: boolean;
}

/** A community marker centred on (0, 0) in the band's shape; `size` is about its half-width. */
export function BandMarker(props: MarkerProps) {
  if (!props.halo) return <MarkerShape {...props} stroke={INK} strokeWidth={1.2} />;
  return (
    <>
      <MarkerShape {...props} fill="none" stroke={PAPER} strokeWidth={4.5} />
      <MarkerShape {...props} stroke={INK} strokeWidth={1.5} />
    </>
  );
}

function MarkerShape(
  props: MarkerProps & { readonly stroke: string; readonly strokeWidth: number },
) {
  const { size: s, fill } = props;
  const x = props.x ?? 0;
  const y = props.y ?? 0;
  const common = {
    fill,
    stroke: props.stroke,
    'stroke-width': props.strokeWidth,
    'stroke-linejoin': 'round' as const,
  };
  switch (props.shape) {
    case 'circle':
      return <circle cx={x} cy={y} r={s * 0.9} {...common} />;
    case 'square':
      return <rect x={x - s * 0.8} y={y - s * 0.8} width={s * 1.6} height={s * 1.6} {...common} />;
    case 'diamond':
      return (
        <polygon points={`${x},${y - s} ${x + s},${y} ${x},${y + s} ${x - s},${y}`} {...common} />
      );
    case 'triangle':
      return (
        <polygon
          points={`${x},${y - s} ${x + s},${y + s * 0.8} ${x - s},${y + s * 0.8}`}
          {...common}
        />
      );
  }
}

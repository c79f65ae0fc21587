import { INK } from '../style/palette.ts';
import type { BandStyle } from '../style/palette.ts';

/** A community marker centred on (0, 0) in the band's shape; `size` is about its half-width. */
export function BandMarker(props: { readonly shape: BandStyle['shape']; readonly fill: string; readonly size: number; readonly x?: number; readonly y?: number }) {
  const { size: s, fill } = props;
  const x = props.x ?? 0;
  const y = props.y ?? 0;
  const common = { fill, stroke: INK, 'stroke-width': 1.2 };
  switch (props.shape) {
    case 'circle':
      return <circle cx={x} cy={y} r={s * 0.9} {...common} />;
    case 'square':
      return <rect x={x - s * 0.8} y={y - s * 0.8} width={s * 1.6} height={s * 1.6} {...common} />;
    case 'diamond':
      return <polygon points={`${x},${y - s} ${x + s},${y} ${x},${y + s} ${x - s},${y}`} {...common} />;
    case 'triangle':
      return <polygon points={`${x},${y - s} ${x + s},${y + s * 0.8} ${x - s},${y + s * 0.8}`} {...common} />;
  }
}

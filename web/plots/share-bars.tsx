import type { Child } from 'hono/jsx';
import { DUSK, INK } from '../style/palette.ts';
import type { Translator } from '../text/translator.ts';

export interface ShareBar {
  readonly label: Child;
  /** Share in [0, 1]. */
  readonly share: number;
}

/**
 * A plain bar list: each row's name, a bar as long as its share and the percentage in words
 * beside it, so the bar only repeats what the text says.
 */
export function ShareBars(props: {
  readonly tr: Translator;
  readonly bars: readonly ShareBar[];
  /** The id of the heading that names the list. */ readonly labelledBy: string;
}) {
  const { tr } = props;
  const barWidth = 260;
  return (
    <ul class="share-bars" aria-labelledby={props.labelledBy}>
      {props.bars.map((b) => (
        <li>
          <span class="share-name">{b.label}</span>
          <svg
            class="share-bar"
            viewBox={`0 0 ${barWidth} 14`}
            width={barWidth}
            height="14"
            aria-hidden="true"
            focusable="false"
          >
            <rect x={0} y={1} width={barWidth} height={12} fill={DUSK[0]} stroke={DUSK[2]} />
            <rect
              x={0}
              y={1}
              width={Math.max(1, b.share * barWidth)}
              height={12}
              fill={DUSK[5]}
              stroke={INK}
              stroke-width={0.5}
            />
          </svg>
          <span class="share-value">
            {tr.text('chance.percent', { p: tr.number(Math.round(b.share * 100)) })}
          </span>
        </li>
      ))}
    </ul>
  );
}

import type { Child } from 'hono/jsx';
import type { Translator } from '../text/translator.ts';

/**
 * A plot's legend: its entries (children, one `li` each) in a list named by a hidden element
 * rather than aria-label, which cannot mark an English stand-in's language.
 */
export function PlotLegend(props: {
  readonly tr: Translator;
  /** The id of the hidden name, unique on the page. */
  readonly nameId: string;
  readonly children?: Child;
}) {
  return (
    <>
      <span id={props.nameId} hidden>
        {props.tr.text('plot.legend')}
      </span>
      <ul class="plot-legend" aria-labelledby={props.nameId}>
        {props.children}
      </ul>
    </>
  );
}

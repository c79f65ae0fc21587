import type { NearestFault } from '../../api/engine/results.ts';
import type { Translator } from '../text/translator.ts';

/** The faults nearest a community, each named with its distance, direction and depth below. */
export function NearestFaults(props: {
  readonly tr: Translator;
  readonly faults: readonly NearestFault[];
}) {
  const { tr } = props;
  return (
    <ul class="faults">
      {props.faults.map((f) => (
        <li data-source={f.sourceId}>
          <strong>{f.name}</strong>: {tr.place(f.distanceKm, f.bearingDeg, f.depthBelowKm)}
        </li>
      ))}
    </ul>
  );
}

import type { Study } from '../../api/engine/model.ts';
import type { HazardCurve } from '../../api/engine/results.ts';
import { INTENSITY_MEASURE } from '../../api/engine/intensity/site-intensity.ts';
import type { CommunityPageData } from '../data/community-data.ts';
import type { Translator } from '../text/translator.ts';
import { HazardCurvePlot } from './hazard-curve-plot.tsx';

/**
 * A community's hazard curve of the screening's intensity measure (`curve`, taken from `result`
 * by the caller, which shows nothing without it), with the levels at the study's return periods
 * marked: the same picture on the community page and as a slide.
 */
export function CommunityCurvePlot(props: {
  readonly tr: Translator;
  readonly study: Study;
  readonly result: CommunityPageData['result'];
  readonly curve: HazardCurve;
  readonly width?: number;
  readonly height?: number;
}) {
  const { study, result } = props;
  const levels = Object.fromEntries(
    study.settings.returnPeriodsYears.map((t) => [
      String(t),
      result.atReturnPeriod[String(t)]?.[INTENSITY_MEASURE] ?? null,
    ]),
  );
  return (
    <HazardCurvePlot
      tr={props.tr}
      curve={props.curve}
      returnPeriodsYears={study.settings.returnPeriodsYears}
      levelsAtReturnPeriods={levels}
      idPrefix="curve"
      width={props.width}
      height={props.height}
    />
  );
}

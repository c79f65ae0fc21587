import { normalSurvival } from '../hazard/normal-cdf.ts';
import { compensatedSum } from '../summation.ts';
import { mmiFromMotion, type IntensityConversion } from './worden2012.ts';

/**
 * Log-spaced steps each interval between two levels of a hazard curve is cut into. The curve is
 * read log–log inside an interval (as curve-interpolation.ts reads it); with 16 steps the sum
 * agrees with a closed form (test/engine/intensity/site-intensity.test.ts) and with an
 * independent sum by parts on 20 000 steps (test/engine/screen-study.test.ts) within 0.5% and 0.1%.
 */
const STEPS_PER_INTERVAL = 16;

/**
 * Annual rate at which intensity reaches `mmiThreshold`, with the scatter of the conversion:
 * the hazard curve of the conversion's measure convolved with the chance that MMI, normal about
 * the relation's median with its σ (Worden et al. 2012, Table 1), is at least the threshold:
 *
 *   λ(MMI ≥ m) = ∫ P(MMI ≥ m | y) |dλ(y)|
 *
 * (the total-probability sum of classical PSHA, Cornell 1968, with the conversion's scatter in
 * place of the ground-motion model's). Motions between two levels are summed in log-spaced
 * steps, each step's rate drop at its geometric middle; motions above the highest level count
 * at the highest level and motions below the lowest not at all, so the result is a lower bound
 * when the curve is cut short at either end. Not the clamped median alone: MMI held to 1–10
 * (worden2012.ts) is used as the median, its scatter unclamped.
 */
export function annualRateOfReachingMmi(
  levels: readonly number[],
  annualRate: readonly number[],
  mmiThreshold: number,
  conversion: IntensityConversion,
): number {
  const { gmice, toRelationUnits } = conversion;
  const chance = (y: number): number =>
    normalSurvival((mmiThreshold - mmiFromMotion(y * toRelationUnits, gmice)) / gmice.sigmaMmi);
  const parts: number[] = [];
  for (let k = 0; k + 1 < levels.length; k++) {
    const y0 = levels[k] as number,
      y1 = levels[k + 1] as number;
    const r0 = annualRate[k] as number,
      r1 = annualRate[k + 1] as number;
    if (!(r0 > r1)) continue;
    const rateAt = (y: number): number => {
      if (r1 > 0) return r0 * Math.exp((Math.log(r1 / r0) * Math.log(y / y0)) / Math.log(y1 / y0));
      return r0 + ((r1 - r0) * Math.log(y / y0)) / Math.log(y1 / y0);
    };
    let previous = r0;
    for (let s = 1; s <= STEPS_PER_INTERVAL; s++) {
      const ya = y0 * (y1 / y0) ** ((s - 1) / STEPS_PER_INTERVAL);
      const yb = y0 * (y1 / y0) ** (s / STEPS_PER_INTERVAL);
      const next = s === STEPS_PER_INTERVAL ? r1 : rateAt(yb);
      parts.push((previous - next) * chance(Math.sqrt(ya * yb)));
      previous = next;
    }
  }
  const top = levels.length - 1;
  if (top >= 0) parts.push((annualRate[top] as number) * chance(levels[top] as number));
  return compensatedSum(parts);
}

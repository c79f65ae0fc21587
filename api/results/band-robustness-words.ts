import { SCREENING_BANDS } from '../engine/intensity/screening-band.ts';
import type { BandHinge, BandRobustness } from '../engine/results.ts';

/** A logic-tree choice in words (English; the pages take theirs from the text bundles). */
const CHOICE_WORDS: Readonly<Record<string, string>> = {
  groundMotion: 'ground-motion model',
  mMax: 'maximum magnitude',
  bValue: 'b-value',
  shape: 'magnitude–frequency shape',
  slipRateMmYr: 'slip rate',
  rate: 'earthquake rate',
};

const bandLabel = (id: string): string => SCREENING_BANDS.find((b) => b.id === id)?.label ?? id;
const percent = (share: number): string => `${Math.round(share * 100)}%`;

/** "Refer first 42%, Refer soon 58%": the bands holding any weight, highest band first. */
export function bandSharesText(robustness: BandRobustness): string {
  return SCREENING_BANDS.filter((b) => (robustness.bandShares[b.id] ?? 0) >= 0.005)
    .map((b) => `${b.label} ${percent(robustness.bandShares[b.id]!)}`)
    .join(', ');
}

/** "Vennick Fault's magnitude–frequency shape" or "the crustal ground-motion model". */
export function hingeSubject(hinge: BandHinge): string {
  const choice = CHOICE_WORDS[hinge.choice] ?? hinge.choice;
  return hinge.sourceName ? `${hinge.sourceName}'s ${choice}` : `the ${hinge.setting} ${choice}`;
}

/** "gutenberg-richter: Refer first (MMI 8.1); characteristic: Refer soon (MMI 7.8)". */
export function hingeAlternativesText(hinge: BandHinge): string {
  return hinge.alternatives
    .map(
      (a) =>
        `${a.value}: ${bandLabel(a.bandId)} (MMI ${a.mmi475 === null ? 'below the curve' : a.mmi475.toFixed(1)})`,
    )
    .join('; ');
}

/**
 * One line for a planner: where the logic tree's weight falls and what the band hinges on
 * most, e.g. "Refer first 42%, Refer soon 58%; hinges most on Vennick Fault's
 * magnitude–frequency shape (gutenberg-richter: Refer first (MMI 8.1); …)".
 */
export function robustnessLine(robustness: BandRobustness): string {
  const first = robustness.hinges[0];
  const shares = bandSharesText(robustness);
  if (!first || first.mmiShift === 0) return `${shares}; no single choice moves it`;
  const verb = first.changesBand ? 'hinges most on' : 'stays in its band; moved most by';
  return `${shares}; ${verb} ${hingeSubject(first)} (${hingeAlternativesText(first)})`;
}

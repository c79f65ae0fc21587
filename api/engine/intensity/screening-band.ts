import type { ScreeningBand } from '../results.ts';

/**
 * A community's screening band from its 475-year MMI: how soon it should be referred for a
 * professional assessment. Thresholds in one place; ids and labels are the product's own.
 * A 475-year level below the lowest computed level (mmi475 null) is the quietest band.
 */
export const SCREENING_BANDS = [
  { id: 'refer-first', label: 'Refer first', minMmi: 8 },
  { id: 'refer-soon', label: 'Refer soon', minMmi: 7 },
  { id: 'prepare', label: 'Prepare and inform', minMmi: 6 },
  { id: 'inform', label: 'Inform', minMmi: -Infinity },
] as const;

export type ScreeningBandId = (typeof SCREENING_BANDS)[number]['id'];

/** The band for a 475-year MMI; `bandMmi` (a bound, when mmi475 is unknown) overrides for the choice. */
export function screeningBand(
  mmi475: number | null,
  bandMmi: number | null = mmi475,
): ScreeningBand {
  const mmi = bandMmi ?? -Infinity;
  const band = SCREENING_BANDS.find((b) => mmi >= b.minMmi) ?? SCREENING_BANDS[3];
  return { id: band.id, label: band.label, mmi475 };
}

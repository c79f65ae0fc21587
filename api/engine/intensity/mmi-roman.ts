const NUMERALS = [
  'I',
  'II',
  'III',
  'IV',
  'V',
  'VI',
  'VII',
  'VIII',
  'IX',
  'X',
  'XI',
  'XII',
] as const;

/**
 * The Modified Mercalli level of an intensity, as a Roman numeral: MMI rounded to the nearest
 * whole level (6.97 is VII; observed intensities are whole levels, and a relation such as
 * Worden et al. 2012 is fitted to them as numbers, so a value names the level it is nearest),
 * held to I–XII.
 */
export function mmiRoman(mmi: number): string {
  const level = Math.min(12, Math.max(1, Math.round(mmi)));
  return NUMERALS[level - 1] as string;
}

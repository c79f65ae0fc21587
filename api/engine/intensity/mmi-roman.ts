const NUMERALS = ['I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X', 'XI', 'XII'] as const;

/**
 * The Modified Mercalli level an intensity has reached, as a Roman numeral: MMI rounded down
 * (6.8 has reached VI, not VII; common practice for naming a level that is reached), held to I–XII.
 */
export function mmiRoman(mmi: number): string {
  const level = Math.min(12, Math.max(1, Math.floor(mmi)));
  return NUMERALS[level - 1] as string;
}

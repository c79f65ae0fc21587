import { mmiRoman } from '../../api/engine/intensity/mmi-roman.ts';

/**
 * An MMI value as the pages name it. The level is the one reached (rounded down, as mmiRoman
 * and the screening bands count it: 6.97 has reached VI, and its band is the band of VI); from
 * halfway to the next level it is said to be almost there ("VI, almost VII"), so that a value
 * of 6.97 is not read as a plain VI. Common practice for naming a reached level; the halfway
 * point is ours.
 */
export interface IntensityWords {
  /** The level reached, I–XII. */
  readonly roman: string;
  /** The next level, when the value is at least halfway to it (never above XII). */
  readonly almost?: string;
  /** The level reached as a number 1–12 (for its description). */
  readonly level: number;
}

export function intensityWords(mmi: number): IntensityWords {
  if (!Number.isFinite(mmi)) throw new RangeError(`expected a finite MMI, got ${mmi}`);
  const level = Math.min(12, Math.max(1, Math.floor(mmi)));
  const roman = mmiRoman(level);
  return mmi - level >= 0.5 && level < 12
    ? { roman, almost: mmiRoman(level + 1), level }
    : { roman, level };
}

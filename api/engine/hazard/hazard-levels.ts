import { InvalidInput } from '../errors.ts';
import type { Measure } from '../motion/measure.ts';

/**
 * Hazard-curve levels. When a study gives none for a measure: 25 levels log-spaced over
 * 0.001–3 g for PGA and SA, 0.1–300 cm/s for PGV (wide enough for the 475- and 2475-year values
 * of quiet and active regions alike; common practice), each rounded to 3 significant figures
 * so the numbers read cleanly. Spacing is a factor of about 1.4, fine enough for log–log
 * interpolation between levels.
 */
export const DEFAULT_LEVEL_COUNT = 25;
const ACCELERATION_RANGE_G: readonly [number, number] = [0.001, 3];
const VELOCITY_RANGE_CMS: readonly [number, number] = [0.1, 300];

/** The default levels for a measure: g for PGA and SA, cm/s for PGV. */
export function defaultLevels(measure: Measure): number[] {
  const [low, high] = measure.kind === 'PGV' ? VELOCITY_RANGE_CMS : ACCELERATION_RANGE_G;
  const ratio = Math.log(high / low) / (DEFAULT_LEVEL_COUNT - 1);
  return Array.from({ length: DEFAULT_LEVEL_COUNT }, (_, i) =>
    Number((low * Math.exp(ratio * i)).toPrecision(3)),
  );
}

/**
 * The study's levels for `measureText` (its key in settings.levels) or the defaults; refused
 * unless finite, positive and strictly increasing.
 */
export function levelsFor(
  given: Readonly<Record<string, readonly number[]>>,
  measureText: string,
  measure: Measure,
): number[] {
  const levels = given[measureText];
  if (levels === undefined) return defaultLevels(measure);
  const path = `settings.levels.${measureText}`;
  if (levels.length === 0)
    throw new InvalidInput([{ path, message: 'expected at least one level' }]);
  levels.forEach((level, i) => {
    if (!(Number.isFinite(level) && level > 0)) {
      throw new InvalidInput([
        { path: `${path}[${i}]`, message: `expected a positive number, got ${level}` },
      ]);
    }
    const previous = levels[i - 1];
    if (previous !== undefined && !(level > previous)) {
      throw new InvalidInput([
        {
          path: `${path}[${i}]`,
          message: `expected levels increasing, got ${level} after ${previous}`,
        },
      ]);
    }
  });
  return [...levels];
}

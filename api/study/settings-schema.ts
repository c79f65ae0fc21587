import { z } from 'zod';
import type { Settings } from '../engine/model.ts';
import { parseMeasure } from '../engine/motion/measure.ts';
import { TremoraError } from '../engine/errors.ts';
import { describeValue, listOf, numberIn } from './fields.ts';
import type { IssueList } from './issues.ts';

/** Settings used where a study gives none (DESIGN.md section 2). */
export const DEFAULT_SETTINGS: Settings = {
  measures: ['PGA', 'SA(0.2)', 'SA(1.0)', 'PGV'],
  levels: {},
  horizonsYears: [1, 30, 50],
  returnPeriodsYears: [475, 2475],
  truncationSigma: 3,
  maxDistanceKm: 300,
  magnitudeStep: 0.1,
  ruptureSpacingKm: 5,
  zoneCellKm: 10,
};

const positive = (max: number, unit: string) => numberIn({ min: 0, minOpen: true, max, unit });

const settingsSchema = z.object({
  measures: listOf(
    z.string({
      error: (i) =>
        `expected a measure name such as "PGA" or "SA(0.2)", got ${describeValue(i.input)}`,
    }),
    1,
    12,
    'measures',
  ).optional(),
  levels: z
    .record(z.string(), listOf(positive(100_000, '(g, or cm/s for PGV)'), 2, 100, 'levels'))
    .optional(),
  horizonsYears: listOf(positive(10_000, 'years'), 1, 10, 'horizons').optional(),
  returnPeriodsYears: listOf(
    numberIn({ min: 1, max: 1e6, unit: 'years' }),
    1,
    10,
    'return periods',
  ).optional(),
  /** 0 gives median-only motions; beyond 6 sigma the normal tail adds nothing a screening needs. */
  truncationSigma: numberIn({ min: 0, max: 6, unit: 'sigma' }).optional(),
  maxDistanceKm: numberIn({ min: 0, minOpen: true, max: 1000, unit: 'km' }).optional(),
  magnitudeStep: numberIn({ min: 0.01, max: 0.5, unit: 'magnitude units' }).optional(),
  ruptureSpacingKm: numberIn({ min: 0.5, max: 50, unit: 'km' }).optional(),
  zoneCellKm: numberIn({ min: 1, max: 100, unit: 'km' }).optional(),
  intensityMeasure: z
    .enum(['PGA', 'PGV'], {
      error: (i) =>
        `expected "PGA" or "PGV" (the Worden et al. 2012 relation intensity is read from), got ${describeValue(i.input)}`,
    })
    .optional(),
  fractiles: listOf(
    numberIn({ min: 0, max: 1, minOpen: true, maxOpen: true }),
    1,
    9,
    'fractiles (each in (0, 1))',
  ).optional(),
});

export const SETTINGS_KEYS = Object.keys(settingsSchema.shape);

/** Validates `settings` (absent: all defaults); measures must parse and levels must increase. */
export function readSettings(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): Settings | undefined {
  if (raw === undefined) return DEFAULT_SETTINGS;
  issues.warnUnknownKeys(raw, SETTINGS_KEYS, path);
  const parsed = issues.parse(settingsSchema, raw, path);
  if (!parsed) return undefined;
  const measures = parsed.measures ?? DEFAULT_SETTINGS.measures;
  let ok = true;
  measures.forEach((m, i) => {
    try {
      parseMeasure(m);
    } catch (error) {
      if (!(error instanceof TremoraError)) throw error;
      issues.add([...path, 'measures', i], error.message);
      ok = false;
    }
    if (measures.indexOf(m) !== i) {
      issues.add([...path, 'measures', i], `"${m}" is listed twice; expected each measure once`);
      ok = false;
    }
  });
  for (const [measure, levels] of Object.entries(parsed.levels ?? {})) {
    if (!measures.includes(measure)) {
      issues.add(
        [...path, 'levels', measure],
        `levels for a measure not in settings.measures; expected one of ${measures.join(', ')}`,
      );
      ok = false;
    }
    for (let i = 1; i < levels.length; i++) {
      if ((levels[i] as number) <= (levels[i - 1] as number)) {
        issues.add(
          [...path, 'levels', measure, i],
          `expected levels in increasing order, got ${levels[i]} after ${levels[i - 1]}`,
        );
        ok = false;
        break;
      }
    }
  }
  const sortedUnique = (xs: readonly number[]) => [...new Set(xs)].sort((a, b) => a - b);
  return ok
    ? {
        measures,
        levels: parsed.levels ?? {},
        horizonsYears: sortedUnique(parsed.horizonsYears ?? DEFAULT_SETTINGS.horizonsYears),
        returnPeriodsYears: sortedUnique(
          parsed.returnPeriodsYears ?? DEFAULT_SETTINGS.returnPeriodsYears,
        ),
        truncationSigma: parsed.truncationSigma ?? DEFAULT_SETTINGS.truncationSigma,
        maxDistanceKm: parsed.maxDistanceKm ?? DEFAULT_SETTINGS.maxDistanceKm,
        magnitudeStep: parsed.magnitudeStep ?? DEFAULT_SETTINGS.magnitudeStep,
        ruptureSpacingKm: parsed.ruptureSpacingKm ?? DEFAULT_SETTINGS.ruptureSpacingKm,
        zoneCellKm: parsed.zoneCellKm ?? DEFAULT_SETTINGS.zoneCellKm,
        ...(parsed.intensityMeasure ? { intensityMeasure: parsed.intensityMeasure } : {}),
        ...(parsed.fractiles ? { fractiles: sortedUnique(parsed.fractiles) } : {}),
      }
    : undefined;
}

import { z } from 'zod';
import { InvalidInput } from '../engine/errors.ts';
import { parseMeasure } from '../engine/motion/measure.ts';
import { numberIn } from '../study/fields.ts';
import { IssueList } from '../study/issues.ts';
import type { MapRequest } from '../workers/messages.ts';

/** Keys a map request may have. */
export const MAP_KEYS = [
  'measure',
  'returnPeriodYears',
  'level',
  'horizonYears',
  'spacingKm',
  'vs30',
  'bounds',
] as const;

const mapSchema = z.object({
  measure: z.string().optional(),
  returnPeriodYears: numberIn({ min: 1, max: 1e6, unit: 'years' }).optional(),
  level: numberIn({ min: 1e-6, max: 1e4, unit: '(g; PGV cm/s)' }).optional(),
  horizonYears: numberIn({ min: 1, max: 1e4, unit: 'years' }).optional(),
  // Finer than 0.5 km adds points without detail at screening scale; the engine caps the count.
  spacingKm: numberIn({ min: 0.5, max: 200, unit: 'km' }),
  vs30: numberIn({ min: 50, max: 5000, unit: 'm/s' }).optional(),
  bounds: z
    .tuple([
      numberIn({ min: -540, max: 540, unit: 'degrees' }),
      numberIn({ min: -90, max: 90, unit: 'degrees' }),
      numberIn({ min: -540, max: 540, unit: 'degrees' }),
      numberIn({ min: -90, max: 90, unit: 'degrees' }),
    ])
    .optional(),
});

/**
 * Validates a map request: the measure (PGA by default), a return period or a level with a
 * horizon, the spacing, and optionally the Vs30 of every point and a box [west, south, east,
 * north] in degrees. Throws InvalidInput listing every problem.
 */
export function readMapRequest(raw: Record<string, unknown>): MapRequest {
  const issues = new IssueList();
  for (const key of Object.keys(raw)) {
    if (!(MAP_KEYS as readonly string[]).includes(key))
      issues.add([key], `unknown key; expected one of ${MAP_KEYS.join(', ')}`);
  }
  const fields = issues.parse(mapSchema, raw, []);
  // The measure is read from the raw request, so it is checked even when another field is bad.
  const measure = typeof raw.measure === 'string' ? raw.measure : (fields?.measure ?? 'PGA');
  try {
    parseMeasure(measure);
  } catch (error) {
    issues.add(['measure'], (error as Error).message);
  }
  // Which quantity is asked for is read from the keys given, so it is checked even when a value is bad.
  const byReturnPeriod = raw.returnPeriodYears !== undefined;
  const byChance = raw.level !== undefined || raw.horizonYears !== undefined;
  if (byReturnPeriod === byChance)
    issues.add(
      ['returnPeriodYears'],
      'expected returnPeriodYears, or level with horizonYears (not both)',
    );
  else if (byChance && (raw.level === undefined || raw.horizonYears === undefined))
    issues.add(
      [raw.level === undefined ? 'level' : 'horizonYears'],
      'expected level and horizonYears together',
    );
  if (issues.issues.length > 0 || !fields)
    throw new InvalidInput(issues.issues, 'invalid map request');
  return {
    measure,
    quantity: byReturnPeriod
      ? { kind: 'return-period', returnPeriodYears: fields.returnPeriodYears! }
      : { kind: 'chance', level: fields.level!, horizonYears: fields.horizonYears! },
    spacingKm: fields.spacingKm,
    ...(fields.vs30 === undefined ? {} : { vs30: fields.vs30 }),
    ...(fields.bounds === undefined ? {} : { bounds: fields.bounds }),
  };
}

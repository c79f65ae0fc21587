import { z } from 'zod';
import type { Recurrence } from '../engine/model.ts';
import { describeValue, numberIn, oneOf } from './fields.ts';
import type { IssueList } from './issues.ts';
import { CHARACTERISTIC_BOX_WIDTH } from '../engine/recurrence/characteristic.ts';
import { readAlternatives } from './alternatives-schema.ts';

/** Moment magnitude bounds accepted anywhere in a study. */
const MAGNITUDE = { min: 0, max: 10 } as const;
/** Exclusive bounds on b: outside (0.3, 2.5) a b-value is almost surely a typo. */
const B_VALUE = { min: 0.3, max: 2.5, minOpen: true, maxOpen: true } as const;

export const RECURRENCE_TYPES = ['gutenberg-richter', 'moment-balanced', 'fixed'] as const;

const grSchema = z.object({
  type: z.literal('gutenberg-richter'),
  bValue: numberIn(B_VALUE),
  mMin: numberIn(MAGNITUDE),
  mMax: numberIn(MAGNITUDE),
  aValue: numberIn({ min: -10, max: 15 }).optional(),
  rate: numberIn({ min: 0, minOpen: true, max: 1e6, unit: 'per year' }).optional(),
});

const momentSchema = z.object({
  type: z.literal('moment-balanced'),
  slipRateMmYr: numberIn({ min: 0, minOpen: true, max: 200, unit: 'mm/yr' }),
  bValue: numberIn(B_VALUE),
  mMin: numberIn(MAGNITUDE),
  mMax: numberIn(MAGNITUDE),
  shape: oneOf(['gutenberg-richter', 'characteristic'] as const).optional(),
  shearModulusPa: numberIn({ min: 1e9, max: 1e11, unit: 'Pa' }).optional(),
});

const fixedSchema = z.object({
  type: z.literal('fixed'),
  magnitude: numberIn(MAGNITUDE),
  rate: numberIn({ min: 0, minOpen: true, max: 1e6, unit: 'per year' }),
});

/** `alternatives` (the source's logic tree) is read by alternatives-schema.ts. */
const KEYS: Record<(typeof RECURRENCE_TYPES)[number], readonly string[]> = {
  'gutenberg-richter': [...Object.keys(grSchema.shape), 'alternatives'],
  'moment-balanced': [...Object.keys(momentSchema.shape), 'alternatives'],
  fixed: [...Object.keys(fixedSchema.shape), 'alternatives'],
};

/** Shear modulus when a moment-balanced source gives none, Pa (DESIGN.md section 3). */
export const DEFAULT_SHEAR_MODULUS_PA = 3.0e10;

/**
 * Validates one recurrence at `path`. `isFault` says whether the source has a fault surface,
 * which moment balancing needs.
 */
export function readRecurrence(
  raw: unknown,
  isFault: boolean,
  issues: IssueList,
  path: readonly PropertyKey[],
  sourceId = '?',
): Recurrence | undefined {
  const single = readSingleRecurrence(raw, isFault, issues, path);
  const given = (raw as { alternatives?: unknown } | null)?.alternatives;
  if (!single || given === undefined) return single;
  const alternatives = readAlternatives(given, single, sourceId, issues, path);
  return alternatives ? { ...single, alternatives } : undefined;
}

/** One recurrence without its alternatives. */
function readSingleRecurrence(
  raw: unknown,
  isFault: boolean,
  issues: IssueList,
  path: readonly PropertyKey[],
): Recurrence | undefined {
  const type = (raw as { type?: unknown } | null)?.type;
  if (typeof raw !== 'object' || raw === null || !RECURRENCE_TYPES.includes(type as never)) {
    const got = typeof raw === 'object' && raw !== null ? describeValue(type) : describeValue(raw);
    issues.add(
      [...path, 'type'],
      `expected one of ${RECURRENCE_TYPES.map((t) => `"${t}"`).join(', ')}, got ${got}`,
    );
    return undefined;
  }
  const kind = type as (typeof RECURRENCE_TYPES)[number];
  issues.warnUnknownKeys(raw, KEYS[kind], path);
  if (kind === 'fixed') return issues.parse(fixedSchema, raw, path);

  const parsed = issues.parse(kind === 'gutenberg-richter' ? grSchema : momentSchema, raw, path);
  if (!parsed) return undefined;
  if (parsed.mMin >= parsed.mMax) {
    issues.add(
      [...path, 'mMax'],
      `expected mMax greater than mMin (${parsed.mMin}), got ${parsed.mMax}`,
    );
    return undefined;
  }
  if (parsed.type === 'gutenberg-richter') {
    if ((parsed.aValue === undefined) === (parsed.rate === undefined)) {
      issues.add(
        [...path, 'aValue'],
        'expected exactly one of aValue (log10 annual rate of M >= 0) or rate (annual rate of M >= mMin)',
      );
      return undefined;
    }
    return parsed;
  }
  if (!isFault) {
    issues.add(
      [...path, 'type'],
      'moment-balanced recurrence needs a fault surface; expected a LineString source, or use "gutenberg-richter"',
    );
    return undefined;
  }
  const shape = parsed.shape ?? 'gutenberg-richter';
  if (shape === 'characteristic' && parsed.mMax - parsed.mMin <= CHARACTERISTIC_BOX_WIDTH) {
    issues.add(
      [...path, 'mMin'],
      `the characteristic shape (Youngs & Coppersmith 1985) needs mMax - mMin > ${CHARACTERISTIC_BOX_WIDTH}, got ${(parsed.mMax - parsed.mMin).toFixed(2)}`,
    );
    return undefined;
  }
  return { ...parsed, shape, shearModulusPa: parsed.shearModulusPa ?? DEFAULT_SHEAR_MODULUS_PA };
}

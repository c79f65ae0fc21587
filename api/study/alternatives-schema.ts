import { z } from 'zod';
import type { Recurrence, RecurrenceAlternatives } from '../engine/model.ts';
import { CHARACTERISTIC_BOX_WIDTH } from '../engine/recurrence/characteristic.ts';
import {
  MAX_SOURCE_VARIANTS,
  recurrenceVariants,
  variantCount,
} from '../engine/recurrence/recurrence-variants.ts';
import { listOf, numberIn, oneOf } from './fields.ts';
import type { IssueList } from './issues.ts';

/** Weights of one parameter's alternatives must sum to 1 within this (as ground-motion branches do). */
const WEIGHT_SUM_TOLERANCE = 1e-6;
/** Alternatives one parameter may list. */
const MAX_ALTERNATIVES = 10;

const alternative = <T extends z.ZodType>(value: T) =>
  z.object({ value, weight: numberIn({ min: 0, minOpen: true, max: 1 }) });
const listed = <T extends z.ZodType>(value: T) =>
  listOf(alternative(value), 1, MAX_ALTERNATIVES, 'alternatives ({ value, weight })').optional();

const alternativesSchema = z.object({
  mMax: listed(numberIn({ min: 0, max: 10 })),
  bValue: listed(numberIn({ min: 0.3, max: 2.5, minOpen: true, maxOpen: true })),
  shape: listed(oneOf(['gutenberg-richter', 'characteristic'] as const)),
  slipRateMmYr: listed(numberIn({ min: 0, minOpen: true, max: 200, unit: 'mm/yr' })),
  rate: listed(numberIn({ min: 0, minOpen: true, max: 1e6, unit: 'per year' })),
});

/** The parameters each recurrence type may vary. */
const ALLOWED: Record<Recurrence['type'], readonly (keyof RecurrenceAlternatives)[]> = {
  'gutenberg-richter': ['mMax', 'bValue', 'rate'],
  'moment-balanced': ['mMax', 'bValue', 'shape', 'slipRateMmYr'],
  fixed: ['rate'],
};

/**
 * Validates `recurrence.alternatives` (the source-model logic tree) of a recurrence already
 * read: each parameter the type allows, weights summing to 1, every variant a valid
 * recurrence, at most MAX_SOURCE_VARIANTS variants. Messages name the source.
 */
export function readAlternatives(
  raw: unknown,
  recurrence: Recurrence,
  sourceId: string,
  issues: IssueList,
  path: readonly PropertyKey[],
): RecurrenceAlternatives | undefined {
  const at = [...path, 'alternatives'];
  const allowed = ALLOWED[recurrence.type];
  const before = issues.issues.length;
  if (typeof raw === 'object' && raw !== null)
    for (const key of Object.keys(raw))
      if (!allowed.includes(key as keyof RecurrenceAlternatives))
        issues.add(
          [...at, key],
          `source "${sourceId}": a ${recurrence.type} recurrence cannot vary "${key}"; expected alternatives for ${allowed.join(', ')}`,
        );
  const parsed = issues.parse(alternativesSchema, raw, at);
  if (!parsed || issues.issues.length > before) return undefined;
  for (const key of allowed) {
    const list = parsed[key];
    if (!list) continue;
    const sum = list.reduce((s, a) => s + a.weight, 0);
    if (Math.abs(sum - 1) > WEIGHT_SUM_TOLERANCE)
      issues.add(
        [...at, key],
        `source "${sourceId}": the weights of the ${key} alternatives sum to ${+sum.toFixed(6)}; expected 1`,
      );
  }
  if (recurrence.type === 'gutenberg-richter' && parsed.rate && recurrence.rate === undefined)
    issues.add(
      [...at, 'rate'],
      `source "${sourceId}": rate alternatives replace "rate" (annual rate of M >= mMin); this recurrence gives aValue instead`,
    );
  if (issues.issues.length > before) return undefined;
  const alternatives = parsed as RecurrenceAlternatives;
  const candidate = { ...recurrence, alternatives } as Recurrence;
  const count = variantCount(candidate);
  if (count > MAX_SOURCE_VARIANTS) {
    issues.add(
      at,
      `source "${sourceId}": the alternatives make ${count} combinations; expected at most ${MAX_SOURCE_VARIANTS}`,
    );
    return undefined;
  }
  for (const { recurrence: v } of recurrenceVariants(candidate)) {
    if (v.type === 'fixed') continue;
    if (v.mMax <= v.mMin) {
      issues.add(
        [...at, 'mMax'],
        `source "${sourceId}": expected every mMax alternative greater than mMin (${v.mMin}), got ${v.mMax}`,
      );
      return undefined;
    }
    if (
      v.type === 'moment-balanced' &&
      v.shape === 'characteristic' &&
      v.mMax - v.mMin <= CHARACTERISTIC_BOX_WIDTH
    ) {
      issues.add(
        [...at, 'shape'],
        `source "${sourceId}": the characteristic shape (Youngs & Coppersmith 1985) needs mMax - mMin > ${CHARACTERISTIC_BOX_WIDTH}; with mMax ${v.mMax} it is ${(v.mMax - v.mMin).toFixed(2)}`,
      );
      return undefined;
    }
  }
  return alternatives;
}

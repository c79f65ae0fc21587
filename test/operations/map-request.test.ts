import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../api/engine/errors.ts';
import { readMapRequest } from '../../api/operations/map-request.ts';

function problems(raw: Record<string, unknown>): string[] {
  try {
    readMapRequest(raw);
  } catch (error) {
    if (error instanceof InvalidInput) return error.issues.map((i) => `${i.path}: ${i.message}`);
    throw error;
  }
  return [];
}

describe('readMapRequest', () => {
  it('lists every problem at once, the measure included when another field is bad', () => {
    expect(problems({ measure: 'SA(x)', spacingKm: 0.1, returnPeriodYears: 475 })).toEqual([
      'spacingKm: expected a number in [0.5, 200] km, got 0.1',
      'measure: unsupported measure "SA(x)": expected "PGA", "PGV" or "SA(T)" with T in seconds, e.g. "SA(0.2)"',
    ]);
  });

  it('reads a return-period map and a chance map', () => {
    expect(readMapRequest({ spacingKm: 5, returnPeriodYears: 475 })).toEqual({
      measure: 'PGA',
      quantity: { kind: 'return-period', returnPeriodYears: 475 },
      spacingKm: 5,
    });
    expect(
      readMapRequest({ measure: 'PGV', spacingKm: 5, level: 10, horizonYears: 50, vs30: 400 }),
    ).toEqual({
      measure: 'PGV',
      quantity: { kind: 'chance', level: 10, horizonYears: 50 },
      spacingKm: 5,
      vs30: 400,
    });
    expect(problems({ spacingKm: 5, returnPeriodYears: 475, level: 0.1 })).toEqual([
      'returnPeriodYears: expected returnPeriodYears, or level with horizonYears (not both)',
    ]);
  });
});

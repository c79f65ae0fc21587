import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { levelAtReturnPeriod } from '../../../api/engine/hazard/curve-interpolation.ts';
import { levelAtReturnPeriodBySearch } from '../../../api/engine/hazard/return-period-search.ts';

// The search against levelAtReturnPeriod on the whole curve (curve-interpolation.ts, checked by
// hand in its own test): the same level and status, exactly, from any starting hint.
const curveArb = fc
  .array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 25 })
  .map((drops) => {
    let rate = 0.5;
    const annualRate = drops.map((d, i) => (i === 0 ? rate : (rate *= d)));
    return { levels: annualRate.map((_, i) => 0.001 * 1.5 ** i), annualRate };
  });

describe('levelAtReturnPeriodBySearch', () => {
  it('equals levelAtReturnPeriod on the whole curve, whatever the hint (fast-check)', () => {
    fc.assert(
      fc.property(
        curveArb,
        fc.constantFrom(2, 10, 100, 475, 2475, 1e6),
        fc.option(fc.integer({ min: -3, max: 30 })),
        ({ levels, annualRate }, years, hint) => {
          const expected = levelAtReturnPeriod(levels, annualRate, years);
          const found = levelAtReturnPeriodBySearch(
            levels,
            (j) => annualRate[j]!,
            years,
            hint ?? undefined,
          );
          expect({ level: found.level, status: found.status }).toEqual(expected);
        },
      ),
      { numRuns: 2000, seed: 5 },
    );
  });

  it('reads a few levels, not all, when the hint is right', () => {
    const levels = Array.from({ length: 25 }, (_, i) => 0.001 * 1.4 ** i);
    const annualRate = levels.map((x) => 1e-3 * x ** -1.5);
    const read = new Set<number>();
    const first = levelAtReturnPeriodBySearch(levels, (j) => (read.add(j), annualRate[j]!), 475);
    read.clear();
    levelAtReturnPeriodBySearch(levels, (j) => (read.add(j), annualRate[j]!), 475, first.index);
    expect(read.size).toBe(2);
  });
});

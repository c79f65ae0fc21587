import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { classIndex, MAX_CLASSES, valueClasses } from '../../../web/maps/hazard-classes.ts';

/**
 * The classes of a hazard map's legend. Round class limits are common practice for map
 * legends (no published source); the expectations below follow the rule written at the top of
 * web/maps/hazard-classes.ts, worked by hand.
 */
const summary = (values: number[], max?: number) => {
  const found = valueClasses(values, max);
  return {
    limits: found.limits,
    steps: found.classes.map((c) => c.step),
    counts: found.classes.map((c) => c.count),
  };
};

describe('valueClasses', () => {
  test('a narrow range (less than a factor of ten) gets evenly spaced round limits, as many as fit in six classes', () => {
    // 0.44 to 0.59 g: 0.02 apart gives seven limits, too many; 0.05 apart gives 0.45, 0.5, 0.55.
    expect(summary([0.44, 0.47, 0.5, 0.52, 0.55, 0.59])).toEqual({
      limits: [0.45, 0.5, 0.55],
      steps: [1, 3, 4, 6],
      counts: [1, 1, 2, 2],
    });
    // With a zero (a chance map far from every source): 0, 0.1, 0.2, 0.3, 0.4 apart, zero not a limit.
    expect(summary([0, 0.2, 0.4]).limits).toEqual([0.1, 0.2, 0.3, 0.4]);
  });

  test('a wide range gets limits spaced by ratio: the finest decade steps that fit, else every few decades', () => {
    // 0.033 to 0.72 g: 1, 1.5, 2, 3, 4, 5, 6, 8 × 10^k gives eleven limits; 1, 2, 5 × 10^k gives four.
    expect(summary([0.033, 0.06, 0.12, 0.3, 0.72])).toEqual({
      limits: [0.05, 0.1, 0.2, 0.5],
      steps: [1, 2, 4, 5, 6],
      counts: [1, 1, 1, 1, 1],
    });
    // 1e-4 to 10: whole decades, five of them, fit.
    expect(summary([1e-4, 10]).limits).toEqual([0.001, 0.01, 0.1, 1, 10]);
    // 1e-6 to 10: seven decades; every second one.
    expect(summary([1e-6, 10]).limits).toEqual([1e-4, 0.01, 1]);
  });

  test('equal values (or nearly) make one class, open at both ends, on the middle of the scale', () => {
    const found = valueClasses([0.2, 0.2, 0.2]);
    expect(found.classes).toEqual([{ from: null, to: null, step: 4, count: 3 }]);
    expect(valueClasses([0.1, 0.3], 1).classes).toEqual([
      { from: null, to: null, step: 4, count: 2 },
    ]);
    // Closer than 1e-12: one class (fast-check found the underflow of finer limits).
    expect(valueClasses([5e-324, 1e-323]).classes).toHaveLength(1);
  });

  test('a value on a limit belongs to the class above it', () => {
    expect(classIndex([0.05, 0.1], 0.05)).toBe(1);
    expect(classIndex([0.05, 0.1], 0.0499)).toBe(0);
    expect(classIndex([0.05, 0.1], 0.1)).toBe(2);
    expect(classIndex([], 7)).toBe(0);
  });

  test('refuses what it cannot class', () => {
    expect(() => valueClasses([])).toThrow('expected at least one value');
    expect(() => valueClasses([0.1, Number.NaN])).toThrow('expected finite values, got NaN');
    expect(() => valueClasses([0.1], 0)).toThrow(`expected 1 to ${MAX_CLASSES} classes, got 0`);
    expect(() => valueClasses([0.1], 7)).toThrow(`expected 1 to ${MAX_CLASSES} classes, got 7`);
  });

  test('for any values: at most six classes, counts adding up, limits increasing inside the range, shades darkening', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 60 }),
        fc.integer({ min: 1, max: MAX_CLASSES }),
        (values, max) => {
          const found = valueClasses(values, max);
          expect(found.classes.length).toBeLessThanOrEqual(max);
          expect(found.classes.reduce((n, c) => n + c.count, 0)).toBe(values.length);
          for (let i = 0; i < found.limits.length; i++) {
            const limit = found.limits[i] as number;
            expect(limit > found.min && limit <= found.max).toBe(true);
            if (i > 0) expect(limit).toBeGreaterThan(found.limits[i - 1] as number);
          }
          for (let i = 1; i < found.classes.length; i++)
            expect(found.classes[i]!.step).toBeGreaterThan(found.classes[i - 1]!.step);
          for (const c of found.classes) expect(c.step >= 1 && c.step <= 6).toBe(true);
          for (const v of values) {
            const c = found.classes[classIndex(found.limits, v)]!;
            expect((c.from === null || v >= c.from) && (c.to === null || v < c.to)).toBe(true);
          }
        },
      ),
    );
  });
});

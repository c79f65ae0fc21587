import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { erfc, normalCdf, normalSurvival } from '../../../api/engine/hazard/normal-cdf.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';

// The tables give 10 significant figures; Cody's (1969) approximations are good to about 1e-15,
// so the tables' rounding (half a unit in the 10th figure) sets the tolerances.
const TABLE_ROUNDING = 5e-10;

describe('normal distribution from erfc (Cody 1969)', () => {
  // Abramowitz & Stegun (1964), Table 26.1, P(x) to 10 decimals (values from memory).
  const table26_1: readonly [number, number][] = [
    [0.5, 0.6914624613],
    [1.0, 0.8413447461],
    [1.5, 0.9331927987],
    [2.0, 0.9772498681],
    [2.5, 0.9937903347],
    [3.0, 0.998650102],
  ];
  for (const [x, p] of table26_1) {
    it(`Φ(${x}) = ${p} (Abramowitz & Stegun 1964, Table 26.1, from memory)`, () => {
      expectClose(normalCdf(x), p, 1e-10, 'A&S Table 26.1, 10 decimals (from memory)');
      expectClose(normalCdf(-x), 1 - p, 1e-10, 'A&S Table 26.1 by symmetry (from memory)');
    });
  }

  // Abramowitz & Stegun (1964), Table 26.1 upper tail Q(x) = 1 − P(x) (values from memory).
  const tail: readonly [number, number][] = [
    [3, 1.349898032e-3],
    [4, 3.167124183e-5],
    [5, 2.866515719e-7],
  ];
  for (const [x, q] of tail) {
    it(`Q(${x}) = ${q} to 10 figures (A&S 1964 Table 26.1, from memory)`, () => {
      expectRelative(
        normalSurvival(x),
        q,
        TABLE_ROUNDING,
        'A&S Table 26.1 tail, 10 figures (from memory)',
      );
    });
  }

  // The far tail, where Cody's third range (erfc argument above 4) works: Q(6), Q(7) and
  // erfc(5), erfc(6) to 10 figures (Abramowitz & Stegun 1964, chapter 26 and 7 tables; values from memory).
  const farTail: readonly [string, number, number][] = [
    ['Q(6)', normalSurvival(6), 9.8658764504e-10],
    ['Q(7)', normalSurvival(7), 1.2798125439e-12],
    ['erfc(5)', erfc(5), 1.5374597944e-12],
    ['erfc(6)', erfc(6), 2.1519736712e-17],
  ];
  for (const [label, actual, expected] of farTail) {
    it(`${label} = ${expected} to 10 figures (A&S 1964, from memory)`, () => {
      expectRelative(actual, expected, TABLE_ROUNDING, 'A&S 1964 far-tail values (from memory)');
    });
  }

  // Abramowitz & Stegun (1964), Table 7.1, erf(x) (values from memory).
  const table7_1: readonly [number, number][] = [
    [0.5, 0.5204998778],
    [1.0, 0.8427007929],
    [1.5, 0.9661051465],
    [2.0, 0.995322265],
  ];
  for (const [x, erf] of table7_1) {
    it(`erfc(${x}) = 1 − ${erf} (A&S 1964 Table 7.1, from memory)`, () => {
      expectClose(erfc(x), 1 - erf, 1e-10, 'A&S Table 7.1, 10 decimals (from memory)');
      expectClose(erfc(-x), 1 + erf, 1e-10, 'A&S Table 7.1, erfc(−x) = 2 − erfc(x)');
    });
  }

  it('Φ(0) = 1/2 exactly (symmetry of the normal distribution)', () => {
    expect(normalCdf(0)).toBe(0.5);
  });

  it("is continuous where Cody's ranges join (|x| = 0.46875 and 4), to a few ulps", () => {
    for (const join of [0.46875, 4, -0.46875, -4]) {
      const below = erfc(join * (1 - 1e-15));
      const above = erfc(join * (1 + 1e-15));
      // The true erfc changes by up to 8 × 8e-15 across this 8e-15 step at x = 4 (slope of ln erfc
      // is about −2x there); 2e-13 leaves room for that and a few ulps, far below any real jump.
      expectRelative(below, above, 2e-13, `Cody (1969) ranges meet at ${join}`);
    }
  });

  it('Φ(x) + Φ(−x) = 1 and Φ + Q = 1 (symmetry, to rounding)', () => {
    fc.assert(
      fc.property(fc.double({ min: -30, max: 30, noNaN: true }), (x) => {
        expect(Math.abs(normalCdf(x) + normalCdf(-x) - 1)).toBeLessThanOrEqual(1e-15);
        expect(Math.abs(normalCdf(x) + normalSurvival(x) - 1)).toBeLessThanOrEqual(1e-15);
      }),
    );
  });

  it('is non-decreasing, up to one rounding at the range joins', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (x, step) => {
          expect(normalCdf(x + step)).toBeGreaterThanOrEqual(normalCdf(x) - 2.3e-16);
        },
      ),
    );
  });

  it('stays in [0, 1] and finite far into the tails', () => {
    for (const x of [-40, -8, 8, 40, Infinity, -Infinity]) {
      const p = normalCdf(x);
      expect(p >= 0 && p <= 1).toBe(true);
    }
    expect(erfc(27)).toBe(0);
    expect(erfc(-27)).toBe(2);
    expect(normalSurvival(Infinity)).toBe(0);
    expect(normalCdf(-Infinity)).toBe(0);
  });
});

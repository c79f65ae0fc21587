import { describe, expect, it } from 'vitest';
import {
  exceedanceFromTable,
  exceedanceTable,
  MAX_TABULATED_SIGMA,
  tabulatedExceedance,
} from '../../../api/engine/hazard/exceedance-table.ts';
import { exceedanceProbability } from '../../../api/engine/hazard/truncated-exceedance.ts';

/*
 * The tabulated truncated exceedance against the exact one (truncated-exceedance.ts, itself
 * checked against published normal tail values in its own test). The bound is the cubic
 * Hermite error h⁴/384 · max|P⁗| with h = 1/64 and |P⁗| < 0.56 / (1 − 2Q(n)) (exceedance-table.ts):
 * 9e-11 / (1 − 2Q(n)), under 1e-10 from n = 2 on.
 */
const bound = (n: number): number => 9e-11 / (1 - 2 * exceedanceProbability(n, Infinity));

describe('exceedanceTable', () => {
  for (const n of [0.5, 1, 2, 3, 4.5, MAX_TABULATED_SIGMA]) {
    it(`at truncation ${n}σ stays within 9e-11 / (1 − 2Q(n)) of the exact probability on a grid 1/1000 σ apart, and never rises with ε`, () => {
      const table = exceedanceTable(n);
      expect(table.mode).toBe('table');
      let worst = 0;
      let previous = 1;
      for (let e = -n; e <= n; e += 0.001) {
        const p = exceedanceFromTable(table, e);
        worst = Math.max(worst, Math.abs(p - exceedanceProbability(e, n)));
        expect(p).toBeLessThanOrEqual(previous + 1e-15);
        previous = p;
      }
      expect(worst, `largest difference ${worst}, bound ${bound(n)}`).toBeLessThan(bound(n));
      if (n >= 2) expect(worst).toBeLessThan(1e-10);
    });
  }

  it('is exact at and beyond ±n: 1 below −n, 0 above n', () => {
    const table = exceedanceTable(3);
    expect(exceedanceFromTable(table, -3)).toBe(1);
    expect(exceedanceFromTable(table, -7)).toBe(1);
    expect(exceedanceFromTable(table, 3)).toBe(0);
    expect(exceedanceFromTable(table, 12)).toBe(0);
    if (table.mode === 'table')
      expect(tabulatedExceedance(table.cubic, table.scale, table.intervals, 3, 0)).toBeCloseTo(
        0.5,
        12,
      );
  });

  it('keeps the exact function for the median-only step and for no or very wide truncation', () => {
    expect(exceedanceTable(0).mode).toBe('step');
    expect(exceedanceTable(Infinity).mode).toBe('exact');
    expect(exceedanceTable(MAX_TABULATED_SIGMA + 1).mode).toBe('exact');
    expect(exceedanceFromTable(exceedanceTable(0), -0.1)).toBe(1);
    expect(exceedanceFromTable(exceedanceTable(0), 0)).toBe(0);
    expect(exceedanceFromTable(exceedanceTable(Infinity), 1.5)).toBe(
      exceedanceProbability(1.5, Infinity),
    );
  });
});

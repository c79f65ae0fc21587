import { expect } from 'vitest';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import type { GmmInput, GmmPrediction } from '../../../api/engine/motion/types.ts';
import { expectClose } from '../../helpers/close.ts';

const RULE = 'interpolate-period.ts rule (common practice)';

/**
 * Between the table rows `loS` and `hiS`, ln median and σ at `periodS` are linear in ln(period)
 * (to 1e-12) and the median lies strictly between the rows'; at the row `rowS`, a period 1e-9
 * off the row gives the row itself.
 */
export function expectLnPeriodInterpolation(
  predictAt: (periodS: number) => GmmPrediction,
  [loS, periodS, hiS]: readonly [number, number, number],
  rowS: number,
): void {
  const between = predictAt(periodS);
  const lo = predictAt(loS);
  const hi = predictAt(hiS);
  const w = Math.log(periodS / loS) / Math.log(hiS / loS);
  expectClose(between.lnMedian, lo.lnMedian + (hi.lnMedian - lo.lnMedian) * w, 1e-12, RULE);
  expectClose(between.sigma, lo.sigma + (hi.sigma - lo.sigma) * w, 1e-12, RULE);
  expect(between.lnMedian).toBeGreaterThan(Math.min(lo.lnMedian, hi.lnMedian));
  expect(between.lnMedian).toBeLessThan(Math.max(lo.lnMedian, hi.lnMedian));
  expect(predictAt(rowS).lnMedian).toBe(predictAt(rowS * (1 + 1e-9)).lnMedian);
}

/** Each input change of `outside`, for each measure: applicable false, a note, finite numbers. */
export function expectNotApplicable(
  predict: (over: Partial<GmmInput>, measure: Measure) => GmmPrediction,
  outside: readonly Partial<GmmInput>[],
  measures: readonly Measure[],
): void {
  for (const over of outside) {
    for (const m of measures) {
      const p = predict(over, m);
      expect(p.applicable, JSON.stringify(over)).toBe(false);
      expect(p.notes.length).toBeGreaterThan(0);
      for (const v of [p.lnMedian, p.sigma, p.tau, p.phi]) expect(Number.isFinite(v)).toBe(true);
    }
  }
}

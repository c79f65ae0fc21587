import { describe, expect, it } from 'vitest';
import {
  accumulatePairs,
  BLOCK_PAIRS,
  coefficientLevelRate,
  createCurveAccumulator,
  createLevelCoefficients,
  curveRates,
  fillLevelCoefficients,
  levelRate,
  resetCurveAccumulator,
  type RatedPairs,
} from '../../../api/engine/hazard/curve-accumulator.ts';
import { exceedanceCurve } from '../../helpers/reference-hazard/exceedance-curve.ts';
import { exceedanceTable } from '../../../api/engine/hazard/exceedance-table.ts';
import type { RupturePredictions } from '../../helpers/reference-hazard/rupture-predictions.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectClose } from '../../helpers/close.ts';
import { pointRuptures } from './point-ruptures.ts';

/*
 * The fast path's curve sums against exceedanceCurve (exceedance-curve.ts, the reference sum,
 * checked against hand computations in its own test), on invented predictions: many pairs
 * with medians spread over the levels, some certain to exceed the lower levels, some zero rate
 * and some zero σ. Tolerance 1e-9 relative: the table's 1e-10 in probability, and rounding.
 */
const LEVELS = [0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2];

function cases(count: number, seed: number) {
  const source = createRandom(seed);
  const next = (): number => source.nextFloat();
  const specs = Array.from({ length: count }, (_, i) => ({
    magnitude: 6,
    annualRate: i % 17 === 0 ? 0 : 1e-4 * (1 + next()),
    repiKm: 10,
  }));
  const { ruptures } = pointRuptures(specs);
  const lnMedian = Float64Array.from({ length: count }, () => Math.log(0.001) + 8 * next());
  const sigma = Float64Array.from({ length: count }, (_, i) =>
    i % 29 === 0 ? 0 : 0.4 + 0.4 * next(),
  );
  const predictions: RupturePredictions = {
    ruptureIndex: Int32Array.from({ length: count }, (_, i) => i),
    lnMedian,
    sigma,
    outsideValidity: 0,
    firstNote: null,
  };
  const rates = Float64Array.from(ruptures, (r) => r.annualRate);
  const pair = { lnMedian, sigma, applicable: new Uint8Array(count) };
  const rated: RatedPairs = {
    rates,
    pairRupture: predictions.ruptureIndex,
    predictions: pair,
    count,
  };
  return { ruptures, predictions, pair, rated };
}

describe('accumulatePairs and curveRates', () => {
  for (const truncation of [3, 2, 0, Infinity]) {
    it(`equal exceedanceCurve at truncation ${truncation} over ${3 * BLOCK_PAIRS + 5} pairs (several blocks)`, () => {
      const { ruptures, predictions, rated } = cases(3 * BLOCK_PAIRS + 5, 42);
      const acc = createCurveAccumulator(LEVELS);
      expect(accumulatePairs(acc, exceedanceTable(truncation), rated)).toBe(-1);
      const expected = exceedanceCurve(predictions, ruptures, LEVELS, truncation);
      curveRates(acc).forEach((rate, j) =>
        expectClose(
          rate,
          expected[j]!,
          1e-9 * expected[j]! + 1e-18,
          `level ${LEVELS[j]} g, exceedance-curve.ts`,
        ),
      );
    });
  }

  it('reports the first pair with a non-finite median or a negative σ and sums nothing from it on', () => {
    const { pair, rated } = cases(10, 1);
    pair.sigma[6] = -0.1;
    const acc = createCurveAccumulator(LEVELS);
    expect(accumulatePairs(acc, exceedanceTable(3), rated)).toBe(6);
    pair.sigma[6] = 0.5;
    pair.lnMedian[2] = Number.POSITIVE_INFINITY;
    resetCurveAccumulator(acc);
    expect(accumulatePairs(acc, exceedanceTable(3), rated)).toBe(2);
  });
});

describe('levelRate and coefficientLevelRate', () => {
  it("give the curve's rate at any single level", () => {
    const { ruptures, predictions, pair, rated } = cases(2 * BLOCK_PAIRS + 3, 9);
    for (const truncation of [3, 0, Infinity]) {
      const table = exceedanceTable(truncation);
      const expected = exceedanceCurve(predictions, ruptures, LEVELS, truncation);
      LEVELS.forEach((level, j) =>
        expectClose(
          levelRate(Math.log(level), table, rated),
          expected[j]!,
          1e-9 * expected[j]! + 1e-18,
          `levelRate at ${level} g, truncation ${truncation}`,
        ),
      );
    }
    // The coefficients apply only to a table and σ > 0 throughout; this set has zero σs.
    const coefficients = createLevelCoefficients(ruptures.length);
    const fill = (): void => fillLevelCoefficients(coefficients, exceedanceTable(3), rated);
    fill();
    expect(coefficients.usable).toBe(false);
    for (let k = 0; k < pair.sigma.length; k++) if (pair.sigma[k] === 0) pair.sigma[k] = 0.6;
    fill();
    expect(coefficients.usable).toBe(true);
    const table = exceedanceTable(3);
    const expected = exceedanceCurve({ ...predictions, sigma: pair.sigma }, ruptures, LEVELS, 3);
    if (table.mode === 'table')
      LEVELS.forEach((level, j) =>
        expectClose(
          coefficientLevelRate(Math.log(level), table, coefficients),
          expected[j]!,
          1e-9 * expected[j]! + 1e-18,
          `coefficientLevelRate at ${level} g`,
        ),
      );
  });
});

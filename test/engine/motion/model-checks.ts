import fc from 'fast-check';
import { expect, it } from 'vitest';
import { InvalidInput, UnsupportedPeriod } from '../../../api/engine/errors.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import type { GmmInput, GmmPrediction } from '../../../api/engine/motion/types.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { PGA, sa } from './measures.ts';

const RULE = 'interpolate-period.ts rule (common practice)';

/**
 * The test "interpolates between rows in ln(period) and returns the row on a row": between the
 * table rows `loS` and `hiS`, ln median and σ at `periodS` are linear in ln(period) (to 1e-12)
 * and the median lies strictly between the rows'; at the row `rowS`, a period 1e-9 off the row
 * gives the row itself.
 */
export function itInterpolatesInLnPeriod(
  predictAt: (periodS: number) => GmmPrediction,
  [loS, periodS, hiS]: readonly [number, number, number],
  rowS: number,
): void {
  it('interpolates between rows in ln(period) and returns the row on a row', () => {
    const between = predictAt(periodS);
    const lo = predictAt(loS);
    const hi = predictAt(hiS);
    const w = Math.log(periodS / loS) / Math.log(hiS / loS);
    expectClose(between.lnMedian, lo.lnMedian + (hi.lnMedian - lo.lnMedian) * w, 1e-12, RULE);
    expectClose(between.sigma, lo.sigma + (hi.sigma - lo.sigma) * w, 1e-12, RULE);
    expect(between.lnMedian).toBeGreaterThan(Math.min(lo.lnMedian, hi.lnMedian));
    expect(between.lnMedian).toBeLessThan(Math.max(lo.lnMedian, hi.lnMedian));
    expect(predictAt(rowS).lnMedian).toBe(predictAt(rowS * (1 + 1e-9)).lnMedian);
  });
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

/** What a model refuses: periods off its table, and inputs with the error each must throw. */
export interface Refusals {
  /** SA periods (s) outside the model's table: each throws UnsupportedPeriod. */
  readonly periodsS: readonly number[];
  /** Input changes and, for each, the error class or the field name the PGA call throws with. */
  readonly inputs: readonly (readonly [Partial<GmmInput>, RegExp | typeof InvalidInput])[];
}

/**
 * The test "refuses periods outside its table and bad input by name": each period of
 * `refusals` throws UnsupportedPeriod, each input change the error named beside it.
 */
export function itRefusesByName(
  predict: (over: Partial<GmmInput>, measure: Measure) => GmmPrediction,
  refusals: Refusals,
): void {
  it('refuses periods outside its table and bad input by name', () => {
    for (const periodS of refusals.periodsS) {
      expect(() => predict({}, sa(periodS)), `SA(${periodS})`).toThrow(UnsupportedPeriod);
    }
    for (const [over, error] of refusals.inputs) {
      expect(() => predict(over, PGA), Object.keys(over).join()).toThrow(error);
    }
  });
}

/**
 * What ASK14, CB14 and CY14 all refuse: SA below and above their 0.01–10 s tables, a NaN
 * magnitude, a negative Rrup, a zero dip.
 */
export const RRUP_REFUSALS: Refusals = {
  periodsS: [0.005, 11],
  inputs: [
    [{ magnitude: Number.NaN }, /magnitude/],
    [{ rrupKm: -2 }, InvalidInput],
    [{ dipDeg: 0 }, /dipDeg/],
  ],
};

export interface MonotonyOptions {
  /** Magnitudes drawn (from the model's lower end, or above where it saturates on purpose). */
  readonly magnitude: readonly [number, number];
  /** The model's distance input and the range drawn for it, km (Rrup 5–290 km when absent). */
  readonly distance?: 'rjbKm' | 'rrupKm';
  readonly distanceKm?: readonly [number, number];
  /** Vs30 values drawn (m/s); the input's own Vs30 when absent. */
  readonly vs30?: readonly number[];
  /** fast-check seed, fixed so that a failure replays. */
  readonly seed: number;
}

/** The measures the crustal models' property checks draw from. */
export const CRUSTAL_MEASURES: readonly Measure[] = [
  { kind: 'PGA' },
  { kind: 'PGV' },
  ...[0.2, 1, 3].map((periodS): Measure => ({ kind: 'SA', periodS })),
];

/**
 * Property (300 drawn cases): ln median falls when the distance grows by 0.5–10 km and rises
 * when the magnitude grows by 0.05–0.5, for each of CRUSTAL_MEASURES.
 */
export function expectFallsWithDistanceRisesWithMagnitude(
  lnY: (over: Partial<GmmInput>, measure: Measure) => number,
  options: MonotonyOptions,
): void {
  const [mMin, mMax] = options.magnitude;
  const distance = options.distance ?? 'rrupKm';
  const [dMin, dMax] = options.distanceKm ?? [5, 290];
  const vs30 = options.vs30 ? fc.constantFrom(...options.vs30) : fc.constant(undefined);
  fc.assert(
    fc.property(
      fc.double({ min: mMin, max: mMax, noNaN: true }),
      fc.double({ min: dMin, max: dMax, noNaN: true }),
      fc.double({ min: 0.5, max: 10, noNaN: true }),
      fc.double({ min: 0.05, max: 0.5, noNaN: true }),
      vs30,
      fc.constantFrom(...CRUSTAL_MEASURES),
      (magnitude, km, stepKm, stepM, vs30, m) => {
        const site = vs30 === undefined ? {} : { vs30 };
        const at = { magnitude, [distance]: km, ...site };
        expect(lnY({ ...at, [distance]: km + stepKm }, m)).toBeLessThan(lnY(at, m));
        expect(lnY({ ...at, magnitude: magnitude + stepM }, m)).toBeGreaterThan(lnY(at, m));
      },
    ),
    { seed: options.seed, numRuns: 300 },
  );
}

/**
 * A reverse fault of M 7, dip 45°, Ztor 2 km, W 20 km: the hanging-wall site at Rx 10 km (above
 * the rupture: Rjb 0, Rrup (10 + 2)/√2) and the footwall site at Rx −10 km (Rjb 10, Rrup
 * √(10² + 2²)) (geometry by hand).
 */
export const HANGING_WALL_CASE = {
  hanging: {
    magnitude: 7,
    rakeDeg: 90,
    mechanism: 'reverse',
    dipDeg: 45,
    ztorKm: 2,
    widthKm: 20,
    rxKm: 10,
    rjbKm: 0,
    rrupKm: 12 / Math.SQRT2,
  },
  foot: { rxKm: -10, rjbKm: 10, rrupKm: Math.hypot(10, 2) },
} as const satisfies { hanging: Partial<GmmInput>; foot: Partial<GmmInput> };

/**
 * ln median on the hanging wall of HANGING_WALL_CASE exceeds the footwall's, and exceeds that of
 * the same distances on the footwall side (Rx −10 km): the hanging-wall term alone, positive.
 */
export function expectHangingWallAboveFootwall(
  lnY: (over: Partial<GmmInput>, measure: Measure) => number,
  measures: readonly Measure[],
): void {
  const { hanging, foot } = HANGING_WALL_CASE;
  for (const m of measures) {
    expect(lnY(hanging, m)).toBeGreaterThan(lnY({ ...hanging, ...foot }, m));
    expect(lnY(hanging, m)).toBeGreaterThan(lnY({ ...hanging, rxKm: -10 }, m));
  }
}

/**
 * Orders of magnitude read from memory of the NGA-West2 papers' and Gregor et al. (2014)'s
 * figures of median motion against distance (Vs30 = 760 m/s, strike-slip): label, M, distance
 * (km), measure, median (g; PGV cm/s).
 */
const FIGURE_MEDIANS: readonly (readonly [string, number, number, Measure, number])[] = [
  ['PGA, M 7, 10 km', 7, 10, { kind: 'PGA' }, 0.26],
  ['SA(0.2), M 7, 10 km', 7, 10, sa(0.2), 0.57],
  ['SA(1.0), M 7, 10 km', 7, 10, sa(1), 0.2],
  ['PGA, M 7, 100 km', 7, 100, { kind: 'PGA' }, 0.03],
  ['PGA, M 5, 10 km', 5, 10, { kind: 'PGA' }, 0.07],
  ['PGV, M 7, 10 km (cm/s)', 7, 10, { kind: 'PGV' }, 25],
];

/** One test a FIGURE_MEDIANS row: the median within ±30%, which suits a figure read by eye. */
export function itMatchesFigureMedians(
  lnY: (over: Partial<GmmInput>, measure: Measure) => number,
  distance: 'rjbKm' | 'rrupKm',
  source: string,
): void {
  it.each(FIGURE_MEDIANS)('%s', (label, magnitude, distanceKm, measure, expected) => {
    expectRelative(
      Math.exp(lnY({ magnitude, [distance]: distanceKm }, measure)),
      expected,
      0.3,
      `${source} figures, ${label} (from memory)`,
    );
  });
}

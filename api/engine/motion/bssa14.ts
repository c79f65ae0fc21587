/**
 * BSSA14 — Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014), "NGA-West2
 * equations for predicting PGA, PGV, and 5% damped PSA for shallow crustal earthquakes",
 * Earthquake Spectra 30(3), 1057–1085, doi:10.1193/070113EQS184M. No erratum known to us that
 * changes the equations. Coefficients: bssa14-coefficients.ts (the published table with the
 * revised f4 of 2014-07-15, from the project's reference record).
 *
 * ln Y = F_E(M, mechanism) + F_P(Rjb, M) + F_S(Vs30, Rjb, M)   (the paper's model equations; from memory)
 *   F_E = e_mech + e4 (M − Mh) + e5 (M − Mh)²   for M ≤ Mh,
 *         e_mech + e6 (M − Mh)                 for M > Mh,
 *         e_mech = e0 unspecified, e1 strike-slip, e2 normal, e3 reverse;
 *   F_P = [c1 + c2 (M − Mref)] ln(R / Rref) + (c3 + Δc3)(R − Rref),  R = √(Rjb² + h²);
 *   F_S = ln F_lin + ln F_nl (+ F_δz1, omitted: δz1 = 0, i.e. the basin depth of the site is
 *         taken to be the average for its Vs30);
 *   ln F_lin = c ln(min(Vs30, Vc) / Vref);
 *   ln F_nl  = f1 + f2 ln((PGAr + f3) / f3),
 *         f2 = f4 [exp(f5 (min(Vs30, 760) − 360)) − exp(f5 (760 − 360))],
 *         PGAr the model's own median PGA (g) for the same event at Vs30 = Vref = 760 m/s.
 * Mechanism from rake, the paper's ranges: normal −150° < λ < −30°, reverse 30° < λ < 150°,
 * strike-slip otherwise. "Unspecified" (e0) is available through predictBssa14's options.
 *
 * Standard deviations (the paper's aleatory-variability model; from memory), natural-log units:
 *   τ(M) = τ1 for M ≤ 4.5, τ2 for M ≥ 5.5, linear in M between; φ(M) likewise with φ1, φ2;
 *   φ(M, Rjb) = φ(M) + ΔφR ln(Rjb / R1) / ln(R2 / R1) between R1 and R2 (0 below R1, ΔφR above R2);
 *   φ(M, Rjb, Vs30) = φ(M, Rjb) − ΔφV ln(V2 / Vs30) / ln(V2 / V1) between V1 and V2
 *   (0 above V2, ΔφV below V1); σ = √(τ² + φ²).
 *
 * Inputs: magnitude M (moment magnitude), rjbKm (Joyner–Boore distance, km), vs30 (m/s),
 * rakeDeg (degrees). Output: ln of the median, ln(g) for PGA and 5%-damped RotD50 PSA,
 * ln(cm/s) for PGV; sigma, tau, phi in natural-log units. Distance metric: Rjb.
 *
 * Validity (the paper's stated ranges, from memory): M 3–8.5 for strike-slip and reverse
 * (and unspecified) events, M 3–7 for normal events; Rjb 0–400 km; Vs30 150–1500 m/s; periods
 * PGA, PGV and PSA 0.01–10 s. Outside, predictions are still finite, with applicable: false.
 *
 * How the table was checked: bssa14-coefficients.ts and test/engine/motion/bssa14.test.ts.
 */
import { InvalidInput, UnsupportedMeasure } from '../errors.ts';
import { BSSA14_CONSTANTS as K, BSSA14_PGA, BSSA14_PGV, BSSA14_SA, type Bssa14Row } from './bssa14-coefficients.ts';
import { prepareBssa14, prepareBssa14Measures } from './bssa14-prepared.ts';
import { predictAtPeriod } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import type { GmmInput, GmmPrediction, GroundMotionModel, PreparedMotion, PreparedMotions, RuptureContext, ValidityRange } from './types.ts';
import { validityNotes } from './validity.ts';

const NAME = 'BSSA14';

export type Bssa14Mechanism = 'unspecified' | 'strike-slip' | 'normal' | 'reverse';

/** The paper's rake classes (rake in degrees, any turn): normal −150..−30, reverse 30..150 (open). */
export function bssa14MechanismFromRake(rakeDeg: number): 'strike-slip' | 'normal' | 'reverse' {
  const rake = ((((rakeDeg + 180) % 360) + 360) % 360) - 180;
  if (rake > -150 && rake < -30) return 'normal';
  if (rake > 30 && rake < 150) return 'reverse';
  return 'strike-slip';
}

/** The earthquake and path as the equation sees them. */
export interface Bssa14Scenario {
  readonly magnitude: number;
  readonly rjbKm: number;
  readonly mechanism: Bssa14Mechanism;
}

const SA_PERIODS_S: readonly number[] = Object.freeze(BSSA14_SA.map((r) => r.periodS));

/** The mechanism constant e_mech (ln units) of a row: e0 unspecified, e1, e2, e3 by mechanism. */
export function bssa14MechanismConstant(row: Bssa14Row, mechanism: Bssa14Mechanism): number {
  switch (mechanism) {
    case 'unspecified':
      return row.e0;
    case 'strike-slip':
      return row.e1;
    case 'normal':
      return row.e2;
    case 'reverse':
      return row.e3;
  }
}

/** Source function F_E (ln units) of a row for moment magnitude M, given its mechanism constant. */
export function bssa14SourceTerm(row: Bssa14Row, mechanismConstant: number, magnitude: number): number {
  const dm = magnitude - row.mh;
  return mechanismConstant + (dm <= 0 ? row.e4 * dm + row.e5 * dm * dm : row.e6 * dm);
}

/** Path function F_P (ln units) of a row for moment magnitude M and Rjb in km. */
export function bssa14PathTerm(row: Bssa14Row, magnitude: number, rjbKm: number): number {
  const rKm = Math.hypot(rjbKm, row.h);
  return (row.c1 + row.c2 * (magnitude - K.mRef)) * Math.log(rKm / K.rRefKm) + (row.c3 + K.deltaC3) * (rKm - K.rRefKm);
}

/** Linear site term ln F_lin (ln units) for Vs30 in m/s; zero at Vref = 760 m/s. */
export function bssa14LinearSiteTerm(row: Bssa14Row, vs30: number): number {
  return row.c * Math.log(Math.min(vs30, row.vc) / K.vRef);
}

/** Vs30 (m/s) in the paper's f2 at which the nonlinear slope is referenced (the paper's f2 equation). */
const F2_VS30_ANCHOR = 360;

/**
 * Nonlinear site term ln F_nl (ln units) for Vs30 in m/s and rock PGA (g, at Vs30 = 760 m/s).
 * Zero at and above 760 m/s; negative on soft soil under strong rock motion.
 */
export function bssa14NonlinearSiteTerm(row: Bssa14Row, vs30: number, pgaRockG: number): number {
  const f2 = row.f4 * (Math.exp(row.f5 * (Math.min(vs30, K.vRef) - F2_VS30_ANCHOR)) - Math.exp(row.f5 * (K.vRef - F2_VS30_ANCHOR)));
  return K.f1 + f2 * Math.log((pgaRockG + K.f3G) / K.f3G);
}

/** ln median (ln g; ln cm/s for PGV) of a row at Vs30 = 760 m/s, where the site term is zero. */
export function bssa14LnMedianOnRock(row: Bssa14Row, scenario: Bssa14Scenario): number {
  return bssa14SourceTerm(row, bssa14MechanismConstant(row, scenario.mechanism), scenario.magnitude) + bssa14PathTerm(row, scenario.magnitude, scenario.rjbKm);
}

/** PGAr: the median PGA (g) of the event at Vs30 = 760 m/s, the input of the nonlinear site term. */
export function bssa14PgaRockG(scenario: Bssa14Scenario): number {
  return Math.exp(bssa14LnMedianOnRock(BSSA14_PGA, scenario));
}

/** Between-event τ, within-event φ and total σ (ln units) of a row; Rjb in km, Vs30 in m/s. */
export function bssa14Sigma(row: Bssa14Row, magnitude: number, rjbKm: number, vs30: number): { tau: number; phi: number; sigma: number } {
  // Magnitudes 4.5 and 5.5 bound the ramp between the small- and large-event values (the paper's τ(M), φ(M)).
  const ramp = (small: number, large: number): number =>
    magnitude <= 4.5 ? small : magnitude >= 5.5 ? large : small + (large - small) * (magnitude - 4.5);
  const tau = ramp(row.tau1, row.tau2);
  let phi = ramp(row.phi1, row.phi2);
  if (rjbKm > row.r1) phi += rjbKm >= row.r2 ? row.deltaPhiR : (row.deltaPhiR * Math.log(rjbKm / row.r1)) / Math.log(row.r2 / row.r1);
  if (vs30 <= K.v1) phi -= row.deltaPhiV;
  else if (vs30 < K.v2) phi -= (row.deltaPhiV * Math.log(K.v2 / vs30)) / Math.log(K.v2 / K.v1);
  return { tau, phi, sigma: Math.hypot(tau, phi) };
}

/** Validity for strike-slip, reverse and unspecified events (the paper's ranges, from memory). */
export const BSSA14_VALIDITY: ValidityRange = Object.freeze({
  magnitude: [3, 8.5],
  distanceKm: [0, 400],
  vs30: [150, 1500],
} as const);

/** Validity for normal-faulting events: the paper stops at M 7 for them. */
export const BSSA14_NORMAL_VALIDITY: ValidityRange = Object.freeze({ ...BSSA14_VALIDITY, magnitude: [3, 7] } as const);

function requireNumber(path: string, value: number, expected: string, ok: (v: number) => boolean): void {
  if (!Number.isFinite(value) || !ok(value)) {
    throw new InvalidInput([{ path, message: `expected ${expected}, got ${value}` }], `${NAME} input`);
  }
}

/** Options of predictBssa14. */
export interface Bssa14Options {
  /** Overrides the mechanism the rake implies; 'unspecified' selects the paper's e0. */
  readonly mechanism?: Bssa14Mechanism;
}

/**
 * BSSA14 median and standard deviations for one measure (PGA and PSA in g, PGV in cm/s; all
 * in ln units). Uses magnitude, rakeDeg, rjbKm, vs30 and setting of the input.
 */
export function predictBssa14(input: GmmInput, measure: Measure, options: Bssa14Options = {}): GmmPrediction {
  requireNumber('magnitude', input.magnitude, 'a finite moment magnitude', () => true);
  requireNumber('rjbKm', input.rjbKm, 'a finite Joyner–Boore distance of at least 0 km', (v) => v >= 0);
  requireNumber('vs30', input.vs30, 'a finite Vs30 above 0 m/s', (v) => v > 0);
  if (options.mechanism === undefined) requireNumber('rakeDeg', input.rakeDeg, 'a finite rake in degrees', () => true);
  const mechanism = options.mechanism ?? bssa14MechanismFromRake(input.rakeDeg);
  const scenario: Bssa14Scenario = { magnitude: input.magnitude, rjbKm: input.rjbKm, mechanism };

  const range = mechanism === 'normal' ? BSSA14_NORMAL_VALIDITY : BSSA14_VALIDITY;
  const notes = validityNotes(NAME, range, input, input.rjbKm);
  if (input.setting !== 'crustal') notes.unshift(`${NAME}: it is a model for shallow crustal earthquakes, not ${input.setting} ones`);
  const pgaRockG = bssa14PgaRockG(scenario);

  const predictRow = (row: Bssa14Row): GmmPrediction => {
    const lnMedian =
      bssa14SourceTerm(row, bssa14MechanismConstant(row, mechanism), scenario.magnitude) +
      bssa14PathTerm(row, scenario.magnitude, scenario.rjbKm) +
      bssa14LinearSiteTerm(row, input.vs30) +
      bssa14NonlinearSiteTerm(row, input.vs30, pgaRockG);
    return { lnMedian, ...bssa14Sigma(row, scenario.magnitude, scenario.rjbKm, input.vs30), applicable: notes.length === 0, notes };
  };

  switch (measure.kind) {
    case 'PGA':
      return predictRow(BSSA14_PGA);
    case 'PGV':
      return predictRow(BSSA14_PGV);
    case 'SA':
      if (!(measure.periodS > 0)) throw new UnsupportedMeasure(`SA(${measure.periodS})`, 'the period must be greater than 0 s');
      return predictAtPeriod(NAME, SA_PERIODS_S, measure.periodS, (i) => predictRow(BSSA14_SA[i] as Bssa14Row));
  }
}

/** Boore, Stewart, Seyhan & Atkinson (2014) for shallow crustal earthquakes (Rjb): PGA, PGV, PSA 0.01–10 s. */
export const bssa14: GroundMotionModel = Object.freeze({
  name: NAME,
  citation:
    'Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014). NGA-West2 equations for predicting PGA, PGV, and 5% damped PSA for shallow crustal earthquakes. Earthquake Spectra 30(3), 1057–1085.',
  settings: Object.freeze(['crustal'] as const),
  distanceMetric: 'rjb',
  periodsS: SA_PERIODS_S,
  hasPga: true,
  hasPgv: true,
  validity: BSSA14_VALIDITY,
  predict: (input: GmmInput, measure: Measure): GmmPrediction => predictBssa14(input, measure),
  prepare: (ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion => prepareBssa14(ruptures, measure),
  prepareMeasures: (ruptures: readonly RuptureContext[], measures: readonly Measure[]): PreparedMotions => prepareBssa14Measures(ruptures, measures),
});

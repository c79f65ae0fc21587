/**
 * ASK14 — Abrahamson, N. A., Silva, W. J. & Kamai, R. (2014), "Summary of the ASK14 ground motion
 * relation for active crustal regions", Earthquake Spectra 30(3), 1025–1055,
 * doi:10.1193/070913EQS198M. No erratum known to us that changes the equations. Coefficients:
 * ask14-coefficients.ts (the paper's table as given in its electronic supplement).
 *
 * ln Sa = f1(M, Rrup) + F_RV f7(M) + F_N f8(M) + F_HW f4 + f5(Sa1180, Vs30) + f6(Ztor) + f10(Z1, Vs30)
 * (the paper's model equations, California/global form: no regional, aftershock or Japan terms;
 * the equations as transcribed here from memory of the paper and checked against the reference
 * vectors, see below):
 *   f1 = a1 + a5 (M − M1) + a8 (8.5 − M)² + [a2 + a3 (M − M1)] ln R + a17 Rrup           (M > M1),
 *        a1 + a4 (M − M1) + a8 (8.5 − M)² + [a2 + a3 (M − M1)] ln R + a17 Rrup           (M2 ≤ M ≤ M1),
 *        a1 + a4 (M2 − M1) + a8 (8.5 − M2)² + a6 (M − M2) + a7 (M − M2)²
 *           + [a2 + a3 (M2 − M1)] ln R + a17 Rrup                                         (M < M2),
 *        R = √(Rrup² + c4M²), c4M = c4 (M > 5), c4 − (c4 − 1)(5 − M) (3 < M ≤ 5), 1 (M ≤ 3);
 *   f7 = a11, f8 = a12 for M > 5, times (M − 4) for 4 ≤ M ≤ 5, 0 below M 4;
 *   f4 = a13 T1(δ) T2(M) T3(Rx, W, δ) T4(Ztor) T5(Rx, Ry0), on the hanging-wall side (Rx ≥ 0):
 *        T1 = (90 − δ)/45 for δ > 30°, 60/45 below; T2 = 1 + a2HW (M − 6.5) for M ≥ 6.5,
 *        1 + a2HW (M − 6.5) − (1 − a2HW)(M − 6.5)² for 5.5 < M < 6.5, 0 for M ≤ 5.5;
 *        T3 = h1 + h2 (Rx/R1) + h3 (Rx/R1)² for Rx < R1, 1 − (Rx − R1)/(R2 − R1) up to R2, 0 beyond,
 *        R1 = W cos δ, R2 = 3 R1; T4 = 1 − Ztor²/100 for Ztor ≤ 10 km, 0 deeper;
 *        T5 = 1 for Ry0 ≤ Ry1, 1 − (Ry0 − Ry1)/5 up to Ry1 + 5 km, 0 beyond, Ry1 = Rx tan 20°;
 *   f5 = (a10 + b n) ln(Vs/Vlin) for Vs30 ≥ Vlin,
 *        a10 ln(Vs/Vlin) − b ln(Sa1180 + c) + b ln(Sa1180 + c (Vs/Vlin)ⁿ) below,
 *        Vs = min(Vs30, V1), V1 = 1500 m/s for T ≤ 0.5 s, exp(−0.35 ln(T/0.5) + ln 1500) for
 *        0.5 < T < 3 s, 800 m/s for T ≥ 3 s; Sa1180 the model's median at the same period for
 *        the same rupture and distances on rock of Vs30 = 1180 m/s (its own default Z1, f10 = 0);
 *   f6 = a15 Ztor/20 for Ztor < 20 km, a15 deeper;
 *   f10 = a43…a46 (by Vs30: ≤ 200, ≤ 300, ≤ 500, above) × ln((Z1 + 0.01)/(Z1ref + 0.01)), Z1 in km,
 *        Z1ref = exp(−7.67/4 ln((Vs30⁴ + 610⁴)/(1360⁴ + 610⁴)))/1000 km, the paper's California
 *        relation; where the site gives no Z1, Z1 = Z1ref and f10 = 0.
 * Mechanism from rake as the paper classes it: reverse 30° < λ < 150°, normal −150° < λ < −30°.
 * Ry0 = 0 means alongside the rupture; the paper's alternative T5 for an unknown Ry0 is not used
 * (Tremora always knows Ry0).
 *
 * PGV: the V1 of the PGV row is taken as 1500 m/s, as the NGA-West2 spreadsheet results and the
 * three written records of the model in ../shared/reference/gmm/README.md have it; 862 m/s is
 * also quoted for PGV (recalled as the paper's, from memory, not checked). The two differ only
 * for PGV at Vs30 above 862 m/s (and, through Sa1180, slightly below 330 m/s).
 *
 * Standard deviations (the paper's aleatory model), ln units: φA = s1 (M < 4), s1 + (s2 − s1)(M − 4)/2
 * (4 ≤ M ≤ 6), s2 above, with s1, s2 for measured or estimated Vs30; τA = s3 (M < 5),
 * s3 + (s4 − s3)(M − 5)/2 (5 ≤ M ≤ 7), s4 above; φB = √(φA² − φamp²), τB = τA;
 * with δ = ∂f5/∂ln Sa1180 = b Sa1180 [1/(Sa1180 + c (Vs/Vlin)ⁿ) − 1/(Sa1180 + c)] below Vlin (0 above),
 * φ = √(φB² (1 + δ)² + φamp²), τ = τB (1 + δ), σ = √(φ² + τ²).
 *
 * Inputs: magnitude M (moment magnitude); rrupKm, rjbKm, rxKm, ry0Km (km); ztorKm, widthKm (km);
 * dipDeg, rakeDeg (degrees); vs30 (m/s), vs30Measured; z1Km (km, optional). Output: ln of the
 * median, ln(g) for PGA and 5%-damped RotD50 PSA, ln(cm/s) for PGV; sigma, tau, phi in
 * natural-log units. Distance metric: Rrup.
 *
 * Validity: M 3.0–8.5, Rrup 0–300 km, periods 0–10 s (the paper's abstract); Vs30 180–1000 m/s
 * (the paper's stated range, from memory). Outside, finite numbers with applicable: false.
 *
 * How it is checked: test/engine/motion/ask14.test.ts reproduces the reference vectors
 * (../shared/reference/gmm/vectors/ask14.json, an independent implementation of the paper) within 1e-4.
 */
import { toRadians } from '../units.ts';
import { hypot2 } from './fast-math.ts';
import { rowMemo } from './prepared-period.ts';
import {
  ASK14_CONSTANTS as K,
  ASK14_TABLE,
  ASK14_PGV,
  type Ask14Row,
} from './ask14-coefficients.ts';
import type { Measure } from './measure.ts';
import { openRakeClass, type RakeClass } from './rake-classes.ts';
import { assembleModel } from './model-assembly.ts';
import {
  emptyPairPrediction,
  predictSplit,
  requirePositivePeriod,
  splitPrepareMeasures,
  type PairPrediction,
  type SplitModel,
} from './split-prepare.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  SiteContext,
  ValidityRange,
} from './types.ts';
import { crustalValidityNotes, insideValidity, requireInputs } from './validity.ts';

const NAME = 'ASK14';
/** Vs30 of the reference rock whose median drives the nonlinear site term, m/s. */
export const ASK14_ROCK_VS30 = 1180;

export type Ask14Mechanism = RakeClass;

/** The paper's rake classes (rake-classes.ts): reverse 30..150, normal −150..−30 (open). */
export const ask14MechanismFromRake: (rakeDeg: number) => Ask14Mechanism = openRakeClass;

/** The rupture as the equation sees it; depths and width in km, dip in degrees. */
export interface Ask14Rupture {
  readonly magnitude: number;
  readonly mechanism: Ask14Mechanism;
  readonly dipDeg: number;
  readonly ztorKm: number;
  readonly widthKm: number;
}

/** The distances the equation reads, km. */
export interface Ask14Distances {
  readonly rrupKm: number;
  readonly rjbKm: number;
  readonly rxKm: number;
  readonly ry0Km: number;
}

/** The terms of one table row that depend on the rupture alone (computed once per rupture). */
export interface Ask14RuptureTerms {
  readonly row: Ask14Row;
  /** f1 without its distance part, plus F_RV f7 + F_N f8 + f6, ln units. */
  readonly sourceLn: number;
  /** Slope of ln R in f1: a2 + a3 (M − M1), with M2 for M below M2. */
  readonly spreading: number;
  /** c4M, the finite-fault term of R, km. */
  readonly c4mKm: number;
  /** a13 T1 T2 T4, the hanging-wall term before its Rx and Ry0 tapers (0 when there is none). */
  readonly hangingWall: number;
  /** R1 = W cos δ, km. */
  readonly r1Km: number;
  /** τA and φA (measured and estimated Vs30) for the magnitude, ln units. */
  readonly tauA: number;
  readonly phiAMeasured: number;
  readonly phiAEstimated: number;
  /** The row's site parts, shared by every rupture's terms of the row. */
  readonly site: Ask14SiteParts;
}

/** The magnitude-only part of f1 (ln units). */
export function ask14MagnitudeTerm(row: Ask14Row, m: number): number {
  if (m > row.M1) return row.a1 + row.a5 * (m - row.M1) + row.a8 * (8.5 - m) ** 2;
  if (m >= row.M2) return row.a1 + row.a4 * (m - row.M1) + row.a8 * (8.5 - m) ** 2;
  const dm = m - row.M2;
  return (
    row.a1 +
    row.a4 * (row.M2 - row.M1) +
    row.a8 * (8.5 - row.M2) ** 2 +
    row.a6 * dm +
    row.a7 * dm * dm
  );
}

/** F_RV f7 + F_N f8 (ln units): style of faulting, faded in between M 4 and 5. */
export function ask14StyleTerm(row: Ask14Row, m: number, mechanism: Ask14Mechanism): number {
  const fade = Math.min(Math.max(m - 4, 0), 1);
  const factor = mechanism === 'reverse' ? row.a11 : mechanism === 'normal' ? row.a12 : 0;
  return factor * fade;
}

/** f6 (ln units) for the depth to the top of rupture in km. */
export function ask14DepthTerm(row: Ask14Row, ztorKm: number): number {
  return (row.a15 * Math.min(ztorKm, 20)) / 20;
}

/** T1 T2 T4 of the hanging-wall model (dimensionless): dip, magnitude and depth tapers. */
export function ask14HangingWallScale(m: number, dipDeg: number, ztorKm: number): number {
  const t1 = dipDeg > 30 ? (90 - dipDeg) / 45 : 60 / 45;
  const dm = m - 6.5;
  const t2 = m >= 6.5 ? 1 + K.a2HW * dm : m > 5.5 ? 1 + K.a2HW * dm - (1 - K.a2HW) * dm * dm : 0;
  const t4 = ztorKm <= 10 ? 1 - (ztorKm * ztorKm) / 100 : 0;
  return t1 * t2 * t4;
}

/** The rupture's terms of one row (ln units; see Ask14RuptureTerms). */
export function ask14RuptureTerms(row: Ask14Row, rupture: Ask14Rupture): Ask14RuptureTerms {
  const m = rupture.magnitude;
  const c4mKm = m > 5 ? row.c4 : m > 3 ? row.c4 - (row.c4 - 1) * (5 - m) : 1;
  // Magnitude ramps of the aleatory model: φ between M 4 and 6, τ between M 5 and 7.
  const ramp = (small: number, large: number, from: number): number =>
    m < from ? small : m > from + 2 ? large : small + ((large - small) * (m - from)) / 2;
  return {
    row,
    sourceLn:
      ask14MagnitudeTerm(row, m) +
      ask14StyleTerm(row, m, rupture.mechanism) +
      ask14DepthTerm(row, rupture.ztorKm),
    spreading: row.a2 + row.a3 * (Math.max(m, row.M2) - row.M1),
    c4mKm,
    hangingWall: row.a13 * ask14HangingWallScale(m, rupture.dipDeg, rupture.ztorKm),
    r1Km: rupture.widthKm * Math.cos(toRadians(rupture.dipDeg)),
    tauA: ramp(row.s3, row.s4, 5),
    phiAMeasured: ramp(row.s1Meas, row.s2Meas, 4),
    phiAEstimated: ramp(row.s1Est, row.s2Est, 4),
    site: sitePartsOf(row),
  };
}

/** T3 T5 of the hanging-wall model (dimensionless) for a site with Rx ≥ 0. */
export function ask14HangingWallTaper(r1Km: number, rxKm: number, ry0Km: number): number {
  const r2Km = 3 * r1Km;
  const t3 =
    rxKm < r1Km
      ? K.h1 + K.h2 * (rxKm / r1Km) + K.h3 * (rxKm / r1Km) ** 2
      : rxKm < r2Km
        ? 1 - (rxKm - r1Km) / (r2Km - r1Km)
        : 0;
  // Off the ends of the rupture the term fades over 5 km beyond Ry1 = Rx tan 20°.
  const beyond = ry0Km - rxKm * Math.tan(toRadians(20));
  const t5 = beyond <= 0 ? 1 : beyond < 5 ? 1 - beyond / 5 : 0;
  return t3 * t5;
}

/** f1's distance part plus F_HW f4 (ln units): everything of the pair but the site. */
export function ask14PathTerm(t: Ask14RuptureTerms, d: Ask14Distances): number {
  const rKm = hypot2(d.rrupKm, t.c4mKm);
  const hangingWall =
    d.rxKm >= 0 && t.hangingWall !== 0
      ? t.hangingWall * ask14HangingWallTaper(t.r1Km, d.rxKm, d.ry0Km)
      : 0;
  return t.spreading * Math.log(rKm) + t.row.a17 * d.rrupKm + hangingWall;
}

/** V1 of the site term, m/s: where Vs30 scaling stops (PGV: see the top comment). */
export function ask14V1(periodS: number): number {
  if (periodS <= 0.5) return 1500;
  if (periodS < 3) return Math.exp(-0.35 * Math.log(periodS / 0.5) + Math.log(1500));
  return 800;
}

/** f5 (ln units) for Vs30 in m/s and Sa1180 in g (cm/s for PGV). */
export function ask14SiteTerm(row: Ask14Row, vs30: number, sa1180: number): number {
  const lnRatio = Math.log(Math.min(vs30, ask14V1(row.periodS)) / row.Vlin);
  return siteTermFrom(row, vs30, lnRatio, Math.exp(row.n * lnRatio), sa1180);
}

/** f5 from ln(min(Vs30, V1) / Vlin) and its exponential e^(n ln ratio), the parts of the site alone. */
function siteTermFrom(
  row: Ask14Row,
  vs30: number,
  lnRatio: number,
  expNLnRatio: number,
  sa1180: number,
): number {
  if (vs30 >= row.Vlin) return (row.a10 + row.b * row.n) * lnRatio;
  return (
    row.a10 * lnRatio -
    row.b * Math.log(sa1180 + row.c) +
    row.b * Math.log(sa1180 + row.c * expNLnRatio)
  );
}

/**
 * δ = ∂f5/∂ln Sa1180, the nonlinear site term's response to the rock motion (0 at and above
 * Vlin), from (min(Vs30, V1) / Vlin)^n, the part of the site alone.
 */
function siteSlopeFrom(row: Ask14Row, vs30: number, ratioPowN: number, sa1180: number): number {
  if (vs30 >= row.Vlin) return 0;
  return row.b * sa1180 * (1 / (sa1180 + row.c * ratioPowN) - 1 / (sa1180 + row.c));
}

/**
 * What a row's site and basin terms need of the site alone, for the last site it was asked for,
 * and f5 on the reference rock: the fast path evaluates a row over all of a site's pairs in
 * turn, so these are worked out once per row and site rather than once per pair, from the same
 * expressions.
 */
interface Ask14SiteParts {
  readonly rockSiteLn: number;
  vs30: number;
  /** Z1 as given (km), or undefined for none. */
  z1Given: number | undefined;
  lnRatio: number;
  expNLnRatio: number;
  ratioPowN: number;
  basin: number;
}

/** Each row's site parts, made when the row is first asked for (none of a site yet). */
const sitePartsOf = rowMemo((row: Ask14Row): Ask14SiteParts => ({
  rockSiteLn: ask14SiteTerm(row, ASK14_ROCK_VS30, 0),
  vs30: NaN,
  z1Given: undefined,
  lnRatio: NaN,
  expNLnRatio: NaN,
  ratioPowN: NaN,
  basin: NaN,
}));

function siteAt(parts: Ask14SiteParts, row: Ask14Row, site: SiteContext): Ask14SiteParts {
  const { vs30, z1Km } = site;
  if (parts.vs30 === vs30 && parts.z1Given === z1Km) return parts;
  const ratio = Math.min(vs30, ask14V1(row.periodS)) / row.Vlin;
  const lnRatio = Math.log(ratio);
  parts.vs30 = vs30;
  parts.z1Given = z1Km;
  parts.lnRatio = lnRatio;
  parts.expNLnRatio = Math.exp(row.n * lnRatio);
  parts.ratioPowN = ratio ** row.n;
  parts.basin = ask14BasinTerm(row, vs30, z1Km);
  return parts;
}

/** The paper's California Z1ref (km) for Vs30 in m/s. */
export function ask14DefaultZ1Km(vs30: number): number {
  return Math.exp((-7.67 / 4) * Math.log((vs30 ** 4 + 610 ** 4) / (1360 ** 4 + 610 ** 4))) / 1000;
}

/** f10 (ln units) for Vs30 in m/s and Z1 in km; 0 where Z1 is not given (the default). */
export function ask14BasinTerm(row: Ask14Row, vs30: number, z1Km: number | undefined): number {
  if (z1Km === undefined) return 0;
  const slope = vs30 <= 200 ? row.a43 : vs30 <= 300 ? row.a44 : vs30 <= 500 ? row.a45 : row.a46;
  return slope * Math.log((z1Km + 0.01) / (ask14DefaultZ1Km(vs30) + 0.01));
}

/** Median (ln units) and standard deviations of one row for one rupture–site pair, written into `out`. */
export function ask14PairPrediction(
  t: Ask14RuptureTerms,
  d: Ask14Distances,
  site: SiteContext,
  out: PairPrediction = emptyPairPrediction(),
): PairPrediction {
  const { row } = t;
  const parts = siteAt(t.site, row, site);
  const rockLn = t.sourceLn + ask14PathTerm(t, d);
  const sa1180 = Math.exp(rockLn + parts.rockSiteLn);
  const lnMedian =
    rockLn + siteTermFrom(row, site.vs30, parts.lnRatio, parts.expNLnRatio, sa1180) + parts.basin;
  const slope = siteSlopeFrom(row, site.vs30, parts.ratioPowN, sa1180);
  const phiA = site.vs30Measured ? t.phiAMeasured : t.phiAEstimated;
  const phiB2 = phiA * phiA - K.phiAmp * K.phiAmp;
  const phi = Math.sqrt(phiB2 * (1 + slope) ** 2 + K.phiAmp * K.phiAmp);
  const tau = t.tauA * (1 + slope);
  out.lnMedian = lnMedian;
  out.tau = tau;
  out.phi = phi;
  out.sigma = Math.sqrt(phi * phi + tau * tau);
  return out;
}

/** Validity: the paper's abstract (M, Rrup, periods) and its stated Vs30 range (from memory). */
export const ASK14_VALIDITY: ValidityRange = Object.freeze({
  magnitude: [3, 8.5],
  distanceKm: [0, 300],
  vs30: [180, 1000],
} as const);

function ruptureOf(input: GmmInput): Ask14Rupture {
  requireInputs(NAME, input, ['magnitude', 'rakeDeg', 'dipDeg', 'ztorKm', 'widthKm']);
  return {
    magnitude: input.magnitude,
    mechanism: ask14MechanismFromRake(input.rakeDeg),
    dipDeg: input.dipDeg,
    ztorKm: input.ztorKm,
    widthKm: input.widthKm,
  };
}

function checkPair(input: GmmInput): void {
  requireInputs(NAME, input, ['rrupKm', 'rjbKm', 'rxKm', 'ry0Km', 'vs30', 'z1Km']);
}

function notesOf(input: GmmInput): string[] {
  return crustalValidityNotes(NAME, ASK14_VALIDITY, input, input.rrupKm);
}

/**
 * ASK14 median and standard deviations for one measure (PGA and PSA in g, PGV in cm/s; all in
 * ln units), from the rupture, distances (Rrup, Rjb, Rx, Ry0) and site of the input.
 */
export function predictAsk14(input: GmmInput, measure: Measure): GmmPrediction {
  const rupture = ruptureOf(input);
  checkPair(input);
  const notes = notesOf(input);
  const applicable = notes.length === 0;
  const predictRow = (row: Ask14Row): GmmPrediction => ({
    ...ask14PairPrediction(ask14RuptureTerms(row, rupture), input, input),
    applicable,
    notes,
  });
  return predictSplit(SPLIT, measure, predictRow);
}

/** The model as rupture terms and pair prediction, for the fast path (split-prepare.ts): the same functions predict() uses. */
const SPLIT: SplitModel<Ask14Row, Ask14RuptureTerms> = {
  name: NAME,
  table: ASK14_TABLE,
  pgv: ASK14_PGV,
  distances: ['rrupKm', 'rjbKm', 'rxKm', 'ry0Km'],
  checkMeasure: requirePositivePeriod,
  checkRupture: (rupture) => void ruptureOf(rupture as GmmInput),
  ruptureTerms: (row, rupture) => ask14RuptureTerms(row, ruptureOf(rupture as GmmInput)),
  pairPrediction: (terms, pair, out) => void ask14PairPrediction(terms, pair, pair, out),
  // notesOf's checks, answered without building the notes.
  applicable: (pair) =>
    pair.setting === 'crustal' && insideValidity(ASK14_VALIDITY, pair, pair.rrupKm),
};

/** Abrahamson, Silva & Kamai (2014) for shallow crustal earthquakes (Rrup): PGA, PGV, PSA 0.01–10 s. */
export const ask14: GroundMotionModel = assembleModel({
  name: NAME,
  citation:
    'Abrahamson, N. A., Silva, W. J. & Kamai, R. (2014). Summary of the ASK14 ground motion relation for active crustal regions. Earthquake Spectra 30(3), 1025–1055.',
  settings: ['crustal'],
  distanceMetric: 'rrup',
  periodsS: ASK14_TABLE.saPeriodsS,
  hasPga: true,
  hasPgv: true,
  validity: ASK14_VALIDITY,
  predict: predictAsk14,
  prepareMeasures: splitPrepareMeasures(SPLIT),
});

/**
 * CB14 — Campbell, K. W. & Bozorgnia, Y. (2014), "NGA-West2 ground motion model for the average
 * horizontal components of PGA, PGV, and 5% damped linear acceleration response spectra",
 * Earthquake Spectra 30(3), 1087–1115, doi:10.1193/062913EQS175M. No erratum known to us that
 * changes the equations. Coefficients: cb14-coefficients.ts (the published Tables 1 and 2).
 *
 * ln Y = f_mag + f_dis + f_flt + f_hng + f_site + f_sed + f_hyp + f_dip + f_atn
 * (the paper's model equations as recalled; from memory), and for PSA at T < 0.25 s, Y = PGA where Y < PGA.
 *   f_mag  = c0 + c1 M + c2 (M − 4.5)₊ + c3 (M − 5.5)₊ + c4 (M − 6.5)₊ (each hinge term active above it);
 *   f_dis  = (c5 + c6 M) ln √(Rrup² + c7²);
 *   f_flt  = (c8 F_RV + c9 F_NM) · f_flt,M, f_flt,M = 0 (M ≤ 4.5), M − 4.5 (≤ 5.5), 1 above;
 *            F_RV = 1 for 30° < rake < 150°, F_NM = 1 for −150° < rake < −30°;
 *   f_hng  = c10 f_Rx f_Rrup f_M f_Z f_δ, the hanging-wall term:
 *            f_Rx = 0 for Rx < 0; h1 + h2 (Rx/R1) + h3 (Rx/R1)² for 0 ≤ Rx < R1;
 *                   max(h4 + h5 x + h6 x², 0), x = (Rx − R1)/(R2 − R1), for Rx ≥ R1;
 *                   R1 = W cos δ, R2 = 62 M − 350 (km);
 *            f_Rrup = (Rrup − Rjb)/Rrup (1 at Rrup = 0);
 *            f_M = 0 (M ≤ 5.5), (M − 5.5)[1 + a2 (M − 6.5)] (≤ 6.5), 1 + a2 (M − 6.5) above;
 *            f_Z = 1 − 0.06 Ztor for Ztor ≤ 16.66 km, else 0; f_δ = (90 − δ)/45;
 *   f_site = c11 ln(Vs30/k1) + k2 [ln(A1100 + c (Vs30/k1)ⁿ) − ln(A1100 + c)] for Vs30 ≤ k1,
 *            (c11 + k2 n) ln(Vs30/k1) above; A1100 the model's median PGA (g) at Vs30 = 1100 m/s;
 *   f_sed  = c14 (Z2.5 − 1) for Z2.5 ≤ 1 km; 0 up to 3 km; c16 k3 e^−0.75 [1 − e^(−0.25 (Z2.5 − 3))] above;
 *   f_hyp  = f_hyp,H f_hyp,M, f_hyp,H = 0 (Zhyp ≤ 7 km), Zhyp − 7 (≤ 20), 13 above;
 *            f_hyp,M = c17 (M ≤ 5.5), c17 + (c18 − c17)(M − 5.5) (≤ 6.5), c18 above;
 *   f_dip  = c19 δ (M ≤ 4.5), c19 (5.5 − M) δ (≤ 5.5), 0 above (δ in degrees);
 *   f_atn  = (c20 + Δc20)(Rrup − 80) for Rrup > 80 km, else 0 (Δc20 = 0, California and global).
 * The Japan terms (S_J) are off. Where the site gives no Z2.5, the paper's California default
 * ln Z2.5 = 7.089 − 1.144 ln Vs30 (Z2.5 in km) is used; A1100 always uses the default for
 * Vs30 = 1100 m/s (its reference-rock condition).
 *
 * Standard deviations (the paper's aleatory-variability model, as recalled), ln units: τ_lnY and φ_lnY ramp linearly in
 * M from (τ1, φ1) at M ≤ 4.5 to (τ2, φ2) at M ≥ 5.5; with α = ∂f_site/∂ln A1100
 *   = k2 A1100 [(A1100 + c (Vs30/k1)ⁿ)⁻¹ − (A1100 + c)⁻¹] for Vs30 < k1 (else 0),
 *   τ = √(τ_lnY² + α² τ_lnPGA² + 2 α ρ τ_lnY τ_lnPGA),
 *   φ = √(φ_lnYB² + φ_lnAF² + α² φ_lnPGAB² + 2 α ρ φ_lnYB φ_lnPGAB), φ_lnXB = √(φ_lnX² − φ_lnAF²),
 *   σ = √(τ² + φ²). Where Vs30 ≥ k1, τ and φ equal the table's (ramped) values.
 *
 * Inputs: magnitude M (moment magnitude); rrupKm, rjbKm, rxKm (km); ztorKm, hypoDepthKm,
 * widthKm (km); dipDeg, rakeDeg (degrees); vs30 (m/s); z2p5Km (km, optional). Output: ln of the
 * median, ln(g) for PGA and 5%-damped RotD50 PSA, ln(cm/s) for PGV; sigma, tau, phi in
 * natural-log units. Distance metric: Rrup.
 *
 * Validity (the paper's stated ranges, from memory): M 3.3–8.5 strike-slip, 3.3–8.0 reverse,
 * 3.3–7.5 normal; Rrup 0–300 km; Vs30 150–1500 m/s; Zhyp 0–20 km; Ztor 0–20 km; dip 15–90°;
 * Z2.5 0–10 km; periods PGA, PGV and PSA 0.01–10 s. Outside, finite numbers with applicable: false.
 *
 * Written once: cb14RuptureTerms (the rupture's source terms per row) and cb14PairPrediction
 * (distance, hanging-wall, site, basin and anelastic terms, A1100 and the PGA floor per pair);
 * predict() and the fast path (split-prepare.ts) both call them. How the table is checked:
 * test/engine/motion/cb14.vectors.test.ts (independent reference vectors, 1e-4 in ln units).
 */
import { toRadians } from '../units.ts';
import { hypot2 } from './fast-math.ts';
import { rowMemo } from './prepared-period.ts';
import { CB14_CONSTANTS as K, CB14_TABLE, CB14_PGV, type Cb14Row } from './cb14-coefficients.ts';
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
  RuptureContext,
  ValidityRange,
} from './types.ts';
import { crustalValidityNotes, insideValidity, requireInputs, within } from './validity.ts';

const NAME = 'CB14';

export type Cb14Mechanism = RakeClass;

/** The paper's rake classes (rake-classes.ts): reverse 30..150, normal −150..−30 (open). */
export const cb14MechanismFromRake: (rakeDeg: number) => Cb14Mechanism = openRakeClass;

/** The earthquake and path as the equation sees them; distances and depths in km, dip in degrees. */
export interface Cb14Scenario {
  readonly magnitude: number;
  readonly mechanism: Cb14Mechanism;
  readonly rrupKm: number;
  readonly rjbKm: number;
  readonly rxKm: number;
  readonly ztorKm: number;
  readonly hypoDepthKm: number;
  readonly widthKm: number;
  readonly dipDeg: number;
}

/** f_mag (ln units) for moment magnitude M. */
export function cb14MagnitudeTerm(row: Cb14Row, m: number): number {
  const above = (hinge: number): number => Math.max(m - hinge, 0);
  return row.c0 + row.c1 * m + row.c2 * above(4.5) + row.c3 * above(5.5) + row.c4 * above(6.5);
}

/** f_dis (ln units) for Rrup in km. */
export function cb14DistanceTerm(row: Cb14Row, m: number, rrupKm: number): number {
  return (row.c5 + row.c6 * m) * Math.log(hypot2(rrupKm, row.c7));
}

/** f_flt (ln units): style of faulting, faded in between M 4.5 and 5.5. */
export function cb14StyleTerm(row: Cb14Row, m: number, mechanism: Cb14Mechanism): number {
  const fade = Math.min(Math.max(m - 4.5, 0), 1);
  const factor = mechanism === 'reverse' ? row.c8 : mechanism === 'normal' ? row.c9 : 0;
  return factor * fade;
}

/**
 * f_hng,Rx of the hanging-wall term for Rx ≥ 0 (km), R1 = W cos δ and R2 = 62 M − 350 (km):
 * h1 + h2 (Rx/R1) + h3 (Rx/R1)² below R1, max(h4 + h5 x + h6 x², 0) with x = (Rx − R1)/(R2 − R1)
 * from R1, evaluated as published also where R2 < R1 (small events on wide ruptures), where x is
 * negative. At R2 = R1 exactly the quadratic's limit beyond R1 is 0 (h6 < 0 in every row).
 */
export function cb14HangingWallRxTaper(
  row: Cb14Row,
  rxKm: number,
  r1Km: number,
  r2Km: number,
): number {
  if (rxKm < r1Km) {
    const x = rxKm / r1Km;
    return row.h1 + row.h2 * x + row.h3 * x * x;
  }
  if (r2Km === r1Km) return rxKm === r1Km ? K.h4 : 0;
  const x = (rxKm - r1Km) / (r2Km - r1Km);
  return Math.max(K.h4 + row.h5 * x + row.h6 * x * x, 0);
}

/** c10 f_M f_Z f_δ: the factors of f_hng that depend on the rupture alone (0 where the term is off). */
export function cb14HangingWallScale(
  row: Cb14Row,
  m: number,
  ztorKm: number,
  dipDeg: number,
): number {
  if (m <= 5.5 || ztorKm > 16.66) return 0;
  const fM = m <= 6.5 ? (m - 5.5) * (1 + row.a2 * (m - 6.5)) : 1 + row.a2 * (m - 6.5);
  const fZ = 1 - 0.06 * ztorKm;
  const fDip = (90 - dipDeg) / 45;
  return row.c10 * fM * fZ * fDip;
}

/** The rupture's hanging-wall geometry: R1 = W cos δ and R2 = 62 M − 350, km. */
interface HangingWallGeometry {
  readonly r1Km: number;
  readonly r2Km: number;
}

const hangingWallGeometry = (
  s: Pick<Cb14Scenario, 'widthKm' | 'dipDeg' | 'magnitude'>,
): HangingWallGeometry => ({
  r1Km: s.widthKm * Math.cos(toRadians(s.dipDeg)),
  r2Km: 62 * s.magnitude - 350,
});

/** f_Rrup = (Rrup − Rjb)/Rrup, 1 at Rrup = 0. */
function rrupTaper(rrupKm: number, rjbKm: number): number {
  // Rjb ≤ Rrup by definition; the clamp keeps rounding in the distance code from making this negative.
  return rrupKm === 0 ? 1 : Math.max(rrupKm - rjbKm, 0) / rrupKm;
}

/** f_hng of a pair from the rupture's scale (cb14HangingWallScale) and geometry. */
function hangingWallOfPair(
  row: Cb14Row,
  scale: number,
  g: HangingWallGeometry,
  rxKm: number,
  fRrup: number,
): number {
  if (rxKm < 0 || scale === 0) return 0;
  return scale * cb14HangingWallRxTaper(row, rxKm, g.r1Km, g.r2Km) * fRrup;
}

/** f_hng (ln units): the hanging-wall term; zero on the footwall (Rx < 0) and for vertical faults. */
export function cb14HangingWallTerm(row: Cb14Row, s: Cb14Scenario): number {
  return hangingWallOfPair(
    row,
    cb14HangingWallScale(row, s.magnitude, s.ztorKm, s.dipDeg),
    hangingWallGeometry(s),
    s.rxKm,
    rrupTaper(s.rrupKm, s.rjbKm),
  );
}

/** f_site (ln units) for Vs30 in m/s and A1100 in g (the Japan term off). */
export function cb14SiteTerm(row: Cb14Row, vs30: number, a1100G: number): number {
  const lnRatio = Math.log(vs30 / row.k1);
  return siteTermFrom(row, vs30, lnRatio, K.c * Math.exp(K.n * lnRatio), a1100G);
}

/** f_site from ln(Vs30 / k1) and c (Vs30 / k1)^n, the parts that depend on the site alone. */
function siteTermFrom(
  row: Cb14Row,
  vs30: number,
  lnRatio: number,
  cRatioPowN: number,
  a1100G: number,
): number {
  if (vs30 > row.k1) return (row.c11 + row.k2 * K.n) * lnRatio;
  return row.c11 * lnRatio + row.k2 * (Math.log(a1100G + cRatioPowN) - Math.log(a1100G + K.c));
}

/**
 * What a row's site, basin and σ terms need of the site alone, for the last site it was asked
 * for: the fast path evaluates a row over all of a site's pairs in turn, so these are worked out
 * once per row and site rather than once per pair, from the same expressions.
 */
interface Cb14SiteParts {
  vs30: number;
  /** Z2.5 as given (km), or undefined for the default of Vs30. */
  z2p5Given: number | undefined;
  z2p5Km: number;
  lnRatio: number;
  cRatioPowN: number;
  basin: number;
  /** (Vs30 / k1)^n as the nonlinear σ correction has it. */
  ratioPowN: number;
}

/** Each row's site parts, made when the row is first asked for (none of a site yet). */
const sitePartsOf = rowMemo((_row: Cb14Row): Cb14SiteParts => ({
  vs30: NaN,
  z2p5Given: undefined,
  z2p5Km: NaN,
  lnRatio: NaN,
  cRatioPowN: NaN,
  basin: NaN,
  ratioPowN: NaN,
}));

/** The row's site parts for Vs30 (m/s) and Z2.5 as given, worked out if the site is not the last one. */
function siteAt(
  parts: Cb14SiteParts,
  row: Cb14Row,
  vs30: number,
  z2p5Given: number | undefined,
): Cb14SiteParts {
  if (parts.vs30 === vs30 && parts.z2p5Given === z2p5Given) return parts;
  const z2p5Km = z2p5Given ?? cb14DefaultZ2p5Km(vs30);
  const lnRatio = Math.log(vs30 / row.k1);
  parts.vs30 = vs30;
  parts.z2p5Given = z2p5Given;
  parts.z2p5Km = z2p5Km;
  parts.lnRatio = lnRatio;
  parts.cRatioPowN = K.c * Math.exp(K.n * lnRatio);
  parts.basin = cb14BasinTerm(row, z2p5Km);
  parts.ratioPowN = (vs30 / row.k1) ** K.n;
  return parts;
}

/** The paper's California default depth to Vs = 2.5 km/s (km) for Vs30 in m/s. */
export function cb14DefaultZ2p5Km(vs30: number): number {
  return Math.exp(7.089 - 1.144 * Math.log(vs30));
}

/** f_sed (ln units): shallow-sediment and deep-basin effects for Z2.5 in km. */
export function cb14BasinTerm(row: Cb14Row, z2p5Km: number): number {
  if (z2p5Km <= 1) return row.c14 * (z2p5Km - 1);
  if (z2p5Km <= 3) return 0;
  return row.c16 * row.k3 * Math.exp(-0.75) * (1 - Math.exp(-0.25 * (z2p5Km - 3)));
}

/** f_hyp (ln units) for hypocentral depth in km. */
export function cb14HypocentreTerm(row: Cb14Row, m: number, hypoDepthKm: number): number {
  const fH = Math.min(Math.max(hypoDepthKm - 7, 0), 13);
  const fM = m <= 5.5 ? row.c17 : m <= 6.5 ? row.c17 + (row.c18 - row.c17) * (m - 5.5) : row.c18;
  return fH * fM;
}

/** f_dip (ln units) for dip in degrees; matters only below M 5.5. */
export function cb14DipTerm(row: Cb14Row, m: number, dipDeg: number): number {
  if (m <= 4.5) return row.c19 * dipDeg;
  if (m <= 5.5) return row.c19 * (5.5 - m) * dipDeg;
  return 0;
}

/** f_atn (ln units): extra anelastic attenuation beyond Rrup = 80 km. */
export function cb14AnelasticTerm(row: Cb14Row, rrupKm: number): number {
  return rrupKm > 80 ? (row.c20 + K.deltaC20) * (rrupKm - 80) : 0;
}

/** The terms of one row that depend on the rupture alone: f_mag + f_flt + f_hyp + f_dip (ln units). */
export function cb14SourceTerm(
  row: Cb14Row,
  s: Omit<Cb14Scenario, 'rrupKm' | 'rjbKm' | 'rxKm'>,
): number {
  return (
    cb14MagnitudeTerm(row, s.magnitude) +
    cb14StyleTerm(row, s.magnitude, s.mechanism) +
    cb14HypocentreTerm(row, s.magnitude, s.hypoDepthKm) +
    cb14DipTerm(row, s.magnitude, s.dipDeg)
  );
}

/** The source, distance, hanging-wall and anelastic terms of one row (ln units): all but site and basin. */
function lnRockPath(
  row: Cb14Row,
  source: number,
  m: number,
  rrupKm: number,
  hangingWall: number,
): number {
  return source + cb14DistanceTerm(row, m, rrupKm) + hangingWall + cb14AnelasticTerm(row, rrupKm);
}

/** Vs30 of the paper's reference rock, m/s. */
export const CB14_ROCK_VS30 = 1100;

/** Z2.5 (km) of the reference rock, the paper's default for Vs30 = 1100 m/s. */
const ROCK_Z2P5_KM = cb14DefaultZ2p5Km(CB14_ROCK_VS30);

/**
 * The PGA row's site and basin terms on the reference rock (Vs30 = 1100 m/s, its default Z2.5),
 * ln units. On rock above k1 the site term does not depend on A1100, so any value serves.
 */
const ROCK_SITE_LN =
  cb14SiteTerm(CB14_TABLE.pga, CB14_ROCK_VS30, 0) + cb14BasinTerm(CB14_TABLE.pga, ROCK_Z2P5_KM);

/** Magnitudes 4.5 and 5.5 bound the ramp of τ and φ between the small- and large-event values. */
const rampM = (m: number, small: number, large: number): number =>
  m <= 4.5 ? small : m >= 5.5 ? large : large + (small - large) * (5.5 - m);

/** The magnitude-ramped τ and φ of a row and of the PGA row (ln units): what σ needs of the rupture. */
interface Cb14SigmaTerms {
  readonly tauY: number;
  readonly phiY: number;
  readonly tauPga: number;
  readonly phiPga: number;
}

const sigmaTerms = (row: Cb14Row, m: number): Cb14SigmaTerms => ({
  tauY: rampM(m, row.tau1, row.tau2),
  phiY: rampM(m, row.phi1, row.phi2),
  tauPga: rampM(m, CB14_TABLE.pga.tau1, CB14_TABLE.pga.tau2),
  phiPga: rampM(m, CB14_TABLE.pga.phi1, CB14_TABLE.pga.phi2),
});

/** τ, φ and σ (ln units) of a row, with the nonlinear-site correction for Vs30 (m/s) below k1. */
export function cb14Sigma(
  row: Cb14Row,
  m: number,
  vs30: number,
  a1100G: number,
): { tau: number; phi: number; sigma: number } {
  return sigmaInto(
    row,
    sigmaTerms(row, m),
    vs30,
    (vs30 / row.k1) ** K.n,
    a1100G,
    emptyPairPrediction(),
  );
}

/** cb14Sigma written into `out` from the rupture's ramped values and (Vs30 / k1)^n. */
function sigmaInto(
  row: Cb14Row,
  t: Cb14SigmaTerms,
  vs30: number,
  ratioPowN: number,
  a1100G: number,
  out: PairPrediction,
): PairPrediction {
  const { tauY, phiY, tauPga } = t;
  const alpha =
    vs30 < row.k1 ? row.k2 * a1100G * (1 / (a1100G + K.c * ratioPowN) - 1 / (a1100G + K.c)) : 0;
  if (alpha === 0) {
    out.tau = tauY;
    out.phi = phiY;
    out.sigma = hypot2(tauY, phiY);
    return out;
  }
  const phiYB = Math.sqrt(Math.max(phiY * phiY - row.phiLnAF * row.phiLnAF, 0));
  const phiPgaB = Math.sqrt(
    Math.max(t.phiPga * t.phiPga - CB14_TABLE.pga.phiLnAF * CB14_TABLE.pga.phiLnAF, 0),
  );
  const tau = Math.sqrt(
    Math.max(tauY ** 2 + alpha ** 2 * tauPga ** 2 + 2 * alpha * row.rho * tauY * tauPga, 0),
  );
  const phi = Math.sqrt(
    Math.max(
      phiYB ** 2 +
        row.phiLnAF ** 2 +
        alpha ** 2 * phiPgaB ** 2 +
        2 * alpha * row.rho * phiYB * phiPgaB,
      0,
    ),
  );
  out.tau = tau;
  out.phi = phi;
  out.sigma = hypot2(tau, phi);
  return out;
}

/** Magnitude validity by mechanism (the paper's ranges, from memory). */
export const CB14_MAGNITUDE_RANGE: Readonly<Record<Cb14Mechanism, readonly [number, number]>> =
  Object.freeze({
    'strike-slip': [3.3, 8.5],
    reverse: [3.3, 8.0],
    normal: [3.3, 7.5],
  });

/** Validity over all mechanisms (strike-slip's magnitude range; the others stop lower). */
export const CB14_VALIDITY: ValidityRange = Object.freeze({
  magnitude: CB14_MAGNITUDE_RANGE['strike-slip'],
  distanceKm: [0, 300],
  vs30: [150, 1500],
  depthKm: [0, 20],
} as const);

function ruptureOf(rupture: RuptureContext): Omit<Cb14Scenario, 'rrupKm' | 'rjbKm' | 'rxKm'> {
  requireInputs(NAME, rupture, [
    'magnitude',
    'rakeDeg',
    'dipDeg',
    'ztorKm',
    'hypoDepthKm',
    'widthKm',
  ]);
  return {
    magnitude: rupture.magnitude,
    mechanism: cb14MechanismFromRake(rupture.rakeDeg),
    ztorKm: rupture.ztorKm,
    hypoDepthKm: rupture.hypoDepthKm,
    widthKm: rupture.widthKm,
    dipDeg: rupture.dipDeg,
  };
}

function scenarioOf(input: GmmInput): Cb14Scenario {
  const rupture = ruptureOf(input);
  requireInputs(NAME, input, ['rrupKm', 'rjbKm', 'rxKm', 'vs30', 'z2p5Km']);
  return { ...rupture, rrupKm: input.rrupKm, rjbKm: input.rjbKm, rxKm: input.rxKm };
}

/** CB14_VALIDITY with each mechanism's own magnitude range. */
const MAGNITUDE_VALIDITY: Readonly<Record<Cb14Mechanism, ValidityRange>> = Object.freeze({
  'strike-slip': { ...CB14_VALIDITY, magnitude: CB14_MAGNITUDE_RANGE['strike-slip'] },
  reverse: { ...CB14_VALIDITY, magnitude: CB14_MAGNITUDE_RANGE.reverse },
  normal: { ...CB14_VALIDITY, magnitude: CB14_MAGNITUDE_RANGE.normal },
});

function notesOf(input: GmmInput, s: Cb14Scenario): string[] {
  const notes = crustalValidityNotes(NAME, MAGNITUDE_VALIDITY[s.mechanism], input, s.rrupKm);
  const outside = (label: string, value: number, min: number, max: number, unit: string): void => {
    if (value < min || value > max)
      notes.push(
        `${NAME}: ${label} ${Math.round(value * 100) / 100}${unit} is outside its range ${min}–${max}${unit}`,
      );
  };
  outside('depth to top of rupture', s.ztorKm, 0, 20, ' km');
  outside('dip', s.dipDeg, 15, 90, '°');
  if (input.z2p5Km !== undefined) outside('Z2.5', input.z2p5Km, 0, 10, ' km');
  return notes;
}

/**
 * CB14 median and standard deviations for one measure (PGA and PSA in g, PGV in cm/s; all in
 * ln units), from the rupture, distances (Rrup, Rjb, Rx) and site of the input.
 */
export function predictCb14(input: GmmInput, measure: Measure): GmmPrediction {
  const s = scenarioOf(input);
  const notes = notesOf(input, s);
  const applicable = notes.length === 0;
  const predictRow = (row: Cb14Row): GmmPrediction => ({
    ...cb14PairPrediction(cb14RuptureTerms(row, s), input),
    applicable,
    notes,
  });
  return predictSplit(SPLIT, measure, predictRow);
}

/** What one row needs of the rupture alone: the rupture, the source, hanging-wall and σ terms of the row and of the PGA row. */
export interface Cb14RuptureTerms {
  readonly row: Cb14Row;
  readonly rupture: Omit<Cb14Scenario, 'rrupKm' | 'rjbKm' | 'rxKm'>;
  readonly source: number;
  readonly pgaSource: number;
  readonly hangingWallScale: number;
  readonly pgaHangingWallScale: number;
  readonly geometry: HangingWallGeometry;
  readonly sigma: Cb14SigmaTerms;
  /** The row's and the PGA row's site parts, shared by every rupture's terms of the row. */
  readonly site: Cb14SiteParts;
  readonly pgaSite: Cb14SiteParts;
}

export function cb14RuptureTerms(
  row: Cb14Row,
  rupture: Omit<Cb14Scenario, 'rrupKm' | 'rjbKm' | 'rxKm'>,
): Cb14RuptureTerms {
  const { magnitude: m, ztorKm, dipDeg } = rupture;
  const pgaSource = cb14SourceTerm(CB14_TABLE.pga, rupture);
  const pgaHangingWallScale = cb14HangingWallScale(CB14_TABLE.pga, m, ztorKm, dipDeg);
  return {
    row,
    rupture,
    source: row === CB14_TABLE.pga ? pgaSource : cb14SourceTerm(row, rupture),
    pgaSource,
    hangingWallScale:
      row === CB14_TABLE.pga ? pgaHangingWallScale : cb14HangingWallScale(row, m, ztorKm, dipDeg),
    pgaHangingWallScale,
    geometry: hangingWallGeometry(rupture),
    sigma: sigmaTerms(row, m),
    site: sitePartsOf(row),
    pgaSite: sitePartsOf(CB14_TABLE.pga),
  };
}

/**
 * Median and standard deviations (ln units) of one row for one rupture–site pair, written into
 * `out`: A1100 from the PGA row on reference rock, the row's ln median, and for PSA below
 * 0.25 s not less than PGA.
 */
export function cb14PairPrediction(
  t: Cb14RuptureTerms,
  pair: GmmInput,
  out: PairPrediction = emptyPairPrediction(),
): PairPrediction {
  const { row } = t;
  const m = t.rupture.magnitude;
  const { rrupKm, rxKm, vs30 } = pair;
  const site = siteAt(t.site, row, vs30, pair.z2p5Km);
  const fRrup = rrupTaper(rrupKm, pair.rjbKm);
  const pgaHangingWall = hangingWallOfPair(
    CB14_TABLE.pga,
    t.pgaHangingWallScale,
    t.geometry,
    rxKm,
    fRrup,
  );
  const pgaRockPath = lnRockPath(CB14_TABLE.pga, t.pgaSource, m, rrupKm, pgaHangingWall);
  const a1100G = Math.exp(pgaRockPath + ROCK_SITE_LN);
  const rockPath =
    row === CB14_TABLE.pga
      ? pgaRockPath
      : lnRockPath(
          row,
          t.source,
          m,
          rrupKm,
          hangingWallOfPair(row, t.hangingWallScale, t.geometry, rxKm, fRrup),
        );
  const unfloored =
    rockPath + siteTermFrom(row, vs30, site.lnRatio, site.cRatioPowN, a1100G) + site.basin;
  // CB14: at periods under 0.25 s the spectral acceleration is not allowed below PGA.
  if (row.periodS > 0 && row.periodS < 0.25) {
    const pga = siteAt(t.pgaSite, CB14_TABLE.pga, vs30, pair.z2p5Km);
    out.lnMedian = Math.max(
      unfloored,
      pgaRockPath +
        siteTermFrom(CB14_TABLE.pga, vs30, pga.lnRatio, pga.cRatioPowN, a1100G) +
        pga.basin,
    );
  } else out.lnMedian = unfloored;
  return sigmaInto(row, t.sigma, vs30, site.ratioPowN, a1100G, out);
}

/** The model as rupture terms and pair prediction, for the fast path (split-prepare.ts): the same functions predict() uses. */
const SPLIT: SplitModel<Cb14Row, Cb14RuptureTerms> = {
  name: NAME,
  table: CB14_TABLE,
  pgv: CB14_PGV,
  distances: ['rrupKm', 'rjbKm', 'rxKm'],
  checkMeasure: requirePositivePeriod,
  checkRupture: (rupture) => void ruptureOf(rupture),
  ruptureTerms: (row, rupture) => cb14RuptureTerms(row, ruptureOf(rupture)),
  pairPrediction: (terms, pair, out) => void cb14PairPrediction(terms, pair, out),
  // notesOf's checks, answered without building the notes.
  applicable: (pair) =>
    pair.setting === 'crustal' &&
    within(pair.ztorKm, 0, 20) &&
    within(pair.dipDeg, 15, 90) &&
    (pair.z2p5Km === undefined || within(pair.z2p5Km, 0, 10)) &&
    insideValidity(MAGNITUDE_VALIDITY[cb14MechanismFromRake(pair.rakeDeg)], pair, pair.rrupKm),
};

/** Campbell & Bozorgnia (2014) for shallow crustal earthquakes (Rrup): PGA, PGV, PSA 0.01–10 s. */
export const cb14: GroundMotionModel = assembleModel({
  name: NAME,
  citation:
    'Campbell, K. W. & Bozorgnia, Y. (2014). NGA-West2 ground motion model for the average horizontal components of PGA, PGV, and 5% damped linear acceleration response spectra. Earthquake Spectra 30(3), 1087–1115.',
  settings: ['crustal'],
  distanceMetric: 'rrup',
  periodsS: CB14_TABLE.saPeriodsS,
  hasPga: true,
  hasPgv: true,
  validity: CB14_VALIDITY,
  predict: predictCb14,
  prepareMeasures: splitPrepareMeasures(SPLIT),
});

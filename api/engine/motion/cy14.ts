/**
 * CY14 — Chiou, B. S.-J. & Youngs, R. R. (2014), "Update of the Chiou and Youngs NGA model for the
 * average horizontal component of peak ground motion and response spectra", Earthquake Spectra
 * 30(3), 1117–1153, doi:10.1193/072813EQS219M. No erratum known to us that changes the equations.
 * Coefficients: cy14-coefficients.ts (the paper's table as updated in the NGA-West2 spreadsheet v5.7).
 *
 * The reference motion (Vs30 = 1130 m/s), California/global form (γ factors 1), directivity off
 * (ΔDPP = 0), as transcribed here from memory of the paper and checked against the reference
 * vectors (see below); with ch = cosh(2 max(M − 4.5, 0)):
 *   ln y_ref = c1 + (c1a + c1c/ch) F_RV + (c1b + c1d/ch) F_NM + (c7 + c7b/ch) ΔZtor
 *            + (c11 + c11b/ch) cos²δ + c2 (M − 6) + (c2 − c3)/cn ln(1 + e^(cn (cM − M)))
 *            + c4 ln(Rrup + c5 cosh(c6 max(M − cHM, 0))) + (c4a − c4) ln √(Rrup² + cRB²)
 *            + [cγ1 + cγ2 / cosh(max(M − cγ3, 0))] Rrup
 *            + c9 F_HW cos δ [c9a + (1 − c9a) tanh(Rx/c9b)] [1 − √(Rjb² + Ztor²)/(Rrup + 1)];
 *   (cos δ, not cos²δ, in the hanging-wall term: recalled both ways; the reference vectors settle it)
 *   ΔZtor = Ztor − E[Ztor], E[Ztor] = max(2.704 − 1.226 max(M − 5.849, 0), 0)² km for reverse
 *   faulting, max(2.673 − 1.136 max(M − 4.970, 0), 0)² km otherwise; F_HW = 1 for Rx ≥ 0.
 * The site:
 *   ln y = ln y_ref + φ1 min(ln(Vs30/1130), 0)
 *        + φ2 [e^(φ3 (min(Vs30, 1130) − 360)) − e^(φ3 (1130 − 360))] ln((y_ref + φ4)/φ4)
 *        + φ5 (1 − e^(−ΔZ1/φ6)),  ΔZ1 = Z1 − μZ1 (m),
 *   ln μZ1 = −7.15/4 ln((Vs30⁴ + 570.94⁴)/(1360⁴ + 570.94⁴)) (Z1 in m), the paper's California relation
 *   (570.94 m/s as the reference vectors have it: 571 reproduces their Z1 only to 7e-4 relative);
 *   where the site gives no Z1, Z1 = μZ1 and the basin term is 0.
 * Mechanism from rake as the paper classes it: reverse 30° ≤ λ ≤ 150°, normal −120° ≤ λ ≤ −60°,
 * otherwise strike-slip (a rake of −45° is strike-slip here and normal in ASK14, BSSA14 and CB14).
 * The PSA ≥ PGA rule at T ≤ 0.3 s that some records of the model apply is not applied: whether
 * the paper states it could not be checked (../shared/reference/gmm/README.md, open point 4).
 *
 * Standard deviations (the paper's aleatory model), ln units, with M̃ = min(max(M, 5), 6.5):
 *   τ = τ1 + (τ2 − τ1)(M̃ − 5)/1.5;
 *   NL0 = φ2 [e^(φ3 (min(Vs30, 1130) − 360)) − e^(φ3 (1130 − 360))] y_ref/(y_ref + φ4);
 *   φ = σ_NL0 = [σ1 + (σ2 − σ1)(M̃ − 5)/1.5] √(σ3 F_Inferred + 0.7 F_Measured + (1 + NL0)²);
 *   the between-event part (1 + NL0) τ is returned as `tau`, σ = √((1 + NL0)² τ² + σ_NL0²).
 *
 * Inputs: magnitude M (moment magnitude); rrupKm, rjbKm, rxKm (km); ztorKm (km); dipDeg, rakeDeg
 * (degrees); vs30 (m/s), vs30Measured; z1Km (km, optional). Output: ln of the median, ln(g) for
 * PGA and 5%-damped RotD50 PSA, ln(cm/s) for PGV; sigma, tau, phi in natural-log units.
 * Distance metric: Rrup.
 *
 * Validity (the paper's stated ranges, from memory): M 3.5–8.5 strike-slip, 3.5–8.0 reverse and
 * normal; Rrup 0–300 km; Vs30 180–1500 m/s; Ztor 0–20 km; periods PGA, PGV and PSA 0.01–10 s.
 * Outside, finite numbers with applicable: false.
 *
 * How it is checked: test/engine/motion/cy14.test.ts reproduces the reference vectors
 * (../shared/reference/gmm/vectors/cy14.json, an independent implementation of the paper) within 1e-4.
 */
import { toRadians, wrapDeg180 } from '../units.ts';
import { hypot2 } from './fast-math.ts';
import { CY14_TABLE, CY14_PGV, type Cy14Row } from './cy14-coefficients.ts';
import type { Measure } from './measure.ts';
import { assembleModel } from './model-assembly.ts';
import { rowMemo } from './prepared-period.ts';
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
import { crustalValidityNotes, insideValidity, requireInputs, within } from './validity.ts';

const NAME = 'CY14';
/** Vs30 of the reference motion y_ref, m/s. */
export const CY14_REFERENCE_VS30 = 1130;

export type Cy14Mechanism = 'strike-slip' | 'normal' | 'reverse';

/** The paper's rake classes (degrees, any turn): reverse 30..150, normal −120..−60 (closed). */
export function cy14MechanismFromRake(rakeDeg: number): Cy14Mechanism {
  const rake = wrapDeg180(rakeDeg);
  if (rake >= 30 && rake <= 150) return 'reverse';
  if (rake >= -120 && rake <= -60) return 'normal';
  return 'strike-slip';
}

/** The rupture as the equation sees it; Ztor in km, dip in degrees. */
export interface Cy14Rupture {
  readonly magnitude: number;
  readonly mechanism: Cy14Mechanism;
  readonly dipDeg: number;
  readonly ztorKm: number;
}

/** The distances the equation reads, km. */
export interface Cy14Distances {
  readonly rrupKm: number;
  readonly rjbKm: number;
  readonly rxKm: number;
}

/** The terms of one table row that depend on the rupture alone (computed once per rupture). */
export interface Cy14RuptureTerms {
  readonly row: Cy14Row;
  /** The source terms of ln y_ref: constant, style of faulting, ΔZtor, dip and magnitude scaling. */
  readonly sourceLn: number;
  /** c5 cosh(c6 max(M − cHM, 0)), the finite-fault term added to Rrup, km. */
  readonly nearFaultKm: number;
  /** cγ1 + cγ2 / cosh(max(M − cγ3, 0)), anelastic attenuation per km. */
  readonly anelasticPerKm: number;
  /** c9 cos δ, the hanging-wall amplitude. */
  readonly hangingWall: number;
  readonly ztorKm: number;
  /** τ(M) and the magnitude part of σ_NL0, ln units. */
  readonly tau: number;
  readonly sigmaM: number;
  /** The row's site parts, shared by every rupture's terms of the row. */
  readonly site: Cy14SiteParts;
}

/** E[Ztor] (km), the paper's expected depth to the top of rupture for the magnitude and mechanism. */
export function cy14ExpectedZtorKm(m: number, mechanism: Cy14Mechanism): number {
  const root =
    mechanism === 'reverse'
      ? 2.704 - 1.226 * Math.max(m - 5.849, 0)
      : 2.673 - 1.136 * Math.max(m - 4.97, 0);
  return Math.max(root, 0) ** 2;
}

/** The source terms of ln y_ref (ln units; see Cy14RuptureTerms.sourceLn). */
export function cy14SourceTerm(row: Cy14Row, r: Cy14Rupture): number {
  const m = r.magnitude;
  const ch = Math.cosh(2 * Math.max(m - 4.5, 0));
  const cos2 = Math.cos(toRadians(r.dipDeg)) ** 2;
  const style =
    r.mechanism === 'reverse'
      ? row.c1a + row.c1c / ch
      : r.mechanism === 'normal'
        ? row.c1b + row.c1d / ch
        : 0;
  const deltaZtorKm = r.ztorKm - cy14ExpectedZtorKm(m, r.mechanism);
  return (
    row.c1 +
    style +
    (row.c7 + row.c7b / ch) * deltaZtorKm +
    (row.c11 + row.c11b / ch) * cos2 +
    row.c2 * (m - 6) +
    ((row.c2 - row.c3) / row.cn) * Math.log(1 + Math.exp(row.cn * (row.cM - m)))
  );
}

/** The rupture's terms of one row (see Cy14RuptureTerms). */
export function cy14RuptureTerms(row: Cy14Row, r: Cy14Rupture): Cy14RuptureTerms {
  const m = r.magnitude;
  // Magnitudes 5 and 6.5 bound the ramp of the aleatory model between small and large events.
  const share = (Math.min(Math.max(m, 5), 6.5) - 5) / 1.5;
  return {
    row,
    sourceLn: cy14SourceTerm(row, r),
    nearFaultKm: row.c5 * Math.cosh(row.c6 * Math.max(m - row.cHM, 0)),
    anelasticPerKm: row.cgamma1 + row.cgamma2 / Math.cosh(Math.max(m - row.cgamma3, 0)),
    hangingWall: row.c9 * Math.cos(toRadians(r.dipDeg)),
    ztorKm: r.ztorKm,
    tau: row.tau1 + (row.tau2 - row.tau1) * share,
    sigmaM: row.sigma1 + (row.sigma2 - row.sigma1) * share,
    site: sitePartsOf(row),
  };
}

/** The distance and hanging-wall terms of ln y_ref (ln units): everything of the pair but the site. */
export function cy14PathTerm(t: Cy14RuptureTerms, d: Cy14Distances): number {
  const { row } = t;
  const spreading =
    row.c4 * Math.log(d.rrupKm + t.nearFaultKm) +
    (row.c4a - row.c4) * Math.log(hypot2(d.rrupKm, row.cRB));
  const hangingWall =
    d.rxKm >= 0
      ? t.hangingWall *
        (row.c9a + (1 - row.c9a) * Math.tanh(d.rxKm / row.c9b)) *
        (1 - hypot2(d.rjbKm, t.ztorKm) / (d.rrupKm + 1))
      : 0;
  return spreading + t.anelasticPerKm * d.rrupKm + hangingWall;
}

/** The paper's California mean Z1 (km) for Vs30 in m/s. */
export function cy14DefaultZ1Km(vs30: number): number {
  return (
    Math.exp((-7.15 / 4) * Math.log((vs30 ** 4 + 570.94 ** 4) / (1360 ** 4 + 570.94 ** 4))) / 1000
  );
}

/** The nonlinear site factor's Vs30 part: φ2 [e^(φ3 (min(Vs30, 1130) − 360)) − e^(φ3 (1130 − 360))]. */
function nonlinearStrength(row: Cy14Row, vs30: number): number {
  return (
    row.phi2 *
    (Math.exp(row.phi3 * (Math.min(vs30, CY14_REFERENCE_VS30) - 360)) -
      Math.exp(row.phi3 * (CY14_REFERENCE_VS30 - 360)))
  );
}

/** The site terms (ln units) for Vs30 in m/s, y_ref in g (cm/s for PGV) and Z1 in km (default when absent). */
export function cy14SiteTerm(
  row: Cy14Row,
  vs30: number,
  yRef: number,
  z1Km: number | undefined,
): number {
  return siteTermFrom(row, siteAt(emptySiteParts(), row, vs30, z1Km), yRef);
}

/** The site term from the parts of the site alone and the reference motion (g). */
const siteTermFrom = (row: Cy14Row, parts: Cy14SiteParts, yRef: number): number =>
  parts.linear + parts.strength * Math.log((yRef + row.phi4) / row.phi4) + parts.basin;

/** NL0 = ∂(site term)/∂ln y_ref, the nonlinear site term's response to the reference motion. */
export function cy14SiteSlope(row: Cy14Row, vs30: number, yRef: number): number {
  return (nonlinearStrength(row, vs30) * yRef) / (yRef + row.phi4);
}

/**
 * What a row's site term and NL0 need of the site alone, for the last site it was asked for: the
 * fast path evaluates a row over all of a site's pairs in turn, so these are worked out once per
 * row and site rather than once per pair, from the same expressions.
 */
interface Cy14SiteParts {
  vs30: number;
  /** Z1 as given (km), or undefined for none. */
  z1Given: number | undefined;
  /** φ1 min(ln(Vs30 / 1130), 0). */
  linear: number;
  /** nonlinearStrength of the row at Vs30. */
  strength: number;
  /** φ5 (1 − e^(−ΔZ1 / φ6)), ΔZ1 in m (0 where Z1 is not given). */
  basin: number;
}

const emptySiteParts = (): Cy14SiteParts => ({
  vs30: NaN,
  z1Given: undefined,
  linear: NaN,
  strength: NaN,
  basin: NaN,
});

/** Each row's site parts, made when the row is first asked for (none of a site yet). */
const sitePartsOf = rowMemo((_row: Cy14Row) => emptySiteParts());

function siteAt(
  parts: Cy14SiteParts,
  row: Cy14Row,
  vs30: number,
  z1Km: number | undefined,
): Cy14SiteParts {
  if (parts.vs30 === vs30 && parts.z1Given === z1Km) return parts;
  const deltaZ1M = z1Km === undefined ? 0 : (z1Km - cy14DefaultZ1Km(vs30)) * 1000;
  parts.vs30 = vs30;
  parts.z1Given = z1Km;
  parts.linear = row.phi1 * Math.min(Math.log(vs30 / CY14_REFERENCE_VS30), 0);
  parts.strength = nonlinearStrength(row, vs30);
  parts.basin = row.phi5 * (1 - Math.exp(-deltaZ1M / row.phi6));
  return parts;
}

/** Median (ln units) and standard deviations of one row for one rupture–site pair, written into `out`. */
export function cy14PairPrediction(
  t: Cy14RuptureTerms,
  d: Cy14Distances,
  site: SiteContext,
  out: PairPrediction = emptyPairPrediction(),
): PairPrediction {
  const { row } = t;
  const lnYRef = t.sourceLn + cy14PathTerm(t, d);
  const yRef = Math.exp(lnYRef);
  const parts = siteAt(t.site, row, site.vs30, site.z1Km);
  const lnMedian = lnYRef + siteTermFrom(row, parts, yRef);
  const onePlusNl0 = 1 + (parts.strength * yRef) / (yRef + row.phi4);
  const phi =
    t.sigmaM * Math.sqrt((site.vs30Measured ? 0.7 : row.sigma3) + onePlusNl0 * onePlusNl0);
  const tau = onePlusNl0 * t.tau;
  out.lnMedian = lnMedian;
  out.tau = tau;
  out.phi = phi;
  out.sigma = Math.sqrt(tau * tau + phi * phi);
  return out;
}

/** Magnitude validity by mechanism (the paper's ranges, from memory). */
export const CY14_MAGNITUDE_RANGE: Readonly<Record<Cy14Mechanism, readonly [number, number]>> =
  Object.freeze({
    'strike-slip': [3.5, 8.5],
    reverse: [3.5, 8.0],
    normal: [3.5, 8.0],
  });

/** Validity over all mechanisms (strike-slip's magnitude range; the others stop lower). */
export const CY14_VALIDITY: ValidityRange = Object.freeze({
  magnitude: CY14_MAGNITUDE_RANGE['strike-slip'],
  distanceKm: [0, 300],
  vs30: [180, 1500],
} as const);

function ruptureOf(input: GmmInput): Cy14Rupture {
  requireInputs(NAME, input, ['magnitude', 'rakeDeg', 'dipDeg', 'ztorKm']);
  return {
    magnitude: input.magnitude,
    mechanism: cy14MechanismFromRake(input.rakeDeg),
    dipDeg: input.dipDeg,
    ztorKm: input.ztorKm,
  };
}

function checkPair(input: GmmInput): void {
  requireInputs(NAME, input, ['rrupKm', 'rjbKm', 'rxKm', 'vs30', 'z1Km']);
}

/** CY14_VALIDITY with each mechanism's own magnitude range. */
const MAGNITUDE_VALIDITY: Readonly<Record<Cy14Mechanism, ValidityRange>> = Object.freeze({
  'strike-slip': { ...CY14_VALIDITY, magnitude: CY14_MAGNITUDE_RANGE['strike-slip'] },
  reverse: { ...CY14_VALIDITY, magnitude: CY14_MAGNITUDE_RANGE.reverse },
  normal: { ...CY14_VALIDITY, magnitude: CY14_MAGNITUDE_RANGE.normal },
});

function notesOf(input: GmmInput, rupture: Cy14Rupture): string[] {
  const notes = crustalValidityNotes(
    NAME,
    MAGNITUDE_VALIDITY[rupture.mechanism],
    input,
    input.rrupKm,
  );
  if (rupture.ztorKm > 20)
    notes.push(
      `${NAME}: depth to top of rupture ${Math.round(rupture.ztorKm * 100) / 100} km is outside its range 0–20 km`,
    );
  return notes;
}

/**
 * CY14 median and standard deviations for one measure (PGA and PSA in g, PGV in cm/s; all in
 * ln units), from the rupture, distances (Rrup, Rjb, Rx) and site of the input.
 */
export function predictCy14(input: GmmInput, measure: Measure): GmmPrediction {
  const rupture = ruptureOf(input);
  checkPair(input);
  const notes = notesOf(input, rupture);
  const applicable = notes.length === 0;
  const predictRow = (row: Cy14Row): GmmPrediction => ({
    ...cy14PairPrediction(cy14RuptureTerms(row, rupture), input, input),
    applicable,
    notes,
  });
  return predictSplit(SPLIT, measure, predictRow);
}

/** The model as rupture terms and pair prediction, for the fast path (split-prepare.ts): the same functions predict() uses. */
const SPLIT: SplitModel<Cy14Row, Cy14RuptureTerms> = {
  name: NAME,
  table: CY14_TABLE,
  pgv: CY14_PGV,
  distances: ['rrupKm', 'rjbKm', 'rxKm'],
  checkMeasure: requirePositivePeriod,
  checkRupture: (rupture) => void ruptureOf(rupture as GmmInput),
  ruptureTerms: (row, rupture) => cy14RuptureTerms(row, ruptureOf(rupture as GmmInput)),
  pairPrediction: (terms, pair, out) => void cy14PairPrediction(terms, pair, pair, out),
  // notesOf's checks, answered without building the notes.
  applicable: (pair) =>
    pair.setting === 'crustal' &&
    within(pair.ztorKm, -Infinity, 20) &&
    insideValidity(MAGNITUDE_VALIDITY[cy14MechanismFromRake(pair.rakeDeg)], pair, pair.rrupKm),
};

/** Chiou & Youngs (2014) for shallow crustal earthquakes (Rrup): PGA, PGV, PSA 0.01–10 s. */
export const cy14: GroundMotionModel = assembleModel({
  name: NAME,
  citation:
    'Chiou, B. S.-J. & Youngs, R. R. (2014). Update of the Chiou and Youngs NGA model for the average horizontal component of peak ground motion and response spectra. Earthquake Spectra 30(3), 1117–1153.',
  settings: ['crustal'],
  distanceMetric: 'rrup',
  periodsS: CY14_TABLE.saPeriodsS,
  hasPga: true,
  hasPgv: true,
  validity: CY14_VALIDITY,
  predict: predictCy14,
  prepareMeasures: splitPrepareMeasures(SPLIT),
});

/**
 * BSSA14 — Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014), "NGA-West2
 * equations for predicting PGA, PGV, and 5% damped PSA for shallow crustal earthquakes",
 * Earthquake Spectra 30(3), 1057–1085, doi:10.1193/070113EQS184M. No erratum known to us that
 * changes the equations. Coefficients: bssa14-coefficients.ts (the published table with the
 * revised f4 of 2014-07-15, from the project's reference record).
 *
 * ln Y = F_E(M, mechanism) + F_P(Rjb, M) + F_S(Vs30, Rjb, M)   (the paper's equations 2–9)
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
 * Standard deviations (the paper's aleatory-variability model), natural-log units:
 *   τ(M) = τ1 for M ≤ 4.5, τ2 for M ≥ 5.5, linear in M between; φ(M) likewise with φ1, φ2;
 *   φ(M, Rjb) = φ(M) + ΔφR ln(Rjb / R1) / ln(R2 / R1) between R1 and R2 (0 below R1, ΔφR above R2);
 *   φ(M, Rjb, Vs30) = φ(M, Rjb) − ΔφV ln(V2 / Vs30) / ln(V2 / V1) between V1 and V2
 *   (0 above V2, ΔφV below V1); σ = √(τ² + φ²).
 *
 * Inputs: magnitude M (moment magnitude), rjbKm (Joyner–Boore distance, km), vs30 (m/s),
 * rakeDeg (degrees). Output: ln of the median, ln(g) for PGA and 5%-damped RotD50 PSA,
 * ln(cm/s) for PGV; sigma, tau, phi in natural-log units. Distance metric: Rjb.
 *
 * Validity (the paper's stated ranges, from memory of its text): M 3–8.5 for strike-slip and reverse
 * (and unspecified) events, M 3–7 for normal events; Rjb 0–400 km; Vs30 150–1500 m/s; periods
 * PGA, PGV and PSA 0.01–10 s. Outside, predictions are still finite, with applicable: false.
 *
 * Written once: the terms that depend on the rupture alone (F_E, the magnitude factor of F_P, τ
 * and the magnitude ramp of φ: bssa14RuptureTerms), on the site alone (the linear site term,
 * f2, the Vs30 part of φ: bssa14SiteTerms) and on the pair (F_P, the nonlinear site term, φ's
 * distance part: bssa14PairPrediction). predict() evaluates them for one pair; the fast path
 * (prepare, prepareMeasures) evaluates the rupture terms once per rupture and row and the pair
 * terms per pair, with the same functions.
 *
 * How the table is checked: test/engine/motion/bssa14.vectors.test.ts (independent reference
 * vectors, 1e-4 in ln units).
 */
import { wrapDeg180 } from '../units.ts';
import { hypot2 } from './fast-math.ts';
import {
  BSSA14_CONSTANTS as K,
  BSSA14_TABLE,
  BSSA14_PGV,
  type Bssa14Row,
} from './bssa14-coefficients.ts';
import { predictOnTable } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import { assembleModel } from './model-assembly.ts';
import { requirePositivePeriod } from './split-prepare.ts';
import {
  atLeast,
  createRowScratch,
  insideRange,
  plannedRows,
  predictRows,
  rowMemo,
  singleMeasure,
  type RowPlan,
  measurePlan,
} from './prepared-period.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  PairDistances,
  PairPredictions,
  PreparedMotion,
  PreparedMotions,
  RuptureContext,
  SiteContext,
  ValidityRange,
} from './types.ts';
import { crustalValidityNotes, requireInputs } from './validity.ts';

const NAME = 'BSSA14';

export type Bssa14Mechanism = 'unspecified' | 'strike-slip' | 'normal' | 'reverse';

/** The paper's rake classes (rake in degrees, any turn): normal −150..−30, reverse 30..150 (open). */
export function bssa14MechanismFromRake(rakeDeg: number): 'strike-slip' | 'normal' | 'reverse' {
  const rake = wrapDeg180(rakeDeg);
  if (rake > -150 && rake < -30) return 'normal';
  if (rake > 30 && rake < 150) return 'reverse';
  return 'strike-slip';
}

/** The column of e_mech for each mechanism: e0 unspecified, e1, e2, e3. */
const MECHANISM_COLUMN = {
  unspecified: 'e0',
  'strike-slip': 'e1',
  normal: 'e2',
  reverse: 'e3',
} as const satisfies Record<Bssa14Mechanism, keyof Bssa14Row>;

/** The mechanism constant e_mech (ln units) of a row: e0 unspecified, e1, e2, e3 by mechanism. */
export function bssa14MechanismConstant(row: Bssa14Row, mechanism: Bssa14Mechanism): number {
  return row[MECHANISM_COLUMN[mechanism]];
}

/** Source function F_E (ln units) of a row for moment magnitude M, given its mechanism constant. */
export function bssa14SourceTerm(
  row: Bssa14Row,
  mechanismConstant: number,
  magnitude: number,
): number {
  const dm = magnitude - row.mh;
  return mechanismConstant + (dm <= 0 ? row.e4 * dm + row.e5 * dm * dm : row.e6 * dm);
}

/** The paper's magnitude ramp of τ and φ between M 4.5 and 5.5. */
const magnitudeRamp = (magnitude: number, small: number, large: number): number =>
  magnitude <= 4.5 ? small : magnitude >= 5.5 ? large : small + (large - small) * (magnitude - 4.5);

/** What one row of the equation needs of the rupture alone. */
export interface Bssa14RuptureTerms {
  /** F_E, ln units. */
  readonly source: number;
  /** c1 + c2 (M − Mref), the factor of ln(R / Rref) in F_P. */
  readonly slope: number;
  /** τ(M), ln units. */
  readonly tau: number;
  /** φ(M) before its distance and Vs30 parts, ln units. */
  readonly phiOfMagnitude: number;
}

export function bssa14RuptureTerms(
  row: Bssa14Row,
  magnitude: number,
  mechanism: Bssa14Mechanism,
): Bssa14RuptureTerms {
  return {
    source: bssa14SourceTerm(row, bssa14MechanismConstant(row, mechanism), magnitude),
    slope: row.c1 + row.c2 * (magnitude - K.mRef),
    tau: magnitudeRamp(magnitude, row.tau1, row.tau2),
    phiOfMagnitude: magnitudeRamp(magnitude, row.phi1, row.phi2),
  };
}

/** Vs30 (m/s) in the paper's f2 at which the nonlinear slope is referenced (the paper's f2 equation). */
const F2_VS30_ANCHOR = 360;

/** What one row of the equation needs of the site alone (Vs30 in m/s). */
export interface Bssa14SiteTerms {
  /** ln F_lin = c ln(min(Vs30, Vc) / Vref): zero at Vref = 760 m/s. */
  readonly linear: number;
  /** f2 of the nonlinear term: zero at and above 760 m/s. */
  readonly f2: number;
  /** The reduction of φ on soft sites (ΔφV, tapered between V1 and V2), ln units. */
  readonly phiReduction: number;
}

export function bssa14SiteTerms(row: Bssa14Row, vs30: number): Bssa14SiteTerms {
  const f2 =
    row.f4 *
    (Math.exp(row.f5 * (Math.min(vs30, K.vRef) - F2_VS30_ANCHOR)) -
      Math.exp(row.f5 * (K.vRef - F2_VS30_ANCHOR)));
  let phiReduction = 0;
  if (vs30 <= K.v1) phiReduction = row.deltaPhiV;
  else if (vs30 < K.v2)
    phiReduction = (row.deltaPhiV * Math.log(K.v2 / vs30)) / Math.log(K.v2 / K.v1);
  return { linear: row.c * Math.log(Math.min(vs30, row.vc) / K.vRef), f2, phiReduction };
}

/** Path function F_P (ln units) of a row for the rupture's slope and Rjb in km. */
export function bssa14PathTerm(row: Bssa14Row, slope: number, rjbKm: number): number {
  const rKm = hypot2(rjbKm, row.h);
  return slope * Math.log(rKm / K.rRefKm) + (row.c3 + K.deltaC3) * (rKm - K.rRefKm);
}

/**
 * ln((PGAr + f3) / f3), the factor of f2 in the nonlinear site term, from the PGA row's
 * rupture terms and Rjb in km: PGAr is the model's median PGA (g) at Vs30 = Vref = 760 m/s.
 */
export function bssa14RockFactor(pgaTerms: Bssa14RuptureTerms, rjbKm: number): number {
  const pgaRockG = Math.exp(
    pgaTerms.source + bssa14PathTerm(BSSA14_TABLE.pga, pgaTerms.slope, rjbKm),
  );
  return Math.log((pgaRockG + K.f3G) / K.f3G);
}

/** ln median (ln g; ln cm/s for PGV) of a row for one pair; `rockFactor` from bssa14RockFactor (any value where f2 is 0). */
export function bssa14LnMedian(
  row: Bssa14Row,
  rupture: Bssa14RuptureTerms,
  site: Bssa14SiteTerms,
  rjbKm: number,
  rockFactor: number,
): number {
  const nonlinear = site.f2 === 0 ? K.f1 : K.f1 + site.f2 * rockFactor;
  return rupture.source + bssa14PathTerm(row, rupture.slope, rjbKm) + site.linear + nonlinear;
}

/** φ(M, Rjb, Vs30) (ln units) of a row for one pair: the magnitude ramp, grown from R1 to R2, reduced on soft sites. */
export function bssa14Phi(
  row: Bssa14Row,
  rupture: Bssa14RuptureTerms,
  site: Bssa14SiteTerms,
  rjbKm: number,
): number {
  let phi = rupture.phiOfMagnitude;
  if (rjbKm > row.r1)
    phi +=
      rjbKm >= row.r2
        ? row.deltaPhiR
        : (row.deltaPhiR * Math.log(rjbKm / row.r1)) / Math.log(row.r2 / row.r1);
  return phi - site.phiReduction;
}

/** Validity for strike-slip, reverse and unspecified events (the paper's ranges, from memory of its text). */
export const BSSA14_VALIDITY: ValidityRange = Object.freeze({
  magnitude: [3, 8.5],
  distanceKm: [0, 400],
  vs30: [150, 1500],
} as const);

/** Validity for normal-faulting events: the paper stops at M 7 for them. */
export const BSSA14_NORMAL_VALIDITY: ValidityRange = Object.freeze({
  ...BSSA14_VALIDITY,
  magnitude: [3, 7],
} as const);

/** Options of predictBssa14 and prepareBssa14Measures. */
export interface Bssa14Options {
  /** Overrides the mechanism the rake implies; 'unspecified' selects the paper's e0. */
  readonly mechanism?: Bssa14Mechanism;
}

/** The rupture's mechanism for the equation, its inputs checked. */
function mechanismOf(rupture: RuptureContext, options: Bssa14Options): Bssa14Mechanism {
  requireInputs(NAME, rupture, ['magnitude']);
  if (options.mechanism !== undefined) return options.mechanism;
  requireInputs(NAME, rupture, ['rakeDeg']);
  return bssa14MechanismFromRake(rupture.rakeDeg);
}

const requireVs30 = (vs30: number): void => requireInputs(NAME, { vs30 }, ['vs30']);

/**
 * BSSA14 median and standard deviations for one measure (PGA and PSA in g, PGV in cm/s; all
 * in ln units). Uses magnitude, rakeDeg, rjbKm, vs30 and setting of the input.
 */
export function predictBssa14(
  input: GmmInput,
  measure: Measure,
  options: Bssa14Options = {},
): GmmPrediction {
  const mechanism = mechanismOf(input, options);
  requireInputs(NAME, input, ['rjbKm', 'vs30']);
  requirePositivePeriod(measure);
  const range = mechanism === 'normal' ? BSSA14_NORMAL_VALIDITY : BSSA14_VALIDITY;
  const notes = crustalValidityNotes(NAME, range, input, input.rjbKm);
  const rockFactor = bssa14RockFactor(
    bssa14RuptureTerms(BSSA14_TABLE.pga, input.magnitude, mechanism),
    input.rjbKm,
  );

  const predictRow = (row: Bssa14Row): GmmPrediction => {
    const rupture = bssa14RuptureTerms(row, input.magnitude, mechanism);
    const site = bssa14SiteTerms(row, input.vs30);
    const phi = bssa14Phi(row, rupture, site, input.rjbKm);
    const lnMedian = bssa14LnMedian(row, rupture, site, input.rjbKm, rockFactor);
    return {
      lnMedian,
      tau: rupture.tau,
      phi,
      sigma: hypot2(rupture.tau, phi),
      applicable: notes.length === 0,
      notes,
    };
  };
  return predictOnTable(NAME, BSSA14_TABLE, BSSA14_PGV, measure, predictRow);
}

/** One row's rupture terms for every prepared rupture. */
interface PreparedRow {
  readonly row: Bssa14Row;
  readonly terms: readonly Bssa14RuptureTerms[];
}

/**
 * BSSA14 for many (rupture, site) pairs (the model's prepareMeasures hook): the rupture terms
 * once per rupture and row, the site terms once per site and row, the rock factor once per pair
 * for every measure, then bssa14LnMedian and bssa14Phi per pair, as predictBssa14 does.
 */
export function prepareBssa14Measures(
  ruptures: readonly RuptureContext[],
  measures: readonly Measure[],
  options: Bssa14Options = {},
): PreparedMotions {
  measures.forEach(requirePositivePeriod);
  const mechanisms = ruptures.map((r) => mechanismOf(r, options));
  const inside = Uint8Array.from(ruptures, (r, i) => {
    const range = mechanisms[i] === 'normal' ? BSSA14_NORMAL_VALIDITY : BSSA14_VALIDITY;
    return r.setting === 'crustal' && insideRange(r.magnitude, range.magnitude) ? 1 : 0;
  });
  const termsOf = rowMemo((row: Bssa14Row): PreparedRow => ({
    row,
    terms: ruptures.map((r, i) =>
      bssa14RuptureTerms(row, r.magnitude, mechanisms[i] as Bssa14Mechanism),
    ),
  }));
  const plans: RowPlan<PreparedRow>[] = measures.map((m) =>
    measurePlan(NAME, BSSA14_TABLE, BSSA14_PGV, m, termsOf),
  );
  const rows = plannedRows(plans).map((p) => p.row);
  let pgaTerms: readonly Bssa14RuptureTerms[] | undefined;
  let rockFactor: Float64Array = new Float64Array(0);
  const scratch = createRowScratch();
  const [minKm, maxKm] = BSSA14_VALIDITY.distanceKm;

  const evaluate = (
    prepared: PreparedRow,
    vs30: number,
    pairs: PairDistances,
    rock: Float64Array,
    out: PairPredictions,
  ): void => {
    const { row, terms } = prepared;
    const site = bssa14SiteTerms(row, vs30);
    const siteInside = insideRange(vs30, BSSA14_VALIDITY.vs30) ? 1 : 0;
    const { rupture, rjbKm, count } = pairs;
    for (let k = 0; k < count; k++) {
      const r = rupture[k] as number;
      const t = terms[r] as Bssa14RuptureTerms;
      const rjb = rjbKm[k] as number;
      const phi = bssa14Phi(row, t, site, rjb);
      out.lnMedian[k] = bssa14LnMedian(row, t, site, rjb, rock[k] as number);
      out.sigma[k] = hypot2(t.tau, phi);
      out.applicable[k] = (inside[r] as number) & siteInside & (rjb < minKm || rjb > maxKm ? 0 : 1);
    }
  };

  return {
    distances: ['rjbKm'],
    predictPairs(site: SiteContext, pairs: PairDistances, out: readonly PairPredictions[]) {
      requireVs30(site.vs30);
      const { count, rupture, rjbKm } = pairs;
      rockFactor = atLeast(rockFactor, count);
      // PGAr is needed only where some row's f2 is not 0 (Vs30 below 760 m/s).
      if (rows.some((row) => bssa14SiteTerms(row, site.vs30).f2 !== 0)) {
        pgaTerms ??= termsOf(BSSA14_TABLE.pga).terms;
        for (let k = 0; k < count; k++)
          rockFactor[k] = bssa14RockFactor(
            pgaTerms[rupture[k] as number] as Bssa14RuptureTerms,
            rjbKm[k] as number,
          );
      }
      plans.forEach((plan, i) =>
        predictRows(plan, count, out[i] as PairPredictions, scratch, (p, into) =>
          evaluate(p, site.vs30, pairs, rockFactor, into),
        ),
      );
    },
  };
}

/** BSSA14 prepared for one measure (the model's prepare hook). */
export function prepareBssa14(
  ruptures: readonly RuptureContext[],
  measure: Measure,
  options: Bssa14Options = {},
): PreparedMotion {
  return singleMeasure(prepareBssa14Measures(ruptures, [measure], options));
}

/** Boore, Stewart, Seyhan & Atkinson (2014) for shallow crustal earthquakes (Rjb): PGA, PGV, PSA 0.01–10 s. */
export const bssa14: GroundMotionModel = assembleModel({
  name: NAME,
  citation:
    'Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014). NGA-West2 equations for predicting PGA, PGV, and 5% damped PSA for shallow crustal earthquakes. Earthquake Spectra 30(3), 1057–1085.',
  settings: ['crustal'],
  distanceMetric: 'rjb',
  periodsS: BSSA14_TABLE.saPeriodsS,
  hasPga: true,
  hasPgv: true,
  validity: BSSA14_VALIDITY,
  predict: (input: GmmInput, measure: Measure): GmmPrediction => predictBssa14(input, measure),
  prepareMeasures: (ruptures: readonly RuptureContext[], measures: readonly Measure[]) =>
    prepareBssa14Measures(ruptures, measures),
});

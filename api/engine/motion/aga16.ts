/**
 * AGA16 — Abrahamson, N., Gregor, N. & Addo, K. (2016), "BC Hydro ground motion prediction
 * equations for subduction earthquakes", Earthquake Spectra 32(1), 23–44,
 * doi:10.1193/051712EQS188MR. No erratum known to us. Coefficients: aga16-coefficients.ts
 * (the paper's Table 3, constants and ΔC1 table, from the project's
 * reference record).
 *
 * One model for both subduction event types, chosen by GmmInput.setting:
 *   interface  — F_event = 0, distance R = Rrup (km);
 *   intraslab  — F_event = 1, distance R = Rhypo (km), with the hypocentral-depth term;
 *   crustal    — outside the model: answered as an interface event with applicable: false.
 *
 * ln Y = θ1 + θ4 ΔC1 + (θ2 + θ14 F + θ3 (M − C1)) ln(R + C4 exp(θ9 (M − 6))) + θ6 R + θ10 F
 *        + f_mag(M) + f_depth(Zh) + f_FABA + f_site(PGA1000, Vs30)
 *   f_mag   = θ4 (M − (C1 + ΔC1)) + θ13 (10 − M)²  for M ≤ C1 + ΔC1, and θ5 (M − (C1 + ΔC1)) + θ13 (10 − M)²
 *             above (θ5 = 0: the paper's saturation above the break);
 *   f_depth = θ11 (min(Zh, 120) − 60) F;
 *   f_FABA  = 0: every site is taken as forearc (the paper's backarc term is off);
 *   f_site  = θ12 ln(Vs* / Vlin) − b ln(PGA1000 + c) + b ln(PGA1000 + c (Vs* / Vlin)^n)  for Vs30 < Vlin,
 *             (θ12 + b n) ln(Vs* / Vlin)  for Vs30 ≥ Vlin, with Vs* = min(Vs30, 1000 m/s) and PGA1000
 *             the model's own median PGA (g) for the same event at Vs30 = 1000 m/s.
 * (Equation as recalled from the paper; checked against the reference vectors.)
 *
 * ΔC1, the shift of the magnitude break from C1 = 7.8, has three epistemic branches for
 * interface events (aga16-coefficients.ts): the central one (model "AGA16": 0.2 up to 0.3 s and
 * for PGA, 0.1 at 0.5 s, 0.0 at 1 s, −0.1 at 2 s, −0.2 from 3 s, linear in ln(period) between)
 * and the lower and upper ones 0.2 below and above it (models "AGA16-lower", "AGA16-upper"; a
 * single public record, provisional until checked against the paper). Intraslab: −0.3 at
 * every period in every variant (break at M 7.5). ΔC1 moves predictions only above the break.
 *
 * Output: ln of the median, ln(g), for PGA and 5%-damped SA at 0.02–10 s (between rows,
 * interpolated in ln period by interpolate-period.ts). The paper has no PGV equation: asking for
 * PGV throws UnsupportedMeasure. Sigma: the paper's period-independent values φ = 0.60,
 * τ = 0.43 and σ = √(φ² + τ²) = 0.73817 (the table prints it rounded).
 *
 * Validity (from memory of the paper's data and its stated use; conservative where unsure):
 *   interface M 6.0–9.0; intraslab M 5.0–8.0; distance (Rrup or Rhypo) 0–300 km;
 *   Vs30 150–1000 m/s (the site term stops changing at 1000); intraslab hypocentral depth
 *   20–120 km (the depth term stops growing at 120 km); periods PGA and 0.02–10 s.
 *
 * Written once: aga16RuptureTerms (everything but the distance and the site, per rupture and
 * row), aga16LnMedianAtVlinFor and aga16SiteTermFor (per pair); predict() and the fast path
 * (prepare, prepareMeasures) both call them. How the table is checked:
 * test/engine/motion/aga16.vectors.test.ts (independent reference vectors, every branch).
 */
import { UnsupportedMeasure } from '../errors.ts';
import {
  AGA16_CONSTANTS as K,
  AGA16_DELTA_C1_INTERFACE,
  AGA16_DELTA_C1_INTRASLAB,
  AGA16_TABLE,
  type Aga16DeltaC1Branch,
  type Aga16Row,
} from './aga16-coefficients.ts';
import { predictOnTable } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import { assembleModel } from './model-assembly.ts';
import {
  atLeast,
  createRowScratch,
  insideRange,
  plannedRows,
  predictRows,
  rowMemo,
  type RowPlan,
  measurePlan,
} from './prepared-period.ts';
import type {
  DistanceName,
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  PairPredictions,
  PreparedMotions,
  RuptureContext,
  ValidityRange,
} from './types.ts';
import { requireInput, requireInputs, validityNotes } from './validity.ts';

const NAME = 'AGA16';

export type Aga16EventType = 'interface' | 'intraslab';

/** The earthquake and path as the equation sees them. */
export interface Aga16Scenario {
  readonly eventType: Aga16EventType;
  readonly magnitude: number;
  /** Rrup for interface events, Rhypo for intraslab events, km. */
  readonly distanceKm: number;
  /** Hypocentral depth, km; used by the intraslab depth term only. */
  readonly hypoDepthKm: number;
}

/** Validity of interface predictions (from memory of the paper). */
export const AGA16_INTERFACE_VALIDITY: ValidityRange = Object.freeze({
  magnitude: [6.0, 9.0],
  distanceKm: [0, 300],
  vs30: [150, 1000],
} as const);

/** Validity of intraslab predictions (from memory of the paper). */
export const AGA16_INTRASLAB_VALIDITY: ValidityRange = Object.freeze({
  magnitude: [5.0, 8.0],
  distanceKm: [0, 300],
  vs30: [150, 1000],
  depthKm: [20, 120],
} as const);

/** σ = √(φ² + τ²) = 0.73817, as the model defines it (the paper's table rounds it to 0.74). */
export const AGA16_SIGMA = Math.sqrt(K.phi * K.phi + K.tau * K.tau);

/**
 * ΔC1 (magnitude units) at a period in s (0 for PGA) for a branch: interface anchors linear
 * in ln(period), constant beyond the first and last anchors; intraslab −0.3 in every branch.
 */
export function aga16DeltaC1(
  periodS: number,
  eventType: Aga16EventType,
  branch: Aga16DeltaC1Branch = 'central',
): number {
  if (eventType === 'intraslab') return AGA16_DELTA_C1_INTRASLAB;
  const anchors = AGA16_DELTA_C1_INTERFACE[branch];
  const [firstT, firstValue] = anchors[0] as readonly [number, number];
  const [lastT, lastValue] = anchors[anchors.length - 1] as readonly [number, number];
  if (periodS <= firstT) return firstValue;
  if (periodS >= lastT) return lastValue;
  let upper = 1;
  while ((anchors[upper] as readonly [number, number])[0] < periodS) upper++;
  const [t0, v0] = anchors[upper - 1] as readonly [number, number];
  const [t1, v1] = anchors[upper] as readonly [number, number];
  return v0 + ((v1 - v0) * Math.log(periodS / t0)) / Math.log(t1 / t0);
}

/** What one row of the equation needs of the rupture alone. */
export interface Aga16RuptureTerms {
  /** θ1 + θ4 ΔC1 + θ10 F + f_mag + f_depth, ln(g). */
  readonly constant: number;
  /** θ2 + θ14 F + θ3 (M − C1), the factor of the spreading logarithm. */
  readonly spreadingSlope: number;
  /** C4 exp(θ9 (M − 6)), km: the same for every row. */
  readonly finiteFaultKm: number;
}

export function aga16RuptureTerms(
  row: Aga16Row,
  eventType: Aga16EventType,
  magnitude: number,
  hypoDepthKm: number,
  branch: Aga16DeltaC1Branch,
): Aga16RuptureTerms {
  const slab = eventType === 'intraslab' ? 1 : 0;
  const deltaC1 = aga16DeltaC1(row.periodS, eventType, branch);
  const magnitudeBreak = K.c1 + deltaC1;
  const slope = magnitude <= magnitudeBreak ? K.theta4 : K.theta5;
  const fMag = slope * (magnitude - magnitudeBreak) + row.theta13 * (10 - magnitude) ** 2;
  const fDepth = row.theta11 * (Math.min(hypoDepthKm, K.depthCapKm) - K.depthReferenceKm) * slab;
  return {
    constant: row.theta1 + K.theta4 * deltaC1 + row.theta10 * slab + fMag + fDepth,
    spreadingSlope: row.theta2 + row.theta14 * slab + K.theta3 * (magnitude - K.c1),
    finiteFaultKm: K.c4Km * Math.exp(K.theta9 * (magnitude - 6)),
  };
}

/** ln(R + C4 exp(θ9 (M − 6))), the spreading logarithm of a pair (R in km); the same for every row. */
export const aga16SpreadingLog = (terms: Aga16RuptureTerms, distanceKm: number): number =>
  Math.log(distanceKm + terms.finiteFaultKm);

/** ln median (ln g) of a row at Vs30 = Vlin (no site term) for one pair, given its spreading logarithm. */
export const aga16LnMedianAtVlinFor = (
  row: Aga16Row,
  terms: Aga16RuptureTerms,
  spreadingLog: number,
  distanceKm: number,
): number => terms.constant + terms.spreadingSlope * spreadingLog + row.theta6 * distanceKm;

/** ln median (ln g) of one row without the site term: the prediction on a site whose Vs30 equals the row's Vlin. */
export function aga16LnMedianAtVlin(
  row: Aga16Row,
  scenario: Aga16Scenario,
  branch: Aga16DeltaC1Branch = 'central',
): number {
  const terms = aga16RuptureTerms(
    row,
    scenario.eventType,
    scenario.magnitude,
    scenario.hypoDepthKm,
    branch,
  );
  return aga16LnMedianAtVlinFor(
    row,
    terms,
    aga16SpreadingLog(terms, scenario.distanceKm),
    scenario.distanceKm,
  );
}

/** What one row's site term needs of the site alone (Vs30 in m/s). */
export interface Aga16SiteTerms {
  /** True at and above Vlin, where the site term is linear. */
  readonly linear: boolean;
  /** (θ12 + b n) ln(Vs* / Vlin), the linear term. */
  readonly linearTerm: number;
  /** θ12 ln(Vs* / Vlin). */
  readonly lnRatioTerm: number;
  /** c (Vs* / Vlin)^n. */
  readonly cScaled: number;
}

export function aga16SiteTerms(row: Aga16Row, vs30: number): Aga16SiteTerms {
  const lnRatio = Math.log(Math.min(vs30, K.vs30CapMS) / row.vlin);
  return {
    linear: vs30 >= row.vlin,
    linearTerm: (row.theta12 + row.b * K.n) * lnRatio,
    lnRatioTerm: row.theta12 * lnRatio,
    cScaled: K.c * Math.exp(K.n * lnRatio),
  };
}

/**
 * f_site (ln units) of a row for one pair, given PGA1000 (g): linear at and above Vlin;
 * below, θ12 ln(Vs* / Vlin) − b ln(PGA1000 + c) + b ln(PGA1000 + c (Vs* / Vlin)^n), the two
 * logarithms taken as one of their ratio.
 */
export const aga16SiteTermFor = (row: Aga16Row, site: Aga16SiteTerms, pga1000G: number): number =>
  site.linear
    ? site.linearTerm
    : site.lnRatioTerm + row.b * Math.log((pga1000G + site.cScaled) / (pga1000G + K.c));

/** f_site (ln units) of one row for Vs30 in m/s and the rock PGA (g) at Vs30 = 1000 m/s. Zero at Vs30 = Vlin. */
export const aga16SiteTerm = (row: Aga16Row, vs30: number, pga1000G: number): number =>
  aga16SiteTermFor(row, aga16SiteTerms(row, vs30), pga1000G);

/** Site term of the PGA row on the reference rock (Vs30 = 1000 m/s, linear there): PGA1000 = exp(ln median at Vlin + this). */
const ROCK_SITE_TERM = aga16SiteTerm(AGA16_TABLE.pga, K.vs30CapMS, 0);

/** PGA1000 (g) of a pair from the PGA row's rupture terms and spreading logarithm. */
export const aga16Pga1000For = (
  pgaTerms: Aga16RuptureTerms,
  spreadingLog: number,
  distanceKm: number,
): number =>
  Math.exp(
    aga16LnMedianAtVlinFor(AGA16_TABLE.pga, pgaTerms, spreadingLog, distanceKm) + ROCK_SITE_TERM,
  );

const eventTypeOf = (rupture: RuptureContext): Aga16EventType =>
  rupture.setting === 'intraslab' ? 'intraslab' : 'interface';

/** Checks the rupture's own inputs; returns whether they are inside the model's validity. */
function checkRupture(rupture: RuptureContext): boolean {
  const eventType = eventTypeOf(rupture);
  requireInputs(
    NAME,
    rupture,
    eventType === 'intraslab' ? ['magnitude', 'hypoDepthKm'] : ['magnitude'],
  );
  const range = eventType === 'intraslab' ? AGA16_INTRASLAB_VALIDITY : AGA16_INTERFACE_VALIDITY;
  const depthInside =
    range.depthKm === undefined || insideRange(rupture.hypoDepthKm, range.depthKm);
  return (
    rupture.setting !== 'crustal' && insideRange(rupture.magnitude, range.magnitude) && depthInside
  );
}

const requireVs30 = (vs30: number): void => requireInputs(NAME, { vs30 }, ['vs30']);

function refusePgv(measure: Measure): void {
  if (measure.kind === 'PGV')
    throw new UnsupportedMeasure(
      'PGV',
      `${NAME} (Abrahamson, Gregor & Addo 2016) has no PGV equation; it predicts PGA and SA from 0.02 to 10 s`,
    );
}

function predictAga16(
  input: GmmInput,
  measure: Measure,
  branch: Aga16DeltaC1Branch,
  name: string,
): GmmPrediction {
  refusePgv(measure);
  checkRupture(input);
  const eventType = eventTypeOf(input);
  const distancePath = eventType === 'intraslab' ? 'rhypoKm' : 'rrupKm';
  const distanceKm = eventType === 'intraslab' ? input.rhypoKm : input.rrupKm;
  requireInput(NAME, distancePath, distanceKm, 'a finite distance of at least 0 km', (v) => v >= 0);
  requireVs30(input.vs30);
  const range = eventType === 'intraslab' ? AGA16_INTRASLAB_VALIDITY : AGA16_INTERFACE_VALIDITY;
  const notes = validityNotes(name, range, input, distanceKm);
  if (input.setting === 'crustal')
    notes.unshift(
      `${name}: it is a model for subduction interface and intraslab earthquakes, not crustal ones; answered as an interface event`,
    );
  const termsOf = (row: Aga16Row): Aga16RuptureTerms =>
    aga16RuptureTerms(row, eventType, input.magnitude, input.hypoDepthKm, branch);
  const pgaTerms = termsOf(AGA16_TABLE.pga);
  const spreadingLog = aga16SpreadingLog(pgaTerms, distanceKm);
  const pga1000G = aga16Pga1000For(pgaTerms, spreadingLog, distanceKm);
  const predictRow = (row: Aga16Row): GmmPrediction => ({
    lnMedian:
      aga16LnMedianAtVlinFor(row, termsOf(row), spreadingLog, distanceKm) +
      aga16SiteTerm(row, input.vs30, pga1000G),
    sigma: AGA16_SIGMA,
    tau: K.tau,
    phi: K.phi,
    applicable: notes.length === 0,
    notes,
  });
  return predictOnTable(name, AGA16_TABLE, undefined, measure, predictRow);
}

/** One row's rupture terms for every prepared rupture. */
interface PreparedRow {
  readonly row: Aga16Row;
  readonly terms: readonly Aga16RuptureTerms[];
}

/**
 * AGA16 for many (rupture, site) pairs (the model's prepareMeasures hook): rupture terms once
 * per rupture and row; per pair the distance, the spreading logarithm and PGA1000 once for
 * every measure, then each row's ln median and site term by the functions predict() uses.
 */
function prepareAga16Measures(
  ruptures: readonly RuptureContext[],
  measures: readonly Measure[],
  branch: Aga16DeltaC1Branch,
  name: string,
): PreparedMotions {
  measures.forEach(refusePgv);
  const inside = Uint8Array.from(ruptures, (r) => (checkRupture(r) ? 1 : 0));
  const slab = Uint8Array.from(ruptures, (r) => (eventTypeOf(r) === 'intraslab' ? 1 : 0));
  const termsOf = rowMemo((row: Aga16Row): PreparedRow => ({
    row,
    terms: ruptures.map((r) =>
      aga16RuptureTerms(row, eventTypeOf(r), r.magnitude, r.hypoDepthKm, branch),
    ),
  }));
  const pga = termsOf(AGA16_TABLE.pga).terms;
  const plans: RowPlan<PreparedRow>[] = measures.map((m) =>
    measurePlan(name, AGA16_TABLE, undefined, m, termsOf),
  );
  const rows = plannedRows(plans).map((p) => p.row);
  const distances: DistanceName[] = [];
  if (slab.some((s) => s === 0)) distances.push('rrupKm');
  if (slab.some((s) => s === 1)) distances.push('rhypoKm');
  const shared: { distanceKm: Float64Array; spreadingLog: Float64Array; pga1000G: Float64Array } = {
    distanceKm: new Float64Array(0),
    spreadingLog: new Float64Array(0),
    pga1000G: new Float64Array(0),
  };
  const scratch = createRowScratch();
  // Interface and intraslab predictions share their Vs30 and distance ranges.
  const [minKm, maxKm] = AGA16_INTERFACE_VALIDITY.distanceKm;

  const evaluate = (
    prepared: PreparedRow,
    vs30: number,
    count: number,
    rupture: Int32Array,
    out: PairPredictions,
  ): void => {
    const { row, terms } = prepared;
    const site = aga16SiteTerms(row, vs30);
    const siteInside = insideRange(vs30, AGA16_INTERFACE_VALIDITY.vs30) ? 1 : 0;
    const { distanceKm, spreadingLog, pga1000G } = shared;
    for (let k = 0; k < count; k++) {
      const r = rupture[k] as number;
      const d = distanceKm[k] as number;
      out.lnMedian[k] =
        aga16LnMedianAtVlinFor(row, terms[r] as Aga16RuptureTerms, spreadingLog[k] as number, d) +
        aga16SiteTermFor(row, site, pga1000G[k] as number);
      out.sigma[k] = AGA16_SIGMA;
      out.applicable[k] = (inside[r] as number) & siteInside & (d < minKm || d > maxKm ? 0 : 1);
    }
  };

  return {
    distances,
    predictPairs(site, pairs, out) {
      requireVs30(site.vs30);
      const { count, rupture, rrupKm, rhypoKm } = pairs;
      shared.distanceKm = atLeast(shared.distanceKm, count);
      shared.spreadingLog = atLeast(shared.spreadingLog, count);
      shared.pga1000G = atLeast(shared.pga1000G, count);
      const { distanceKm, spreadingLog, pga1000G } = shared;
      // PGA1000 drives the nonlinear site term of the rows whose Vlin is above the site's Vs30.
      const rock = rows.some((row) => site.vs30 < row.vlin);
      for (let k = 0; k < count; k++) {
        const r = rupture[k] as number;
        const d = slab[r] === 1 ? (rhypoKm[k] as number) : (rrupKm[k] as number);
        const terms = pga[r] as Aga16RuptureTerms;
        const lnR = aga16SpreadingLog(terms, d);
        distanceKm[k] = d;
        spreadingLog[k] = lnR;
        if (rock) pga1000G[k] = aga16Pga1000For(terms, lnR, d);
      }
      plans.forEach((plan, i) =>
        predictRows(plan, count, out[i] as PairPredictions, scratch, (p, into) =>
          evaluate(p, site.vs30, count, rupture, into),
        ),
      );
    },
  };
}

const CITATION =
  'Abrahamson, N., Gregor, N. & Addo, K. (2016). BC Hydro ground motion prediction equations for subduction earthquakes. Earthquake Spectra 32(1), 23–44.';

/** The model's name for a ΔC1 branch: "AGA16" for the central branch, "AGA16-lower" and "AGA16-upper" for the others. */
export const aga16Name = (branch: Aga16DeltaC1Branch): string =>
  branch === 'central' ? NAME : `${NAME}-${branch}`;

/**
 * Abrahamson, Gregor & Addo (2016) with one ΔC1 branch, for subduction interface (Rrup) and
 * intraslab (Rhypo) earthquakes at forearc sites: PGA and SA 0.02–10 s in g, no PGV.
 */
export function createAga16(branch: Aga16DeltaC1Branch): GroundMotionModel {
  const name = aga16Name(branch);
  return assembleModel({
    name,
    citation:
      branch === 'central'
        ? CITATION
        : `${CITATION} ${branch[0]!.toUpperCase()}${branch.slice(1)} ΔC1 branch (central ${branch === 'lower' ? '−' : '+'} 0.2 for interface events).`,
    settings: ['interface', 'intraslab'],
    // Rrup is the interface metric; intraslab predictions use Rhypo (see the top comment).
    distanceMetric: 'rrup',
    periodsS: AGA16_TABLE.saPeriodsS,
    hasPga: true,
    hasPgv: false,
    validity: Object.freeze({
      magnitude: [5.0, 9.0],
      distanceKm: [0, 300],
      vs30: [150, 1000],
    } as const),
    predict: (input: GmmInput, measure: Measure): GmmPrediction =>
      predictAga16(input, measure, branch, name),
    prepareMeasures: (
      ruptures: readonly RuptureContext[],
      measures: readonly Measure[],
    ): PreparedMotions => prepareAga16Measures(ruptures, measures, branch, name),
  });
}

/** AGA16 with the central ΔC1 branch. */
export const aga16: GroundMotionModel = createAga16('central');
/** AGA16 with the lower ΔC1 branch (interface break 0.2 lower). */
export const aga16Lower: GroundMotionModel = createAga16('lower');
/** AGA16 with the upper ΔC1 branch (interface break 0.2 higher). */
export const aga16Upper: GroundMotionModel = createAga16('upper');

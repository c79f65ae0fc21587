/**
 * Zhao06 — Zhao, J. X. et al. (2006), "Attenuation relations of strong ground motion in Japan
 * using site classification based on predominant period", Bulletin of the Seismological
 * Society of America 96(3), 898–913. Coefficients: zhao06-coefficients.ts.
 *
 * ln y = a M + b x − ln(x + c exp(d M)) + e (h − hc) δh + F_R + S_I + S_S + S_SL ln x + C_k
 *        [+ P (M − Mc) + Q (M − Mc)² + W, the magnitude-squared term]
 * with y in cm/s² (here divided by standard gravity, 980.665 cm/s², to give g); x = Rrup (km);
 * h the focal depth, taken as 125 km when deeper; δh = 1 for h ≥ hc = 15 km, else 0. F_R only
 * for crustal reverse events, S_I only for interface events, S_S and S_SL only for intraslab
 * (slab) events. C_k by the paper's site classes from Vs30 (m/s): hard rock above 1100 (CH),
 * SC I 600–1100 (C1), SC II 300–600 (C2), SC III 200–300 (C3), SC IV 200 and below (C4), each
 * class including its upper bound (the reference README's reading of the paper).
 * The magnitude-squared term: crustal Mc 6.3, P = 0, QC, WC, τ = τC; interface Mc 6.3, P = 0,
 * QI, WI, τ = τI; slab Mc 6.5, PS, QS, WS, τ = τS. Model "Zhao06" leaves it out (τ from the
 * τ column); model "Zhao06-Msq" adds it. Which of the two the paper recommends could not be
 * checked here (the reference README's open point 2); both are published coefficients.
 * φ is the paper's within-event σ; σ = √(φ² + τ²) (not the tabulated σT).
 *
 * Inputs: magnitude (Mw), rrupKm, hypoDepthKm, setting, rakeDeg (reverse 30°–150° for F_R, the
 * class rule of the other models), vs30. Output: ln median in ln(g), PGA and SA 0.05–5 s; no PGV.
 *
 * Validity (the paper's data, from memory; common practice for its use): M 5–8.3; Rrup 0–300
 * km; focal depth 0–125 km (deeper taken as 125 km by the equation); Vs30 100–2000 m/s (its
 * site classes cover every Vs30); periods PGA and 0.05–5 s.
 *
 * Written once: zhao06RuptureTerms (the magnitude, depth, source-type and magnitude-squared
 * terms, per rupture and row) and zhao06LnMedianFor (the distance and site terms, per pair);
 * predict() and the fast path call both. Checked against independent vectors in
 * test/engine/motion/zhao06.vectors.test.ts.
 */
import { wrapDeg180 } from '../units.ts';
import { UnsupportedMeasure } from '../errors.ts';
import type { TectonicSetting } from '../model.ts';
import { predictOnTable } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import { assembleModel } from './model-assembly.ts';
import {
  createRowScratch,
  insideRange,
  predictRows,
  rowMemo,
  type RowPlan,
  measurePlan,
} from './prepared-period.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
  PairDistances,
  PairPredictions,
  PreparedMotions,
  RuptureContext,
  ValidityRange,
} from './types.ts';
import { requireInput, requireInputs, validityNotes } from './validity.ts';
import { ZHAO06_CONSTANTS as K, ZHAO06_TABLE, type Zhao06Row } from './zhao06-coefficients.ts';

/** Standard gravity, cm/s²: the equation's y is in cm/s². */
const STANDARD_GRAVITY_CMS2 = 980.665;
const LN_G = Math.log(STANDARD_GRAVITY_CMS2);

/** The paper's site classes. */
export type Zhao06SiteClass = 'hard rock' | 'SC I' | 'SC II' | 'SC III' | 'SC IV';

/** The site class of a Vs30 (m/s), by the paper's classes (each including its upper bound). */
export function zhao06SiteClass(vs30: number): Zhao06SiteClass {
  if (vs30 > 1100) return 'hard rock';
  if (vs30 > 600) return 'SC I';
  if (vs30 > 300) return 'SC II';
  if (vs30 > 200) return 'SC III';
  return 'SC IV';
}

/** The column of C_k for each site class: CH hard rock, C1–C4 for SC I–IV. */
const SITE_CLASS_COLUMN = {
  'hard rock': 'ch',
  'SC I': 'c1',
  'SC II': 'c2',
  'SC III': 'c3',
  'SC IV': 'c4',
} as const satisfies Record<Zhao06SiteClass, keyof Zhao06Row>;

/** C_k of a row for a site class, ln units. */
export function zhao06SiteTerm(row: Zhao06Row, siteClass: Zhao06SiteClass): number {
  return row[SITE_CLASS_COLUMN[siteClass]];
}

/** What one row of the equation needs of the rupture alone. */
export interface Zhao06RuptureTerms {
  /** a M + e (h − hc) δh + F_R + S_I + S_S [+ magnitude-squared term] − ln g, ln(g). */
  readonly constant: number;
  /** c exp(d M), km. */
  readonly nearSourceKm: number;
  /** S_SL for slab events, else 0: the factor of ln x. */
  readonly slabPath: number;
  /** Between-event τ, ln units. */
  readonly tau: number;
}

/** Reverse faulting by rake (degrees, any turn): 30..150 (open), as for the other models. */
const isReverse = (rakeDeg: number): boolean => {
  const rake = wrapDeg180(rakeDeg);
  return rake > 30 && rake < 150;
};

export function zhao06RuptureTerms(
  row: Zhao06Row,
  setting: TectonicSetting,
  magnitude: number,
  hypoDepthKm: number,
  rakeDeg: number,
  magnitudeSquared: boolean,
): Zhao06RuptureTerms {
  const h = Math.min(hypoDepthKm, K.depthCapKm);
  const depth = h >= K.hcKm ? row.e * (h - K.hcKm) : 0;
  const source =
    setting === 'interface'
      ? row.si
      : setting === 'intraslab'
        ? row.ss
        : isReverse(rakeDeg)
          ? row.fr
          : 0;
  let constant = row.a * magnitude + depth + source - LN_G;
  let tau = row.tau;
  if (magnitudeSquared) {
    if (setting === 'intraslab') {
      const dm = magnitude - K.mcSlab;
      constant += row.ps * dm + row.qs * dm * dm + row.ws;
      tau = row.tauS;
    } else if (setting === 'interface') {
      const dm = magnitude - K.mcInterface;
      constant += row.qi * dm * dm + row.wi;
      tau = row.tauI;
    } else {
      const dm = magnitude - K.mcCrustal;
      constant += row.qc * dm * dm + row.wc;
      tau = row.tauC;
    }
  }
  return {
    constant,
    nearSourceKm: row.c * Math.exp(row.d * magnitude),
    slabPath: setting === 'intraslab' ? row.ssl : 0,
    tau,
  };
}

/**
 * The smallest x (km) in the slab path term S_SL ln x: slab events lie tens of km deep, so x
 * below 1 km only arises from an input no slab event has; the floor keeps ln x finite there.
 */
const SLAB_MIN_DISTANCE_KM = 1;

/** ln median (ln g) of a row for one pair: Rrup in km, C_k of the site. */
export const zhao06LnMedianFor = (
  row: Zhao06Row,
  terms: Zhao06RuptureTerms,
  rrupKm: number,
  siteTerm: number,
): number =>
  terms.constant +
  row.b * rrupKm -
  Math.log(rrupKm + terms.nearSourceKm) +
  (terms.slabPath === 0 ? 0 : terms.slabPath * Math.log(Math.max(rrupKm, SLAB_MIN_DISTANCE_KM))) +
  siteTerm;

/** Validity (the paper's data, from memory; see the top comment). */
export const ZHAO06_VALIDITY: ValidityRange = Object.freeze({
  magnitude: [5, 8.3],
  distanceKm: [0, 300],
  vs30: [100, 2000],
  depthKm: [0, 125],
} as const);

function checkRupture(name: string, rupture: RuptureContext): boolean {
  requireInputs(name, rupture, ['magnitude']);
  requireInput(
    name,
    'hypoDepthKm',
    rupture.hypoDepthKm,
    'a finite focal depth of at least 0 km',
    (v) => v >= 0,
  );
  requireInputs(name, rupture, ['rakeDeg']);
  return (
    insideRange(rupture.magnitude, ZHAO06_VALIDITY.magnitude) &&
    insideRange(rupture.hypoDepthKm, ZHAO06_VALIDITY.depthKm!)
  );
}

function refusePgv(name: string, measure: Measure): void {
  if (measure.kind === 'PGV')
    throw new UnsupportedMeasure(
      'PGV',
      `${name} (Zhao et al. 2006) has no PGV equation; it predicts PGA and SA from 0.05 to 5 s`,
    );
}

interface PreparedRow {
  readonly row: Zhao06Row;
  readonly terms: readonly Zhao06RuptureTerms[];
}

/** Zhao et al. (2006), with or without the magnitude-squared term. */
export function createZhao06(magnitudeSquared: boolean): GroundMotionModel {
  const name = magnitudeSquared ? 'Zhao06-Msq' : 'Zhao06';
  const rowTerms = (row: Zhao06Row, r: RuptureContext): Zhao06RuptureTerms =>
    zhao06RuptureTerms(row, r.setting, r.magnitude, r.hypoDepthKm, r.rakeDeg, magnitudeSquared);

  function predict(input: GmmInput, measure: Measure): GmmPrediction {
    refusePgv(name, measure);
    checkRupture(name, input);
    requireInputs(name, input, ['rrupKm', 'vs30']);
    const notes = validityNotes(name, ZHAO06_VALIDITY, input, input.rrupKm);
    const siteClass = zhao06SiteClass(input.vs30);
    const predictRow = (row: Zhao06Row): GmmPrediction => {
      const terms = rowTerms(row, input);
      return {
        lnMedian: zhao06LnMedianFor(row, terms, input.rrupKm, zhao06SiteTerm(row, siteClass)),
        tau: terms.tau,
        phi: row.sigma,
        sigma: Math.sqrt(row.sigma * row.sigma + terms.tau * terms.tau),
        applicable: notes.length === 0,
        notes,
      };
    };
    return predictOnTable(name, ZHAO06_TABLE, undefined, measure, predictRow);
  }

  function prepareMeasures(
    ruptures: readonly RuptureContext[],
    measures: readonly Measure[],
  ): PreparedMotions {
    measures.forEach((m) => refusePgv(name, m));
    const inside = Uint8Array.from(ruptures, (r) => (checkRupture(name, r) ? 1 : 0));
    const termsOf = rowMemo((row: Zhao06Row): PreparedRow => ({
      row,
      terms: ruptures.map((r) => rowTerms(row, r)),
    }));
    const plans: RowPlan<PreparedRow>[] = measures.map((m) =>
      measurePlan(name, ZHAO06_TABLE, undefined, m, termsOf),
    );
    const scratch = createRowScratch();
    const [minKm, maxKm] = ZHAO06_VALIDITY.distanceKm;
    const evaluate = (
      prepared: PreparedRow,
      vs30: number,
      pairs: PairDistances,
      out: PairPredictions,
    ): void => {
      const { row, terms } = prepared;
      const siteTerm = zhao06SiteTerm(row, zhao06SiteClass(vs30));
      const siteInside = insideRange(vs30, ZHAO06_VALIDITY.vs30) ? 1 : 0;
      const { rupture, rrupKm, count } = pairs;
      for (let k = 0; k < count; k++) {
        const r = rupture[k] as number;
        const t = terms[r] as Zhao06RuptureTerms;
        const x = rrupKm[k] as number;
        out.lnMedian[k] = zhao06LnMedianFor(row, t, x, siteTerm);
        out.sigma[k] = Math.sqrt(row.sigma * row.sigma + t.tau * t.tau);
        out.applicable[k] = (inside[r] as number) & siteInside & (x < minKm || x > maxKm ? 0 : 1);
      }
    };
    return {
      distances: ['rrupKm'],
      predictPairs(site, pairs, out) {
        requireInputs(name, site, ['vs30']);
        plans.forEach((plan, i) =>
          predictRows(plan, pairs.count, out[i] as PairPredictions, scratch, (p, into) =>
            evaluate(p, site.vs30, pairs, into),
          ),
        );
      },
    };
  }

  return assembleModel({
    name,
    citation: `Zhao, J. X. et al. (2006). Attenuation relations of strong ground motion in Japan using site classification based on predominant period. Bulletin of the Seismological Society of America 96(3), 898–913.${magnitudeSquared ? ' With the magnitude-squared term.' : ''}`,
    settings: ['interface', 'intraslab', 'crustal'],
    distanceMetric: 'rrup',
    periodsS: ZHAO06_TABLE.saPeriodsS,
    hasPga: true,
    hasPgv: false,
    validity: ZHAO06_VALIDITY,
    predict,
    prepareMeasures,
  });
}

/** Zhao et al. (2006) without the magnitude-squared term. */
export const zhao06: GroundMotionModel = createZhao06(false);
/** Zhao et al. (2006) with the magnitude-squared term. */
export const zhao06Msq: GroundMotionModel = createZhao06(true);

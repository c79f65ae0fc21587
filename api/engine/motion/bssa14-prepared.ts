/**
 * BSSA14 for the fast hazard path (GroundMotionModel.prepare and prepareMeasures): the equations
 * of bssa14.ts split into what depends on the rupture alone (F_E, the magnitude factor of F_P, τ
 * and the magnitude ramp of φ, done once per rupture and row) and what depends on the site
 * (Rjb, Vs30, done per pair). What every measure shares is done once per pair: the distance
 * R = √(Rjb² + h²) of the PGA row, PGAr and the logarithm of the nonlinear site term,
 * ln((PGAr + f3) / f3), which does not depend on the period. Every term is computed by the same
 * expression, in the same order, as predictBssa14 (√ in place of Math.hypot), so
 * the numbers agree to within rounding (checked pair by pair in
 * test/engine/motion/bssa14-prepared.test.ts).
 *
 * This file and bssa14.ts import each other (the model object names its hook; the hook reuses
 * the model's terms); nothing here reads bssa14.ts at load time, which keeps the cycle safe.
 */
import { InvalidInput, UnsupportedMeasure } from '../errors.ts';
import { BSSA14_CONSTANTS as K, BSSA14_PGA, BSSA14_PGV, BSSA14_SA, type Bssa14Row } from './bssa14-coefficients.ts';
import {
  BSSA14_NORMAL_VALIDITY,
  BSSA14_VALIDITY,
  bssa14LinearSiteTerm,
  bssa14MechanismConstant,
  bssa14MechanismFromRake,
  bssa14SourceTerm,
  type Bssa14Mechanism,
  type Bssa14Options,
} from './bssa14.ts';
import type { Measure } from './measure.ts';
import { atLeast, createRowScratch, insideRange, mapPlan, periodRows, plannedRows, predictRows, rowMemo, singleMeasure, singleRow, type RowPlan } from './prepared-period.ts';
import type { PairDistances, PairPredictions, PreparedMotion, PreparedMotions, RuptureContext, SiteContext } from './types.ts';

const NAME = 'BSSA14';

/** Vs30 (m/s) of the f2 anchor, as in bssa14NonlinearSiteTerm. */
const F2_VS30_ANCHOR = 360;

function requireFinite(path: string, value: number, expected: string): void {
  if (!Number.isFinite(value)) throw new InvalidInput([{ path, message: `expected ${expected}, got ${value}` }], `${NAME} input`);
}

function requireVs30(site: SiteContext): void {
  if (!Number.isFinite(site.vs30) || !(site.vs30 > 0)) {
    throw new InvalidInput([{ path: 'vs30', message: `expected a finite Vs30 above 0 m/s, got ${site.vs30}` }], `${NAME} input`);
  }
}

/** The paper's magnitude ramp of τ and φ between M 4.5 and 5.5, as in bssa14Sigma. */
const ramp = (magnitude: number, small: number, large: number): number =>
  magnitude <= 4.5 ? small : magnitude >= 5.5 ? large : small + (large - small) * (magnitude - 4.5);

/** f2 of a row's nonlinear site term at `vs30` (m/s), as in bssa14NonlinearSiteTerm: 0 at and above 760 m/s. */
const nonlinearSlope = (row: Bssa14Row, vs30: number): number =>
  row.f4 * (Math.exp(row.f5 * (Math.min(vs30, K.vRef) - F2_VS30_ANCHOR)) - Math.exp(row.f5 * (K.vRef - F2_VS30_ANCHOR)));

/** Per-rupture columns shared by every row: magnitude, mechanism, and whether the rupture's own inputs are valid. */
interface RuptureColumns {
  readonly count: number;
  readonly magnitude: Float64Array;
  readonly mechanism: readonly Bssa14Mechanism[];
  readonly inside: Uint8Array;
  /** F_E and the F_P magnitude factor of the PGA row, for PGAr. */
  readonly pgaSource: Float64Array;
  readonly pgaSlope: Float64Array;
}

function ruptureColumns(ruptures: readonly RuptureContext[], options: Bssa14Options): RuptureColumns {
  const count = ruptures.length;
  const magnitude = new Float64Array(count);
  const mechanism: Bssa14Mechanism[] = [];
  const inside = new Uint8Array(count);
  const pgaSource = new Float64Array(count);
  const pgaSlope = new Float64Array(count);
  for (let r = 0; r < count; r++) {
    const rupture = ruptures[r] as RuptureContext;
    requireFinite('magnitude', rupture.magnitude, 'a finite moment magnitude');
    if (options.mechanism === undefined) requireFinite('rakeDeg', rupture.rakeDeg, 'a finite rake in degrees');
    const m = rupture.magnitude;
    const mech = options.mechanism ?? bssa14MechanismFromRake(rupture.rakeDeg);
    const range = mech === 'normal' ? BSSA14_NORMAL_VALIDITY : BSSA14_VALIDITY;
    magnitude[r] = m;
    mechanism.push(mech);
    inside[r] = rupture.setting === 'crustal' && insideRange(m, range.magnitude) ? 1 : 0;
    pgaSource[r] = bssa14SourceTerm(BSSA14_PGA, bssa14MechanismConstant(BSSA14_PGA, mech), m);
    pgaSlope[r] = BSSA14_PGA.c1 + BSSA14_PGA.c2 * (m - K.mRef);
  }
  return { count, magnitude, mechanism, inside, pgaSource, pgaSlope };
}

/** One row's per-rupture terms. */
interface RowTerms {
  readonly row: Bssa14Row;
  readonly source: Float64Array;
  readonly slope: Float64Array;
  readonly tau: Float64Array;
  readonly phiOfMagnitude: Float64Array;
}

function rowTerms(row: Bssa14Row, columns: RuptureColumns): RowTerms {
  const { count, magnitude } = columns;
  const source = new Float64Array(count);
  const slope = new Float64Array(count);
  const tau = new Float64Array(count);
  const phiOfMagnitude = new Float64Array(count);
  for (let r = 0; r < count; r++) {
    const m = magnitude[r] as number;
    source[r] = bssa14SourceTerm(row, bssa14MechanismConstant(row, columns.mechanism[r] as Bssa14Mechanism), m);
    slope[r] = row.c1 + row.c2 * (m - K.mRef);
    tau[r] = ramp(m, row.tau1, row.tau2);
    phiOfMagnitude[r] = ramp(m, row.phi1, row.phi2);
  }
  return { row, source, slope, tau, phiOfMagnitude };
}

/** What every measure shares at one site, per pair: the PGA row's R and ln(R / Rref), and ln((PGAr + f3) / f3). */
interface SharedTerms {
  rPgaKm: Float64Array;
  lnRPga: Float64Array;
  lnNonlinear: Float64Array;
}

/** One row's predictions for the pairs, from the shared terms. */
function predictRow(t: RowTerms, columns: RuptureColumns, shared: SharedTerms, vs30: number, pairs: PairDistances, out: PairPredictions): void {
  const { row, source, slope, tau, phiOfMagnitude } = t;
  const linear = bssa14LinearSiteTerm(row, vs30);
  const f2 = nonlinearSlope(row, vs30);
  let phiSite = 0;
  if (vs30 <= K.v1) phiSite = row.deltaPhiV;
  else if (vs30 < K.v2) phiSite = (row.deltaPhiV * Math.log(K.v2 / vs30)) / Math.log(K.v2 / K.v1);
  const soft = vs30 < K.v2;
  const siteInside = insideRange(vs30, BSSA14_VALIDITY.vs30) ? 1 : 0;
  const anelastic = row.c3 + K.deltaC3;
  const lnR2OverR1 = Math.log(row.r2 / row.r1);
  const { h, r1, r2, deltaPhiR } = row;
  const sameR = h === BSSA14_PGA.h;
  const [minKm, maxKm] = BSSA14_VALIDITY.distanceKm;
  const { rupture, rjbKm: rjbColumn, count } = pairs;
  const { rPgaKm, lnRPga, lnNonlinear } = shared;
  const { inside } = columns;
  const { lnMedian, sigma, applicable } = out;
  for (let k = 0; k < count; k++) {
    const r = rupture[k] as number;
    const rjbKm = rjbColumn[k] as number;
    let rKm: number;
    let lnR: number;
    if (sameR) {
      rKm = rPgaKm[k] as number;
      lnR = lnRPga[k] as number;
    } else {
      rKm = Math.sqrt(rjbKm * rjbKm + h * h);
      lnR = Math.log(rKm / K.rRefKm);
    }
    const path = (slope[r] as number) * lnR + anelastic * (rKm - K.rRefKm);
    // f2 is 0 at and above 760 m/s: the nonlinear term is f1 whatever PGAr.
    const nonlinear = f2 === 0 ? K.f1 : K.f1 + f2 * (lnNonlinear[k] as number);
    lnMedian[k] = (source[r] as number) + path + linear + nonlinear;

    let phi = phiOfMagnitude[r] as number;
    if (rjbKm > r1) phi += rjbKm >= r2 ? deltaPhiR : (deltaPhiR * Math.log(rjbKm / r1)) / lnR2OverR1;
    if (soft) phi -= phiSite;
    const tr = tau[r] as number;
    sigma[k] = Math.sqrt(tr * tr + phi * phi);
    applicable[k] = (inside[r] as number) & siteInside & (rjbKm < minKm || rjbKm > maxKm ? 0 : 1);
  }
}

const SA_PERIODS_S: readonly number[] = BSSA14_SA.map((r) => r.periodS);

/** BSSA14 prepared for `measures` over `ruptures` (the model's prepareMeasures hook). */
export function prepareBssa14Measures(ruptures: readonly RuptureContext[], measures: readonly Measure[], options: Bssa14Options = {}): PreparedMotions {
  for (const m of measures) if (m.kind === 'SA' && !(m.periodS > 0)) throw new UnsupportedMeasure(`SA(${m.periodS})`, 'the period must be greater than 0 s');
  const columns = ruptureColumns(ruptures, options);
  const termsOf = rowMemo((row: Bssa14Row) => rowTerms(row, columns));
  const plans: RowPlan<RowTerms>[] = measures.map((m) => {
    if (m.kind !== 'SA') return singleRow(termsOf(m.kind === 'PGA' ? BSSA14_PGA : BSSA14_PGV));
    return mapPlan(periodRows(NAME, SA_PERIODS_S, BSSA14_SA, m.periodS), termsOf);
  });
  const rows = plannedRows(plans).map((t) => t.row);
  const pgaAnelastic = BSSA14_PGA.c3 + K.deltaC3;
  const shared: SharedTerms = { rPgaKm: new Float64Array(0), lnRPga: new Float64Array(0), lnNonlinear: new Float64Array(0) };
  const scratch = createRowScratch();

  return {
    distances: ['rjbKm'],
    predictPairs(site, pairs, out) {
      requireVs30(site);
      const vs30 = site.vs30;
      const { count, rupture, rjbKm: rjbColumn } = pairs;
      shared.rPgaKm = atLeast(shared.rPgaKm, count);
      shared.lnRPga = atLeast(shared.lnRPga, count);
      shared.lnNonlinear = atLeast(shared.lnNonlinear, count);
      const { rPgaKm, lnRPga, lnNonlinear } = shared;
      // PGAr (hence its logarithm) is needed only where some row's nonlinear slope f2 is not 0 (Vs30 below 760 m/s).
      const rock = rows.some((row) => nonlinearSlope(row, vs30) !== 0);
      const { pgaSource, pgaSlope } = columns;
      const h = BSSA14_PGA.h;
      for (let k = 0; k < count; k++) {
        const rjbKm = rjbColumn[k] as number;
        const rKm = Math.sqrt(rjbKm * rjbKm + h * h);
        const lnR = Math.log(rKm / K.rRefKm);
        rPgaKm[k] = rKm;
        lnRPga[k] = lnR;
        if (rock) {
          const r = rupture[k] as number;
          const pgaRockG = Math.exp((pgaSource[r] as number) + ((pgaSlope[r] as number) * lnR + pgaAnelastic * (rKm - K.rRefKm)));
          lnNonlinear[k] = Math.log((pgaRockG + K.f3G) / K.f3G);
        }
      }
      plans.forEach((plan, i) => predictRows(plan, count, out[i] as PairPredictions, scratch, (t, into) => predictRow(t, columns, shared, vs30, pairs, into)));
    },
  };
}

/** BSSA14 prepared for one measure (the model's prepare hook). */
export function prepareBssa14(ruptures: readonly RuptureContext[], measure: Measure, options: Bssa14Options = {}): PreparedMotion {
  return singleMeasure(prepareBssa14Measures(ruptures, [measure], options));
}

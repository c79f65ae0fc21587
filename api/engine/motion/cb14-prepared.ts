/**
 * CB14 for the fast hazard path (GroundMotionModel.prepare and prepareMeasures): the terms of
 * cb14.ts that depend on the rupture alone (f_mag, f_flt, f_hyp, f_dip, the magnitude factor of
 * f_dis, the rupture factors of f_hng, the magnitude ramps of τ and φ) are done once per rupture
 * and row. Per pair remain f_dis, f_hng, f_atn, A1100 and what follows from it (f_site below
 * k1, α of the σ model). The PGA row's f_dis, f_hng and f_atn, A1100 and the PGA at the site
 * (the floor of SA below 0.25 s) are shared by every measure, worked out once per pair. Each
 * term is the same expression as in cb14.ts (f_site's two logarithms taken as one of their
 * ratio) and the nine terms are added in predictCb14's order, so the numbers agree to within
 * rounding (test/engine/motion/cb14-prepared.test.ts).
 *
 * This file and cb14.ts import each other (the model object names its hook; the hook reuses
 * the model's terms); nothing here reads cb14.ts at load time, which keeps the cycle safe.
 */
import { InvalidInput, UnsupportedMeasure } from '../errors.ts';
import { toRadians } from '../units.ts';
import { CB14_CONSTANTS as K, CB14_PGA, CB14_PGV, CB14_SA, type Cb14Row } from './cb14-coefficients.ts';
import {
  cb14HangingWallRxTaper,
  CB14_MAGNITUDE_RANGE,
  CB14_ROCK_VS30,
  CB14_VALIDITY,
  cb14BasinTerm,
  cb14DefaultZ2p5Km,
  cb14DipTerm,
  cb14HypocentreTerm,
  cb14MechanismFromRake,
  cb14SiteTerm,
  cb14StyleTerm,
  type Cb14Mechanism,
} from './cb14.ts';
import type { Measure } from './measure.ts';
import { atLeast, createRowScratch, insideRange, mapPlan, periodRows, predictRows, rowMemo, singleMeasure, singleRow, type RowPlan } from './prepared-period.ts';
import type { PairDistances, PairPredictions, PreparedMotion, PreparedMotions, RuptureContext, SiteContext } from './types.ts';

const NAME = 'CB14';

function requireNumber(path: string, value: number, expected: string, ok: (v: number) => boolean): void {
  if (!Number.isFinite(value) || !ok(value)) {
    throw new InvalidInput([{ path, message: `expected ${expected}, got ${value}` }], `${NAME} input`);
  }
}

/** The rupture's own columns, shared by every row. */
interface RuptureColumns {
  readonly count: number;
  readonly contexts: readonly RuptureContext[];
  readonly mechanism: readonly Cb14Mechanism[];
  /** 1 where the hanging-wall term can be non-zero (M > 5.5, Ztor ≤ 16.66 km). */
  readonly hangingWall: Uint8Array;
  readonly r1Km: Float64Array;
  readonly r2Km: Float64Array;
  readonly fZ: Float64Array;
  readonly fDip: Float64Array;
  readonly inside: Uint8Array;
}

function ruptureColumns(ruptures: readonly RuptureContext[]): RuptureColumns {
  const count = ruptures.length;
  const columns = {
    count,
    contexts: ruptures,
    mechanism: [] as Cb14Mechanism[],
    hangingWall: new Uint8Array(count),
    r1Km: new Float64Array(count),
    r2Km: new Float64Array(count),
    fZ: new Float64Array(count),
    fDip: new Float64Array(count),
    inside: new Uint8Array(count),
  };
  for (let r = 0; r < count; r++) {
    const s = ruptures[r] as RuptureContext;
    requireNumber('magnitude', s.magnitude, 'a finite moment magnitude', () => true);
    requireNumber('rakeDeg', s.rakeDeg, 'a finite rake in degrees', () => true);
    requireNumber('dipDeg', s.dipDeg, 'a dip above 0° and at most 90°', (v) => v > 0 && v <= 90);
    requireNumber('ztorKm', s.ztorKm, 'a finite depth to the top of rupture of at least 0 km', (v) => v >= 0);
    requireNumber('hypoDepthKm', s.hypoDepthKm, 'a finite hypocentral depth of at least 0 km', (v) => v >= 0);
    requireNumber('widthKm', s.widthKm, 'a finite down-dip width of at least 0 km', (v) => v >= 0);
    const mechanism = cb14MechanismFromRake(s.rakeDeg);
    columns.mechanism.push(mechanism);
    columns.hangingWall[r] = s.magnitude <= 5.5 || s.ztorKm > 16.66 ? 0 : 1;
    columns.r1Km[r] = s.widthKm * Math.cos(toRadians(s.dipDeg));
    columns.r2Km[r] = 62 * s.magnitude - 350;
    columns.fZ[r] = 1 - 0.06 * s.ztorKm;
    columns.fDip[r] = (90 - s.dipDeg) / 45;
    const inside =
      s.setting === 'crustal' &&
      insideRange(s.magnitude, CB14_MAGNITUDE_RANGE[mechanism]) &&
      insideRange(s.hypoDepthKm, CB14_VALIDITY.depthKm as readonly [number, number]) &&
      insideRange(s.ztorKm, [0, 20]) &&
      insideRange(s.dipDeg, [15, 90]);
    columns.inside[r] = inside ? 1 : 0;
  }
  return columns;
}

/** One row's per-rupture terms. */
interface RowTerms {
  readonly row: Cb14Row;
  /** f_mag; then f_flt, f_hyp and f_dip, kept apart so the nine terms add in predictCb14's order. */
  readonly magnitudeTerm: Float64Array;
  readonly styleTerm: Float64Array;
  readonly hypocentreTerm: Float64Array;
  readonly dipTerm: Float64Array;
  readonly distanceSlope: Float64Array;
  readonly fM: Float64Array;
  readonly tauY: Float64Array;
  readonly phiY: Float64Array;
  readonly phiYB: Float64Array;
}

/** The σ model's magnitude ramp, as in cb14Sigma. */
const ramp = (m: number, small: number, large: number): number => (m <= 4.5 ? small : m >= 5.5 ? large : large + (small - large) * (5.5 - m));

function rowTerms(row: Cb14Row, columns: RuptureColumns): RowTerms {
  const n = columns.count;
  const terms: RowTerms = {
    row,
    magnitudeTerm: new Float64Array(n),
    styleTerm: new Float64Array(n),
    hypocentreTerm: new Float64Array(n),
    dipTerm: new Float64Array(n),
    distanceSlope: new Float64Array(n),
    fM: new Float64Array(n),
    tauY: new Float64Array(n),
    phiY: new Float64Array(n),
    phiYB: new Float64Array(n),
  };
  for (let r = 0; r < n; r++) {
    const s = columns.contexts[r] as RuptureContext;
    const m = s.magnitude;
    // cb14MagnitudeTerm's expression, written out: that function builds a closure per call.
    terms.magnitudeTerm[r] = row.c0 + row.c1 * m + row.c2 * Math.max(m - 4.5, 0) + row.c3 * Math.max(m - 5.5, 0) + row.c4 * Math.max(m - 6.5, 0);
    terms.styleTerm[r] = cb14StyleTerm(row, m, columns.mechanism[r] as Cb14Mechanism);
    terms.hypocentreTerm[r] = cb14HypocentreTerm(row, m, s.hypoDepthKm);
    terms.dipTerm[r] = cb14DipTerm(row, m, s.dipDeg);
    terms.distanceSlope[r] = row.c5 + row.c6 * m;
    terms.fM[r] = m <= 6.5 ? (m - 5.5) * (1 + row.a2 * (m - 6.5)) : 1 + row.a2 * (m - 6.5);
    const phiY = ramp(m, row.phi1, row.phi2);
    terms.tauY[r] = ramp(m, row.tau1, row.tau2);
    terms.phiY[r] = phiY;
    terms.phiYB[r] = Math.sqrt(Math.max(phiY * phiY - row.phiLnAF * row.phiLnAF, 0));
  }
  return terms;
}

/** f_hng of cb14HangingWallTerm with the rupture's factors looked up. */
function hangingWallTerm(t: RowTerms, c: RuptureColumns, r: number, rxKm: number, rrupKm: number, rjbKm: number): number {
  if (rxKm < 0 || c.hangingWall[r] === 0) return 0;
  const { row } = t;
  const r1Km = c.r1Km[r] as number;
  const r2Km = c.r2Km[r] as number;
  const fRx = cb14HangingWallRxTaper(row, rxKm, r1Km, r2Km);
  const fRrup = rrupKm === 0 ? 1 : Math.max(rrupKm - rjbKm, 0) / rrupKm;
  return row.c10 * fRx * fRrup * (t.fM[r] as number) * (c.fZ[r] as number) * (c.fDip[r] as number);
}

/** f_atn of a row for Rrup in km, as cb14AnelasticTerm. */
const anelasticTerm = (row: Cb14Row, rrupKm: number): number => (rrupKm > 80 ? (row.c20 + K.deltaC20) * (rrupKm - 80) : 0);

/** ln median before the PGA floor: the nine terms in predictCb14's order. */
function lnMedianUnfloored(t: RowTerms, r: number, distance: number, hangingWall: number, site: number, sed: number, anelastic: number): number {
  return (
    (t.magnitudeTerm[r] as number) + distance + (t.styleTerm[r] as number) + hangingWall + site + sed + (t.hypocentreTerm[r] as number) + (t.dipTerm[r] as number) + anelastic
  );
}

/** The site's parts of f_site for one row: constant above k1, else the pieces around A1100. */
interface SiteTerms {
  readonly linear: boolean;
  readonly constant: number;
  readonly lnRatio: number;
  readonly cExp: number;
  /** K.c (Vs30/k1)^n of the σ model's α. */
  readonly cPow: number;
}

function siteTerms(row: Cb14Row, vs30: number): SiteTerms {
  const lnRatio = Math.log(vs30 / row.k1);
  return {
    linear: vs30 > row.k1,
    constant: (row.c11 + row.k2 * K.n) * lnRatio,
    lnRatio,
    cExp: K.c * Math.exp(K.n * lnRatio),
    cPow: K.c * (vs30 / row.k1) ** K.n,
  };
}

function siteTerm(row: Cb14Row, s: SiteTerms, a1100G: number): number {
  if (s.linear) return s.constant;
  // cb14SiteTerm's difference of two logarithms taken as the logarithm of their ratio (a rounding apart, half the cost).
  return row.c11 * s.lnRatio + row.k2 * Math.log((a1100G + s.cExp) / (a1100G + K.c));
}

function checkSite(site: SiteContext): void {
  requireNumber('vs30', site.vs30, 'a finite Vs30 above 0 m/s', (v) => v > 0);
  if (site.z2p5Km !== undefined) requireNumber('z2p5Km', site.z2p5Km, 'a finite Z2.5 of at least 0 km', (v) => v >= 0);
}

/** CB14 at periods under 0.25 s is not allowed below PGA. */
const isFloored = (row: Cb14Row): boolean => row.periodS > 0 && row.periodS < 0.25;

/** What every row shares at one site, per pair: the PGA row's f_dis, f_hng, f_atn, A1100 (g) and, where a row is floored, ln PGA at the site. */
interface SharedTerms {
  pgaDistance: Float64Array;
  pgaHangingWall: Float64Array;
  pgaAnelastic: Float64Array;
  a1100G: Float64Array;
  lnPga: Float64Array;
  /** Whether lnPga is filled at this site (only when some row is floored). */
  hasLnPga: boolean;
}

/** Per-rupture σ terms of the PGA row, for α. */
interface PgaSigma {
  readonly tau: Float64Array;
  readonly phiB: Float64Array;
}

/** The site's own numbers, the same for every row: Vs30, Z2.5 and whether they are in range. */
interface SiteNumbers {
  readonly vs30: number;
  readonly z2p5Km: number;
  readonly inside: number;
}

function predictRow(t: RowTerms, pga: RowTerms, columns: RuptureColumns, pgaSigma: PgaSigma, shared: SharedTerms, site: SiteNumbers, pairs: PairDistances, out: PairPredictions): void {
  const { row } = t;
  const isPga = t === pga;
  const floored = isFloored(row);
  const rowSite = siteTerms(row, site.vs30);
  const rowSed = cb14BasinTerm(row, site.z2p5Km);
  const nonlinearSigma = site.vs30 < row.k1;
  const [minKm, maxKm] = CB14_VALIDITY.distanceKm;
  const { pgaDistance, pgaHangingWall, pgaAnelastic, a1100G: a1100Column, lnPga } = shared;
  const { rupture, rrupKm: rrupColumn, rjbKm: rjbColumn, rxKm: rxColumn, count } = pairs;
  const { lnMedian, sigma, applicable } = out;
  const { tauY: tauYColumn, phiY: phiYColumn, phiYB: phiYBColumn, distanceSlope } = t;
  const c7 = row.c7;
  for (let k = 0; k < count; k++) {
    const r = rupture[k] as number;
    const rrupKm = rrupColumn[k] as number;
    const a1100G = a1100Column[k] as number;
    let distance: number, hangingWall: number, anelastic: number;
    if (isPga) {
      distance = pgaDistance[k] as number;
      hangingWall = pgaHangingWall[k] as number;
      anelastic = pgaAnelastic[k] as number;
    } else {
      distance = (distanceSlope[r] as number) * Math.log(Math.sqrt(rrupKm * rrupKm + c7 * c7));
      hangingWall = hangingWallTerm(t, columns, r, rxColumn[k] as number, rrupKm, rjbColumn[k] as number);
      anelastic = anelasticTerm(row, rrupKm);
    }
    if (isPga && shared.hasLnPga) {
      lnMedian[k] = lnPga[k] as number;
    } else {
      const unfloored = lnMedianUnfloored(t, r, distance, hangingWall, siteTerm(row, rowSite, a1100G), rowSed, anelastic);
      lnMedian[k] = floored ? Math.max(unfloored, lnPga[k] as number) : unfloored;
    }

    const tauY = tauYColumn[r] as number;
    const phiY = phiYColumn[r] as number;
    const alpha = nonlinearSigma ? row.k2 * a1100G * (1 / (a1100G + rowSite.cPow) - 1 / (a1100G + K.c)) : 0;
    if (alpha === 0) {
      sigma[k] = Math.sqrt(tauY * tauY + phiY * phiY);
    } else {
      const tauPga = pgaSigma.tau[r] as number;
      const phiYB = phiYBColumn[r] as number;
      const phiPgaB = pgaSigma.phiB[r] as number;
      const tau = Math.sqrt(Math.max(tauY * tauY + alpha * alpha * tauPga * tauPga + 2 * alpha * row.rho * tauY * tauPga, 0));
      const phi = Math.sqrt(Math.max(phiYB * phiYB + row.phiLnAF * row.phiLnAF + alpha * alpha * phiPgaB * phiPgaB + 2 * alpha * row.rho * phiYB * phiPgaB, 0));
      sigma[k] = Math.sqrt(tau * tau + phi * phi);
    }
    applicable[k] = (columns.inside[r] as number) & site.inside & (rrupKm < minKm || rrupKm > maxKm ? 0 : 1);
  }
}

const SA_PERIODS_S: readonly number[] = CB14_SA.map((r) => r.periodS);

/** CB14 prepared for `measures` over `ruptures` (the model's prepareMeasures hook). */
export function prepareCb14Measures(ruptures: readonly RuptureContext[], measures: readonly Measure[]): PreparedMotions {
  for (const m of measures) if (m.kind === 'SA' && !(m.periodS > 0)) throw new UnsupportedMeasure(`SA(${m.periodS})`, 'the period must be greater than 0 s');
  const columns = ruptureColumns(ruptures);
  const termsOf = rowMemo((row: Cb14Row) => rowTerms(row, columns));
  const pga = termsOf(CB14_PGA);
  const plans: RowPlan<RowTerms>[] = measures.map((m) => {
    if (m.kind !== 'SA') return singleRow(m.kind === 'PGA' ? pga : termsOf(CB14_PGV));
    return mapPlan(periodRows(NAME, SA_PERIODS_S, CB14_SA, m.periodS), termsOf);
  });
  const anyFloored = plans.some((plan) => isFloored(plan.lower.row) || (plan.upper !== undefined && isFloored(plan.upper.row)));
  const rockSite = cb14SiteTerm(CB14_PGA, CB14_ROCK_VS30, 0);
  const rockSed = cb14BasinTerm(CB14_PGA, cb14DefaultZ2p5Km(CB14_ROCK_VS30));
  const pgaSigma: PgaSigma = { tau: new Float64Array(columns.count), phiB: new Float64Array(columns.count) };
  for (let r = 0; r < columns.count; r++) {
    const m = (columns.contexts[r] as RuptureContext).magnitude;
    pgaSigma.tau[r] = ramp(m, CB14_PGA.tau1, CB14_PGA.tau2);
    const phiPga = ramp(m, CB14_PGA.phi1, CB14_PGA.phi2);
    pgaSigma.phiB[r] = Math.sqrt(Math.max(phiPga * phiPga - CB14_PGA.phiLnAF * CB14_PGA.phiLnAF, 0));
  }
  const empty = new Float64Array(0);
  const shared: SharedTerms = { pgaDistance: empty, pgaHangingWall: empty, pgaAnelastic: empty, a1100G: empty, lnPga: empty, hasLnPga: anyFloored };
  const scratch = createRowScratch();

  return {
    distances: ['rrupKm', 'rjbKm', 'rxKm'],
    predictPairs(site, pairs, out) {
      checkSite(site);
      const vs30 = site.vs30;
      const z2p5Km = site.z2p5Km ?? cb14DefaultZ2p5Km(vs30);
      const siteNumbers: SiteNumbers = {
        vs30,
        z2p5Km,
        inside: insideRange(vs30, CB14_VALIDITY.vs30) && (site.z2p5Km === undefined || insideRange(site.z2p5Km, [0, 10])) ? 1 : 0,
      };
      const { count, rupture, rrupKm: rrupColumn, rjbKm: rjbColumn, rxKm: rxColumn } = pairs;
      for (const key of ['pgaDistance', 'pgaHangingWall', 'pgaAnelastic', 'a1100G', 'lnPga'] as const) shared[key] = atLeast(shared[key], count);
      const { pgaDistance, pgaHangingWall, pgaAnelastic, a1100G: a1100Column, lnPga } = shared;
      const pgaSite = siteTerms(CB14_PGA, vs30);
      const pgaSed = cb14BasinTerm(CB14_PGA, z2p5Km);
      const c7 = CB14_PGA.c7;
      for (let k = 0; k < count; k++) {
        const r = rupture[k] as number;
        const rrupKm = rrupColumn[k] as number;
        const distance = (pga.distanceSlope[r] as number) * Math.log(Math.sqrt(rrupKm * rrupKm + c7 * c7));
        const hangingWall = hangingWallTerm(pga, columns, r, rxColumn[k] as number, rrupKm, rjbColumn[k] as number);
        const anelastic = anelasticTerm(CB14_PGA, rrupKm);
        const a1100G = Math.exp(lnMedianUnfloored(pga, r, distance, hangingWall, rockSite, rockSed, anelastic));
        pgaDistance[k] = distance;
        pgaHangingWall[k] = hangingWall;
        pgaAnelastic[k] = anelastic;
        a1100Column[k] = a1100G;
        if (anyFloored) lnPga[k] = lnMedianUnfloored(pga, r, distance, hangingWall, siteTerm(CB14_PGA, pgaSite, a1100G), pgaSed, anelastic);
      }
      plans.forEach((plan, i) => predictRows(plan, count, out[i] as PairPredictions, scratch, (t, into) => predictRow(t, pga, columns, pgaSigma, shared, siteNumbers, pairs, into)));
    },
  };
}

/** CB14 prepared for one measure (the model's prepare hook). */
export function prepareCb14(ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion {
  return singleMeasure(prepareCb14Measures(ruptures, [measure]));
}

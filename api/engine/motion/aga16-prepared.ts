/**
 * AGA16 for the fast hazard path (GroundMotionModel.prepare and prepareMeasures): the terms of
 * aga16.ts that depend on the rupture alone (the constant with θ4 ΔC1, the slope of the
 * spreading term, the finite-fault distance C4 exp(θ9 (M − 6)), θ10 F, f_mag, f_depth) are done
 * once per rupture and row. Per pair remain the spreading logarithm ln(R + C4 exp(θ9 (M − 6))),
 * which does not depend on the period and so is shared by every measure, θ6 R, PGA1000 (shared
 * too) and each row's nonlinear site term. Each term is the same expression as in aga16.ts,
 * added in the same order (the nonlinear site term's two logarithms taken as one of their
 * ratio), so the numbers agree to within rounding (test/engine/motion/aga16-prepared.test.ts).
 *
 * This file and aga16.ts import each other (the model object names its hook; the hook reuses
 * the model's terms); nothing here reads aga16.ts at load time, which keeps the cycle safe.
 */
import { InvalidInput, UnsupportedMeasure } from '../errors.ts';
import { AGA16_CONSTANTS as K, AGA16_PGA, AGA16_SA, type Aga16Row } from './aga16-coefficients.ts';
import { AGA16_INTERFACE_VALIDITY, AGA16_INTRASLAB_VALIDITY, AGA16_SIGMA, aga16DeltaC1, aga16SiteTerm, type Aga16EventType } from './aga16.ts';
import type { Measure } from './measure.ts';
import { atLeast, createRowScratch, insideRange, mapPlan, periodRows, plannedRows, predictRows, rowMemo, singleMeasure, singleRow, type RowPlan } from './prepared-period.ts';
import type { DistanceName, PairDistances, PairPredictions, PreparedMotion, PreparedMotions, RuptureContext } from './types.ts';

const NAME = 'AGA16';

function requireNumber(path: string, value: number, expected: string, ok: (v: number) => boolean): void {
  if (!Number.isFinite(value) || !ok(value)) {
    throw new InvalidInput([{ path, message: `expected ${expected}, got ${value}` }], `${NAME} input`);
  }
}

/** The rupture's own columns, shared by every row. */
interface RuptureColumns {
  readonly contexts: readonly RuptureContext[];
  readonly eventType: readonly Aga16EventType[];
  /** 1 for intraslab ruptures, whose distance is Rhypo; 0 for Rrup. */
  readonly slab: Uint8Array;
  readonly inside: Uint8Array;
  /** C4 exp(θ9 (M − 6)), km: the same for every row. */
  readonly finiteFaultKm: Float64Array;
}

function ruptureColumns(ruptures: readonly RuptureContext[]): RuptureColumns {
  const count = ruptures.length;
  const eventType: Aga16EventType[] = [];
  const slab = new Uint8Array(count);
  const inside = new Uint8Array(count);
  const finiteFaultKm = new Float64Array(count);
  for (let r = 0; r < count; r++) {
    const s = ruptures[r] as RuptureContext;
    const type: Aga16EventType = s.setting === 'intraslab' ? 'intraslab' : 'interface';
    requireNumber('magnitude', s.magnitude, 'a finite moment magnitude', () => true);
    if (type === 'intraslab') requireNumber('hypoDepthKm', s.hypoDepthKm, 'a finite hypocentral depth of at least 0 km', (v) => v >= 0);
    const range = type === 'intraslab' ? AGA16_INTRASLAB_VALIDITY : AGA16_INTERFACE_VALIDITY;
    eventType.push(type);
    slab[r] = type === 'intraslab' ? 1 : 0;
    const depthInside = range.depthKm === undefined || insideRange(s.hypoDepthKm, range.depthKm);
    inside[r] = s.setting !== 'crustal' && insideRange(s.magnitude, range.magnitude) && depthInside ? 1 : 0;
    finiteFaultKm[r] = K.c4Km * Math.exp(K.theta9 * (s.magnitude - 6));
  }
  return { contexts: ruptures, eventType, slab, inside, finiteFaultKm };
}

/** The per-rupture parts of aga16LnMedianAtVlin for one row. */
interface RowTerms {
  readonly row: Aga16Row;
  /** θ1 + θ4 ΔC1. */
  readonly constant: Float64Array;
  readonly spreadingSlope: Float64Array;
  /** θ10 F. */
  readonly slabTerm: Float64Array;
  readonly magnitudeTerm: Float64Array;
  readonly depthTerm: Float64Array;
}

function rowTerms(row: Aga16Row, columns: RuptureColumns): RowTerms {
  const n = columns.contexts.length;
  const terms: RowTerms = {
    row,
    constant: new Float64Array(n),
    spreadingSlope: new Float64Array(n),
    slabTerm: new Float64Array(n),
    magnitudeTerm: new Float64Array(n),
    depthTerm: new Float64Array(n),
  };
  // ΔC1 depends on the row and the event type only.
  const deltaC1ByType = { interface: aga16DeltaC1(row.periodS, 'interface'), intraslab: aga16DeltaC1(row.periodS, 'intraslab') };
  for (let r = 0; r < n; r++) {
    const s = columns.contexts[r] as RuptureContext;
    const m = s.magnitude;
    const slab = columns.slab[r] as number;
    const deltaC1 = deltaC1ByType[columns.eventType[r] as Aga16EventType];
    const magnitudeBreak = K.c1 + deltaC1;
    const slope = m <= magnitudeBreak ? K.theta4 : K.theta5;
    terms.constant[r] = row.theta1 + K.theta4 * deltaC1;
    terms.spreadingSlope[r] = row.theta2 + row.theta14 * slab + K.theta3 * (m - K.c1);
    terms.slabTerm[r] = row.theta10 * slab;
    terms.magnitudeTerm[r] = slope * (m - magnitudeBreak) + row.theta13 * (10 - m) ** 2;
    terms.depthTerm[r] = row.theta11 * (Math.min(s.hypoDepthKm, K.depthCapKm) - K.depthReferenceKm) * slab;
  }
  return terms;
}

/** What every row shares at one site, per pair: the distance (Rrup or Rhypo), ln(R + C4 exp(θ9 (M − 6))) and PGA1000 (g). */
interface SharedTerms {
  distanceKm: Float64Array;
  lnSpreading: Float64Array;
  pga1000G: Float64Array;
}

/** aga16LnMedianAtVlin of pair k's rupture r from the shared terms. */
const lnMedianAtVlin = (t: RowTerms, r: number, lnSpreading: number, distanceKm: number): number =>
  (t.constant[r] as number) + (t.spreadingSlope[r] as number) * lnSpreading + t.row.theta6 * distanceKm + (t.slabTerm[r] as number) + (t.magnitudeTerm[r] as number) + (t.depthTerm[r] as number);

function predictRow(t: RowTerms, columns: RuptureColumns, shared: SharedTerms, vs30: number, pairs: PairDistances, out: PairPredictions): void {
  const { row } = t;
  const lnRatio = Math.log(Math.min(vs30, K.vs30CapMS) / row.vlin);
  const linear = vs30 >= row.vlin;
  const linearTerm = (row.theta12 + row.b * K.n) * lnRatio;
  const lnRatioTerm = row.theta12 * lnRatio;
  const cExp = K.c * Math.exp(K.n * lnRatio);
  // Interface and intraslab predictions share their Vs30 and distance ranges.
  const siteInside = insideRange(vs30, AGA16_INTERFACE_VALIDITY.vs30) ? 1 : 0;
  const [minKm, maxKm] = AGA16_INTERFACE_VALIDITY.distanceKm;
  const { constant, spreadingSlope, slabTerm, magnitudeTerm, depthTerm } = t;
  const { theta6, b } = row;
  const rowSigma = AGA16_SIGMA;
  const { distanceKm: distances, lnSpreading, pga1000G } = shared;
  const { inside } = columns;
  const { rupture, count } = pairs;
  const { lnMedian, sigma, applicable } = out;
  for (let k = 0; k < count; k++) {
    const r = rupture[k] as number;
    const distanceKm = distances[k] as number;
    const lnAtVlin =
      (constant[r] as number) + (spreadingSlope[r] as number) * (lnSpreading[k] as number) + theta6 * distanceKm + (slabTerm[r] as number) + (magnitudeTerm[r] as number) + (depthTerm[r] as number);
    if (linear) {
      lnMedian[k] = lnAtVlin + linearTerm;
    } else {
      const p = pga1000G[k] as number;
      // aga16SiteTerm's two logarithms taken as one of their ratio (a rounding apart, half the cost).
      lnMedian[k] = lnAtVlin + (lnRatioTerm + b * Math.log((p + cExp) / (p + K.c)));
    }
    sigma[k] = rowSigma;
    applicable[k] = (inside[r] as number) & siteInside & (distanceKm < minKm || distanceKm > maxKm ? 0 : 1);
  }
}

const SA_PERIODS_S: readonly number[] = AGA16_SA.map((r) => r.periodS);

/** AGA16 prepared for `measures` over `ruptures` (the model's prepareMeasures hook); PGV is refused as predict refuses it. */
export function prepareAga16Measures(ruptures: readonly RuptureContext[], measures: readonly Measure[]): PreparedMotions {
  for (const m of measures) {
    if (m.kind === 'PGV') throw new UnsupportedMeasure('PGV', `${NAME} (Abrahamson, Gregor & Addo 2016) has no PGV equation; it predicts PGA and SA from 0.02 to 10 s`);
  }
  const columns = ruptureColumns(ruptures);
  const termsOf = rowMemo((row: Aga16Row) => rowTerms(row, columns));
  const pga = termsOf(AGA16_PGA);
  const plans: RowPlan<RowTerms>[] = measures.map((m) => {
    if (m.kind !== 'SA') return singleRow(pga);
    return mapPlan(periodRows(NAME, SA_PERIODS_S, AGA16_SA, m.periodS), termsOf);
  });
  const rows = plannedRows(plans).map((t) => t.row);
  const distances: DistanceName[] = [];
  if (columns.slab.some((s) => s === 0)) distances.push('rrupKm');
  if (columns.slab.some((s) => s === 1)) distances.push('rhypoKm');
  const rockSite = aga16SiteTerm(AGA16_PGA, K.vs30CapMS, 0);
  const shared: SharedTerms = { distanceKm: new Float64Array(0), lnSpreading: new Float64Array(0), pga1000G: new Float64Array(0) };
  const scratch = createRowScratch();

  return {
    distances,
    predictPairs(site, pairs, out) {
      requireNumber('vs30', site.vs30, 'a finite Vs30 above 0 m/s', (v) => v > 0);
      const vs30 = site.vs30;
      const { count, rupture, rrupKm, rhypoKm } = pairs;
      shared.distanceKm = atLeast(shared.distanceKm, count);
      shared.lnSpreading = atLeast(shared.lnSpreading, count);
      shared.pga1000G = atLeast(shared.pga1000G, count);
      const { distanceKm: distance, lnSpreading, pga1000G } = shared;
      // PGA1000 drives the nonlinear site term of the rows whose Vlin is above the site's Vs30.
      const rock = rows.some((row) => vs30 < row.vlin);
      const { slab, finiteFaultKm } = columns;
      for (let k = 0; k < count; k++) {
        const r = rupture[k] as number;
        const d = slab[r] === 1 ? (rhypoKm[k] as number) : (rrupKm[k] as number);
        const lnR = Math.log(d + (finiteFaultKm[r] as number));
        distance[k] = d;
        lnSpreading[k] = lnR;
        if (rock) pga1000G[k] = Math.exp(lnMedianAtVlin(pga, r, lnR, d) + rockSite);
      }
      plans.forEach((plan, i) => predictRows(plan, count, out[i] as PairPredictions, scratch, (t, into) => predictRow(t, columns, shared, vs30, pairs, into)));
    },
  };
}

/** AGA16 prepared for one measure (the model's prepare hook). */
export function prepareAga16(ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion {
  return singleMeasure(prepareAga16Measures(ruptures, [measure]));
}

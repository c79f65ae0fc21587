/**
 * AGA16 for the fast hazard path (GroundMotionModel.prepare): the terms of aga16.ts that depend
 * on the rupture alone (the constant with θ4 ΔC1, the slope of the spreading term, the
 * finite-fault distance C4 exp(θ9 (M − 6)), θ10 F, f_mag, f_depth) are done once per rupture;
 * per pair remain the spreading logarithm, θ6 R, PGA1000 and the nonlinear site term. Each term
 * is the same expression as in aga16.ts, added in the same order (the nonlinear site term's two
 * logarithms taken as one of their ratio), so the numbers agree to within rounding
 * (test/engine/motion/aga16-prepared.test.ts).
 *
 * This file and aga16.ts import each other (the model object names its hook; the hook reuses
 * the model's terms); nothing here reads aga16.ts at load time, which keeps the cycle safe.
 */
import { InvalidInput, UnsupportedMeasure } from '../errors.ts';
import { AGA16_CONSTANTS as K, AGA16_PGA, AGA16_SA, type Aga16Row } from './aga16-coefficients.ts';
import { AGA16_INTERFACE_VALIDITY, AGA16_INTRASLAB_VALIDITY, aga16DeltaC1, aga16SiteTerm, type Aga16EventType } from './aga16.ts';
import type { Measure } from './measure.ts';
import { insideRange, preparedAtPeriod } from './prepared-period.ts';
import type { DistanceName, PreparedMotion, RuptureContext } from './types.ts';

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
}

function ruptureColumns(ruptures: readonly RuptureContext[]): RuptureColumns {
  const eventType: Aga16EventType[] = [];
  const slab = new Uint8Array(ruptures.length);
  const inside = new Uint8Array(ruptures.length);
  ruptures.forEach((s, r) => {
    const type: Aga16EventType = s.setting === 'intraslab' ? 'intraslab' : 'interface';
    requireNumber('magnitude', s.magnitude, 'a finite moment magnitude', () => true);
    if (type === 'intraslab') requireNumber('hypoDepthKm', s.hypoDepthKm, 'a finite hypocentral depth of at least 0 km', (v) => v >= 0);
    const range = type === 'intraslab' ? AGA16_INTRASLAB_VALIDITY : AGA16_INTERFACE_VALIDITY;
    eventType.push(type);
    slab[r] = type === 'intraslab' ? 1 : 0;
    const depthInside = range.depthKm === undefined || insideRange(s.hypoDepthKm, range.depthKm);
    inside[r] = s.setting !== 'crustal' && insideRange(s.magnitude, range.magnitude) && depthInside ? 1 : 0;
  });
  return { contexts: ruptures, eventType, slab, inside };
}

/** The per-rupture parts of aga16LnMedianAtVlin for one row. */
interface RowTerms {
  readonly row: Aga16Row;
  /** θ1 + θ4 ΔC1. */
  readonly constant: Float64Array;
  readonly spreadingSlope: Float64Array;
  readonly finiteFaultKm: Float64Array;
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
    finiteFaultKm: new Float64Array(n),
    slabTerm: new Float64Array(n),
    magnitudeTerm: new Float64Array(n),
    depthTerm: new Float64Array(n),
  };
  columns.contexts.forEach((s, r) => {
    const m = s.magnitude;
    const slab = columns.slab[r] as number;
    const deltaC1 = aga16DeltaC1(row.periodS, columns.eventType[r] as Aga16EventType);
    const magnitudeBreak = K.c1 + deltaC1;
    const slope = m <= magnitudeBreak ? K.theta4 : K.theta5;
    terms.constant[r] = row.theta1 + K.theta4 * deltaC1;
    terms.spreadingSlope[r] = row.theta2 + row.theta14 * slab + K.theta3 * (m - K.c1);
    terms.finiteFaultKm[r] = K.c4Km * Math.exp(K.theta9 * (m - 6));
    terms.slabTerm[r] = row.theta10 * slab;
    terms.magnitudeTerm[r] = slope * (m - magnitudeBreak) + row.theta13 * (10 - m) ** 2;
    terms.depthTerm[r] = row.theta11 * (Math.min(s.hypoDepthKm, K.depthCapKm) - K.depthReferenceKm) * slab;
  });
  return terms;
}

/** aga16LnMedianAtVlin with the rupture's terms looked up; `distanceKm` Rrup or Rhypo. */
function lnMedianAtVlin(t: RowTerms, r: number, distanceKm: number): number {
  return (
    (t.constant[r] as number) +
    (t.spreadingSlope[r] as number) * Math.log(distanceKm + (t.finiteFaultKm[r] as number)) +
    t.row.theta6 * distanceKm +
    (t.slabTerm[r] as number) +
    (t.magnitudeTerm[r] as number) +
    (t.depthTerm[r] as number)
  );
}

function prepareRow(row: Aga16Row, columns: RuptureColumns, pga: RowTerms, distances: readonly DistanceName[]): PreparedMotion {
  const target = row === AGA16_PGA ? pga : rowTerms(row, columns);
  const rockSite = aga16SiteTerm(AGA16_PGA, K.vs30CapMS, 0);
  return {
    distances,
    predictPairs(site, pairs, out) {
      requireNumber('vs30', site.vs30, 'a finite Vs30 above 0 m/s', (v) => v > 0);
      const vs30 = site.vs30;
      const lnRatio = Math.log(Math.min(vs30, K.vs30CapMS) / row.vlin);
      const linear = vs30 >= row.vlin;
      const linearTerm = (row.theta12 + row.b * K.n) * lnRatio;
      const lnRatioTerm = row.theta12 * lnRatio;
      const cExp = K.c * Math.exp(K.n * lnRatio);
      // Interface and intraslab predictions share their Vs30 and distance ranges.
      const siteInside = insideRange(vs30, AGA16_INTERFACE_VALIDITY.vs30) ? 1 : 0;
      for (let k = 0; k < pairs.count; k++) {
        const r = pairs.rupture[k] as number;
        const distanceKm = columns.slab[r] === 1 ? (pairs.rhypoKm[k] as number) : (pairs.rrupKm[k] as number);
        const lnAtVlin = lnMedianAtVlin(target, r, distanceKm);
        let siteTerm = linearTerm;
        if (!linear) {
          const pga1000G = Math.exp((target === pga ? lnAtVlin : lnMedianAtVlin(pga, r, distanceKm)) + rockSite);
          // aga16SiteTerm's two logarithms taken as one of their ratio (a rounding apart, half the cost).
          siteTerm = lnRatioTerm + row.b * Math.log((pga1000G + cExp) / (pga1000G + K.c));
        }
        out.lnMedian[k] = lnAtVlin + siteTerm;
        out.sigma[k] = row.sigma;
        out.applicable[k] = (columns.inside[r] as number) & siteInside & (insideRange(distanceKm, AGA16_INTERFACE_VALIDITY.distanceKm) ? 1 : 0);
      }
    },
  };
}

const SA_PERIODS_S: readonly number[] = AGA16_SA.map((r) => r.periodS);

/** AGA16 prepared for `measure` over `ruptures` (the hook of the AGA16 model); PGV is refused as predict refuses it. */
export function prepareAga16(ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion {
  if (measure.kind === 'PGV') {
    throw new UnsupportedMeasure('PGV', `${NAME} (Abrahamson, Gregor & Addo 2016) has no PGV equation; it predicts PGA and SA from 0.02 to 10 s`);
  }
  const columns = ruptureColumns(ruptures);
  const pga = rowTerms(AGA16_PGA, columns);
  const distances: DistanceName[] = [];
  if (columns.slab.some((s) => s === 0)) distances.push('rrupKm');
  if (columns.slab.some((s) => s === 1)) distances.push('rhypoKm');
  if (measure.kind === 'PGA') return prepareRow(AGA16_PGA, columns, pga, distances);
  return preparedAtPeriod(NAME, SA_PERIODS_S, measure.periodS, (i) => prepareRow(AGA16_SA[i] as Aga16Row, columns, pga, distances));
}

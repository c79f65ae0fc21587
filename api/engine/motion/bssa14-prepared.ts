/**
 * BSSA14 for the fast hazard path (GroundMotionModel.prepare): the equations of bssa14.ts split
 * into what depends on the rupture alone (F_E, the magnitude factor of F_P, τ and the magnitude
 * ramp of φ, done once per rupture) and what depends on the site (Rjb, Vs30, done per pair).
 * Every term is computed by the same expression, in the same order, as predictBssa14 (√ in place
 * of Math.hypot, fast-math.ts), so the numbers agree to within rounding (checked pair by pair in
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
import { hypot2 } from './fast-math.ts';
import { insideRange, preparedAtPeriod } from './prepared-period.ts';
import type { PreparedMotion, RuptureContext, SiteContext } from './types.ts';

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
  ruptures.forEach((rupture, r) => {
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
  });
  return { count, magnitude, mechanism, inside, pgaSource, pgaSlope };
}

function prepareRow(row: Bssa14Row, columns: RuptureColumns): PreparedMotion {
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
  const anelastic = row.c3 + K.deltaC3;
  const pgaAnelastic = BSSA14_PGA.c3 + K.deltaC3;
  const lnR2OverR1 = Math.log(row.r2 / row.r1);

  return {
    distances: ['rjbKm'],
    predictPairs(site, pairs, out) {
      requireVs30(site);
      const vs30 = site.vs30;
      const linear = bssa14LinearSiteTerm(row, vs30);
      const f2 = row.f4 * (Math.exp(row.f5 * (Math.min(vs30, K.vRef) - F2_VS30_ANCHOR)) - Math.exp(row.f5 * (K.vRef - F2_VS30_ANCHOR)));
      let phiSite = 0;
      if (vs30 <= K.v1) phiSite = row.deltaPhiV;
      else if (vs30 < K.v2) phiSite = (row.deltaPhiV * Math.log(K.v2 / vs30)) / Math.log(K.v2 / K.v1);
      const siteInside = insideRange(vs30, BSSA14_VALIDITY.vs30) ? 1 : 0;

      for (let k = 0; k < pairs.count; k++) {
        const r = pairs.rupture[k] as number;
        const rjbKm = pairs.rjbKm[k] as number;
        const rKm = hypot2(rjbKm, row.h);
        const path = (slope[r] as number) * Math.log(rKm / K.rRefKm) + anelastic * (rKm - K.rRefKm);
        // f2 is 0 at and above 760 m/s: the nonlinear term is f1 whatever PGAr, so PGAr is not computed.
        let nonlinear = K.f1;
        if (f2 !== 0) {
          const rPgaKm = hypot2(rjbKm, BSSA14_PGA.h);
          const pgaRockG = Math.exp((columns.pgaSource[r] as number) + ((columns.pgaSlope[r] as number) * Math.log(rPgaKm / K.rRefKm) + pgaAnelastic * (rPgaKm - K.rRefKm)));
          nonlinear = K.f1 + f2 * Math.log((pgaRockG + K.f3G) / K.f3G);
        }
        out.lnMedian[k] = (source[r] as number) + path + linear + nonlinear;

        let phi = phiOfMagnitude[r] as number;
        if (rjbKm > row.r1) phi += rjbKm >= row.r2 ? row.deltaPhiR : (row.deltaPhiR * Math.log(rjbKm / row.r1)) / lnR2OverR1;
        if (vs30 < K.v2) phi -= phiSite;
        out.sigma[k] = hypot2(tau[r] as number, phi);
        out.applicable[k] = (columns.inside[r] as number) & siteInside & (insideRange(rjbKm, BSSA14_VALIDITY.distanceKm) ? 1 : 0);
      }
    },
  };
}

const SA_PERIODS_S: readonly number[] = BSSA14_SA.map((r) => r.periodS);

/** BSSA14 prepared for `measure` over `ruptures` (the hook of the bssa14 model). */
export function prepareBssa14(ruptures: readonly RuptureContext[], measure: Measure, options: Bssa14Options = {}): PreparedMotion {
  if (measure.kind === 'SA' && !(measure.periodS > 0)) throw new UnsupportedMeasure(`SA(${measure.periodS})`, 'the period must be greater than 0 s');
  const columns = ruptureColumns(ruptures, options);
  switch (measure.kind) {
    case 'PGA':
      return prepareRow(BSSA14_PGA, columns);
    case 'PGV':
      return prepareRow(BSSA14_PGV, columns);
    case 'SA':
      return preparedAtPeriod(NAME, SA_PERIODS_S, measure.periodS, (i) => prepareRow(BSSA14_SA[i] as Bssa14Row, columns));
  }
}

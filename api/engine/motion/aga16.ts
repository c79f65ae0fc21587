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
 * (Equation as recalled from the paper; from memory.)
 *
 * ΔC1, the shift of the magnitude break from C1 = 7.8: the central branch. Interface: 0.2 up to
 * 0.3 s and for PGA, 0.1 at 0.5 s, 0.0 at 1 s, −0.1 at 2 s, −0.2 at 3 s and longer, linear in
 * ln(period) between (so 0.144 at 0.4 s, 0.074 at 0.6 s, 0.042 at 0.75 s, −0.058 at 1.5 s,
 * −0.155 at 2.5 s). Intraslab: −0.3 at every period (break at M 7.5). From memory of the paper.
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
 * How the table was checked: see aga16-coefficients.ts and its test (smoothness of each column
 * and of median spectra in ln period; medians against the orders of magnitude of the paper's figures).
 */
import { InvalidInput, UnsupportedMeasure } from '../errors.ts';
import {
  AGA16_CONSTANTS as K,
  AGA16_DELTA_C1_INTERFACE,
  AGA16_DELTA_C1_INTRASLAB,
  AGA16_PGA,
  AGA16_SA,
  type Aga16Row,
} from './aga16-coefficients.ts';
import { prepareAga16, prepareAga16Measures } from './aga16-prepared.ts';
import { predictAtPeriod } from './interpolate-period.ts';
import type { Measure } from './measure.ts';
import type { GmmInput, GmmPrediction, GroundMotionModel, PreparedMotion, PreparedMotions, RuptureContext, ValidityRange } from './types.ts';
import { validityNotes } from './validity.ts';

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

/**
 * Central-branch ΔC1 (magnitude units) at a period in s (0 for PGA): interface anchors linear
 * in ln(period), constant beyond the first and last anchors; intraslab −0.3 throughout.
 */
export function aga16DeltaC1(periodS: number, eventType: Aga16EventType): number {
  if (eventType === 'intraslab') return AGA16_DELTA_C1_INTRASLAB;
  const anchors = AGA16_DELTA_C1_INTERFACE.central;
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

/**
 * ln median (ln g) of one table row without the site term: the prediction on a site whose
 * Vs30 equals the row's Vlin, where f_site is zero.
 */
export function aga16LnMedianAtVlin(row: Aga16Row, scenario: Aga16Scenario): number {
  const { magnitude: m, distanceKm: r, hypoDepthKm } = scenario;
  const slab = scenario.eventType === 'intraslab' ? 1 : 0;
  const deltaC1 = aga16DeltaC1(row.periodS, scenario.eventType);
  const magnitudeBreak = K.c1 + deltaC1;
  const slope = m <= magnitudeBreak ? K.theta4 : K.theta5;
  const fMag = slope * (m - magnitudeBreak) + row.theta13 * (10 - m) ** 2;
  const finiteFaultKm = K.c4Km * Math.exp(K.theta9 * (m - 6));
  const spreading = (row.theta2 + row.theta14 * slab + K.theta3 * (m - K.c1)) * Math.log(r + finiteFaultKm);
  const fDepth = row.theta11 * (Math.min(hypoDepthKm, K.depthCapKm) - K.depthReferenceKm) * slab;
  return row.theta1 + K.theta4 * deltaC1 + spreading + row.theta6 * r + row.theta10 * slab + fMag + fDepth;
}

/**
 * Site term f_site (ln units) of one row for Vs30 in m/s, given the rock PGA at
 * Vs30 = 1000 m/s in g. Zero at Vs30 = Vlin (where Vlin ≤ 1000 m/s); nonlinear below Vlin, so
 * on soft soil (Vs30 ≲ 250 m/s) the median can dip slightly with magnitude near the break and
 * rise with distance close to an intraslab source, as the paper's form implies.
 */
export function aga16SiteTerm(row: Aga16Row, vs30: number, pga1000G: number): number {
  const lnRatio = Math.log(Math.min(vs30, K.vs30CapMS) / row.vlin);
  if (vs30 >= row.vlin) return (row.theta12 + row.b * K.n) * lnRatio;
  return (
    row.theta12 * lnRatio -
    row.b * Math.log(pga1000G + K.c) +
    row.b * Math.log(pga1000G + K.c * Math.exp(K.n * lnRatio))
  );
}

/** Median PGA (g) of the event on a site with Vs30 = 1000 m/s, the input of the nonlinear site term. */
export function aga16Pga1000G(scenario: Aga16Scenario): number {
  return Math.exp(aga16LnMedianAtVlin(AGA16_PGA, scenario) + aga16SiteTerm(AGA16_PGA, K.vs30CapMS, 0));
}

/** σ = √(φ² + τ²) = 0.73817, as the model defines it (the paper's table rounds it to 0.74). */
export const AGA16_SIGMA = Math.sqrt(K.phi * K.phi + K.tau * K.tau);

const SA_PERIODS_S: readonly number[] = Object.freeze(AGA16_SA.map((r) => r.periodS));

function requireNumber(path: string, value: number, expected: string, ok: (v: number) => boolean): void {
  if (!Number.isFinite(value) || !ok(value)) {
    throw new InvalidInput([{ path, message: `expected ${expected}, got ${value}` }], `${NAME} input`);
  }
}

function scenarioOf(input: GmmInput): { scenario: Aga16Scenario; notes: string[] } {
  const eventType: Aga16EventType = input.setting === 'intraslab' ? 'intraslab' : 'interface';
  const distancePath = eventType === 'intraslab' ? 'rhypoKm' : 'rrupKm';
  const distanceKm = eventType === 'intraslab' ? input.rhypoKm : input.rrupKm;
  requireNumber('magnitude', input.magnitude, 'a finite moment magnitude', () => true);
  requireNumber(distancePath, distanceKm, 'a finite distance of at least 0 km', (v) => v >= 0);
  requireNumber('vs30', input.vs30, 'a finite Vs30 above 0 m/s', (v) => v > 0);
  if (eventType === 'intraslab') {
    requireNumber('hypoDepthKm', input.hypoDepthKm, 'a finite hypocentral depth of at least 0 km', (v) => v >= 0);
  }
  const range = eventType === 'intraslab' ? AGA16_INTRASLAB_VALIDITY : AGA16_INTERFACE_VALIDITY;
  const notes = validityNotes(NAME, range, input, distanceKm);
  if (input.setting === 'crustal') {
    notes.unshift(`${NAME}: it is a model for subduction interface and intraslab earthquakes, not crustal ones; answered as an interface event`);
  }
  const scenario = { eventType, magnitude: input.magnitude, distanceKm, hypoDepthKm: input.hypoDepthKm };
  return { scenario, notes };
}

function predictRow(row: Aga16Row, scenario: Aga16Scenario, vs30: number, pga1000G: number, notes: readonly string[]): GmmPrediction {
  return {
    lnMedian: aga16LnMedianAtVlin(row, scenario) + aga16SiteTerm(row, vs30, pga1000G),
    sigma: AGA16_SIGMA,
    tau: K.tau,
    phi: K.phi,
    applicable: notes.length === 0,
    notes,
  };
}

/**
 * Abrahamson, Gregor & Addo (2016) for subduction interface (Rrup) and intraslab (Rhypo)
 * earthquakes at forearc sites: PGA and SA 0.02–10 s in g, no PGV.
 */
export const aga16: GroundMotionModel = Object.freeze({
  name: NAME,
  citation:
    'Abrahamson, N., Gregor, N. & Addo, K. (2016). BC Hydro ground motion prediction equations for subduction earthquakes. Earthquake Spectra 32(1), 23–44.',
  settings: Object.freeze(['interface', 'intraslab'] as const),
  // Rrup is the interface metric; intraslab predictions use Rhypo (see the top comment).
  distanceMetric: 'rrup',
  periodsS: SA_PERIODS_S,
  hasPga: true,
  hasPgv: false,
  validity: Object.freeze({
    magnitude: [5.0, 9.0],
    distanceKm: [0, 300],
    vs30: [150, 1000],
  } as const),
  predict(input: GmmInput, measure: Measure): GmmPrediction {
    if (measure.kind === 'PGV') {
      throw new UnsupportedMeasure('PGV', `${NAME} (Abrahamson, Gregor & Addo 2016) has no PGV equation; it predicts PGA and SA from 0.02 to 10 s`);
    }
    const { scenario, notes } = scenarioOf(input);
    const pga1000G = aga16Pga1000G(scenario);
    if (measure.kind === 'PGA') return predictRow(AGA16_PGA, scenario, input.vs30, pga1000G, notes);
    return predictAtPeriod(NAME, SA_PERIODS_S, measure.periodS, (i) =>
      predictRow(AGA16_SA[i] as Aga16Row, scenario, input.vs30, pga1000G, notes),
    );
  },
  prepare: (ruptures: readonly RuptureContext[], measure: Measure): PreparedMotion => prepareAga16(ruptures, measure),
  prepareMeasures: (ruptures: readonly RuptureContext[], measures: readonly Measure[]): PreparedMotions => prepareAga16Measures(ruptures, measures),
});

/**
 * Coefficients of AGA16: Abrahamson, N., Gregor, N. & Addo, K. (2016), "BC Hydro ground motion
 * prediction equations for subduction earthquakes", Earthquake Spectra 32(1), 23–44,
 * doi:10.1193/051712EQS188MR. No erratum known to us.
 *
 * Source of the numbers: the paper's period-dependent coefficient table (θ1, θ2, θ6, θ10–θ14,
 * Vlin, b, φ, τ, σ), its period-independent constants (θ3, θ4, θ5, θ9, C1, C4, n, c) and its
 * table of ΔC1 branches. Typed from memory of the paper, digit for digit as recalled; they were
 * not read off a copy while typing, so treat every value as "from memory".
 *
 * Not typed: the backarc coefficients θ7, θ8 (intraslab) and θ15, θ16 (interface). Tremora
 * treats every site as forearc, where the paper's backarc term f_FABA is zero, so those
 * columns are never used and a value we could not test would only be a liability.
 *
 * How the table was checked (test/engine/motion/aga16-coefficients.test.ts):
 *   - shape: periods increasing, every value finite, every column present;
 *   - each column smooth in ln(period): a row's value may stray from the chord between its
 *     neighbours by at most a stated share of the column's range, and the test shows that a
 *     sign slip, a decimal slip or a row copied from a far period breaks that bound;
 *   - the median spectrum of several scenarios is smooth in ln(period) (one wrong coefficient
 *     shows as a kink in ln SA), and medians have the orders of magnitude of the paper's
 *     figures (test/engine/motion/aga16.test.ts).
 *
 * Units: ln Y is ln(g). θ1 and θ10 in ln(g); θ2 and θ14 multiply ln(R / 1 km); θ6 per km of R;
 * θ11 per km of hypocentral depth; θ12 and b multiply ln(Vs30 / Vlin) and ln(PGA + c) (PGA in g);
 * θ13 per magnitude unit squared; Vlin in m/s; φ, τ, σ natural-log standard deviations.
 */

/** One row of the period-dependent table. `periodS` is 0 for the PGA row. */
export interface Aga16Row {
  readonly periodS: number;
  /** Vs30 above which the site term is linear, m/s. */
  readonly vlin: number;
  /** Slope of the nonlinear site term (dimensionless). */
  readonly b: number;
  /** Constant, ln(g). */
  readonly theta1: number;
  /** Geometric spreading, ln(g) per ln(km). */
  readonly theta2: number;
  /** Anelastic attenuation, ln(g) per km. */
  readonly theta6: number;
  /** Intraslab constant, ln(g). */
  readonly theta10: number;
  /** Intraslab depth scaling, ln(g) per km of hypocentral depth. */
  readonly theta11: number;
  /** Linear site scaling, ln(g) per ln(m/s). */
  readonly theta12: number;
  /** Quadratic magnitude scaling, ln(g) per magnitude unit squared. */
  readonly theta13: number;
  /** Intraslab geometric spreading, ln(g) per ln(km). */
  readonly theta14: number;
  /** Within-event standard deviation, ln units. */
  readonly phi: number;
  /** Between-event standard deviation, ln units. */
  readonly tau: number;
  /** Total standard deviation as the paper tabulates it (0.74 ≈ √(0.60² + 0.43²)). */
  readonly sigma: number;
}

/** Column names of the table, for the shape and smoothness tests. */
export const AGA16_COLUMNS = [
  'vlin', 'b', 'theta1', 'theta2', 'theta6', 'theta10', 'theta11', 'theta12', 'theta13', 'theta14', 'phi', 'tau', 'sigma',
] as const satisfies readonly (keyof Aga16Row)[];

type Cells = readonly [
  periodS: number, vlin: number, b: number, theta1: number, theta2: number, theta6: number, theta10: number,
  theta11: number, theta12: number, theta13: number, theta14: number, phi: number, tau: number, sigma: number,
];

const row = ([periodS, vlin, b, theta1, theta2, theta6, theta10, theta11, theta12, theta13, theta14, phi, tau, sigma]: Cells): Aga16Row =>
  Object.freeze({ periodS, vlin, b, theta1, theta2, theta6, theta10, theta11, theta12, theta13, theta14, phi, tau, sigma });

const TABLE: readonly Cells[] = [
  //  T (s)   Vlin    b       θ1       θ2      θ6       θ10   θ11      θ12     θ13      θ14    φ     τ     σ
  [  0,      865.1, -1.186,  4.2203, -1.35, -0.0012,  3.12,  0.0130,  0.980, -0.0135, -0.40, 0.60, 0.43, 0.74],
  [  0.02,   865.1, -1.186,  4.2203, -1.35, -0.0012,  3.12,  0.0130,  0.980, -0.0135, -0.40, 0.60, 0.43, 0.74],
  [  0.05,  1053.5, -1.346,  4.5371, -1.40, -0.0012,  3.37,  0.0130,  1.288, -0.0138, -0.40, 0.60, 0.43, 0.74],
  [  0.075, 1085.7, -1.471,  5.0733, -1.45, -0.0012,  3.37,  0.0130,  1.483, -0.0142, -0.40, 0.60, 0.43, 0.74],
  [  0.1,   1032.5, -1.624,  5.2892, -1.45, -0.0012,  3.33,  0.0130,  1.613, -0.0145, -0.40, 0.60, 0.43, 0.74],
  [  0.15,   877.6, -1.931,  5.4563, -1.45, -0.0014,  3.25,  0.0130,  1.882, -0.0153, -0.40, 0.60, 0.43, 0.74],
  [  0.2,    748.2, -2.188,  5.2684, -1.40, -0.0018,  3.03,  0.0129,  2.076, -0.0162, -0.35, 0.60, 0.43, 0.74],
  [  0.25,   654.3, -2.381,  5.0594, -1.35, -0.0023,  2.80,  0.0129,  2.248, -0.0172, -0.31, 0.60, 0.43, 0.74],
  [  0.3,    587.1, -2.518,  4.7945, -1.28, -0.0027,  2.59,  0.0128,  2.348, -0.0183, -0.28, 0.60, 0.43, 0.74],
  [  0.4,    503.0, -2.657,  4.4644, -1.18, -0.0035,  2.20,  0.0127,  2.427, -0.0206, -0.23, 0.60, 0.43, 0.74],
  [  0.5,    456.6, -2.669,  4.0181, -1.08, -0.0044,  1.92,  0.0125,  2.399, -0.0231, -0.19, 0.60, 0.43, 0.74],
  [  0.6,    430.3, -2.599,  3.6055, -0.99, -0.0050,  1.70,  0.0124,  2.273, -0.0256, -0.16, 0.60, 0.43, 0.74],
  [  0.75,   410.5, -2.401,  3.2174, -0.91, -0.0058,  1.42,  0.0120,  1.993, -0.0296, -0.12, 0.60, 0.43, 0.74],
  [  1,      400.0, -1.955,  2.7981, -0.85, -0.0062,  1.10,  0.0114,  1.470, -0.0363, -0.07, 0.60, 0.43, 0.74],
  [  1.5,    400.0, -1.025,  2.0123, -0.77, -0.0064,  0.70,  0.0100,  0.408, -0.0493,  0.00, 0.60, 0.43, 0.74],
  [  2,      400.0, -0.299,  1.4128, -0.71, -0.0064,  0.70,  0.0085, -0.401, -0.0610,  0.00, 0.60, 0.43, 0.74],
  [  2.5,    400.0,  0.000,  0.9976, -0.67, -0.0064,  0.70,  0.0069, -0.723, -0.0711,  0.00, 0.60, 0.43, 0.74],
  [  3,      400.0,  0.000,  0.6443, -0.64, -0.0064,  0.70,  0.0054, -0.673, -0.0798,  0.00, 0.60, 0.43, 0.74],
  [  4,      400.0,  0.000,  0.0657, -0.58, -0.0064,  0.70,  0.0027, -0.627, -0.0935,  0.00, 0.60, 0.43, 0.74],
  [  5,      400.0,  0.000, -0.4624, -0.54, -0.0064,  0.70,  0.0005, -0.596, -0.0980,  0.00, 0.60, 0.43, 0.74],
  [  6,      400.0,  0.000, -0.9809, -0.50, -0.0064,  0.70, -0.0013, -0.566, -0.0980,  0.00, 0.60, 0.43, 0.74],
  [  7.5,    400.0,  0.000, -1.6017, -0.46, -0.0064,  0.70, -0.0033, -0.528, -0.0980,  0.00, 0.60, 0.43, 0.74],
  [ 10,      400.0,  0.000, -2.2937, -0.40, -0.0064,  0.70, -0.0060, -0.504, -0.0980,  0.00, 0.60, 0.43, 0.74],
];

/** The PGA row (periodS 0). */
export const AGA16_PGA: Aga16Row = row(TABLE[0] as Cells);

/** The spectral-acceleration rows, 0.02 s to 10 s, periods increasing. */
export const AGA16_SA: readonly Aga16Row[] = Object.freeze(TABLE.slice(1).map(row));

/** Period-independent constants of the paper (from memory). */
export const AGA16_CONSTANTS = Object.freeze({
  /** Magnitude dependence of geometric spreading, per magnitude unit. */
  theta3: 0.1,
  /** Magnitude slope below the break, ln(g) per magnitude unit. */
  theta4: 0.9,
  /** Magnitude slope above the break, ln(g) per magnitude unit: zero, the paper's saturation. */
  theta5: 0.0,
  /** Growth of the finite-fault term with magnitude, per magnitude unit. */
  theta9: 0.4,
  /** Magnitude break before the ΔC1 shift. */
  c1: 7.8,
  /** Finite-fault distance scale, km. */
  c4Km: 10,
  /** Exponent of Vs30/Vlin in the nonlinear site term. */
  n: 1.18,
  /** Offset added to PGA (g) in the nonlinear site term. */
  c: 1.88,
  /** Vs30 at and above which the site term stops changing, m/s. */
  vs30CapMS: 1000,
  /** Hypocentral depth at and below which the intraslab depth term stops growing, km. */
  depthCapKm: 120,
  /** Hypocentral depth at which the intraslab depth term is zero, km. */
  depthReferenceKm: 60,
});

/**
 * Central ΔC1 branch for interface events, as (period s, ΔC1) anchors: 0.2 up to 0.3 s
 * (PGA included), falling 0.1 per anchor to −0.2 at 3 s and beyond (from memory of the paper's
 * ΔC1 table; its lower and upper branches sit 0.2 below and above). Between anchors ΔC1 is
 * taken linear in ln(period), which reproduces the intermediate values we recall to within
 * 0.001 (an effect below 0.001 in ln Y).
 */
export const AGA16_DELTA_C1_INTERFACE_CENTRAL: readonly (readonly [periodS: number, deltaC1: number])[] = Object.freeze([
  [0.3, 0.2],
  [0.5, 0.1],
  [1.0, 0.0],
  [2.0, -0.1],
  [3.0, -0.2],
] as const);

/** ΔC1 for intraslab events at every period: the magnitude break sits at C1 − 0.3 = 7.5 (from memory). */
export const AGA16_DELTA_C1_INTRASLAB = -0.3;

/**
 * Coefficients of AGA16: Abrahamson, N., Gregor, N. & Addo, K. (2016), "BC Hydro ground motion
 * prediction equations for subduction earthquakes", Earthquake Spectra 32(1), 23–44,
 * doi:10.1193/051712EQS188MR.
 *
 * Source of the numbers: the paper's Table 3 (period-dependent coefficients: Vlin, b, θ1, θ2,
 * θ6, θ7, θ8, θ10–θ16; θ7, θ8, θ15, θ16 are the backarc terms, kept for the record: Tremora
 * takes every site as forearc), its period-independent constants (C1, θ3, θ4, θ5, θ9, C4, n,
 * c, φ, τ) and its ΔC1 table, copied digit for digit from the project's reference record
 * (`aga16.csv` and `aga16-constants.csv` of the shared GMM reference data; its README gives the
 * provenance: pygmm 0.8.0's data file "Coefficients from Table 3", cross-checked against three
 * other public records; θ15 at PGA and 0.02 s is 0.9969, where one record transposes digits).
 *
 * ΔC1 (the shift of the magnitude break): the central interface anchors are agreed by four
 * records. The lower and upper branches (central ∓ 0.2 at every anchor) rest on a single
 * public record, which the reference README marks as provisional until checked against the
 * paper's ΔC1 table; Tremora offers them as the AGA16-lower and AGA16-upper variants with that
 * caveat. Intraslab: −0.3 at every period, no branches.
 *
 * How the table is checked: test/engine/motion/aga16.vectors.test.ts compares the model (every
 * branch) with independent test vectors computed from the same published table to 1e-4.
 *
 * Units: ln Y is ln(g). θ1, θ10 in ln(g); θ2, θ14 multiply ln(R + C4 exp(θ9 (M − 6))), R in
 * km; θ6 per km of R; θ11 per km of hypocentral depth; θ12 and b multiply ln(Vs30 / Vlin) and
 * ln(PGA + c) (PGA in g); θ13 per magnitude unit squared; Vlin m/s; φ, τ natural-log units.
 */
import { coefficientRows, rowOfPeriod, type CoefficientRow } from './coefficient-table.ts';

/** Column names of Table 3, in the paper's order. */
export const AGA16_COLUMNS = [
  'vlin',
  'b',
  'theta1',
  'theta2',
  'theta6',
  'theta7',
  'theta8',
  'theta10',
  'theta11',
  'theta12',
  'theta13',
  'theta14',
  'theta15',
  'theta16',
] as const;

/** One row of Table 3. `periodS` is 0 for the PGA row. */
export type Aga16Row = CoefficientRow<(typeof AGA16_COLUMNS)[number]>;

// prettier-ignore
const TABLE: readonly (readonly number[])[] = [
  // periodS    vlin       b   theta1  theta2   theta6   theta7  theta8  theta10  theta11  theta12  theta13  theta14  theta15  theta16
  [      0,  865.1, -1.186,  4.2203,  -1.35, -0.0012,  1.0988,  -1.42,    3.12,  0.0130,   0.980, -0.0135,   -0.40,  0.9969,   -1.00],
  [   0.02,  865.1, -1.186,  4.2203,  -1.35, -0.0012,  1.0988,  -1.42,    3.12,  0.0130,   0.980, -0.0135,   -0.40,  0.9969,   -1.00],
  [   0.05, 1053.5, -1.346,  4.5371,  -1.40, -0.0012,  1.2536,  -1.65,    3.37,  0.0130,   1.288, -0.0138,   -0.40,  1.1030,   -1.18],
  [  0.075, 1085.7, -1.471,  5.0733,  -1.45, -0.0012,  1.4175,  -1.80,    3.37,  0.0130,   1.483, -0.0142,   -0.40,  1.2732,   -1.36],
  [    0.1, 1032.5, -1.624,  5.2892,  -1.45, -0.0012,  1.3997,  -1.80,    3.33,  0.0130,   1.613, -0.0145,   -0.40,  1.3042,   -1.36],
  [   0.15,  877.6, -1.931,  5.4563,  -1.45, -0.0014,  1.3582,  -1.69,    3.25,  0.0130,   1.882, -0.0153,   -0.40,  1.2600,   -1.30],
  [    0.2,  748.2, -2.188,  5.2684,  -1.40, -0.0018,  1.1648,  -1.49,    3.03,  0.0129,   2.076, -0.0162,   -0.35,  1.2230,   -1.25],
  [   0.25,  654.3, -2.381,  5.0594,  -1.35, -0.0023,  0.9940,  -1.30,    2.80,  0.0129,   2.248, -0.0172,   -0.31,  1.1600,   -1.17],
  [    0.3,  587.1, -2.518,  4.7945,  -1.28, -0.0027,  0.8821,  -1.18,    2.59,  0.0128,   2.348, -0.0183,   -0.28,  1.0500,   -1.06],
  [    0.4,  503.0, -2.657,  4.4644,  -1.18, -0.0035,  0.7046,  -0.98,    2.20,  0.0127,   2.427, -0.0206,   -0.23,  0.8000,   -0.78],
  [    0.5,  456.6, -2.669,  4.0181,  -1.08, -0.0044,  0.5799,  -0.82,    1.92,  0.0125,   2.399, -0.0231,   -0.19,  0.6620,   -0.62],
  [    0.6,  430.3, -2.599,  3.6055,  -0.99, -0.0050,  0.5021,  -0.70,    1.70,  0.0124,   2.273, -0.0256,   -0.16,  0.5800,   -0.50],
  [   0.75,  410.5, -2.401,  3.2174,  -0.91, -0.0058,  0.3687,  -0.54,    1.42,  0.0120,   1.993, -0.0296,   -0.12,  0.4800,   -0.34],
  [      1,  400.0, -1.955,  2.7981,  -0.85, -0.0062,  0.1746,  -0.34,    1.10,  0.0114,   1.470, -0.0363,   -0.07,  0.3300,   -0.14],
  [    1.5,  400.0, -1.025,  2.0123,  -0.77, -0.0064, -0.0820,  -0.05,    0.70,  0.0100,   0.408, -0.0493,    0.00,  0.3100,    0.00],
  [      2,  400.0, -0.299,  1.4128,  -0.71, -0.0064, -0.2821,   0.12,    0.70,  0.0085,  -0.401, -0.0610,    0.00,  0.3000,    0.00],
  [    2.5,  400.0,  0.000,  0.9976,  -0.67, -0.0064, -0.4108,   0.25,    0.70,  0.0069,  -0.723, -0.0711,    0.00,  0.3000,    0.00],
  [      3,  400.0,  0.000,  0.6443,  -0.64, -0.0064, -0.4466,   0.30,    0.70,  0.0054,  -0.673, -0.0798,    0.00,  0.3000,    0.00],
  [      4,  400.0,  0.000,  0.0657,  -0.58, -0.0064, -0.4344,   0.30,    0.70,  0.0027,  -0.627, -0.0935,    0.00,  0.3000,    0.00],
  [      5,  400.0,  0.000, -0.4624,  -0.54, -0.0064, -0.4368,   0.30,    0.70,  0.0005,  -0.596, -0.0980,    0.00,  0.3000,    0.00],
  [      6,  400.0,  0.000, -0.9809,  -0.50, -0.0064, -0.4586,   0.30,    0.70, -0.0013,  -0.566, -0.0980,    0.00,  0.3000,    0.00],
  [    7.5,  400.0,  0.000, -1.6017,  -0.46, -0.0064, -0.4433,   0.30,    0.70, -0.0033,  -0.528, -0.0980,    0.00,  0.3000,    0.00],
  [     10,  400.0,  0.000, -2.2937,  -0.40, -0.0064, -0.4828,   0.30,    0.70, -0.0060,  -0.504, -0.0980,    0.00,  0.3000,    0.00],
];

/** Every row: PGA, then the spectral periods increasing. */
export const AGA16_ROWS: readonly Aga16Row[] = coefficientRows('AGA16', AGA16_COLUMNS, TABLE);

/** The PGA row (periodS 0). */
export const AGA16_PGA: Aga16Row = rowOfPeriod('AGA16', AGA16_ROWS, 0);

/** The spectral-acceleration rows, 0.02 s to 10 s, periods increasing. */
export const AGA16_SA: readonly Aga16Row[] = Object.freeze(AGA16_ROWS.filter((r) => r.periodS > 0));

/** Period-independent constants of the paper (aga16-constants.csv). */
export const AGA16_CONSTANTS = Object.freeze({
  /** Magnitude dependence of geometric spreading, per magnitude unit. */
  theta3: 0.1,
  /** Magnitude slope below the break, ln(g) per magnitude unit. */
  theta4: 0.9,
  /** Magnitude slope above the break, ln(g) per magnitude unit: zero, the paper's saturation. */
  theta5: 0,
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
  /** Within-event standard deviation, every period, ln units. */
  phi: 0.6,
  /** Between-event standard deviation, every period, ln units. */
  tau: 0.43,
  /** Vs30 at and above which the site term stops changing, m/s (the paper's Vs* = min(Vs30, 1000)). */
  vs30CapMS: 1000,
  /** Hypocentral depth at and below which the intraslab depth term stops growing, km. */
  depthCapKm: 120,
  /** Hypocentral depth at which the intraslab depth term is zero, km. */
  depthReferenceKm: 60,
});

/** The ΔC1 branches of interface events. */
export type Aga16DeltaC1Branch = 'lower' | 'central' | 'upper';

/**
 * ΔC1 anchors of interface events, (period s, ΔC1), per branch (aga16-constants.csv): PGA
 * (period 0) and periods up to the first anchor take its value, periods from the last anchor
 * take the last; between anchors ΔC1 is linear in ln(period), as three of the four records do.
 */
export const AGA16_DELTA_C1_INTERFACE: Readonly<
  Record<Aga16DeltaC1Branch, readonly (readonly [periodS: number, deltaC1: number])[]>
> = Object.freeze({
  central: [
    [0.3, 0.2],
    [0.5, 0.1],
    [1, 0],
    [2, -0.1],
    [3, -0.2],
  ],
  lower: [
    [0.3, 0],
    [0.5, -0.1],
    [1, -0.2],
    [2, -0.3],
    [3, -0.4],
  ],
  upper: [
    [0.3, 0.4],
    [0.5, 0.3],
    [1, 0.2],
    [2, 0.1],
    [3, 0],
  ],
});

/** ΔC1 of intraslab events at every period: the magnitude break sits at C1 − 0.3 = 7.5. */
export const AGA16_DELTA_C1_INTRASLAB = -0.3;

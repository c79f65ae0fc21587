/**
 * Coefficients of BSSA14: Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014),
 * "NGA-West2 equations for predicting PGA, PGV, and 5% damped PSA for shallow crustal
 * earthquakes", Earthquake Spectra 30(3), 1057–1085, doi:10.1193/070113EQS184M.
 * Erratum known to us: none that changes these coefficients.
 *
 * Source of the numbers: the paper's table of coefficients (electronic supplement; the same
 * numbers as PEER report 2013/05), rows PGV (period −1 in the paper), PGA (period 0) and the
 * 21 spectral periods 0.01–10 s below. Typed from memory, digit for digit as recalled; they were
 * not read off a copy while typing, so treat every value as "from memory".
 *
 * How firm the recall is, column by column (how we judged it: the same digits came back on
 * separate attempts, and the median spectra they give are smooth in period at M 3.5–8):
 *   firm       e0, e1, e4, e5, e6, c1, c2, c3, h, c, Vc, f5, R1, R2, φ1, φ2, τ1; all of the
 *              PGA, PGV, 0.01, 0.02 and 0.03 s rows;
 *   less sure  Mh between 0.1 and 0.3 s (where it ramps from 5.5 to 6.2); f4 at 0.75 s and
 *              1.5–10 s (two recollections differed by up to 0.023); τ2 from 0.25 s on; ΔφR and
 *              ΔφV (recalled once); e2 and e3 at 0.05, 0.3 and 1 s; e2 and e3 at 0.075–0.25,
 *              0.4–0.75 and 1.5–10 s, from a separate recollection (where two recollections
 *              cover a cell, 0.3 s and 1 s, they agree digit for digit; at 0.03 and 0.05 s they
 *              differ by up to 0.025, and the values of the fuller recollection are kept).
 *   not typed  f6, f7 (the basin term, which
 *              Tremora omits: δz1 = 0) and the regional Δc3 columns (Tremora uses the global
 *              Δc3 = 0 of California, Taiwan and the other regions).
 * Before Tremora's results are used for anything beyond screening, this table should be
 * proofread against the paper's supplement; the less-sure and untyped cells first.
 *
 * How the table was checked (test/engine/motion/bssa14.test.ts): shape (periods increasing,
 * every value finite, every column present, the untyped cells exactly those listed); each
 * column smooth in ln(period) within a stated share of its range; the median spectra of
 * several scenarios smooth in ln(period); medians against the orders of magnitude of published
 * figures; agreement with CB14, whose table was recalled independently.
 *
 * Units: ln Y is ln(g) for PGA and PSA, ln(cm/s) for PGV. e0–e3 in ln units; e4, e6 per
 * magnitude unit; e5 per magnitude unit squared; Mh magnitude; c1 multiplies ln(R / Rref);
 * c2 multiplies (M − Mref) ln(R / Rref); c3 per km of R; h km; c multiplies ln(Vs30 / Vref);
 * Vc m/s; f4 dimensionless (multiplies ln((PGAr + f3) / f3)); f5 per m/s; R1, R2 km (Rjb);
 * ΔφR, ΔφV, φ1, φ2, τ1, τ2 natural-log standard deviations.
 */

/** One row of the table. `periodS` is 0 for PGA and −1 for PGV, as in the paper. */
export interface Bssa14Row {
  readonly periodS: number;
  /** Constant for unspecified mechanism, ln units. */
  readonly e0: number;
  /** Constant for strike-slip, ln units. */
  readonly e1: number;
  /** Constant for normal faulting, ln units. */
  readonly e2: number;
  /** Constant for reverse faulting, ln units. */
  readonly e3: number;
  /** Linear magnitude scaling at and below Mh, per magnitude unit. */
  readonly e4: number;
  /** Quadratic magnitude scaling at and below Mh, per magnitude unit squared. */
  readonly e5: number;
  /** Linear magnitude scaling above Mh, per magnitude unit. */
  readonly e6: number;
  /** Hinge magnitude. */
  readonly mh: number;
  /** Geometric spreading, per ln(km). */
  readonly c1: number;
  /** Magnitude dependence of geometric spreading, per magnitude unit per ln(km). */
  readonly c2: number;
  /** Anelastic attenuation, per km. */
  readonly c3: number;
  /** Finite-fault term of R = √(Rjb² + h²), km. */
  readonly h: number;
  /** Linear site scaling, per ln(m/s). */
  readonly c: number;
  /** Vs30 above which the linear site term stops changing, m/s. */
  readonly vc: number;
  /** Nonlinear site term amplitude (dimensionless). */
  readonly f4: number;
  /** Nonlinear site term Vs30 decay, per m/s. */
  readonly f5: number;
  /** Rjb below which φ does not depend on distance, km. */
  readonly r1: number;
  /** Rjb above which φ stops growing, km. */
  readonly r2: number;
  /** Growth of φ from R1 to R2, ln units. */
  readonly deltaPhiR: number;
  /** Reduction of φ from V2 down to V1, ln units. */
  readonly deltaPhiV: number;
  /** Within-event standard deviation at M ≤ 4.5, ln units. */
  readonly phi1: number;
  /** Within-event standard deviation at M ≥ 5.5, ln units. */
  readonly phi2: number;
  /** Between-event standard deviation at M ≤ 4.5, ln units. */
  readonly tau1: number;
  /** Between-event standard deviation at M ≥ 5.5, ln units. */
  readonly tau2: number;
}

/** Column names of the table, in the paper's order, for the shape and smoothness tests. */
export const BSSA14_COLUMNS = [
  'e0', 'e1', 'e2', 'e3', 'e4', 'e5', 'e6', 'mh', 'c1', 'c2', 'c3', 'h', 'c', 'vc', 'f4', 'f5',
  'r1', 'r2', 'deltaPhiR', 'deltaPhiV', 'phi1', 'phi2', 'tau1', 'tau2',
] as const satisfies readonly (keyof Bssa14Row)[];

/**
 * Period-independent coefficients (BSSA14 table and text, from memory): Mref, Rref (km), Vref
 * (m/s), f1, f3 (g), V1, V2 (m/s); Δc3 = 0 for California, Taiwan and other regions.
 */
export const BSSA14_CONSTANTS = Object.freeze({
  mRef: 4.5,
  rRefKm: 1,
  vRef: 760,
  f1: 0,
  f3G: 0.1,
  v1: 225,
  v2: 300,
  deltaC3: 0,
});

type Cells = readonly [
  e0: number, e1: number, e2: number, e3: number, e4: number, e5: number, e6: number, mh: number,
  c1: number, c2: number, c3: number, h: number, c: number, vc: number, f4: number, f5: number,
  r1: number, r2: number, deltaPhiR: number, deltaPhiV: number, phi1: number, phi2: number, tau1: number, tau2: number,
];

function row(periodS: number, cells: Cells): Bssa14Row {
  const [e0, e1, e2, e3, e4, e5, e6, mh, c1, c2, c3, h, c, vc, f4, f5, r1, r2, deltaPhiR, deltaPhiV, phi1, phi2, tau1, tau2] = cells;
  return Object.freeze({ periodS, e0, e1, e2, e3, e4, e5, e6, mh, c1, c2, c3, h, c, vc, f4, f5, r1, r2, deltaPhiR, deltaPhiV, phi1, phi2, tau1, tau2 });
}

//            e0        e1        e2        e3        e4       e5         e6         Mh     c1       c2       c3         h     c        Vc       f4       f5        R1      R2      ΔφR    ΔφV    φ1     φ2     τ1     τ2
export const BSSA14_PGV: Bssa14Row = row(-1, [
              5.037,    5.078,    4.849,    5.033,    1.073,  -0.1536,    0.2252,    6.2,  -1.243,  0.1489, -0.00344,   5.3, -0.84,    1300,   -0.1,    -0.00844, 105,    272,    0.082, 0.08,  0.644, 0.552, 0.401, 0.346]);

export const BSSA14_PGA: Bssa14Row = row(0, [
              0.4473,   0.4856,   0.2459,   0.4539,   1.431,   0.05053,  -0.1662,    5.5,  -1.134,  0.1917, -0.008088,  4.5, -0.6,     1500,   -0.15,   -0.00701, 110,    270,    0.1,   0.07,  0.695, 0.495, 0.398, 0.348]);

/** The spectral rows, periods in s, increasing. */
export const BSSA14_SA: readonly Bssa14Row[] = Object.freeze([
  row(0.01,  [0.4534,   0.4916,   0.2519,   0.4599,   1.421,   0.04932,  -0.1659,    5.5,  -1.134,  0.1916, -0.008088,  4.5, -0.6037,  1500.2, -0.1483, -0.00701, 111.67, 270,    0.096, 0.07,  0.698, 0.499, 0.402, 0.345]),
  row(0.02,  [0.48598,  0.52359,  0.29707,  0.48875,  1.4331,  0.053388, -0.16561,   5.5,  -1.1394, 0.18962, -0.008074, 4.5, -0.5739,  1500.36, -0.1471, -0.00728, 113.1, 270,    0.092, 0.03,  0.702, 0.502, 0.409, 0.346]),
  row(0.03,  [0.56916,  0.6092,   0.37891,  0.56258,  1.4261,  0.061444, -0.1669,    5.5,  -1.1421, 0.18842, -0.008336, 4.49, -0.5341, 1502.95, -0.1549, -0.00735, 112.13, 270,   0.081, 0.029, 0.721, 0.514, 0.445, 0.364]),
  row(0.05,  [0.75436,  0.79905,  0.60055,  0.74705,  1.3974,  0.067357, -0.18082,   5.5,  -1.1159, 0.18709, -0.009819, 4.2,  -0.458,  1501.42, -0.1963, -0.00647, 97.93,  270,    0.063, 0.03,  0.753, 0.532, 0.503, 0.426]),
  row(0.075, [0.96447,  1.0077,   0.77678,  0.9563,       1.4174,  0.073549, -0.19665,   5.5,  -1.0831, 0.18225, -0.01058,  4.04, -0.4441, 1494,    -0.2287, -0.00573, 85.99,  270.04, 0.064, 0.022, 0.745, 0.542, 0.474, 0.466]),
  row(0.1,   [1.1268,   1.1669,   0.8871,   1.1454,       1.4293,  0.055231, -0.19838,   5.54, -1.0652, 0.17203, -0.0102,   4.13, -0.4872, 1479.12, -0.2492, -0.0056,  79.59,  270.09, 0.087, 0.014, 0.728, 0.541, 0.415, 0.458]),
  row(0.15,  [1.3095,   1.3481,   1.0648,   1.3324,       1.2844, -0.042065, -0.18234,   5.74, -1.0532, 0.15401, -0.008977, 4.39, -0.5796, 1442.85, -0.2571, -0.00585, 81.33,  270.16, 0.12,  0.015, 0.72,  0.537, 0.354, 0.388]),
  row(0.2,   [1.3255,   1.359,    1.122,    1.3414,       1.1349, -0.11096,  -0.15852,   5.92, -1.0607, 0.14489, -0.007717, 4.61, -0.6876, 1392.61, -0.2466, -0.00614, 90.91,  270,    0.136, 0.045, 0.711, 0.539, 0.344, 0.309]),
  row(0.25,  [1.2766,   1.3017,   1.0828,   1.3052,       1.0166, -0.16213,  -0.12784,   6.05, -1.0773, 0.13925, -0.006517, 4.78, -0.7718, 1356.21, -0.2357, -0.00644, 97.04,  269.45, 0.141, 0.055, 0.698, 0.547, 0.35,  0.266]),
  row(0.3,   [1.2217,   1.2401,   1.0246,   1.2653,   0.95676, -0.1959,  -0.092855,  6.14, -1.0948, 0.13388, -0.005475, 4.93, -0.8417, 1308.47, -0.2191, -0.0067,  103.15, 268.59, 0.138, 0.05,  0.675, 0.561, 0.363, 0.229]),
  row(0.4,   [1.1046,   1.1214,   0.89765,  1.1552,       0.96766, -0.22608, -0.023189,  6.2,  -1.1243, 0.12512, -0.004053, 5.16, -0.9109, 1252.66, -0.1958, -0.00713, 106.02, 266.54, 0.122, 0.049, 0.643, 0.58,  0.381, 0.21]),
  row(0.5,   [0.96991,  0.99106,  0.7615,   1.012,        1.0384,  -0.23522,  0.029119,  6.2,  -1.1459, 0.12015, -0.00322,  5.34, -0.9693, 1203.91, -0.175,  -0.00744, 105.54, 265,    0.109, 0.06,  0.615, 0.599, 0.41,  0.224]),
  row(0.75,  [0.66903,  0.69737,  0.47523,  0.69173,      1.2871,  -0.21591,  0.10829,   6.2,  -1.1777, 0.11054, -0.001931, 5.6,  -1.0154, 1147.59, -0.1387, -0.00812, 108.39, 266.51, 0.1,   0.07,  0.581, 0.622, 0.457, 0.266]),
  row(1,     [0.3932,   0.4218,   0.207,    0.4124,   1.5004,  -0.18983,  0.17895,   6.2,  -1.193,  0.10248, -0.00121,  5.74, -1.05,   1109.95, -0.1052, -0.00844, 116.39, 270,    0.098, 0.02,  0.553, 0.625, 0.498, 0.298]),
  row(1.5,   [-0.14954, -0.11866, -0.3138,  -0.1437,      1.7622,  -0.1467,   0.33896,   6.2,  -1.2063, 0.09645, -0.000365, 6.18, -1.0454, 1072.39, -0.0679, -0.00771, 125.38, 262.41, 0.104, 0.01,  0.532, 0.619, 0.525, 0.315]),
  row(2,     [-0.58669, -0.55003, -0.71466, -0.60658,     1.9152,  -0.11237,  0.44788,   6.2,  -1.2159, 0.09636, 0,         6.54, -1.0392, 1009.49, -0.0361, -0.00479, 130.37, 240.14, 0.105, 0.008, 0.526, 0.618, 0.532, 0.329]),
  row(3,     [-1.1898,  -1.142,   -1.23,    -1.2664,      2.1323,  -0.04332,  0.62694,   6.2,  -1.2179, 0.09764, 0,         6.93, -1.0112, 922.43,  -0.0136, -0.00183, 130.36, 195,    0.088, 0,     0.534, 0.619, 0.537, 0.344]),
  row(4,     [-1.6388,  -1.5748,  -1.6673,  -1.7516,      2.204,   -0.014642, 0.76303,   6.2,  -1.2162, 0.10218, 0,         7.32, -0.9694, 844.48,  -0.0032, -0.00152, 129.49, 199.45, 0.07,  0,     0.536, 0.616, 0.543, 0.349]),
  row(5,     [-1.966,   -1.8882,  -2.0245,  -2.0928,      2.2299,  -0.014855, 0.87314,   6.2,  -1.2189, 0.10353, 0,         7.78, -0.9195, 793.13,  -0.0003, -0.00144, 130.22, 230,    0.061, 0,     0.528, 0.622, 0.532, 0.335]),
  row(7.5,   [-2.5865,  -2.4874,  -2.8176,  -2.6854,      2.1187,  -0.081606, 1.0121,    6.2,  -1.2543, 0.12507, 0,         9.48, -0.7766, 771.01,  -0.0001, -0.00137, 130.72, 250.39, 0.058, 0,     0.512, 0.634, 0.511, 0.27]),
  row(10,    [-3.0702,  -2.9537,  -3.3776,  -3.1726,      1.8837,  -0.15096,  1.0651,    6.2,  -1.3253, 0.15183, 0,         9.66, -0.6558, 775,     0,       -0.00136, 129.7,  210,    0.06,  0,     0.51,  0.604, 0.487, 0.239]),
]);

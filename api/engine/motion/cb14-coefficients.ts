/**
 * Coefficients of CB14: Campbell, K. W. & Bozorgnia, Y. (2014), "NGA-West2 ground motion model
 * for the average horizontal components of PGA, PGV, and 5% damped linear acceleration response
 * spectra", Earthquake Spectra 30(3), 1087–1115, doi:10.1193/062913EQS175M.
 * Erratum known to us: none that changes these coefficients.
 *
 * Source of the numbers: the paper's Table 1 (coefficients of the median model) and Table 2
 * (coefficients of the aleatory-variability model), rows PGA, PGV and the 21 spectral periods
 * 0.01–10 s; the period-independent constants c = 1.88, n = 1.18 and h4 = 1 from the same
 * tables. Typed from memory, digit for digit as recalled; they were not read off a copy while
 * typing, so treat every value as "from memory". The same digits came back on separate attempts.
 * Least sure: the 7.5 s row's c2 and c3 (with them the median spectrum at M ≤ 6 dips by up to
 * 0.22 ln units at 7.5 s below the line between 5 and 10 s), c19 at 3–10 s and c16 at 5–10 s.
 * Before Tremora's results are used beyond screening, proofread the table against the paper.
 *
 * Not typed: c12 and c13 (the Japan site term), c15 (the Japan shallow-sediment term), the
 * regional Δc20 (Tremora uses Δc20 = 0, the paper's California and global value) and σc (the
 * arbitrary-component addition: Tremora predicts RotD50). Tremora never uses them, and a value
 * we could not test would only be a liability.
 *
 * How the table was checked (test/engine/motion/cb14.test.ts): shape (periods increasing,
 * every value finite, every column present); each column smooth in ln(period) within a stated
 * share of its range, with the magnitude-scaling columns c2–c4 and c7 checked through the
 * smoothness of the median spectra they produce instead (they trade off against each other
 * from period to period in the paper); the hanging-wall taper continuous at Rx = R1
 * (h1 + h2 + h3 = h4 = 1 on every row, a constraint of the paper's functional form that the
 * recalled digits meet to ±0.001); medians against the orders of magnitude of published
 * figures; agreement with BSSA14, whose table was recalled independently.
 *
 * Units: ln Y is ln(g) for PGA and PSA, ln(cm/s) for PGV. c0, c8, c9 in ln units; c1 per
 * magnitude unit, c2–c4 per magnitude unit above their hinges (4.5, 5.5, 6.5); c5 per ln(km),
 * c6 per magnitude unit per ln(km); c7 km; c10 ln units (hanging-wall amplitude); c11 per
 * ln(m/s); c14 per km of Z2.5 below 1 km; c16 ln units (deep-basin amplitude, times k3);
 * c17, c18 per km of hypocentral depth below 7 km; c19 per degree of dip per magnitude unit;
 * c20 per km of Rrup beyond 80 km; a2 per magnitude unit; h1–h6 dimensionless; k1 m/s;
 * k2, k3 dimensionless; φ1, φ2, τ1, τ2, φlnAF natural-log standard deviations; ρ dimensionless.
 */

/** One row of Tables 1 and 2. `periodS` is 0 for PGA and −1 for PGV. */
export interface Cb14Row {
  readonly periodS: number;
  readonly c0: number;
  readonly c1: number;
  readonly c2: number;
  readonly c3: number;
  readonly c4: number;
  readonly c5: number;
  readonly c6: number;
  readonly c7: number;
  /** Reverse-faulting factor (zero at every period in the paper). */
  readonly c8: number;
  /** Normal-faulting factor. */
  readonly c9: number;
  readonly c10: number;
  readonly c11: number;
  readonly c14: number;
  readonly c16: number;
  readonly c17: number;
  readonly c18: number;
  readonly c19: number;
  readonly c20: number;
  readonly a2: number;
  readonly h1: number;
  readonly h2: number;
  readonly h3: number;
  readonly h5: number;
  readonly h6: number;
  /** Vs30 below which the site response is nonlinear, m/s. */
  readonly k1: number;
  readonly k2: number;
  readonly k3: number;
  readonly phi1: number;
  readonly phi2: number;
  readonly tau1: number;
  readonly tau2: number;
  /** Standard deviation of the site amplification, ln units. */
  readonly phiLnAF: number;
  /** Correlation of ln PGA and ln Y residuals. */
  readonly rho: number;
}

/** Column names, in the paper's order, for the shape and smoothness tests. */
export const CB14_COLUMNS = [
  'c0', 'c1', 'c2', 'c3', 'c4', 'c5', 'c6', 'c7', 'c8', 'c9', 'c10', 'c11', 'c14', 'c16', 'c17', 'c18', 'c19', 'c20',
  'a2', 'h1', 'h2', 'h3', 'h5', 'h6', 'k1', 'k2', 'k3', 'phi1', 'phi2', 'tau1', 'tau2', 'phiLnAF', 'rho',
] as const satisfies readonly (keyof Cb14Row)[];

/** Period-independent constants (CB14 Tables 1 and 2, from memory); Δc20 = 0 for California and global use. */
export const CB14_CONSTANTS = Object.freeze({ c: 1.88, n: 1.18, h4: 1, deltaC20: 0 });

type Cells = readonly [
  c0: number, c1: number, c2: number, c3: number, c4: number, c5: number, c6: number, c7: number, c8: number,
  c9: number, c10: number, c11: number, c14: number, c16: number, c17: number, c18: number, c19: number, c20: number,
  a2: number, h1: number, h2: number, h3: number, h5: number, h6: number, k1: number, k2: number, k3: number,
  phi1: number, phi2: number, tau1: number, tau2: number, phiLnAF: number, rho: number,
];

function row(periodS: number, cells: Cells): Cb14Row {
  const [c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c14, c16, c17, c18, c19, c20, a2, h1, h2, h3, h5, h6, k1, k2, k3, phi1, phi2, tau1, tau2, phiLnAF, rho] = cells;
  return Object.freeze({ periodS, c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c14, c16, c17, c18, c19, c20, a2, h1, h2, h3, h5, h6, k1, k2, k3, phi1, phi2, tau1, tau2, phiLnAF, rho });
}

//                                  c0       c1     c2      c3      c4      c5      c6     c7     c8  c9      c10    c11     c14      c16    c17      c18     c19      c20      a2     h1     h2     h3      h5      h6      k1    k2      k3     φ1     φ2     τ1     τ2     φlnAF ρ
export const CB14_PGA: Cb14Row = row(0, [-4.416, 0.984, 0.537, -1.499, -0.496, -2.773, 0.248, 6.768, 0, -0.212, 0.72,  1.09,  -0.0064, 0.393, 0.0977,  0.0333, 0.00757, -0.0055, 0.167, 0.241, 1.474, -0.715, -0.337, -0.27,  865,  -1.186, 1.839, 0.734, 0.492, 0.409, 0.322, 0.3,  1]);
export const CB14_PGV: Cb14Row = row(-1, [-2.895, 1.51, 0.27,  -1.299, -0.453, -2.466, 0.204, 5.837, 0, -0.168, 0.305, 1.713, 0.106,   0.585, 0.0517,  0.0327, 0.00613, -0.0017, 0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  -1.955, 1.929, 0.655, 0.494, 0.317, 0.297, 0.3,  0.684]);

/** The spectral rows, periods in s, increasing. */
export const CB14_SA: readonly Cb14Row[] = Object.freeze([
  row(0.01,  [-4.365,  0.977, 0.533,  -1.485, -0.499, -2.773, 0.248, 6.753, 0, -0.214, 0.72,  1.094,  -0.007,  0.39,  0.0981,  0.0334, 0.00755, -0.0055, 0.168, 0.242, 1.471, -0.714, -0.336, -0.27,  865,  -1.186, 1.839, 0.734, 0.492, 0.404, 0.325, 0.3, 1]),
  row(0.02,  [-4.348,  0.976, 0.549,  -1.488, -0.501, -2.772, 0.247, 6.502, 0, -0.208, 0.73,  1.149,  -0.0167, 0.387, 0.1009,  0.0327, 0.00759, -0.0055, 0.166, 0.244, 1.467, -0.711, -0.339, -0.263, 865,  -1.219, 1.84,  0.738, 0.496, 0.417, 0.326, 0.3, 0.998]),
  row(0.03,  [-4.024,  0.931, 0.628,  -1.494, -0.517, -2.782, 0.246, 6.291, 0, -0.213, 0.759, 1.29,   -0.0422, 0.378, 0.1095,  0.0331, 0.0079,  -0.0057, 0.167, 0.246, 1.467, -0.713, -0.338, -0.259, 908,  -1.273, 1.841, 0.747, 0.503, 0.446, 0.344, 0.3, 0.986]),
  row(0.05,  [-3.479,  0.887, 0.674,  -1.388, -0.615, -2.791, 0.24,  6.317, 0, -0.244, 0.826, 1.449,  -0.0663, 0.295, 0.1226,  0.027,  0.00803, -0.0063, 0.173, 0.251, 1.449, -0.701, -0.338, -0.263, 1054, -1.346, 1.843, 0.777, 0.52,  0.508, 0.377, 0.3, 0.938]),
  row(0.075, [-3.293,  0.902, 0.726,  -1.469, -0.596, -2.745, 0.227, 6.861, 0, -0.266, 0.815, 1.535,  -0.0794, 0.322, 0.1165,  0.0288, 0.00811, -0.007,  0.198, 0.26,  1.435, -0.695, -0.347, -0.219, 1086, -1.471, 1.845, 0.782, 0.535, 0.504, 0.418, 0.3, 0.887]),
  row(0.1,   [-3.666,  0.993, 0.698,  -1.572, -0.536, -2.633, 0.21,  7.294, 0, -0.229, 0.831, 1.615,  -0.0294, 0.384, 0.0998,  0.0325, 0.00744, -0.0073, 0.174, 0.259, 1.449, -0.708, -0.391, -0.201, 1032, -1.624, 1.847, 0.769, 0.543, 0.445, 0.426, 0.3, 0.87]),
  row(0.15,  [-4.866,  1.267, 0.51,   -1.669, -0.49,  -2.458, 0.183, 8.031, 0, -0.211, 0.749, 1.877,  0.0642,  0.417, 0.076,   0.0388, 0.00716, -0.0069, 0.198, 0.254, 1.461, -0.715, -0.449, -0.099, 878,  -1.931, 1.852, 0.769, 0.543, 0.382, 0.387, 0.3, 0.876]),
  row(0.2,   [-5.411,  1.366, 0.447,  -1.75,  -0.451, -2.421, 0.182, 8.385, 0, -0.163, 0.764, 2.069,  0.0968,  0.404, 0.0571,  0.0437, 0.00688, -0.006,  0.204, 0.237, 1.484, -0.721, -0.393, -0.198, 748,  -2.188, 1.856, 0.761, 0.552, 0.339, 0.338, 0.3, 0.87]),
  row(0.25,  [-5.962,  1.458, 0.274,  -1.711, -0.404, -2.392, 0.189, 7.534, 0, -0.15,  0.716, 2.205,  0.1441,  0.466, 0.0437,  0.0463, 0.00556, -0.0055, 0.185, 0.206, 1.581, -0.787, -0.339, -0.21,  654,  -2.381, 1.861, 0.744, 0.545, 0.34,  0.316, 0.3, 0.85]),
  row(0.3,   [-6.403,  1.528, 0.193,  -1.77,  -0.321, -2.376, 0.195, 6.99,  0, -0.131, 0.737, 2.306,  0.1597,  0.528, 0.0323,  0.0508, 0.00458, -0.0049, 0.164, 0.21,  1.586, -0.795, -0.447, -0.121, 587,  -2.518, 1.865, 0.727, 0.568, 0.34,  0.3,   0.3, 0.819]),
  row(0.4,   [-7.566,  1.739, -0.02,  -1.594, -0.426, -2.303, 0.185, 7.012, 0, -0.159, 0.738, 2.398,  0.141,   0.54,  0.0209,  0.0432, 0.00401, -0.0037, 0.16,  0.226, 1.544, -0.77,  -0.525, -0.086, 503,  -2.657, 1.874, 0.69,  0.593, 0.356, 0.264, 0.3, 0.743]),
  row(0.5,   [-8.379,  1.872, -0.121, -1.577, -0.44,  -2.296, 0.186, 6.902, 0, -0.153, 0.718, 2.355,  0.1474,  0.638, 0.0092,  0.0405, 0.00388, -0.0027, 0.184, 0.217, 1.554, -0.77,  -0.407, -0.281, 457,  -2.669, 1.883, 0.663, 0.611, 0.379, 0.263, 0.3, 0.684]),
  row(0.75,  [-9.841,  2.021, -0.042, -1.757, -0.443, -2.232, 0.186, 5.522, 0, -0.09,  0.795, 1.995,  0.1764,  0.776, -0.0082, 0.042,  0.0042,  -0.0016, 0.216, 0.154, 1.626, -0.78,  -0.371, -0.285, 410,  -2.401, 1.906, 0.606, 0.633, 0.43,  0.326, 0.3, 0.562]),
  row(1,     [-11.011, 2.18,  -0.069, -1.707, -0.527, -2.158, 0.169, 5.65,  0, -0.105, 0.556, 1.447,  0.2593,  0.771, -0.0131, 0.0426, 0.00409, -0.0006, 0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  -1.955, 1.929, 0.579, 0.628, 0.47,  0.353, 0.3, 0.467]),
  row(1.5,   [-12.469, 2.27,  0.047,  -1.621, -0.63,  -2.063, 0.158, 5.795, 0, -0.058, 0.48,  0.33,   0.2881,  0.748, -0.0187, 0.038,  0.00424, 0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  -1.025, 1.974, 0.541, 0.603, 0.497, 0.399, 0.3, 0.364]),
  row(2,     [-12.969, 2.271, 0.149,  -1.512, -0.768, -2.104, 0.158, 6.632, 0, -0.028, 0.401, -0.514, 0.3112,  0.763, -0.0258, 0.0252, 0.00448, 0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  -0.299, 2.019, 0.529, 0.588, 0.499, 0.4,   0.3, 0.298]),
  row(3,     [-13.306, 2.15,  0.368,  -1.315, -0.89,  -2.051, 0.148, 6.759, 0, 0,      0.206, -0.848, 0.3478,  0.686, -0.0311, 0.0236, 0.00345, 0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  0,      2.11,  0.527, 0.578, 0.5,   0.417, 0.3, 0.234]),
  row(4,     [-14.02,  2.132, 0.726,  -1.506, -0.885, -1.986, 0.135, 7.978, 0, 0,      0.105, -0.793, 0.3747,  0.691, -0.0413, 0.0102, 0.00603, 0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  0,      2.2,   0.521, 0.559, 0.543, 0.393, 0.3, 0.202]),
  row(5,     [-14.558, 2.116, 1.027,  -1.721, -0.878, -2.021, 0.135, 8.538, 0, 0,      0,     -0.748, 0.3382,  0.67,  -0.0281, 0.0034, 0.00805, 0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  0,      2.291, 0.502, 0.551, 0.534, 0.421, 0.3, 0.184]),
  row(7.5,   [-15.509, 2.223, 0.169,  -0.756, -1.077, -2.179, 0.165, 8.468, 0, 0,      0,     -0.664, 0.3754,  0.757, -0.0205, 0.005,  0.0028,  0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  0,      2.517, 0.457, 0.546, 0.523, 0.438, 0.3, 0.176]),
  row(10,    [-15.975, 2.132, 0.367,  -0.8,   -1.282, -2.244, 0.18,  6.564, 0, 0,      0,     -0.576, 0.3506,  0.621, 0.0009,  0.0099, 0.00458, 0,       0.596, 0.117, 1.616, -0.733, -0.128, -0.756, 400,  0,      2.744, 0.441, 0.543, 0.466, 0.438, 0.3, 0.154]),
]);

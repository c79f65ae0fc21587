/**
 * Coefficients of Zhao06: Zhao, J. X., Zhang, J., Asano, A., Ohno, Y., Oouchi, T., Takahashi, T.,
 * Ogawa, H., Irikura, K., Thio, H. K., Somerville, P. G., Fukushima, Yasuhiro & Fukushima,
 * Yoshimitsu (2006), "Attenuation relations of strong ground motion in Japan using site
 * classification based on predominant period", Bulletin of the Seismological Society of
 * America 96(3), 898–913 (doi 10.1785/0120050122, from memory).
 *
 * Source of the numbers: the paper's coefficient tables (a–e, the source terms FR, SI, SS, SSL,
 * the site-class terms CH, C1–C4, the within-event σ, between-event τ and tabulated total σT;
 * and the magnitude-squared terms QC, WC, τC, QI, WI, τI, PS, QS, WS, τS), rows PGA and 20
 * periods 0.05–5 s, copied digit for digit from the project's reference record (`zhao06.csv`
 * and `zhao06-constants.csv` of the shared GMM reference data). Its README says this table
 * rests on one public record (a second record agrees but looks derived from it): treat it as
 * provisional until proofread against the paper.
 *
 * How the table is checked: test/engine/motion/zhao06.vectors.test.ts compares the model with
 * test vectors from an independent transcription of the paper's equations (1e-4 in ln units).
 *
 * Units: y in cm/s² (converted to g with standard gravity in zhao06.ts). a per magnitude unit;
 * b per km; c km; d per magnitude unit; e per km of depth beyond hc; FR, SI, SS, CH, C1–C4 ln
 * units; SSL multiplies ln x (x in km); Q per magnitude unit squared, P per magnitude unit, W ln
 * units; σ, τ, σT and the τ of the magnitude-squared terms natural-log standard deviations.
 */
import { coefficientRows, rowOfPeriod, type CoefficientRow } from './coefficient-table.ts';

/** Column names, in the reference record's order. */
// prettier-ignore
export const ZHAO06_COLUMNS = [
  'a', 'b', 'c', 'd', 'e', 'fr', 'si', 'ss', 'ssl', 'ch', 'c1', 'c2', 'c3', 'c4', 'sigma', 'tau', 'sigmaT',
  'qc', 'wc', 'tauC', 'qi', 'wi', 'tauI', 'ps', 'qs', 'ws', 'tauS',
] as const;

/** One row of the table. `periodS` is 0 for PGA. */
export type Zhao06Row = CoefficientRow<(typeof ZHAO06_COLUMNS)[number]>;

// prettier-ignore
const TABLE: readonly (readonly number[])[] = [
  // periodS      a         b       c      d        e     fr      si     ss     ssl      ch      c1      c2      c3      c4  sigma    tau  sigmaT       qc      wc   tauC       qi      wi   tauI       ps       qs       ws   tauS
  [      0, 1.101, -0.00564, 0.0055,  1.08, 0.01412, 0.251,      0, 2.607, -0.528,  0.293,  1.111,  1.344,  1.355,   1.42, 0.604, 0.398,  0.723,       0,      0, 0.303,       0,      0, 0.308,  0.1392,  0.1584, -0.0529, 0.321],
  [   0.05, 1.076, -0.00671, 0.0075,  1.06, 0.01463, 0.251,      0, 2.764, -0.551,  0.939,  1.684,  1.793,  1.747,  1.814,  0.64, 0.444,  0.779,       0,      0, 0.326,       0,      0, 0.343,  0.1636,  0.1932, -0.0841, 0.378],
  [    0.1, 1.118, -0.00787,  0.009, 1.083, 0.01423,  0.24,      0, 2.156,  -0.42,  1.499,  2.061,  2.135,  2.031,  2.082, 0.694,  0.49,  0.849,       0,      0, 0.342,       0,      0, 0.403,   0.169,  0.2057, -0.0877,  0.42],
  [   0.15, 1.134, -0.00722,   0.01, 1.053, 0.01509, 0.251,      0, 2.161, -0.431,  1.462,  1.916,  2.168,  2.052,  2.113, 0.702,  0.46,  0.839,       0,      0, 0.331, -0.0138, 0.0286, 0.367,  0.1669,  0.1984, -0.0773, 0.372],
  [    0.2, 1.147, -0.00659,  0.012, 1.014, 0.01462,  0.26,      0, 1.901, -0.372,   1.28,  1.669,  2.085,  2.001,   2.03, 0.692, 0.423,  0.811,       0,      0, 0.312, -0.0256, 0.0352, 0.328,  0.1631,  0.1856, -0.0644, 0.324],
  [   0.25, 1.149,  -0.0059,  0.014, 0.966, 0.01459, 0.269,      0, 1.814,  -0.36,  1.121,  1.468,  1.942,  1.941,  1.937, 0.682, 0.391,  0.786,       0,      0, 0.298, -0.0348, 0.0403, 0.289,  0.1588,  0.1714, -0.0515, 0.294],
  [    0.3, 1.163,  -0.0052,  0.015, 0.934, 0.01458, 0.259,      0, 2.181,  -0.45,  0.852,  1.172,  1.683,  1.808,   1.77,  0.67, 0.379,   0.77,       0,      0,   0.3, -0.0423, 0.0445,  0.28,  0.1544,  0.1573, -0.0395, 0.284],
  [    0.4,   1.2, -0.00422,   0.01, 0.959, 0.01257, 0.248, -0.041, 2.432, -0.506,  0.365,  0.655,  1.127,  1.482,  1.397, 0.659,  0.39,  0.766,       0,      0, 0.346, -0.0541, 0.0511, 0.271,   0.146,  0.1309, -0.0183, 0.278],
  [    0.5,  1.25, -0.00338,  0.006, 1.008, 0.01114, 0.247, -0.053, 2.629, -0.554, -0.207,  0.071,  0.515,  0.934,  0.955, 0.653, 0.389,   0.76, -0.0126, 0.0116, 0.338, -0.0632, 0.0562, 0.277,  0.1381,  0.1078, -0.0008, 0.272],
  [    0.6, 1.293, -0.00282,  0.003, 1.088, 0.01019, 0.233, -0.103, 2.702, -0.575, -0.705, -0.429, -0.003,  0.394,  0.559, 0.653, 0.401,  0.766, -0.0329, 0.0202, 0.349, -0.0707, 0.0604, 0.296,  0.1307,  0.0878,  0.0136, 0.285],
  [    0.7, 1.336, -0.00258, 0.0025, 1.084, 0.00979,  0.22, -0.146, 2.654, -0.572, -1.144, -0.866, -0.449, -0.111,  0.188, 0.652, 0.408,  0.769, -0.0501, 0.0274, 0.351, -0.0771, 0.0639, 0.313,  0.1239,  0.0705,  0.0254,  0.29],
  [    0.8, 1.386, -0.00242, 0.0022, 1.088, 0.00944, 0.232, -0.164,  2.48,  -0.54, -1.609, -1.325, -0.928,  -0.62, -0.246, 0.647, 0.418,   0.77,  -0.065, 0.0336, 0.356, -0.0825,  0.067, 0.329,  0.1176,  0.0556,  0.0352, 0.299],
  [    0.9, 1.433, -0.00232,  0.002, 1.109, 0.00972,  0.22, -0.206, 2.332, -0.522, -2.023, -1.732, -1.349, -1.066, -0.643, 0.653, 0.411,  0.771, -0.0781, 0.0391, 0.348, -0.0874, 0.0697, 0.324,  0.1116,  0.0426,  0.0432, 0.289],
  [      1, 1.479,  -0.0022,  0.002, 1.115, 0.01005, 0.211, -0.239, 2.233, -0.509, -2.451, -2.152, -1.776, -1.523, -1.084, 0.657,  0.41,  0.775, -0.0899,  0.044, 0.338, -0.0917, 0.0721, 0.328,   0.106,  0.0314,  0.0498, 0.286],
  [   1.25, 1.551, -0.00207,  0.002, 1.083, 0.01003, 0.251, -0.256, 2.029, -0.469, -3.243, -2.923, -2.542, -2.327, -1.936,  0.66, 0.402,  0.773, -0.1148, 0.0545, 0.313, -0.1009, 0.0772, 0.339,  0.0933,  0.0093,  0.0612, 0.277],
  [    1.5, 1.621, -0.00224,  0.002, 1.091, 0.00928, 0.248, -0.306, 1.589, -0.379, -3.888, -3.548, -3.169, -2.979, -2.661, 0.664, 0.408,  0.779, -0.1351,  0.063, 0.306, -0.1083, 0.0814, 0.352,  0.0821, -0.0062,  0.0674, 0.282],
  [      2, 1.694, -0.00201, 0.0025, 1.055, 0.00833, 0.263, -0.321, 0.966, -0.248, -4.783,  -4.41, -4.039, -3.871,  -3.64, 0.669, 0.414,  0.787, -0.1672, 0.0764, 0.283, -0.1202,  0.088,  0.36,  0.0628, -0.0235,  0.0692,   0.3],
  [    2.5, 1.748, -0.00187, 0.0028, 1.052, 0.00776, 0.262, -0.337, 0.789, -0.221, -5.444, -5.049, -4.698, -4.496, -4.341, 0.671, 0.411,  0.786, -0.1921, 0.0869, 0.287, -0.1293, 0.0931, 0.356,  0.0465, -0.0287,  0.0622, 0.292],
  [      3, 1.759, -0.00147, 0.0032, 1.025, 0.00644, 0.307, -0.331, 1.037, -0.263, -5.839, -5.431, -5.089, -4.893, -4.758, 0.667, 0.396,  0.776, -0.2124, 0.0954, 0.278, -0.1368, 0.0972, 0.338,  0.0322, -0.0261,  0.0496, 0.274],
  [      4, 1.826, -0.00195,  0.004, 1.044,  0.0059, 0.353,  -0.39, 0.561, -0.169, -6.598, -6.181, -5.882, -5.698, -5.588, 0.647, 0.382,  0.751, -0.2445, 0.1088, 0.273, -0.1486, 0.1038, 0.307,  0.0083, -0.0065,   0.015, 0.281],
  [      5, 1.825, -0.00237,  0.005, 1.065,  0.0051, 0.248, -0.498, 0.225,  -0.12, -6.752, -6.347, -6.051, -5.873, -5.798, 0.643, 0.377,  0.745, -0.2694, 0.1193, 0.275, -0.1578,  0.109, 0.272, -0.0117,  0.0246, -0.0268, 0.296],
];

/** Every row: PGA, then the spectral periods increasing. */
export const ZHAO06_ROWS: readonly Zhao06Row[] = coefficientRows('Zhao06', ZHAO06_COLUMNS, TABLE);

export const ZHAO06_PGA: Zhao06Row = rowOfPeriod('Zhao06', ZHAO06_ROWS, 0);

/** The spectral rows, 0.05–5 s, increasing. */
export const ZHAO06_SA: readonly Zhao06Row[] = Object.freeze(
  ZHAO06_ROWS.filter((r) => r.periodS > 0),
);

/** Period-independent constants (zhao06-constants.csv). */
export const ZHAO06_CONSTANTS = Object.freeze({
  /** Depth constant hc, km: the depth term e (h − hc) applies from h ≥ hc. */
  hcKm: 15,
  /** Focal depths below this are taken as this, km. */
  depthCapKm: 125,
  /** Reference magnitude Mc of the crustal and interface magnitude-squared terms. */
  mcCrustal: 6.3,
  mcInterface: 6.3,
  /** Reference magnitude Mc of the slab magnitude-squared term. */
  mcSlab: 6.5,
});

/**
 * Coefficients of ASK14: Abrahamson, N. A., Silva, W. J. & Kamai, R. (2014), "Summary of the
 * ASK14 ground motion relation for active crustal regions", Earthquake Spectra 30(3), 1025–1055,
 * doi:10.1193/070913EQS198M.
 *
 * Source of the numbers: the paper's tables of coefficients as given in its electronic
 * supplement (the coefficient file `ask14_coeffs.m.txt`), rows PGV, PGA and the 22 spectral
 * periods 0.01–10 s, copied digit for digit from `../shared/reference/gmm/ask14.csv`; the
 * period-independent hanging-wall constants (a2HW, h1–h3) and φamp from
 * `../shared/reference/gmm/ask14-constants.csv`. That reference README records the provenance:
 * the table was taken from a public record of the supplement and cross-checked cell by cell
 * against two further independent records (1080 and 1056 cells) with no differences.
 *
 * Every column of the published table is kept, also the ones Tremora does not use: the
 * regional terms of Taiwan, China and Japan (a25, a28, a29, a31, a36–a42, s5Jp, s6Jp) and
 * the aftershock term a14. Tremora evaluates the California/global form of the model.
 *
 * How the table is checked: test/engine/motion/ask14.test.ts reproduces the independent test
 * vectors of `../shared/reference/gmm/vectors/ask14.json` (copied to
 * test/engine/motion/vectors/ask14.json) within 1e-4 in ln units, and checks the table's shape.
 *
 * Units: ln Y is ln(g) for PGA and PSA, ln(cm/s) for PGV; Vlin m/s; c4 km; c in g (cm/s in
 * the PGV row); a17 per km; the standard deviations s1–s4 in natural-log units; the other
 * coefficients in ln units per unit of the quantity they multiply (see ask14.ts).
 */

/** One row of the table. `periodS` is 0 for PGA and −1 for PGV. */
export interface Ask14Row {
  readonly periodS: number;
  /** Upper magnitude break of the magnitude scaling. */
  readonly M1: number;
  /** Lower magnitude break (6.75 and 5 at every row). */
  readonly M2: number;
  /** Vs30 below which the site response is nonlinear, m/s. */
  readonly Vlin: number;
  /** Nonlinear site coefficient. */
  readonly b: number;
  /** Nonlinear site constant, in the units of the row (g; 2400 in the PGV row, cm/s). */
  readonly c: number;
  /** Nonlinear site exponent. */
  readonly n: number;
  /** Finite-fault distance, km (above M 5). */
  readonly c4: number;
  readonly a1: number;
  readonly a2: number;
  readonly a3: number;
  readonly a4: number;
  readonly a5: number;
  readonly a6: number;
  readonly a7: number;
  readonly a8: number;
  readonly a10: number;
  readonly a11: number;
  readonly a12: number;
  /** Hanging-wall amplitude. */
  readonly a13: number;
  /** Aftershock (Class 2) term; Tremora treats every earthquake as a main shock. */
  readonly a14: number;
  readonly a15: number;
  /** Anelastic attenuation per km of Rrup. */
  readonly a17: number;
  readonly a43: number;
  readonly a44: number;
  readonly a45: number;
  readonly a46: number;
  readonly a25: number;
  readonly a28: number;
  readonly a29: number;
  readonly a31: number;
  readonly a36: number;
  readonly a37: number;
  readonly a38: number;
  readonly a39: number;
  readonly a40: number;
  readonly a41: number;
  readonly a42: number;
  /** φ of small events (M < 4) where Vs30 is estimated. */
  readonly s1Est: number;
  /** φ of large events (M > 6) where Vs30 is estimated. */
  readonly s2Est: number;
  /** τ of small events (M < 5). */
  readonly s3: number;
  /** τ of large events (M > 7). */
  readonly s4: number;
  /** φ of small events where Vs30 is measured. */
  readonly s1Meas: number;
  /** φ of large events where Vs30 is measured. */
  readonly s2Meas: number;
  readonly s5Jp: number;
  readonly s6Jp: number;
}

/** Column names, in the table's order, for the shape test. */
export const ASK14_COLUMNS = [
  'M1', 'M2', 'Vlin', 'b', 'c', 'n', 'c4', 'a1', 'a2', 'a3', 'a4', 'a5', 'a6', 'a7', 'a8', 'a10', 'a11', 'a12', 'a13', 'a14', 'a15', 'a17', 'a43', 'a44', 'a45', 'a46', 'a25', 'a28', 'a29', 'a31', 'a36', 'a37', 'a38', 'a39', 'a40', 'a41', 'a42', 's1Est', 's2Est', 's3', 's4', 's1Meas', 's2Meas', 's5Jp', 's6Jp',
] as const satisfies readonly (keyof Ask14Row)[];

/**
 * Period-independent constants: the hanging-wall model's a2HW (T2) and h1–h3 (T3), and φamp,
 * the standard deviation of the site amplification, removed from φ and added back (ask14.ts).
 */
export const ASK14_CONSTANTS = Object.freeze({ a2HW: 0.2, h1: 0.25, h2: 1.5, h3: -0.75, phiAmp: 0.4 });

const freezeRow = (row: Ask14Row): Ask14Row => Object.freeze(row);

export const ASK14_PGV: Ask14Row = freezeRow({ periodS: -1, M1: 6.75, M2: 5, Vlin: 330, b: -2.02, c: 2400, n: 1.5, c4: 4.5, a1: 5.975, a2: -0.919, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.3657, a7: 0, a8: -0.094, a10: 2.36, a11: 0, a12: -0.1, a13: 0.25, a14: 0.22, a15: 0.3, a17: -0.0005, a43: 0.28, a44: 0.15, a45: 0.09, a46: 0.07, a25: -0.0001, a28: 0.0005, a29: -0.0037, a31: -0.1462, a36: 0.377, a37: 0.212, a38: 0.157, a39: 0, a40: 0.095, a41: -0.038, a42: 0.065, s1Est: 0.662, s2Est: 0.51, s3: 0.38, s4: 0.38, s1Meas: 0.66, s2Meas: 0.51, s5Jp: 0.58, s6Jp: 0.53 });
export const ASK14_PGA: Ask14Row = freezeRow({ periodS: 0, M1: 6.75, M2: 5, Vlin: 660, b: -1.47, c: 2.4, n: 1.5, c4: 4.5, a1: 0.587, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.1541, a7: 0, a8: -0.015, a10: 1.735, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0072, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0015, a28: 0.0025, a29: -0.0034, a31: -0.1503, a36: 0.265, a37: 0.337, a38: 0.188, a39: 0, a40: 0.088, a41: -0.196, a42: 0.044, s1Est: 0.754, s2Est: 0.52, s3: 0.47, s4: 0.36, s1Meas: 0.741, s2Meas: 0.501, s5Jp: 0.54, s6Jp: 0.63 });

/** The spectral rows, periods in s, increasing. */
export const ASK14_SA: readonly Ask14Row[] = Object.freeze(
  [
    { periodS: 0.01, M1: 6.75, M2: 5, Vlin: 660, b: -1.47, c: 2.4, n: 1.5, c4: 4.5, a1: 0.587, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.1541, a7: 0, a8: -0.015, a10: 1.735, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0072, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0015, a28: 0.0025, a29: -0.0034, a31: -0.1503, a36: 0.265, a37: 0.337, a38: 0.188, a39: 0, a40: 0.088, a41: -0.196, a42: 0.044, s1Est: 0.754, s2Est: 0.52, s3: 0.47, s4: 0.36, s1Meas: 0.741, s2Meas: 0.501, s5Jp: 0.54, s6Jp: 0.63 },
    { periodS: 0.02, M1: 6.75, M2: 5, Vlin: 680, b: -1.459, c: 2.4, n: 1.5, c4: 4.5, a1: 0.598, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.1461, a7: 0, a8: -0.015, a10: 1.718, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0073, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0015, a28: 0.0024, a29: -0.0033, a31: -0.1479, a36: 0.255, a37: 0.328, a38: 0.184, a39: 0, a40: 0.088, a41: -0.194, a42: 0.061, s1Est: 0.76, s2Est: 0.52, s3: 0.47, s4: 0.36, s1Meas: 0.747, s2Meas: 0.501, s5Jp: 0.54, s6Jp: 0.63 },
    { periodS: 0.03, M1: 6.75, M2: 5, Vlin: 770, b: -1.39, c: 2.4, n: 1.5, c4: 4.5, a1: 0.602, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.1566, a7: 0, a8: -0.015, a10: 1.615, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0075, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0016, a28: 0.0023, a29: -0.0034, a31: -0.1447, a36: 0.249, a37: 0.32, a38: 0.18, a39: 0, a40: 0.093, a41: -0.175, a42: 0.162, s1Est: 0.781, s2Est: 0.52, s3: 0.47, s4: 0.36, s1Meas: 0.769, s2Meas: 0.501, s5Jp: 0.55, s6Jp: 0.63 },
    { periodS: 0.05, M1: 6.75, M2: 5, Vlin: 915, b: -1.219, c: 2.4, n: 1.5, c4: 4.5, a1: 0.707, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.0845, a7: 0, a8: -0.015, a10: 1.358, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.008, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.002, a28: 0.0027, a29: -0.0033, a31: -0.1326, a36: 0.202, a37: 0.289, a38: 0.167, a39: 0, a40: 0.133, a41: -0.09, a42: 0.451, s1Est: 0.81, s2Est: 0.53, s3: 0.47, s4: 0.36, s1Meas: 0.798, s2Meas: 0.512, s5Jp: 0.56, s6Jp: 0.65 },
    { periodS: 0.075, M1: 6.75, M2: 5, Vlin: 960, b: -1.152, c: 2.4, n: 1.5, c4: 4.5, a1: 0.973, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.0285, a7: 0, a8: -0.015, a10: 1.258, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0089, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0027, a28: 0.0032, a29: -0.0029, a31: -0.1353, a36: 0.126, a37: 0.275, a38: 0.173, a39: 0, a40: 0.186, a41: 0.09, a42: 0.506, s1Est: 0.81, s2Est: 0.54, s3: 0.47, s4: 0.36, s1Meas: 0.798, s2Meas: 0.522, s5Jp: 0.57, s6Jp: 0.69 },
    { periodS: 0.1, M1: 6.75, M2: 5, Vlin: 910, b: -1.23, c: 2.4, n: 1.5, c4: 4.5, a1: 1.169, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.0408, a7: 0, a8: -0.015, a10: 1.31, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0095, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0033, a28: 0.0036, a29: -0.0025, a31: -0.1128, a36: 0.022, a37: 0.256, a38: 0.189, a39: 0, a40: 0.16, a41: 0.006, a42: 0.335, s1Est: 0.81, s2Est: 0.55, s3: 0.47, s4: 0.36, s1Meas: 0.795, s2Meas: 0.527, s5Jp: 0.57, s6Jp: 0.7 },
    { periodS: 0.15, M1: 6.75, M2: 5, Vlin: 740, b: -1.587, c: 2.4, n: 1.5, c4: 4.5, a1: 1.442, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.1208, a7: 0, a8: -0.022, a10: 1.66, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0095, a43: 0.1, a44: 0.05, a45: 0, a46: -0.05, a25: -0.0035, a28: 0.0033, a29: -0.0025, a31: 0.0383, a36: -0.136, a37: 0.162, a38: 0.108, a39: 0, a40: 0.068, a41: -0.156, a42: -0.084, s1Est: 0.801, s2Est: 0.56, s3: 0.47, s4: 0.36, s1Meas: 0.773, s2Meas: 0.519, s5Jp: 0.58, s6Jp: 0.7 },
    { periodS: 0.2, M1: 6.75, M2: 5, Vlin: 590, b: -2.012, c: 2.4, n: 1.5, c4: 4.5, a1: 1.637, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.2241, a7: 0, a8: -0.03, a10: 2.22, a11: 0, a12: -0.1, a13: 0.6, a14: -0.3, a15: 1.1, a17: -0.0086, a43: 0.1, a44: 0.05, a45: 0, a46: -0.03, a25: -0.0033, a28: 0.0027, a29: -0.0031, a31: 0.0775, a36: -0.078, a37: 0.224, a38: 0.115, a39: 0, a40: 0.048, a41: -0.274, a42: -0.178, s1Est: 0.789, s2Est: 0.565, s3: 0.47, s4: 0.36, s1Meas: 0.753, s2Meas: 0.514, s5Jp: 0.59, s6Jp: 0.7 },
    { periodS: 0.25, M1: 6.75, M2: 5, Vlin: 495, b: -2.411, c: 2.4, n: 1.5, c4: 4.5, a1: 1.701, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.3124, a7: 0, a8: -0.038, a10: 2.77, a11: 0, a12: -0.1, a13: 0.6, a14: -0.24, a15: 1.1, a17: -0.0074, a43: 0.1, a44: 0.05, a45: 0, a46: 0, a25: -0.0029, a28: 0.0024, a29: -0.0036, a31: 0.0741, a36: 0.037, a37: 0.248, a38: 0.122, a39: 0, a40: 0.055, a41: -0.248, a42: -0.187, s1Est: 0.77, s2Est: 0.57, s3: 0.47, s4: 0.36, s1Meas: 0.729, s2Meas: 0.513, s5Jp: 0.61, s6Jp: 0.7 },
    { periodS: 0.3, M1: 6.75, M2: 5, Vlin: 430, b: -2.757, c: 2.4, n: 1.5, c4: 4.5, a1: 1.712, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.3383, a7: 0, a8: -0.045, a10: 3.25, a11: 0, a12: -0.1, a13: 0.6, a14: -0.19, a15: 1.03, a17: -0.0064, a43: 0.1, a44: 0.05, a45: 0.03, a46: 0.03, a25: -0.0027, a28: 0.002, a29: -0.0039, a31: 0.2548, a36: -0.091, a37: 0.203, a38: 0.096, a39: 0, a40: 0.073, a41: -0.203, a42: -0.159, s1Est: 0.74, s2Est: 0.58, s3: 0.47, s4: 0.36, s1Meas: 0.693, s2Meas: 0.519, s5Jp: 0.63, s6Jp: 0.7 },
    { periodS: 0.4, M1: 6.75, M2: 5, Vlin: 360, b: -3.278, c: 2.4, n: 1.5, c4: 4.5, a1: 1.662, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.4688, a7: 0, a8: -0.055, a10: 3.99, a11: 0, a12: -0.1, a13: 0.58, a14: -0.11, a15: 0.92, a17: -0.0043, a43: 0.1, a44: 0.07, a45: 0.06, a46: 0.06, a25: -0.0023, a28: 0.001, a29: -0.0048, a31: 0.2136, a36: 0.129, a37: 0.232, a38: 0.123, a39: 0, a40: 0.143, a41: -0.154, a42: -0.023, s1Est: 0.699, s2Est: 0.59, s3: 0.47, s4: 0.36, s1Meas: 0.644, s2Meas: 0.524, s5Jp: 0.66, s6Jp: 0.7 },
    { periodS: 0.5, M1: 6.75, M2: 5, Vlin: 340, b: -3.599, c: 2.4, n: 1.5, c4: 4.5, a1: 1.571, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.5586, a7: 0, a8: -0.065, a10: 4.45, a11: 0, a12: -0.1, a13: 0.56, a14: -0.04, a15: 0.84, a17: -0.0032, a43: 0.1, a44: 0.1, a45: 0.1, a46: 0.09, a25: -0.002, a28: 0.0008, a29: -0.005, a31: 0.1542, a36: 0.31, a37: 0.252, a38: 0.134, a39: 0, a40: 0.16, a41: -0.159, a42: -0.029, s1Est: 0.676, s2Est: 0.6, s3: 0.47, s4: 0.36, s1Meas: 0.616, s2Meas: 0.532, s5Jp: 0.69, s6Jp: 0.7 },
    { periodS: 0.75, M1: 6.75, M2: 5, Vlin: 330, b: -3.8, c: 2.4, n: 1.5, c4: 4.5, a1: 1.299, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.6821, a7: 0, a8: -0.095, a10: 4.75, a11: 0, a12: -0.1, a13: 0.53, a14: 0.07, a15: 0.68, a17: -0.0025, a43: 0.14, a44: 0.14, a45: 0.14, a46: 0.13, a25: -0.001, a28: 0.0007, a29: -0.0041, a31: 0.0787, a36: 0.505, a37: 0.208, a38: 0.129, a39: 0, a40: 0.158, a41: -0.141, a42: 0.061, s1Est: 0.631, s2Est: 0.615, s3: 0.47, s4: 0.36, s1Meas: 0.566, s2Meas: 0.548, s5Jp: 0.73, s6Jp: 0.69 },
    { periodS: 1, M1: 6.75, M2: 5, Vlin: 330, b: -3.5, c: 2.4, n: 1.5, c4: 4.5, a1: 1.043, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.763, a7: 0, a8: -0.11, a10: 4.3, a11: 0, a12: -0.1, a13: 0.5, a14: 0.15, a15: 0.57, a17: -0.0025, a43: 0.17, a44: 0.17, a45: 0.17, a46: 0.14, a25: -0.0005, a28: 0.0007, a29: -0.0032, a31: 0.0476, a36: 0.358, a37: 0.208, a38: 0.152, a39: 0, a40: 0.145, a41: -0.144, a42: 0.062, s1Est: 0.609, s2Est: 0.63, s3: 0.47, s4: 0.36, s1Meas: 0.541, s2Meas: 0.565, s5Jp: 0.77, s6Jp: 0.68 },
    { periodS: 1.5, M1: 6.75, M2: 5, Vlin: 330, b: -2.4, c: 2.4, n: 1.5, c4: 4.5, a1: 0.665, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.8355, a7: 0, a8: -0.124, a10: 2.6, a11: 0, a12: -0.1, a13: 0.42, a14: 0.27, a15: 0.42, a17: -0.0022, a43: 0.22, a44: 0.21, a45: 0.2, a46: 0.16, a25: -0.0004, a28: 0.0006, a29: -0.002, a31: -0.0163, a36: 0.131, a37: 0.108, a38: 0.118, a39: 0, a40: 0.131, a41: -0.126, a42: 0.037, s1Est: 0.578, s2Est: 0.64, s3: 0.47, s4: 0.36, s1Meas: 0.506, s2Meas: 0.576, s5Jp: 0.8, s6Jp: 0.66 },
    { periodS: 2, M1: 6.75, M2: 5, Vlin: 330, b: -1, c: 2.4, n: 1.5, c4: 4.5, a1: 0.329, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.8973, a7: 0, a8: -0.138, a10: 0.55, a11: 0, a12: -0.1, a13: 0.35, a14: 0.35, a15: 0.31, a17: -0.0019, a43: 0.26, a44: 0.25, a45: 0.22, a46: 0.16, a25: -0.0002, a28: 0.0003, a29: -0.0017, a31: -0.1203, a36: 0.123, a37: 0.068, a38: 0.119, a39: 0, a40: 0.083, a41: -0.075, a42: -0.143, s1Est: 0.555, s2Est: 0.65, s3: 0.47, s4: 0.36, s1Meas: 0.48, s2Meas: 0.587, s5Jp: 0.8, s6Jp: 0.62 },
    { periodS: 3, M1: 6.82, M2: 5, Vlin: 330, b: 0, c: 2.4, n: 1.5, c4: 4.5, a1: -0.06, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.9061, a7: 0, a8: -0.172, a10: -0.95, a11: 0, a12: -0.1, a13: 0.2, a14: 0.46, a15: 0.16, a17: -0.0015, a43: 0.34, a44: 0.3, a45: 0.23, a46: 0.16, a25: 0, a28: 0, a29: -0.002, a31: -0.2719, a36: 0.109, a37: -0.023, a38: 0.093, a39: 0, a40: 0.07, a41: -0.021, a42: -0.028, s1Est: 0.548, s2Est: 0.64, s3: 0.47, s4: 0.36, s1Meas: 0.472, s2Meas: 0.576, s5Jp: 0.8, s6Jp: 0.55 },
    { periodS: 4, M1: 6.92, M2: 5, Vlin: 330, b: 0, c: 2.4, n: 1.5, c4: 4.5, a1: -0.299, a2: -0.79, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.8888, a7: 0, a8: -0.197, a10: -0.95, a11: 0, a12: -0.1, a13: 0, a14: 0.54, a15: 0.05, a17: -0.001, a43: 0.41, a44: 0.32, a45: 0.23, a46: 0.14, a25: 0, a28: 0, a29: -0.002, a31: -0.2958, a36: 0.135, a37: 0.028, a38: 0.084, a39: 0, a40: 0.101, a41: 0.072, a42: -0.097, s1Est: 0.527, s2Est: 0.63, s3: 0.47, s4: 0.36, s1Meas: 0.447, s2Meas: 0.565, s5Jp: 0.76, s6Jp: 0.52 },
    { periodS: 5, M1: 7, M2: 5, Vlin: 330, b: 0, c: 2.4, n: 1.5, c4: 4.5, a1: -0.562, a2: -0.765, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.8984, a7: 0, a8: -0.218, a10: -0.93, a11: 0, a12: -0.1, a13: 0, a14: 0.61, a15: -0.04, a17: -0.001, a43: 0.51, a44: 0.32, a45: 0.22, a46: 0.13, a25: 0, a28: 0, a29: -0.002, a31: -0.2718, a36: 0.189, a37: 0.031, a38: 0.058, a39: 0, a40: 0.095, a41: 0.205, a42: 0.015, s1Est: 0.505, s2Est: 0.63, s3: 0.47, s4: 0.36, s1Meas: 0.425, s2Meas: 0.568, s5Jp: 0.72, s6Jp: 0.5 },
    { periodS: 6, M1: 7.06, M2: 5, Vlin: 330, b: 0, c: 2.4, n: 1.5, c4: 4.5, a1: -0.875, a2: -0.711, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.8955, a7: 0, a8: -0.235, a10: -0.91, a11: 0, a12: -0.2, a13: 0, a14: 0.65, a15: -0.11, a17: -0.001, a43: 0.55, a44: 0.32, a45: 0.2, a46: 0.1, a25: 0, a28: 0, a29: -0.002, a31: -0.2517, a36: 0.215, a37: 0.024, a38: 0.065, a39: 0, a40: 0.133, a41: 0.285, a42: 0.104, s1Est: 0.477, s2Est: 0.63, s3: 0.47, s4: 0.36, s1Meas: 0.395, s2Meas: 0.571, s5Jp: 0.7, s6Jp: 0.5 },
    { periodS: 7.5, M1: 7.145, M2: 5, Vlin: 330, b: 0, c: 2.4, n: 1.5, c4: 4.5, a1: -1.303, a2: -0.634, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.87, a7: 0, a8: -0.255, a10: -0.87, a11: 0, a12: -0.2, a13: 0, a14: 0.72, a15: -0.19, a17: -0.001, a43: 0.49, a44: 0.275, a45: 0.17, a46: 0.09, a25: 0, a28: 0, a29: -0.002, a31: -0.14, a36: 0.15, a37: -0.07, a38: 0, a39: 0, a40: 0.151, a41: 0.329, a42: 0.299, s1Est: 0.457, s2Est: 0.63, s3: 0.47, s4: 0.36, s1Meas: 0.378, s2Meas: 0.575, s5Jp: 0.67, s6Jp: 0.5 },
    { periodS: 10, M1: 7.25, M2: 5, Vlin: 330, b: 0, c: 2.4, n: 1.5, c4: 4.5, a1: -1.928, a2: -0.529, a3: 0.275, a4: -0.1, a5: -0.41, a6: 2.8431, a7: 0, a8: -0.285, a10: -0.8, a11: 0, a12: -0.2, a13: 0, a14: 0.8, a15: -0.3, a17: -0.001, a43: 0.42, a44: 0.22, a45: 0.14, a46: 0.08, a25: 0, a28: 0, a29: -0.002, a31: -0.0216, a36: 0.092, a37: -0.159, a38: -0.05, a39: 0, a40: 0.124, a41: 0.301, a42: 0.243, s1Est: 0.429, s2Est: 0.63, s3: 0.47, s4: 0.36, s1Meas: 0.359, s2Meas: 0.585, s5Jp: 0.64, s6Jp: 0.5 },
  ].map(freezeRow),
);

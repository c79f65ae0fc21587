/**
 * Coefficients of CY14: Chiou, B. S.-J. & Youngs, R. R. (2014), "Update of the Chiou and Youngs
 * NGA model for the average horizontal component of peak ground motion and response spectra",
 * Earthquake Spectra 30(3), 1117–1153, doi:10.1193/072813EQS219M.
 *
 * Source of the numbers: the paper's tables of coefficients (median and aleatory-variability
 * models) in the values of the NGA-West2 model spreadsheet v5.7 (2015-04-14), from which the
 * reference record was updated; rows PGV, PGA and the 24 spectral periods 0.01–10 s, copied
 * digit for digit from `../shared/reference/gmm/cy14.csv` (the PGA row equals the 0.01 s row, as published). That
 * reference README records the provenance: the table was taken from a public record of the
 * spreadsheet's coefficients and cross-checked cell by cell against two further independent
 * records (1170 cells each) with no differences.
 *
 * Every column of the published table is kept, also the ones Tremora does not use: the
 * regional terms of Japan, Italy and Wenchuan (phi1Jp, phi5Jp, phi6Jp, sigma2Jp, gammaJpIt,
 * gammaWn) and the directivity coefficients c8, c8a, c8b (Tremora evaluates the model with
 * ΔDPP = 0: no directivity adjustment).
 *
 * How the table is checked: test/engine/motion/cy14.test.ts reproduces the independent test
 * vectors of `../shared/reference/gmm/vectors/cy14.json` (copied to
 * test/engine/motion/vectors/cy14.json) within 1e-4 in ln units, and checks the table's shape.
 *
 * Units: ln Y is ln(g) for PGA and PSA, ln(cm/s) for PGV; c5, cRB, c9b in km; cgamma1, cgamma2
 * per km; phi6 in m; phi4 in g (cm/s in the PGV row); tau1, tau2, sigma1–sigma3 in natural-log
 * units (sigma3 a factor of the variance); the other coefficients in ln units per unit of the
 * quantity they multiply (see cy14.ts).
 */

/** One row of the table. `periodS` is 0 for PGA and −1 for PGV. */
export interface Cy14Row {
  readonly periodS: number;
  /** Constant of the reference motion (Vs30 = 1130 m/s). */
  readonly c1: number;
  readonly c1a: number;
  readonly c1b: number;
  readonly c1c: number;
  readonly c1d: number;
  readonly c2: number;
  readonly c3: number;
  readonly c4: number;
  readonly c4a: number;
  readonly c5: number;
  readonly c6: number;
  readonly c7: number;
  readonly c7b: number;
  readonly c8: number;
  readonly c8a: number;
  readonly c8b: number;
  /** Hanging-wall amplitude. */
  readonly c9: number;
  /** Share of the hanging-wall term reached at the top edge (Rx = 0). */
  readonly c9a: number;
  /** Hanging-wall Rx scale, km. */
  readonly c9b: number;
  readonly c11: number;
  readonly c11b: number;
  /** Magnitude above which the finite-fault distance grows. */
  readonly cHM: number;
  /** Magnitude of the bend in the magnitude scaling. */
  readonly cM: number;
  readonly cn: number;
  /** Distance, km, beyond which geometric spreading takes the slope c4a. */
  readonly cRB: number;
  readonly cgamma1: number;
  readonly cgamma2: number;
  readonly cgamma3: number;
  /** Anelastic-attenuation factor of Japan and Italy (Tremora uses the California/global factor 1). */
  readonly gammaJpIt: number;
  /** Anelastic-attenuation factor of Wenchuan (not used). */
  readonly gammaWn: number;
  readonly phi1: number;
  readonly phi1Jp: number;
  readonly phi2: number;
  readonly phi3: number;
  /** Nonlinear site constant, in the units of the row (g; cm/s in the PGV row). */
  readonly phi4: number;
  readonly phi5: number;
  readonly phi5Jp: number;
  /** Basin-depth scale, m. */
  readonly phi6: number;
  readonly phi6Jp: number;
  readonly tau1: number;
  readonly tau2: number;
  readonly sigma1: number;
  readonly sigma2: number;
  readonly sigma2Jp: number;
  /** Factor of the within-event variance where Vs30 is inferred (0.7 where measured). */
  readonly sigma3: number;
}

/** Column names, in the table's order, for the shape test. */
export const CY14_COLUMNS = [
  'c1', 'c1a', 'c1b', 'c1c', 'c1d', 'c2', 'c3', 'c4', 'c4a', 'c5', 'c6', 'c7', 'c7b', 'c8', 'c8a', 'c8b', 'c9', 'c9a', 'c9b', 'c11', 'c11b', 'cHM', 'cM', 'cn', 'cRB', 'cgamma1', 'cgamma2', 'cgamma3', 'gammaJpIt', 'gammaWn', 'phi1', 'phi1Jp', 'phi2', 'phi3', 'phi4', 'phi5', 'phi5Jp', 'phi6', 'phi6Jp', 'tau1', 'tau2', 'sigma1', 'sigma2', 'sigma2Jp', 'sigma3',
] as const satisfies readonly (keyof Cy14Row)[];

const freezeRow = (row: Cy14Row): Cy14Row => Object.freeze(row);

export const CY14_PGV: Cy14Row = freezeRow({ periodS: -1, c1: 2.3549, c1a: 0.1650, c1b: -0.0626, c1c: -0.1650, c1d: 0.0626, c2: 1.06, c3: 2.3152, c4: -2.1, c4a: -0.5, c5: 5.8096, c6: 0.4407, c7: 0.0324, c7b: 0.0097, c8: 0.2154, c8a: 0.2695, c8b: 5.0000, c9: 0.3079, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.3834, cHM: 3.0514, cM: 5.4230, cn: 3.3024, cRB: 50, cgamma1: -0.001852, cgamma2: -0.007403, cgamma3: 4.3439, gammaJpIt: 2.2306, gammaWn: 0.3350, phi1: -0.7936, phi1Jp: -0.7966, phi2: -0.0699, phi3: -0.008444, phi4: 5.410000, phi5: 0.0202, phi5Jp: 0.9488, phi6: 300, phi6Jp: 800, tau1: 0.3894, tau2: 0.2578, sigma1: 0.4785, sigma2: 0.3629, sigma2Jp: 0.3918, sigma3: 0.7504 });
export const CY14_PGA: Cy14Row = freezeRow({ periodS: 0, c1: -1.5065, c1a: 0.1650, c1b: -0.2550, c1c: -0.1650, c1d: 0.2550, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.4908, c7: 0.0352, c7b: 0.0462, c8: 0.0000, c8a: 0.2695, c8b: 0.4833, c9: 0.9228, c9a: 0.1202, c9b: 6.8607, c11: 0.0000, c11b: -0.4536, cHM: 3.0956, cM: 4.9993, cn: 16.0875, cRB: 50, cgamma1: -0.007146, cgamma2: -0.006758, cgamma3: 4.2542, gammaJpIt: 1.5817, gammaWn: 0.7594, phi1: -0.5210, phi1Jp: -0.6846, phi2: -0.1417, phi3: -0.007010, phi4: 0.102151, phi5: 0.0000, phi5Jp: 0.4590, phi6: 300, phi6Jp: 800, tau1: 0.4000, tau2: 0.2600, sigma1: 0.4912, sigma2: 0.3762, sigma2Jp: 0.4528, sigma3: 0.8000 });

/** The spectral rows, periods in s, increasing. */
export const CY14_SA: readonly Cy14Row[] = Object.freeze(
  [
    { periodS: 0.01, c1: -1.5065, c1a: 0.1650, c1b: -0.2550, c1c: -0.1650, c1d: 0.2550, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.4908, c7: 0.0352, c7b: 0.0462, c8: 0.0000, c8a: 0.2695, c8b: 0.4833, c9: 0.9228, c9a: 0.1202, c9b: 6.8607, c11: 0.0000, c11b: -0.4536, cHM: 3.0956, cM: 4.9993, cn: 16.0875, cRB: 50, cgamma1: -0.007146, cgamma2: -0.006758, cgamma3: 4.2542, gammaJpIt: 1.5817, gammaWn: 0.7594, phi1: -0.5210, phi1Jp: -0.6846, phi2: -0.1417, phi3: -0.007010, phi4: 0.102151, phi5: 0.0000, phi5Jp: 0.4590, phi6: 300, phi6Jp: 800, tau1: 0.4000, tau2: 0.2600, sigma1: 0.4912, sigma2: 0.3762, sigma2Jp: 0.4528, sigma3: 0.8000 },
    { periodS: 0.02, c1: -1.4798, c1a: 0.1650, c1b: -0.2550, c1c: -0.1650, c1d: 0.2550, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.4925, c7: 0.0352, c7b: 0.0472, c8: 0.0000, c8a: 0.2695, c8b: 1.2144, c9: 0.9296, c9a: 0.1217, c9b: 6.8697, c11: 0.0000, c11b: -0.4536, cHM: 3.0963, cM: 4.9993, cn: 15.7118, cRB: 50, cgamma1: -0.007249, cgamma2: -0.006758, cgamma3: 4.2386, gammaJpIt: 1.5740, gammaWn: 0.7606, phi1: -0.5055, phi1Jp: -0.6681, phi2: -0.1364, phi3: -0.007279, phi4: 0.108360, phi5: 0.0000, phi5Jp: 0.4580, phi6: 300, phi6Jp: 800, tau1: 0.4026, tau2: 0.2637, sigma1: 0.4904, sigma2: 0.3762, sigma2Jp: 0.4551, sigma3: 0.8000 },
    { periodS: 0.03, c1: -1.2972, c1a: 0.1650, c1b: -0.2550, c1c: -0.1650, c1d: 0.2550, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.4992, c7: 0.0352, c7b: 0.0533, c8: 0.0000, c8a: 0.2695, c8b: 1.6421, c9: 0.9396, c9a: 0.1194, c9b: 6.9113, c11: 0.0000, c11b: -0.4536, cHM: 3.0974, cM: 4.9993, cn: 15.8819, cRB: 50, cgamma1: -0.007869, cgamma2: -0.006758, cgamma3: 4.2519, gammaJpIt: 1.5544, gammaWn: 0.7642, phi1: -0.4368, phi1Jp: -0.6314, phi2: -0.1403, phi3: -0.007354, phi4: 0.119888, phi5: 0.0000, phi5Jp: 0.4620, phi6: 300, phi6Jp: 800, tau1: 0.4063, tau2: 0.2689, sigma1: 0.4988, sigma2: 0.3849, sigma2Jp: 0.4571, sigma3: 0.8000 },
    { periodS: 0.04, c1: -1.1007, c1a: 0.1650, c1b: -0.2550, c1c: -0.1650, c1d: 0.2550, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.5037, c7: 0.0352, c7b: 0.0596, c8: 0.0000, c8a: 0.2695, c8b: 1.9456, c9: 0.9661, c9a: 0.1166, c9b: 7.0271, c11: 0.0000, c11b: -0.4536, cHM: 3.0988, cM: 4.9993, cn: 16.4556, cRB: 50, cgamma1: -0.008316, cgamma2: -0.006758, cgamma3: 4.2960, gammaJpIt: 1.5502, gammaWn: 0.7676, phi1: -0.3752, phi1Jp: -0.5855, phi2: -0.1591, phi3: -0.006977, phi4: 0.133641, phi5: 0.0000, phi5Jp: 0.4530, phi6: 300, phi6Jp: 800, tau1: 0.4095, tau2: 0.2736, sigma1: 0.5049, sigma2: 0.3910, sigma2Jp: 0.4642, sigma3: 0.8000 },
    { periodS: 0.05, c1: -0.9292, c1a: 0.1650, c1b: -0.2550, c1c: -0.1650, c1d: 0.2550, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.5048, c7: 0.0352, c7b: 0.0639, c8: 0.0000, c8a: 0.2695, c8b: 2.1810, c9: 0.9794, c9a: 0.1176, c9b: 7.0959, c11: 0.0000, c11b: -0.4536, cHM: 3.1011, cM: 4.9993, cn: 17.6453, cRB: 50, cgamma1: -0.008743, cgamma2: -0.006758, cgamma3: 4.3578, gammaJpIt: 1.5391, gammaWn: 0.7739, phi1: -0.3469, phi1Jp: -0.5457, phi2: -0.1862, phi3: -0.006467, phi4: 0.148927, phi5: 0.0000, phi5Jp: 0.4360, phi6: 300, phi6Jp: 800, tau1: 0.4124, tau2: 0.2777, sigma1: 0.5096, sigma2: 0.3957, sigma2Jp: 0.4716, sigma3: 0.8000 },
    { periodS: 0.075, c1: -0.6580, c1a: 0.1650, c1b: -0.2540, c1c: -0.1650, c1d: 0.2540, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.4551, c6: 0.5048, c7: 0.0352, c7b: 0.0630, c8: 0.0000, c8a: 0.2695, c8b: 2.6087, c9: 1.0260, c9a: 0.1171, c9b: 7.3298, c11: 0.0000, c11b: -0.4536, cHM: 3.1094, cM: 5.0031, cn: 20.1772, cRB: 50, cgamma1: -0.009537, cgamma2: -0.006190, cgamma3: 4.5455, gammaJpIt: 1.4804, gammaWn: 0.7956, phi1: -0.3747, phi1Jp: -0.4685, phi2: -0.2538, phi3: -0.005734, phi4: 0.190596, phi5: 0.0000, phi5Jp: 0.3830, phi6: 300, phi6Jp: 800, tau1: 0.4179, tau2: 0.2855, sigma1: 0.5179, sigma2: 0.4043, sigma2Jp: 0.5022, sigma3: 0.8000 },
    { periodS: 0.1, c1: -0.5613, c1a: 0.1650, c1b: -0.2530, c1c: -0.1650, c1d: 0.2530, c2: 1.06, c3: 1.9636, c4: -2.1, c4a: -0.5, c5: 6.8305, c6: 0.5048, c7: 0.0352, c7b: 0.0532, c8: 0.0000, c8a: 0.2695, c8b: 2.9122, c9: 1.0177, c9a: 0.1146, c9b: 7.2588, c11: 0.0000, c11b: -0.4536, cHM: 3.2381, cM: 5.0172, cn: 19.9992, cRB: 50, cgamma1: -0.009830, cgamma2: -0.005332, cgamma3: 4.7603, gammaJpIt: 1.4094, gammaWn: 0.7932, phi1: -0.4440, phi1Jp: -0.4985, phi2: -0.2943, phi3: -0.005604, phi4: 0.230662, phi5: 0.0000, phi5Jp: 0.3750, phi6: 300, phi6Jp: 800, tau1: 0.4219, tau2: 0.2913, sigma1: 0.5236, sigma2: 0.4104, sigma2Jp: 0.523, sigma3: 0.8000 },
    { periodS: 0.12, c1: -0.5342, c1a: 0.1650, c1b: -0.2520, c1c: -0.1650, c1d: 0.2520, c2: 1.06, c3: 1.9795, c4: -2.1, c4a: -0.5, c5: 7.1333, c6: 0.5048, c7: 0.0352, c7b: 0.0452, c8: 0.0000, c8a: 0.2695, c8b: 3.1045, c9: 1.0008, c9a: 0.1128, c9b: 7.2372, c11: 0.0000, c11b: -0.4536, cHM: 3.3407, cM: 5.0315, cn: 18.7106, cRB: 50, cgamma1: -0.009913, cgamma2: -0.004732, cgamma3: 4.8963, gammaJpIt: 1.3682, gammaWn: 0.7768, phi1: -0.4895, phi1Jp: -0.5603, phi2: -0.3077, phi3: -0.005696, phi4: 0.253169, phi5: 0.0000, phi5Jp: 0.3770, phi6: 300, phi6Jp: 800, tau1: 0.4244, tau2: 0.2949, sigma1: 0.5270, sigma2: 0.4143, sigma2Jp: 0.5278, sigma3: 0.8000 },
    { periodS: 0.15, c1: -0.5462, c1a: 0.1650, c1b: -0.2500, c1c: -0.1650, c1d: 0.2500, c2: 1.06, c3: 2.0362, c4: -2.1, c4a: -0.5, c5: 7.3621, c6: 0.5045, c7: 0.0352, c7b: 0.0345, c8: 0.0000, c8a: 0.2695, c8b: 3.3399, c9: 0.9801, c9a: 0.1106, c9b: 7.2109, c11: 0.0000, c11b: -0.4536, cHM: 3.4300, cM: 5.0547, cn: 16.6246, cRB: 50, cgamma1: -0.009896, cgamma2: -0.003806, cgamma3: 5.0644, gammaJpIt: 1.3241, gammaWn: 0.7437, phi1: -0.5477, phi1Jp: -0.6451, phi2: -0.3113, phi3: -0.005845, phi4: 0.266468, phi5: 0.0000, phi5Jp: 0.3790, phi6: 300, phi6Jp: 800, tau1: 0.4275, tau2: 0.2993, sigma1: 0.5308, sigma2: 0.4191, sigma2Jp: 0.5304, sigma3: 0.8000 },
    { periodS: 0.17, c1: -0.5858, c1a: 0.1650, c1b: -0.2480, c1c: -0.1650, c1d: 0.2480, c2: 1.06, c3: 2.0823, c4: -2.1, c4a: -0.5, c5: 7.4365, c6: 0.5036, c7: 0.0352, c7b: 0.0283, c8: 0.0000, c8a: 0.2695, c8b: 3.4719, c9: 0.9652, c9a: 0.1150, c9b: 7.2491, c11: 0.0000, c11b: -0.4536, cHM: 3.4688, cM: 5.0704, cn: 15.3709, cRB: 50, cgamma1: -0.009787, cgamma2: -0.003280, cgamma3: 5.1371, gammaJpIt: 1.3071, gammaWn: 0.7219, phi1: -0.5922, phi1Jp: -0.6981, phi2: -0.3062, phi3: -0.005959, phi4: 0.265060, phi5: 0.0000, phi5Jp: 0.3800, phi6: 300, phi6Jp: 800, tau1: 0.4292, tau2: 0.3017, sigma1: 0.5328, sigma2: 0.4217, sigma2Jp: 0.531, sigma3: 0.8000 },
    { periodS: 0.2, c1: -0.6798, c1a: 0.1650, c1b: -0.2449, c1c: -0.1650, c1d: 0.2449, c2: 1.06, c3: 2.1521, c4: -2.1, c4a: -0.5, c5: 7.4972, c6: 0.5016, c7: 0.0352, c7b: 0.0202, c8: 0.0000, c8a: 0.2695, c8b: 3.6434, c9: 0.9459, c9a: 0.1208, c9b: 7.2988, c11: 0.0000, c11b: -0.4440, cHM: 3.5146, cM: 5.0939, cn: 13.7012, cRB: 50, cgamma1: -0.009505, cgamma2: -0.002690, cgamma3: 5.1880, gammaJpIt: 1.2931, gammaWn: 0.6922, phi1: -0.6693, phi1Jp: -0.7653, phi2: -0.2927, phi3: -0.006141, phi4: 0.255253, phi5: 0.0000, phi5Jp: 0.3840, phi6: 300, phi6Jp: 800, tau1: 0.4313, tau2: 0.3047, sigma1: 0.5351, sigma2: 0.4252, sigma2Jp: 0.5312, sigma3: 0.8000 },
    { periodS: 0.25, c1: -0.8663, c1a: 0.1650, c1b: -0.2382, c1c: -0.1650, c1d: 0.2382, c2: 1.06, c3: 2.2574, c4: -2.1, c4a: -0.5, c5: 7.5416, c6: 0.4971, c7: 0.0352, c7b: 0.0090, c8: 0.0000, c8a: 0.2695, c8b: 3.8787, c9: 0.9196, c9a: 0.1208, c9b: 7.3691, c11: 0.0000, c11b: -0.3539, cHM: 3.5746, cM: 5.1315, cn: 11.2667, cRB: 50, cgamma1: -0.008918, cgamma2: -0.002128, cgamma3: 5.2164, gammaJpIt: 1.3150, gammaWn: 0.6579, phi1: -0.7766, phi1Jp: -0.8469, phi2: -0.2662, phi3: -0.006439, phi4: 0.231541, phi5: 0.0000, phi5Jp: 0.3930, phi6: 300, phi6Jp: 800, tau1: 0.4341, tau2: 0.3087, sigma1: 0.5377, sigma2: 0.4299, sigma2Jp: 0.5309, sigma3: 0.7999 },
    { periodS: 0.3, c1: -1.0514, c1a: 0.1650, c1b: -0.2313, c1c: -0.1650, c1d: 0.2313, c2: 1.06, c3: 2.3440, c4: -2.1, c4a: -0.5, c5: 7.5600, c6: 0.4919, c7: 0.0352, c7b: -0.0004, c8: 0.0000, c8a: 0.2695, c8b: 4.0711, c9: 0.8829, c9a: 0.1175, c9b: 6.8789, c11: 0.0000, c11b: -0.2688, cHM: 3.6232, cM: 5.1670, cn: 9.1908, cRB: 50, cgamma1: -0.008251, cgamma2: -0.001812, cgamma3: 5.1954, gammaJpIt: 1.3514, gammaWn: 0.6362, phi1: -0.8501, phi1Jp: -0.8999, phi2: -0.2405, phi3: -0.006704, phi4: 0.207277, phi5: 0.0010, phi5Jp: 0.4080, phi6: 300, phi6Jp: 800, tau1: 0.4363, tau2: 0.3119, sigma1: 0.5395, sigma2: 0.4338, sigma2Jp: 0.5307, sigma3: 0.7997 },
    { periodS: 0.4, c1: -1.3794, c1a: 0.1650, c1b: -0.2146, c1c: -0.1650, c1d: 0.2146, c2: 1.06, c3: 2.4709, c4: -2.1, c4a: -0.5, c5: 7.5735, c6: 0.4807, c7: 0.0352, c7b: -0.0155, c8: 0.0000, c8a: 0.2695, c8b: 4.3745, c9: 0.8302, c9a: 0.1060, c9b: 6.5334, c11: 0.0000, c11b: -0.1793, cHM: 3.6945, cM: 5.2317, cn: 6.5459, cRB: 50, cgamma1: -0.007267, cgamma2: -0.001274, cgamma3: 5.0899, gammaJpIt: 1.4051, gammaWn: 0.6049, phi1: -0.9431, phi1Jp: -0.9618, phi2: -0.1975, phi3: -0.007125, phi4: 0.165464, phi5: 0.0040, phi5Jp: 0.4620, phi6: 300, phi6Jp: 800, tau1: 0.4396, tau2: 0.3165, sigma1: 0.5422, sigma2: 0.4399, sigma2Jp: 0.531, sigma3: 0.7988 },
    { periodS: 0.5, c1: -1.6508, c1a: 0.1650, c1b: -0.1972, c1c: -0.1650, c1d: 0.1972, c2: 1.06, c3: 2.5567, c4: -2.1, c4a: -0.5, c5: 7.5778, c6: 0.4707, c7: 0.0352, c7b: -0.0278, c8: 0.0991, c8a: 0.2695, c8b: 4.6099, c9: 0.7884, c9a: 0.1061, c9b: 6.5260, c11: 0.0000, c11b: -0.1428, cHM: 3.7401, cM: 5.2893, cn: 5.2305, cRB: 50, cgamma1: -0.006492, cgamma2: -0.001074, cgamma3: 4.7854, gammaJpIt: 1.4402, gammaWn: 0.5507, phi1: -1.0044, phi1Jp: -0.9945, phi2: -0.1633, phi3: -0.007435, phi4: 0.133828, phi5: 0.0100, phi5Jp: 0.5240, phi6: 300, phi6Jp: 800, tau1: 0.4419, tau2: 0.3199, sigma1: 0.5433, sigma2: 0.4446, sigma2Jp: 0.5313, sigma3: 0.7966 },
    { periodS: 0.75, c1: -2.1511, c1a: 0.1650, c1b: -0.1620, c1c: -0.1650, c1d: 0.1620, c2: 1.06, c3: 2.6812, c4: -2.1, c4a: -0.5, c5: 7.5808, c6: 0.4575, c7: 0.0352, c7b: -0.0477, c8: 0.1982, c8a: 0.2695, c8b: 5.0376, c9: 0.6754, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1138, cHM: 3.7941, cM: 5.4109, cn: 3.7896, cRB: 50, cgamma1: -0.005147, cgamma2: -0.001115, cgamma3: 4.3304, gammaJpIt: 1.5280, gammaWn: 0.3582, phi1: -1.0602, phi1Jp: -1.0225, phi2: -0.1028, phi3: -0.008120, phi4: 0.085153, phi5: 0.0340, phi5Jp: 0.6580, phi6: 300, phi6Jp: 800, tau1: 0.4459, tau2: 0.3255, sigma1: 0.5294, sigma2: 0.4533, sigma2Jp: 0.5309, sigma3: 0.7792 },
    { periodS: 1, c1: -2.5365, c1a: 0.1650, c1b: -0.1400, c1c: -0.1650, c1d: 0.1400, c2: 1.06, c3: 2.7474, c4: -2.1, c4a: -0.5, c5: 7.5814, c6: 0.4522, c7: 0.0352, c7b: -0.0559, c8: 0.2154, c8a: 0.2695, c8b: 5.3411, c9: 0.6196, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1062, cHM: 3.8144, cM: 5.5106, cn: 3.3024, cRB: 50, cgamma1: -0.004277, cgamma2: -0.001197, cgamma3: 4.1667, gammaJpIt: 1.6523, gammaWn: 0.2003, phi1: -1.0941, phi1Jp: -1.0002, phi2: -0.0699, phi3: -0.008444, phi4: 0.058595, phi5: 0.0670, phi5Jp: 0.7800, phi6: 300, phi6Jp: 800, tau1: 0.4484, tau2: 0.3291, sigma1: 0.5105, sigma2: 0.4594, sigma2Jp: 0.5302, sigma3: 0.7504 },
    { periodS: 1.5, c1: -3.0686, c1a: 0.1650, c1b: -0.1184, c1c: -0.1650, c1d: 0.1184, c2: 1.06, c3: 2.8161, c4: -2.1, c4a: -0.5, c5: 7.5817, c6: 0.4501, c7: 0.0352, c7b: -0.0630, c8: 0.2154, c8a: 0.2695, c8b: 5.7688, c9: 0.5101, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1020, cHM: 3.8284, cM: 5.6705, cn: 2.8498, cRB: 50, cgamma1: -0.002979, cgamma2: -0.001675, cgamma3: 4.0029, gammaJpIt: 1.8872, gammaWn: 0.0356, phi1: -1.1142, phi1Jp: -0.9245, phi2: -0.0425, phi3: -0.007707, phi4: 0.031787, phi5: 0.1430, phi5Jp: 0.9600, phi6: 300, phi6Jp: 800, tau1: 0.4515, tau2: 0.3335, sigma1: 0.4783, sigma2: 0.4680, sigma2Jp: 0.5276, sigma3: 0.7136 },
    { periodS: 2, c1: -3.4148, c1a: 0.1645, c1b: -0.1100, c1c: -0.1645, c1d: 0.1100, c2: 1.06, c3: 2.8514, c4: -2.1, c4a: -0.5, c5: 7.5818, c6: 0.4500, c7: 0.0352, c7b: -0.0665, c8: 0.2154, c8a: 0.2695, c8b: 6.0723, c9: 0.3917, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1009, cHM: 3.8330, cM: 5.7981, cn: 2.5417, cRB: 50, cgamma1: -0.002301, cgamma2: -0.002349, cgamma3: 3.8949, gammaJpIt: 2.1348, gammaWn: 0.0000, phi1: -1.1154, phi1Jp: -0.8626, phi2: -0.0302, phi3: -0.004792, phi4: 0.019716, phi5: 0.2030, phi5Jp: 1.1100, phi6: 300, phi6Jp: 800, tau1: 0.4534, tau2: 0.3363, sigma1: 0.4681, sigma2: 0.4681, sigma2Jp: 0.5167, sigma3: 0.7035 },
    { periodS: 3, c1: -3.9013, c1a: 0.1168, c1b: -0.1040, c1c: -0.1168, c1d: 0.1040, c2: 1.06, c3: 2.8875, c4: -2.1, c4a: -0.5, c5: 7.5818, c6: 0.4500, c7: 0.0160, c7b: -0.0516, c8: 0.2154, c8a: 0.2695, c8b: 6.5000, c9: 0.1244, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1003, cHM: 3.8361, cM: 5.9983, cn: 2.1488, cRB: 50, cgamma1: -0.001344, cgamma2: -0.003306, cgamma3: 3.7928, gammaJpIt: 3.5752, gammaWn: 0.0000, phi1: -1.1081, phi1Jp: -0.7882, phi2: -0.0129, phi3: -0.001828, phi4: 0.009643, phi5: 0.2770, phi5Jp: 1.2910, phi6: 300, phi6Jp: 800, tau1: 0.4558, tau2: 0.3398, sigma1: 0.4617, sigma2: 0.4617, sigma2Jp: 0.4917, sigma3: 0.7006 },
    { periodS: 4, c1: -4.2466, c1a: 0.0732, c1b: -0.1020, c1c: -0.0732, c1d: 0.1020, c2: 1.06, c3: 2.9058, c4: -2.1, c4a: -0.5, c5: 7.5818, c6: 0.4500, c7: 0.0062, c7b: -0.0448, c8: 0.2154, c8a: 0.2695, c8b: 6.8035, c9: 0.0086, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1001, cHM: 3.8369, cM: 6.1552, cn: 1.8957, cRB: 50, cgamma1: -0.001084, cgamma2: -0.003566, cgamma3: 3.7443, gammaJpIt: 3.8646, gammaWn: 0.0000, phi1: -1.0603, phi1Jp: -0.7195, phi2: -0.0016, phi3: -0.001523, phi4: 0.005379, phi5: 0.3090, phi5Jp: 1.3870, phi6: 300, phi6Jp: 800, tau1: 0.4574, tau2: 0.3419, sigma1: 0.4571, sigma2: 0.4571, sigma2Jp: 0.4682, sigma3: 0.7001 },
    { periodS: 5, c1: -4.5143, c1a: 0.0484, c1b: -0.1010, c1c: -0.0484, c1d: 0.1010, c2: 1.06, c3: 2.9169, c4: -2.1, c4a: -0.5, c5: 7.5818, c6: 0.4500, c7: 0.0029, c7b: -0.0424, c8: 0.2154, c8a: 0.2695, c8b: 7.0389, c9: 0.0000, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1001, cHM: 3.8376, cM: 6.2856, cn: 1.7228, cRB: 50, cgamma1: -0.001010, cgamma2: -0.003640, cgamma3: 3.7090, gammaJpIt: 3.7292, gammaWn: 0.0000, phi1: -0.9872, phi1Jp: -0.6560, phi2: 0.0000, phi3: -0.001440, phi4: 0.003223, phi5: 0.3210, phi5Jp: 1.4330, phi6: 300, phi6Jp: 800, tau1: 0.4584, tau2: 0.3435, sigma1: 0.4535, sigma2: 0.4535, sigma2Jp: 0.4517, sigma3: 0.7000 },
    { periodS: 7.5, c1: -5.0009, c1a: 0.0220, c1b: -0.1010, c1c: -0.0220, c1d: 0.1010, c2: 1.06, c3: 2.9320, c4: -2.1, c4a: -0.5, c5: 7.5818, c6: 0.4500, c7: 0.0007, c7b: -0.0348, c8: 0.2154, c8a: 0.2695, c8b: 7.4666, c9: 0.0000, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1000, cHM: 3.8380, cM: 6.5428, cn: 1.5737, cRB: 50, cgamma1: -0.000964, cgamma2: -0.003686, cgamma3: 3.6632, gammaJpIt: 2.3763, gammaWn: 0.0000, phi1: -0.8274, phi1Jp: -0.5202, phi2: 0.0000, phi3: -0.001369, phi4: 0.001134, phi5: 0.3290, phi5Jp: 1.4600, phi6: 300, phi6Jp: 800, tau1: 0.4601, tau2: 0.3459, sigma1: 0.4471, sigma2: 0.4471, sigma2Jp: 0.4167, sigma3: 0.7000 },
    { periodS: 10, c1: -5.3461, c1a: 0.0124, c1b: -0.1000, c1c: -0.0124, c1d: 0.1000, c2: 1.06, c3: 2.9396, c4: -2.1, c4a: -0.5, c5: 7.5818, c6: 0.4500, c7: 0.0003, c7b: -0.0253, c8: 0.2154, c8a: 0.2695, c8b: 7.7700, c9: 0.0000, c9a: 0.1000, c9b: 6.5000, c11: 0.0000, c11b: -0.1000, cHM: 3.8380, cM: 6.7415, cn: 1.5265, cRB: 50, cgamma1: -0.000950, cgamma2: -0.003700, cgamma3: 3.6230, gammaJpIt: 1.7679, gammaWn: 0.0000, phi1: -0.7053, phi1Jp: -0.4068, phi2: 0.0000, phi3: -0.001361, phi4: 0.000515, phi5: 0.3300, phi5Jp: 1.4640, phi6: 300, phi6Jp: 800, tau1: 0.4612, tau2: 0.3474, sigma1: 0.4426, sigma2: 0.4426, sigma2Jp: 0.3755, sigma3: 0.7000 },
  ].map(freezeRow),
);

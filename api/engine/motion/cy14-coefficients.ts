/**
 * Coefficients of CY14: Chiou, B. S.-J. & Youngs, R. R. (2014), "Update of the Chiou and Youngs
 * NGA model for the average horizontal component of peak ground motion and response spectra",
 * Earthquake Spectra 30(3), 1117–1153, doi:10.1193/072813EQS219M.
 *
 * Source of the numbers: the paper's tables of coefficients (median and aleatory-variability
 * models) in the values of the NGA-West2 model spreadsheet v5.7 (2015-04-14), from which the
 * reference record was updated; rows PGV, PGA and the 24 spectral periods 0.01–10 s, kept
 * in `cy14.json` beside this module, copied unchanged from `../shared/reference/gmm/cy14.csv` (the
 * PGA row equals the 0.01 s row, as published). That
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
import { readModelTable, rowOfPeriod, type ModelTable } from './coefficient-table.ts';
import PUBLISHED from './cy14.json' with { type: 'json' };

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

/** The row fields, in the order of the table's columns. */
export const CY14_COLUMNS = [
  'c1',
  'c1a',
  'c1b',
  'c1c',
  'c1d',
  'c2',
  'c3',
  'c4',
  'c4a',
  'c5',
  'c6',
  'c7',
  'c7b',
  'c8',
  'c8a',
  'c8b',
  'c9',
  'c9a',
  'c9b',
  'c11',
  'c11b',
  'cHM',
  'cM',
  'cn',
  'cRB',
  'cgamma1',
  'cgamma2',
  'cgamma3',
  'gammaJpIt',
  'gammaWn',
  'phi1',
  'phi1Jp',
  'phi2',
  'phi3',
  'phi4',
  'phi5',
  'phi5Jp',
  'phi6',
  'phi6Jp',
  'tau1',
  'tau2',
  'sigma1',
  'sigma2',
  'sigma2Jp',
  'sigma3',
] as const satisfies readonly (keyof Cy14Row)[];

/** The table as the model reads it: every row, the PGA row, the spectral rows and their periods. */
export const CY14_TABLE: ModelTable<Cy14Row> = readModelTable('CY14', PUBLISHED, CY14_COLUMNS);

export const CY14_PGV: Cy14Row = rowOfPeriod('CY14', CY14_TABLE.rows, -1);

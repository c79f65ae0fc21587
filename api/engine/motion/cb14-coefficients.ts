/**
 * Coefficients of CB14: Campbell, K. W. & Bozorgnia, Y. (2014), "NGA-West2 ground motion model
 * for the average horizontal components of PGA, PGV, and 5% damped linear acceleration response
 * spectra", Earthquake Spectra 30(3), 1087–1115, doi:10.1193/062913EQS175M.
 *
 * Source of the numbers: the paper's Tables 1 and 2 (median and aleatory-variability
 * coefficients, with the journal's updates to c0–c6: c6 at 5, 7.5 and 10 s is the journal's
 * 0.135, 0.165, 0.180, not the PEER report's), rows PGV, PGA and 21 periods 0.01–10 s, kept
 * in `cb14.json` beside this module, its cells copied as written from the project's reference record (`cb14.csv` and `cb14-constants.csv` of
 * the shared GMM reference data; its README gives the provenance: pygmm 0.8.0's data file,
 * cross-checked cell by cell against two other public records with no difference). The
 * period-independent constants c = 1.88 and n = 1.18 come from the same record. The four
 * sigma columns are the tabulated totals, kept for the record; the model computes σ from τ and φ.
 *
 * How the table is checked: test/engine/motion/cb14.vectors.test.ts compares the model with
 * independent test vectors computed from the same published table to 1e-4 in ln units.
 *
 * Units: ln Y is ln(g) for PGA and PSA, ln(cm/s) for PGV. c0, c8, c9 in ln units; c1 per
 * magnitude unit, c2–c4 per magnitude unit above their hinges (4.5, 5.5, 6.5); c5 per ln(km),
 * c6 per magnitude unit per ln(km); c7 km; c10 ln units (hanging-wall amplitude); c11 per
 * ln(m/s); c12, c13 the Japan site term; c14, c15 per km of Z2.5 below 1 km (c15 Japan); c16 ln
 * units (deep-basin amplitude, times k3); c17, c18 per km of hypocentral depth below 7 km; c19
 * per degree of dip per magnitude unit; c20 and the regional Δc20 per km of Rrup beyond 80 km;
 * a2 per magnitude unit; h1–h6 dimensionless; k1 m/s; k2, k3 dimensionless; φ1, φ2, τ1, τ2,
 * φlnAF, φC and the sigma columns natural-log standard deviations; ρ dimensionless.
 */
import {
  readModelTable,
  rowOfPeriod,
  type CoefficientRow,
  type ModelTable,
} from './coefficient-table.ts';
import PUBLISHED from './cb14.json' with { type: 'json' };

/** Column names of Tables 1 and 2, in the paper's order (ρ is ρlnPGA,lnY). */
// prettier-ignore
export const CB14_COLUMNS = [
  'c0', 'c1', 'c2', 'c3', 'c4', 'c5', 'c6', 'c7', 'c8', 'c9', 'c10', 'c11', 'c12', 'c13', 'c14', 'c15', 'c16', 'c17', 'c18', 'c19', 'c20', 'deltaC20CA', 'deltaC20JI', 'deltaC20CH', 'a2', 'h1', 'h2', 'h3', 'h4', 'h5', 'h6', 'k1', 'k2', 'k3', 'tau1', 'tau2', 'phi1', 'phi2', 'phiLnAF', 'phiC', 'rho', 'sigmaLowM', 'sigmaArbLowM', 'sigmaHighM', 'sigmaArbHighM',
] as const;

/** One row of Tables 1 and 2. `periodS` is 0 for PGA and −1 for PGV. */
export type Cb14Row = CoefficientRow<(typeof CB14_COLUMNS)[number]>;

/** The table as the model reads it: every row, the PGA row, the spectral rows and their periods. */
export const CB14_TABLE: ModelTable<Cb14Row> = readModelTable('CB14', PUBLISHED, CB14_COLUMNS);

export const CB14_PGV: Cb14Row = rowOfPeriod('CB14', CB14_TABLE.rows, -1);

/** Period-independent constants (cb14-constants.csv): c, n of the nonlinear site term; h4 = 1 in every row; Δc20 = 0 for California and global use. */
export const CB14_CONSTANTS = Object.freeze({
  c: 1.88,
  n: 1.18,
  h4: CB14_TABLE.pga.h4,
  deltaC20: CB14_TABLE.pga.deltaC20CA,
});

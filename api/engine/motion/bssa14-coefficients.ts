/**
 * Coefficients of BSSA14: Boore, D. M., Stewart, J. P., Seyhan, E. & Atkinson, G. M. (2014),
 * "NGA-West2 equations for predicting PGA, PGV, and 5% damped PSA for shallow crustal
 * earthquakes", Earthquake Spectra 30(3), 1057–1085, doi:10.1193/070113EQS184M.
 *
 * Source of the numbers: the paper's electronic-supplement table of coefficients with the
 * revised f4 column of 2014-07-15, all 107 rows (PGV, PGA and 105 periods 0.01–10 s), kept in
 * `bssa14.json` beside this module, its cells copied as written from the project's reference record (`bssa14.csv` of the shared GMM reference
 * data; its README gives the provenance: pygmm 0.8.0's data file "Revised 2014-07-15 / Revised
 * coefficients", cross-checked cell by cell against two other public records, every difference
 * listed and resolved there). Column order as in the supplement; the period-independent
 * constants (Mref, Rref, Vref, f1, f3, V1, V2) are repeated in every row as the supplement does.
 * f6 and f7 (the basin term, which Tremora does not apply: δz1 = 0) are −9.9 where the paper
 * has no basin term.
 *
 * How the table is checked: test/engine/motion/bssa14.vectors.test.ts compares the model's
 * medians and standard deviations with independent test vectors (computed by another
 * implementation from the same published table) to 1e-4 in ln units, at every period whose
 * cells were once wrong here; the shape test checks periods increasing and every cell finite.
 *
 * Units: ln Y is ln(g) for PGA and PSA, ln(cm/s) for PGV. e0–e3 (unspecified, strike-slip,
 * normal, reverse) in ln units; e4, e6 per magnitude unit; e5 per magnitude unit squared; Mh
 * magnitude; c1 multiplies ln(R / Rref); c2 multiplies (M − Mref) ln(R / Rref); c3 and the
 * regional Δc3 per km of R; Rref, h km; c multiplies ln(Vs30 / Vref); Vc, Vref, V1, V2 m/s;
 * f1 ln units; f3 g; f4 dimensionless; f5 per m/s; f6 ln units per km, f7 ln units; R1, R2 km
 * (Rjb); ΔφR, ΔφV, φ1, φ2, τ1, τ2 natural-log standard deviations.
 */
import {
  readModelTable,
  rowOfPeriod,
  type CoefficientRow,
  type ModelTable,
} from './coefficient-table.ts';
import PUBLISHED from './bssa14.json' with { type: 'json' };

/** Column names of the table, in the supplement's order. */
export const BSSA14_COLUMNS = [
  'e0',
  'e1',
  'e2',
  'e3',
  'e4',
  'e5',
  'e6',
  'mh',
  'c1',
  'c2',
  'c3',
  'mRef',
  'rRefKm',
  'h',
  'deltaC3Global',
  'deltaC3ChinaTurkey',
  'deltaC3ItalyJapan',
  'c',
  'vc',
  'vRef',
  'f1',
  'f3G',
  'f4',
  'f5',
  'f6',
  'f7',
  'r1',
  'r2',
  'deltaPhiR',
  'deltaPhiV',
  'v1',
  'v2',
  'phi1',
  'phi2',
  'tau1',
  'tau2',
] as const;

/** One row of the table. `periodS` is 0 for PGA and −1 for PGV, as in the supplement. */
export type Bssa14Row = CoefficientRow<(typeof BSSA14_COLUMNS)[number]>;

/** The table as the model reads it: every row, the PGA row, the spectral rows and their periods. */
export const BSSA14_TABLE: ModelTable<Bssa14Row> = readModelTable(
  'BSSA14',
  PUBLISHED,
  BSSA14_COLUMNS,
);

export const BSSA14_PGV: Bssa14Row = rowOfPeriod('BSSA14', BSSA14_TABLE.rows, -1);

/**
 * Period-independent coefficients, as repeated in every row of the table: Mref, Rref (km), Vref
 * (m/s), f1, f3 (g), V1, V2 (m/s); Δc3 of California, Taiwan and the other global regions (0).
 */
export const BSSA14_CONSTANTS = Object.freeze({
  mRef: BSSA14_TABLE.pga.mRef,
  rRefKm: BSSA14_TABLE.pga.rRefKm,
  vRef: BSSA14_TABLE.pga.vRef,
  f1: BSSA14_TABLE.pga.f1,
  f3G: BSSA14_TABLE.pga.f3G,
  v1: BSSA14_TABLE.pga.v1,
  v2: BSSA14_TABLE.pga.v2,
  deltaC3: BSSA14_TABLE.pga.deltaC3Global,
});

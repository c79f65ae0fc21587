/**
 * Coefficients of ASK14: Abrahamson, N. A., Silva, W. J. & Kamai, R. (2014), "Summary of the
 * ASK14 ground motion relation for active crustal regions", Earthquake Spectra 30(3), 1025–1055,
 * doi:10.1193/070913EQS198M.
 *
 * Source of the numbers: the paper's tables of coefficients as given in its electronic
 * supplement (the coefficient file `ask14_coeffs.m.txt`), rows PGV, PGA and the 22 spectral
 * periods 0.01–10 s, kept in `ask14.json` beside this module (copied unchanged from
 * `../shared/reference/gmm/ask14.csv`); the
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
import { readModelTable, rowOfPeriod, type ModelTable } from './coefficient-table.ts';
import PUBLISHED from './ask14.json' with { type: 'json' };

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

/** The row fields, in the order of the table's columns. */
export const ASK14_COLUMNS = [
  'M1',
  'M2',
  'Vlin',
  'b',
  'c',
  'n',
  'c4',
  'a1',
  'a2',
  'a3',
  'a4',
  'a5',
  'a6',
  'a7',
  'a8',
  'a10',
  'a11',
  'a12',
  'a13',
  'a14',
  'a15',
  'a17',
  'a43',
  'a44',
  'a45',
  'a46',
  'a25',
  'a28',
  'a29',
  'a31',
  'a36',
  'a37',
  'a38',
  'a39',
  'a40',
  'a41',
  'a42',
  's1Est',
  's2Est',
  's3',
  's4',
  's1Meas',
  's2Meas',
  's5Jp',
  's6Jp',
] as const satisfies readonly (keyof Ask14Row)[];

/**
 * Period-independent constants: the hanging-wall model's a2HW (T2) and h1–h3 (T3), and φamp,
 * the standard deviation of the site amplification, removed from φ and added back (ask14.ts).
 */
export const ASK14_CONSTANTS = Object.freeze({
  a2HW: 0.2,
  h1: 0.25,
  h2: 1.5,
  h3: -0.75,
  phiAmp: 0.4,
});

/** The table as the model reads it: every row, the PGA row, the spectral rows and their periods. */
export const ASK14_TABLE: ModelTable<Ask14Row> = readModelTable('ASK14', PUBLISHED, ASK14_COLUMNS);

export const ASK14_PGV: Ask14Row = rowOfPeriod('ASK14', ASK14_TABLE.rows, -1);

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
 * periods 0.05–5 s, kept in `zhao06.json` beside this module, copied unchanged from the
 * project's reference record (`zhao06.csv` and `zhao06-constants.csv` of the shared GMM
 * reference data). Its README says this table
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
import { readModelTable, type CoefficientRow, type ModelTable } from './coefficient-table.ts';
import PUBLISHED from './zhao06.json' with { type: 'json' };

/** Column names, in the reference record's order. */
// prettier-ignore
export const ZHAO06_COLUMNS = [
  'a', 'b', 'c', 'd', 'e', 'fr', 'si', 'ss', 'ssl', 'ch', 'c1', 'c2', 'c3', 'c4', 'sigma', 'tau', 'sigmaT',
  'qc', 'wc', 'tauC', 'qi', 'wi', 'tauI', 'ps', 'qs', 'ws', 'tauS',
] as const;

/** One row of the table. `periodS` is 0 for PGA. */
export type Zhao06Row = CoefficientRow<(typeof ZHAO06_COLUMNS)[number]>;

/** The table as the model reads it: every row, the PGA row, the spectral rows and their periods. */
export const ZHAO06_TABLE: ModelTable<Zhao06Row> = readModelTable(
  'Zhao06',
  PUBLISHED,
  ZHAO06_COLUMNS,
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

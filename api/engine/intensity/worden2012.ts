import { STANDARD_GRAVITY_MS2 } from '../units.ts';

/**
 * Ground motion to Modified Mercalli intensity and back:
 * Worden, C. B., Gerstenberger, M. C., Rhoades, D. A. & Wald, D. J. (2012). Probabilistic
 * relationships between ground-motion parameters and Modified Mercalli intensity in California.
 * BSSA 102(1), 204–221, doi:10.1785/0120110156 (citation details from memory).
 *
 * The bilinear relation of their equation (3), without the distance and magnitude residual
 * terms (c5, c6, c7) of their equation (5):
 *
 *   MMI = c1 + c2 log10(Y)   for log10(Y) <= t1
 *   MMI = c3 + c4 log10(Y)   for log10(Y) >  t1
 *
 * and its inverse, which the paper gives with the break at MMI = t2:
 *
 *   log10(Y) = (MMI − c1) / c2   for MMI <= t2
 *   log10(Y) = (MMI − c3) / c4   for MMI >  t2
 *
 * Y is PGA in cm/s² or PGV in cm/s. Coefficients of their Table 1, typed from memory (the
 * two segments meet at the break to within 0.01 MMI, which checks them against each other:
 * 1.78 + 1.55 × 1.57 = 4.21 ≈ −1.60 + 3.70 × 1.57 = 4.21 ≈ t2 = 4.22 for PGA; 3.78 + 1.47 ×
 * 0.53 = 4.56 ≈ 2.89 + 3.16 × 0.53 = 4.56 = t2 for PGV).
 *
 * MMI is held to 1–10 (common practice: the relation is fitted to California intensities that
 * rarely exceed IX, and intensities above X describe effects ground motion does not capture).
 */
export interface Gmice {
  readonly c1: number;
  readonly c2: number;
  readonly c3: number;
  readonly c4: number;
  /** Break in log10(Y). */
  readonly t1: number;
  /** Break in MMI, for the inverse. */
  readonly t2: number;
  /** Standard deviation of MMI about equation (3), MMI units (their Table 1). */
  readonly sigmaMmi: number;
}

/** Worden et al. (2012) Table 1, PGA in cm/s² (from memory, σ as well). */
export const WORDEN2012_PGA: Gmice = {
  c1: 1.78,
  c2: 1.55,
  c3: -1.6,
  c4: 3.7,
  t1: 1.57,
  t2: 4.22,
  sigmaMmi: 0.73,
};
/** Worden et al. (2012) Table 1, PGV in cm/s (from memory, σ as well). */
export const WORDEN2012_PGV: Gmice = {
  c1: 3.78,
  c2: 1.47,
  c3: 2.89,
  c4: 3.16,
  t1: 0.53,
  t2: 4.56,
  sigmaMmi: 0.65,
};

/** A conversion of one hazard measure to MMI: the relation, and the factor from the curve's units (g, cm/s) to the relation's. */
export interface IntensityConversion {
  readonly measure: 'PGA' | 'PGV';
  readonly gmice: Gmice;
  readonly toRelationUnits: number;
}

export const MMI_MIN = 1;
export const MMI_MAX = 10;

const G_CMS2 = STANDARD_GRAVITY_MS2 * 100;

const clampMmi = (mmi: number): number => Math.min(MMI_MAX, Math.max(MMI_MIN, mmi));

/** MMI from a ground motion Y (> 0) in the relation's units. */
export function mmiFromMotion(y: number, c: Gmice): number {
  const logY = Math.log10(y);
  return clampMmi(logY <= c.t1 ? c.c1 + c.c2 * logY : c.c3 + c.c4 * logY);
}

/** The ground motion Y (relation's units) at which the relation reaches `mmi` (1–10). */
export function motionFromMmi(mmi: number, c: Gmice): number {
  const m = clampMmi(mmi);
  return 10 ** (m <= c.t2 ? (m - c.c1) / c.c2 : (m - c.c3) / c.c4);
}

/** Worden et al. (2012) from PGA in g (the curve's units) and from PGV in cm/s. */
export const INTENSITY_CONVERSIONS: Readonly<
  Record<IntensityConversion['measure'], IntensityConversion>
> = {
  PGA: { measure: 'PGA', gmice: WORDEN2012_PGA, toRelationUnits: STANDARD_GRAVITY_MS2 * 100 },
  PGV: { measure: 'PGV', gmice: WORDEN2012_PGV, toRelationUnits: 1 },
};

/** MMI from PGA in g. */
export function mmiFromPga(pgaG: number): number {
  return mmiFromMotion(pgaG * G_CMS2, WORDEN2012_PGA);
}

/** MMI from PGV in cm/s. */
export function mmiFromPgv(pgvCmS: number): number {
  return mmiFromMotion(pgvCmS, WORDEN2012_PGV);
}

/** PGA (g) at which MMI reaches `mmi`. */
export function pgaForMmi(mmi: number): number {
  return motionFromMmi(mmi, WORDEN2012_PGA) / G_CMS2;
}

/** PGV (cm/s) at which MMI reaches `mmi`. */
export function pgvForMmi(mmi: number): number {
  return motionFromMmi(mmi, WORDEN2012_PGV);
}

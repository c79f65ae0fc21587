import { InvalidInput } from '../errors.ts';
import { compensatedSum } from '../summation.ts';
import { binCentre, checkMagnitudeStep } from './magnitude-bins.ts';

/**
 * Gutenberg–Richter b-value by maximum likelihood (formulas from memory).
 *
 * Aki (1965), "Maximum likelihood estimate of b in the formula log N = a − bM and its
 * confidence limits", Bull. Earthquake Res. Inst. 43: b = log10(e) / (mean M − Mc)
 * for continuous magnitudes at and above Mc. Utsu (1965) corrects for magnitudes rounded to
 * bins of width ΔM, whose lowest bin centre Mc stands for magnitudes from Mc − ΔM/2:
 *   b = log10(e) / (mean M − (Mc − ΔM/2)).
 * Uncertainty: Shi & Bolt (1982), "The standard error of the magnitude-frequency b value",
 * BSSA 72(5): σb = 2.30 b² sqrt( Σ (Mi − mean M)² / (n (n − 1)) ), where 2.30 is ln 10.
 */
export interface BValueEstimate {
  readonly bValue: number;
  /** Shi & Bolt (1982) standard error. */
  readonly sigmaB: number;
  /** Events at or above the completeness magnitude. */
  readonly eventCount: number;
  readonly meanMagnitude: number;
  /** Completeness magnitude (lowest bin centre used). */
  readonly mc: number;
  /** Bin width; 0 for unbinned magnitudes. */
  readonly magnitudeStep: number;
}

/**
 * Aki–Utsu b-value and Shi & Bolt σb from magnitudes. With `magnitudeStep` > 0 magnitudes are
 * first rounded to bins of that width and Mc is taken as a bin centre; with 0 they are used as
 * given. Needs at least two events at or above Mc with different magnitudes.
 */
export function akiUtsuBValue(
  magnitudes: readonly number[],
  mc: number,
  magnitudeStep: number,
): BValueEstimate {
  if (!Number.isFinite(mc))
    throw new InvalidInput([
      { path: 'mc', message: `expected a finite completeness magnitude; got ${mc}` },
    ]);
  if (magnitudeStep !== 0) checkMagnitudeStep(magnitudeStep);
  const mcUsed = magnitudeStep > 0 ? binCentre(mc, magnitudeStep) : mc;
  // A bin centre compared with Mc: allow for representation error in the printed values.
  const complete = magnitudes
    .map((m) => (magnitudeStep > 0 ? binCentre(m, magnitudeStep) : m))
    .filter((m) => m >= mcUsed - 1e-9);
  const n = complete.length;
  if (n < 2) {
    throw new InvalidInput([
      {
        path: 'magnitudes',
        message: `expected at least 2 events at or above Mc ${mcUsed}; got ${n}`,
      },
    ]);
  }
  const mean = compensatedSum(complete) / n;
  const excess = mean - (mcUsed - magnitudeStep / 2);
  const spread = compensatedSum(complete.map((m) => (m - mean) ** 2));
  if (!(excess > 0) || spread === 0) {
    throw new InvalidInput([
      {
        path: 'magnitudes',
        message: `expected magnitudes spread above Mc ${mcUsed}; all ${n} events share one magnitude`,
      },
    ]);
  }
  const bValue = Math.LOG10E / excess;
  const sigmaB = Math.LN10 * bValue * bValue * Math.sqrt(spread / (n * (n - 1)));
  return { bValue, sigmaB, eventCount: n, meanMagnitude: mean, mc: mcUsed, magnitudeStep };
}

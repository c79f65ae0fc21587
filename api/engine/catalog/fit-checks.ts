import type { CompletenessWindow } from './completeness.ts';

/**
 * Checks of a Gutenberg–Richter fit before its recurrence is used: each finds a reason to
 * distrust the line and says what to look at. Pure: the numbers in, the findings out; the
 * wording of options is the caller's (the command line and the service name them differently).
 */

/** b-values of tectonic seismicity mostly lie in about 0.6–1.4 (common practice; around 1 on average). */
export const USUAL_B_RANGE: readonly [number, number] = [0.6, 1.4];

/** A count is said to disagree with the line when its two-sided Poisson chance is below this. */
export const DISAGREEMENT_CHANCE = 0.05;

/** Declustering that removes more than this share of the events is worth a second look. */
export const MOST_REMOVED_SHARE = 0.5;

/** Completeness windows whose Mc exceeds the Mc used by this much (two 0.1 bins) show it changing over time. */
export const MC_CHANGE = 0.15;

export type FitFinding =
  | { readonly kind: 'b-outside-usual'; readonly bValue: number }
  | {
      readonly kind: 'large-magnitudes-disagree';
      readonly magnitude: number;
      readonly observed: number;
      readonly predicted: number;
      /** Poisson chance of a count this far from the prediction or further, on the side observed. */
      readonly chance: number;
    }
  | {
      readonly kind: 'completeness-changes';
      readonly mcUsed: number;
      readonly earliestMc: number;
      readonly highestMc: number;
    }
  | { readonly kind: 'most-removed'; readonly removed: number; readonly total: number };

export function bOutsideUsual(bValue: number): FitFinding | undefined {
  return bValue < USUAL_B_RANGE[0] || bValue > USUAL_B_RANGE[1]
    ? { kind: 'b-outside-usual', bValue }
    : undefined;
}

/** P(N <= k) for N Poisson with mean mu, summed term by term (k is small here: a few hundred at most). */
export function poissonAtMost(k: number, mu: number): number {
  if (k < 0) return 0;
  let term = Math.exp(-mu);
  let sum = term;
  for (let i = 1; i <= k; i++) {
    term *= mu / i;
    sum += term;
  }
  return Math.min(1, sum);
}

export interface LargeMagnitudeCheck {
  /** Magnitudes of the events fitted (those in the observation span). */
  readonly magnitudes: readonly number[];
  readonly aValue: number;
  readonly bValue: number;
  /** The magnitude the fit counts from (Mc − ΔM/2). */
  readonly referenceMagnitude: number;
  readonly observationYears: number;
  readonly magnitudeStep: number;
}

/**
 * The line against the count of the largest events: from one magnitude unit below the largest
 * observed (on a bin edge, and at least one unit above where the fit counts from, so the count
 * is not the one the fit was made to match), the number the line predicts over the span,
 * T 10^(a − b m), against the number observed. A disagreement is a two-sided Poisson chance
 * under DISAGREEMENT_CHANCE of a count this far out.
 */
export function largeMagnitudesDisagree(check: LargeMagnitudeCheck): FitFinding | undefined {
  const largest = Math.max(...check.magnitudes);
  const step = check.magnitudeStep > 0 ? check.magnitudeStep : 0.1;
  const magnitude =
    Math.round((Math.floor((largest - 1 + step / 2) / step) * step - step / 2) * 1e9) / 1e9;
  if (!(magnitude >= check.referenceMagnitude + 1 - 1e-9)) return undefined;
  const observed = check.magnitudes.filter((m) => m >= magnitude).length;
  const predicted = check.observationYears * 10 ** (check.aValue - check.bValue * magnitude);
  const chance =
    observed < predicted
      ? poissonAtMost(observed, predicted)
      : 1 - poissonAtMost(observed - 1, predicted);
  return 2 * chance < DISAGREEMENT_CHANCE
    ? { kind: 'large-magnitudes-disagree', magnitude, observed, predicted, chance }
    : undefined;
}

/** Completeness that looks time-dependent: a window (earliest first) with Mc well above the Mc used. */
export function completenessChanges(
  windows: readonly CompletenessWindow[],
  mcUsed: number,
): FitFinding | undefined {
  if (windows.length < 2) return undefined;
  const highestMc = Math.max(...windows.map((w) => w.mc));
  if (!(highestMc > mcUsed + MC_CHANGE)) return undefined;
  const earliest = [...windows].sort((a, b) => a.startMs - b.startMs)[0] as CompletenessWindow;
  return { kind: 'completeness-changes', mcUsed, earliestMc: earliest.mc, highestMc };
}

export function mostRemoved(removed: number, total: number): FitFinding | undefined {
  return total > 0 && removed / total > MOST_REMOVED_SHARE
    ? { kind: 'most-removed', removed, total }
    : undefined;
}

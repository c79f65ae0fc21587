/** Fractiles reported when a study names none. */
export const DEFAULT_FRACTILES: readonly number[] = [0.16, 0.5, 0.84];

/**
 * Products of branch weights rarely sum to exactly 1: a cumulative weight within this of the
 * fractile counts as reaching it, so a fractile that falls on a branch boundary is stable.
 */
const CUMULATIVE_SLACK = 1e-9;

/**
 * The p-fractiles of values with weights: for each p, the smallest value whose cumulative
 * weight (values in increasing order) reaches p of the total, i.e. the inverse of the weighted
 * empirical distribution, without interpolation between branches. Fractile hazard curves are
 * read this way level by level over the branch curves (common practice; so described by
 * Abrahamson & Bommer 2005, Earthquake Spectra 21(2), from memory). Each p in (0, 1).
 */
export function weightedFractiles(
  values: readonly number[],
  weights: readonly number[],
  fractiles: readonly number[],
): number[] {
  const order = values.map((_, i) => i).sort((a, b) => values[a]! - values[b]!);
  const total = weights.reduce((s, w) => s + w, 0);
  return fractiles.map((p) => {
    let cumulative = 0;
    for (const i of order) {
      cumulative += weights[i]!;
      if (cumulative >= p * total - CUMULATIVE_SLACK) return values[i]!;
    }
    return values[order[order.length - 1]!]!;
  });
}

/**
 * Fractile curves, level by level, of `curves` (one per combination, annual rates) with their
 * weights, keyed by the fractile as written ("0.16"). Each level is taken on its own, so a
 * fractile curve need not be any one branch's curve.
 */
export function fractileCurves(
  curves: readonly (readonly number[])[],
  weights: readonly number[],
  fractiles: readonly number[],
  levelCount: number,
): Record<string, number[]> {
  const out: Record<string, number[]> = {};
  for (const p of fractiles) out[String(p)] = [];
  for (let j = 0; j < levelCount; j++) {
    const values = curves.map((c) => c[j] as number);
    weightedFractiles(values, weights, fractiles).forEach((v, f) =>
      out[String(fractiles[f])]!.push(v),
    );
  }
  return out;
}

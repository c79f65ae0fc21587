import type { Deaggregation } from '../results.ts';
import { compensatedSum } from '../summation.ts';

/** One source's summed contribution to the deaggregated level (annual rate). */
export interface SourceContribution {
  readonly sourceId: string;
  readonly name: string;
  readonly rate: number;
}

/**
 * Each source's share of the deaggregated rate: its rate over the compensated sum of all of
 * them (so the shares sum to 1), largest first, equal shares by source id so the order is
 * deterministic.
 */
export function sourceShares(sources: readonly SourceContribution[]): Deaggregation['bySource'] {
  const total = compensatedSum(sources.map((s) => s.rate));
  return sources
    .map(({ sourceId, name, rate }) => ({ sourceId, name, share: rate / total }))
    .sort(
      (a, b) =>
        b.share - a.share || (a.sourceId < b.sourceId ? -1 : a.sourceId > b.sourceId ? 1 : 0),
    );
}

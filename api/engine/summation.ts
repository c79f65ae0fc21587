/**
 * Compensated (Neumaier 1974) summation: hazard adds many small rates, where plain
 * summation loses digits once the running total dwarfs each term.
 *
 * Kept as running sums, one per slot (a hazard level), so a rupture's contributions to every
 * level are added without storing all the terms; typed arrays keep the layout the fast path needs.
 */
export interface LevelAccumulator {
  readonly sum: Float64Array;
  readonly compensation: Float64Array;
}

export function createLevelAccumulator(levelCount: number): LevelAccumulator {
  return { sum: new Float64Array(levelCount), compensation: new Float64Array(levelCount) };
}

/** Adds `value` to the running sum of slot `index` (one Neumaier step). */
export function accumulate(acc: LevelAccumulator, index: number, value: number): void {
  const sum = acc.sum[index] as number;
  const t = sum + value;
  acc.compensation[index] =
    (acc.compensation[index] as number) +
    (Math.abs(sum) >= Math.abs(value) ? sum - t + value : value - t + sum);
  acc.sum[index] = t;
}

/** The compensated total of slot `index`. */
export const accumulatedTotal = (acc: LevelAccumulator, index: number): number =>
  (acc.sum[index] as number) + (acc.compensation[index] as number);

/** The compensated totals, one per slot. */
export function accumulatedTotals(acc: LevelAccumulator): number[] {
  return Array.from(acc.sum, (s, i) => s + (acc.compensation[i] as number));
}

/** The compensated sum of `values`. */
export function compensatedSum(values: Iterable<number>): number {
  const acc = createLevelAccumulator(1);
  for (const v of values) accumulate(acc, 0, v);
  return accumulatedTotals(acc)[0] as number;
}

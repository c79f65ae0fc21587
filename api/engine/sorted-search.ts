/**
 * Binary search of an ascending list for the first entry at least, or above, a value (Knuth,
 * The Art of Computer Programming vol. 3, §6.2.1, from memory).
 */

/** Index of the first value >= `value` in ascending `sorted` (its length when there is none). */
export function firstAtLeast(sorted: ArrayLike<number>, value: number): number {
  return firstPassing(sorted, (x) => x < value);
}

/** Index of the first value > `value` in ascending `sorted` (its length when there is none). */
export function firstAbove(sorted: ArrayLike<number>, value: number): number {
  return firstPassing(sorted, (x) => x <= value);
}

/** Index of the first entry for which `before` is false; `before` is true on a prefix of the list. */
function firstPassing(sorted: ArrayLike<number>, before: (x: number) => boolean): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (before(sorted[mid] as number)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Compensated (Neumaier 1974) summation: hazard adds many small rates, where plain
 * summation loses digits once the running total dwarfs each term.
 */
export function compensatedSum(values: Iterable<number>): number {
  let sum = 0;
  let compensation = 0;
  for (const v of values) {
    const t = sum + v;
    compensation += Math.abs(sum) >= Math.abs(v) ? sum - t + v : v - t + sum;
    sum = t;
  }
  return sum + compensation;
}

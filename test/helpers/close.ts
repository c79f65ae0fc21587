import { expect } from 'vitest';

/**
 * Asserts |actual - expected| <= tolerance (absolute), with a message that shows all three
 * and the source of the expected value.
 */
export function expectClose(
  actual: number,
  expected: number,
  tolerance: number,
  source: string,
): void {
  const diff = Math.abs(actual - expected);
  expect(
    diff <= tolerance,
    `${source}: actual ${actual}, expected ${expected} ± ${tolerance} (off by ${diff})`,
  ).toBe(true);
}

/** Asserts |actual / expected - 1| <= relTolerance. */
export function expectRelative(
  actual: number,
  expected: number,
  relTolerance: number,
  source: string,
): void {
  const rel = Math.abs(actual / expected - 1);
  expect(
    rel <= relTolerance,
    `${source}: actual ${actual}, expected ${expected} ± ${relTolerance * 100}% (off by ${(rel * 100).toPrecision(3)}%)`,
  ).toBe(true);
}

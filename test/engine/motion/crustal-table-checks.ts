import { expect } from 'vitest';

/**
 * Checks shared by the crustal-model table tests (BSSA14, CB14): how far a column or a median
 * spectrum strays from smooth variation with ln(period). A row typed from the wrong period, or
 * a slipped digit, shows as a kink: an interior value far from the chord through its neighbours.
 */

export interface Kink {
  /** Largest distance of an interior value from the chord through its two neighbours. */
  readonly residual: number;
  /** The period (s) where it occurs; NaN when there is no interior point. */
  readonly periodS: number;
}

/** The worst chord residual in ln(period) of `values` tabulated at `periodsS` (same length). */
export function worstKink(periodsS: readonly number[], values: readonly number[]): Kink {
  let worst: Kink = { residual: 0, periodS: Number.NaN };
  for (let i = 1; i + 1 < values.length; i++) {
    const [x0, x1, x2] = [periodsS[i - 1], periodsS[i], periodsS[i + 1]].map((p) =>
      Math.log(p as number),
    ) as [number, number, number];
    const [v0, v1, v2] = [values[i - 1], values[i], values[i + 1]] as [number, number, number];
    const chord = v0 + ((v2 - v0) * (x1 - x0)) / (x2 - x0);
    const residual = Math.abs(v1 - chord);
    if (residual > worst.residual) worst = { residual, periodS: periodsS[i] as number };
  }
  return worst;
}

/**
 * The median spectrum `lnAt` (ln units) over the table's `periodsS` has no kink larger than
 * `bound`; `what` names the case in the failure message.
 */
export function expectSmoothSpectrum(
  periodsS: readonly number[],
  lnAt: (periodS: number) => number,
  bound: number,
  what: string,
): void {
  const kink = worstKink(periodsS, periodsS.map(lnAt));
  expect(kink.residual <= bound, `${what}: ${kink.residual.toFixed(3)} at ${kink.periodS} s`).toBe(
    true,
  );
}

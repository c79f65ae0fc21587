import { expect } from 'vitest';
import { DEFAULT_FIT, SPAN_YEARS } from '../../helpers/catalog-fixtures.ts';
import { expectRelative } from '../../helpers/close.ts';

/**
 * Checks the Weichert (1980) fit of the fit catalog with one completeness period (M 4.2 from
 * 2001-01-15) and bins up to mMax 9.5, as the API and the CLI both give it.
 *
 * With one period Weichert's equation is the maximum likelihood of binned Gutenberg–Richter
 * magnitudes, β = ln(1 + ΔM / (mean − Mc)) / ΔM (derived from Weichert 1980 for one period),
 * which is Aki–Utsu's β_U times 2 artanh(y/2) / y with y = β_U ΔM. Bins run to mMax = 9.5,
 * where the untruncated tail left out, 10^(−1.25 · 5.3), is below 1e-6.
 */
export function expectOnePeriodWeichert(
  weichert: { bValue: number; rateAtReference: number; method: string } | null | undefined,
): void {
  const y = DEFAULT_FIT.bValue * Math.LN10 * 0.1;
  expect(weichert?.method).toBe('weichert');
  expectRelative(
    weichert?.bValue ?? NaN,
    (DEFAULT_FIT.bValue * 2 * Math.atanh(y / 2)) / y,
    1e-5,
    'Aki–Utsu with the binning term (Weichert 1980, one period)',
  );
  expectRelative(
    weichert?.rateAtReference ?? NaN,
    7 / SPAN_YEARS,
    1e-12,
    'one period: N / T (Weichert 1980)',
  );
}

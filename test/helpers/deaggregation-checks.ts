import { expectClose } from './close.ts';

interface Shares {
  readonly bySource: readonly { readonly share: number }[];
  readonly bins: readonly { readonly share: number }[];
}

/** A deaggregation's source shares and its bin shares each sum to 1 within 1e-9 (summation rounding). */
export function expectSharesSumToOne(d: Shares): void {
  expectClose(
    d.bySource.reduce((s, x) => s + x.share, 0),
    1,
    1e-9,
    'source shares sum to 1',
  );
  expectClose(
    d.bins.reduce((s, x) => s + x.share, 0),
    1,
    1e-9,
    'bin shares sum to 1',
  );
}

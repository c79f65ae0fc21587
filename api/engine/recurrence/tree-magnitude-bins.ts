import type { Recurrence, Settings } from '../model.ts';
import { magnitudeBins } from './magnitude-bins.ts';
import { recurrenceVariants, type RecurrenceVariant } from './recurrence-variants.ts';

/** A source's magnitude bins over its logic tree: the union of its variants' bins. */
export interface TreeMagnitudeBins {
  /** Every variant's bin centres, merged, increasing. */
  readonly magnitudes: readonly number[];
  /** Weighted mean annual rate of each magnitude over the variants (per year). */
  readonly annualRates: readonly number[];
  readonly variants: readonly RecurrenceVariant[];
  /** variantRates[v][i]: variant v's annual rate at magnitudes[i] (0 where v has no such bin). */
  readonly variantRates: readonly (readonly number[])[];
}

/**
 * Bin centres are rounded to 1e-9 by magnitude-bins.ts, so a magnitude two variants share is
 * the same number in both; this key only guards against a last-digit difference.
 */
const key = (m: number): number => Math.round(m * 1e6);

/**
 * The bins of every variant of a recurrence (recurrence-variants.ts) over one set of
 * magnitudes. The hazard of a source is linear in its rates, so the weighted mean of its
 * variants' hazard is the hazard of the weighted mean rates, exactly: the mean curves need
 * nothing but these mean rates. Without alternatives: magnitudeBins' own bins.
 */
export function treeMagnitudeBins(
  recurrence: Recurrence,
  settings: Pick<Settings, 'magnitudeStep'>,
  faultAreaKm2?: number,
): TreeMagnitudeBins {
  const variants = recurrenceVariants(recurrence);
  const bins = variants.map((v) => magnitudeBins(v.recurrence, settings, faultAreaKm2));
  const byKey = new Map<number, number>();
  for (const b of bins) for (const m of b.magnitudes) if (!byKey.has(key(m))) byKey.set(key(m), m);
  const magnitudes = [...byKey.values()].sort((a, b) => a - b);
  const index = new Map(magnitudes.map((m, i) => [key(m), i]));
  const variantRates = bins.map((b) => {
    const rates = new Array<number>(magnitudes.length).fill(0);
    b.magnitudes.forEach((m, i) => (rates[index.get(key(m))!] = b.annualRates[i] as number));
    return rates;
  });
  const annualRates = magnitudes.map((_, i) =>
    variants.reduce((sum, v, k) => sum + v.weight * (variantRates[k]![i] as number), 0),
  );
  return { magnitudes, annualRates, variants, variantRates };
}

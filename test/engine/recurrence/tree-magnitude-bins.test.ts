import { describe, expect, it } from 'vitest';
import type { Recurrence } from '../../../api/engine/model.ts';
import {
  recurrenceVariants,
  variantCount,
} from '../../../api/engine/recurrence/recurrence-variants.ts';
import { treeMagnitudeBins } from '../../../api/engine/recurrence/tree-magnitude-bins.ts';
import { expectClose } from '../../helpers/close.ts';

const recurrence: Recurrence = {
  type: 'gutenberg-richter',
  bValue: 1,
  mMin: 5,
  mMax: 7,
  rate: 0.1,
  alternatives: {
    mMax: [
      { value: 7.0, weight: 0.4 },
      { value: 7.3, weight: 0.6 },
    ],
    bValue: [
      { value: 0.9, weight: 0.5 },
      { value: 1.1, weight: 0.5 },
    ],
  },
};

describe('recurrence variants over a source logic tree', () => {
  it('every combination once, weight the product, the first parameter varying slowest', () => {
    const variants = recurrenceVariants(recurrence);
    expect(variantCount(recurrence)).toBe(4);
    expect(variants.map((v) => v.choices)).toEqual([
      { mMax: 0, bValue: 0 },
      { mMax: 0, bValue: 1 },
      { mMax: 1, bValue: 0 },
      { mMax: 1, bValue: 1 },
    ]);
    expect(variants.map((v) => v.weight)).toEqual([0.2, 0.2, 0.3, 0.3]);
    expect(variants[3]!.recurrence).toMatchObject({ mMax: 7.3, bValue: 1.1, rate: 0.1 });
    expect(variants[3]!.recurrence.alternatives).toBeUndefined();
  });

  it('bins are the union (5.05 … 7.25 by 0.1) and each variant keeps the total rate of M >= mMin (truncated G-R integrates to the rate)', () => {
    const bins = treeMagnitudeBins(recurrence, { magnitudeStep: 0.1 });
    expect(bins.magnitudes).toHaveLength(23);
    expectClose(bins.magnitudes[22]!, 7.25, 1e-9, 'last bin centre of mMax 7.3');
    for (const rates of bins.variantRates)
      expectClose(
        rates.reduce((s, r) => s + r, 0),
        0.1,
        1e-12,
        'rate of M >= 5',
      );
    // mMax 7.0 variants have no bin above 7.0.
    expect(bins.variantRates[0]![21]).toBe(0);
    bins.magnitudes.forEach((_, i) =>
      expectClose(
        bins.annualRates[i]!,
        bins.variants.reduce((s, v, k) => s + v.weight * bins.variantRates[k]![i]!, 0),
        1e-15,
        'weighted mean of the variants',
      ),
    );
  });
});

import { describe, expect, it } from 'vitest';
import { screeningBand } from '../../../api/engine/intensity/screening-band.ts';

// Thresholds are the product's own (stated in screening-band.ts and the README): >= 8 refer-first, >= 7 refer-soon,
// >= 6 prepare, below 6 inform; a 475-year level below the computed levels is inform.
describe('screeningBand', () => {
  it('uses the stated thresholds, inclusive at the lower edge', () => {
    const ids = [8, 9.5, 7.999, 7, 6.999, 6, 5.999, 2].map((m) => screeningBand(m).id);
    expect(ids).toEqual([
      'refer-first',
      'refer-first',
      'refer-soon',
      'refer-soon',
      'prepare',
      'prepare',
      'inform',
      'inform',
    ]);
  });
  it('labels each band', () => {
    expect([8, 7, 6, 5].map((m) => screeningBand(m).label)).toEqual([
      'Refer first',
      'Refer soon',
      'Prepare and inform',
      'Inform',
    ]);
  });
  it('is inform when the 475-year MMI is unknown below the curve, and keeps mmi475', () => {
    expect(screeningBand(null)).toEqual({ id: 'inform', label: 'Inform', mmi475: null });
    expect(screeningBand(7.2)).toEqual({ id: 'refer-soon', label: 'Refer soon', mmi475: 7.2 });
  });
  it('can be chosen from a bound while the MMI itself stays unknown', () => {
    expect(screeningBand(null, 8.3)).toEqual({
      id: 'refer-first',
      label: 'Refer first',
      mmi475: null,
    });
  });
});

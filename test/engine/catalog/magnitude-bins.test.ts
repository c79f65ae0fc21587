import { describe, expect, it } from 'vitest';
import {
  binCentre,
  binIndex,
  magnitudeHistogram,
} from '../../../api/engine/catalog/magnitude-bins.ts';

describe('magnitude bins', () => {
  it('round to the nearest bin centre, edges upwards', () => {
    // Half-up rounding of the printed value, as catalogs round (common practice); 4.05 / 0.1 is
    // 40.4999... in binary and must still go up.
    expect(binCentre(4.05, 0.1)).toBe(4.1);
    expect(binCentre(4.04, 0.1)).toBe(4.0);
    expect(binCentre(4.3, 0.1)).toBe(4.3);
    expect(binCentre(-0.25, 0.1)).toBe(-0.2);
    expect(binIndex(4.3, 0.1)).toBe(43);
  });

  it('count every bin between the lowest and highest', () => {
    expect(magnitudeHistogram([4.0, 4.3, 4.0, 4.04], 0.1)).toEqual([
      { magnitude: 4.0, count: 3 },
      { magnitude: 4.1, count: 0 },
      { magnitude: 4.2, count: 0 },
      { magnitude: 4.3, count: 1 },
    ]);
    expect(magnitudeHistogram([], 0.1)).toEqual([]);
  });

  it('refuse a bin width outside (0, 1]', () => {
    expect(() => magnitudeHistogram([4], 0)).toThrow(/magnitudeStep/);
    expect(() => magnitudeHistogram([4], 2)).toThrow(/at most 1/);
  });
});

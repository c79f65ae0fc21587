import { describe, expect, test } from 'vitest';
import { compassPoint, placeFrom } from '../../../web/format/direction-words.ts';
import { translator } from '../../../web/text/translator.ts';

// Eight compass points, 45° sectors centred on each point (the rule stated in
// web/format/direction-words.ts; the sectors are the usual ones, common practice).
describe('directions in words', () => {
  test('the issue example: 14 km to the north-east', () => {
    expect(translator('en').place(14.2, 44)).toBe('14 km to the north-east');
  });

  test('each point owns 22.5° either side of it; a boundary goes clockwise', () => {
    const cases: [number, string][] = [
      [0, 'N'], [22.4, 'N'], [22.5, 'NE'], [67.4, 'NE'], [67.5, 'E'], [90, 'E'], [135, 'SE'],
      [180, 'S'], [202.5, 'SW'], [247.4, 'SW'], [270, 'W'], [315, 'NW'], [337.4, 'NW'], [337.5, 'N'], [359.9, 'N'],
    ];
    for (const [bearing, point] of cases) expect(compassPoint(bearing), `bearing ${bearing}`).toBe(point);
  });

  test('bearings outside [0, 360) are wrapped', () => {
    expect(compassPoint(-90)).toBe('W');
    expect(compassPoint(450)).toBe('E');
  });

  test('under 1 km is "here"; distances round to the nearest km', () => {
    expect(placeFrom(0, 270)).toEqual({ kind: 'here' });
    expect(placeFrom(0.99, 10)).toEqual({ kind: 'here' });
    expect(placeFrom(1, 10)).toEqual({ kind: 'away', distanceKm: 1, compass: 'N' });
    expect(placeFrom(34.5, 105)).toEqual({ kind: 'away', distanceKm: 35, compass: 'E' });
    expect(translator('en').place(0, 270)).toBe('beneath or right beside this place');
    expect(translator('en').place(1234.4, 210)).toBe('1,234 km to the south-west');
  });

  test('French words come from the French bundle', () => {
    expect(translator('fr').place(14.2, 44)).toBe('à 14 km au nord-est');
  });

  test('a negative or missing distance is refused', () => {
    expect(() => placeFrom(-1, 0)).toThrow(/expected a distance >= 0 km, got -1/);
    expect(() => placeFrom(3, Number.NaN)).toThrow(/expected a bearing/);
  });
});

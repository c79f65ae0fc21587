import { describe, expect, test } from 'vitest';
import { compassPoint, placeFrom } from '../../../web/format/direction-words.ts';
import { translator } from '../../../web/text/translator.ts';

// Eight compass points, 45° sectors centred on each point (the rule stated in
// web/format/direction-words.ts; the sectors are the usual ones, common practice).
describe('directions in words', () => {
  test('14.2 km at 44° reads as 14 km to the north-east', () => {
    expect(translator('en').place(14.2, 44)).toBe('14 km to the north-east');
  });

  test('each point owns 22.5° either side of it; a boundary goes clockwise', () => {
    const cases: [number, string][] = [
      [0, 'N'],
      [22.4, 'N'],
      [22.5, 'NE'],
      [67.4, 'NE'],
      [67.5, 'E'],
      [90, 'E'],
      [135, 'SE'],
      [180, 'S'],
      [202.5, 'SW'],
      [247.4, 'SW'],
      [270, 'W'],
      [315, 'NW'],
      [337.4, 'NW'],
      [337.5, 'N'],
      [359.9, 'N'],
    ];
    for (const [bearing, point] of cases)
      expect(compassPoint(bearing), `bearing ${bearing}`).toBe(point);
  });

  test('bearings outside [0, 360) are wrapped', () => {
    expect(compassPoint(-90)).toBe('W');
    expect(compassPoint(450)).toBe('E');
  });

  test('at 0 km it is "here", under 1 km "beside"; distances round to the nearest km', () => {
    expect(placeFrom(0, 270)).toEqual({ kind: 'here' });
    expect(placeFrom(0.001, 10)).toEqual({ kind: 'beside' });
    expect(placeFrom(0.99, 10)).toEqual({ kind: 'beside' });
    expect(placeFrom(1, 10)).toEqual({ kind: 'away', distanceKm: 1, compass: 'N' });
    expect(placeFrom(34.5, 105)).toEqual({ kind: 'away', distanceKm: 35, compass: 'E' });
    expect(translator('en').place(0, 270)).toBe('right under this place');
    expect(translator('en').place(0.4, 270)).toBe('right beside this place, less than 1 km away');
    expect(translator('fr').place(0.4, 270)).toBe('juste à côté de cet endroit, à moins d’1 km');
    expect(translator('en').place(1234.4, 210)).toBe('1,234 km to the south-west');
  });

  test('French words come from the French bundle', () => {
    expect(translator('fr').place(14.2, 44)).toBe('à 14 km au nord-est');
  });

  test('a negative or missing distance is refused', () => {
    expect(() => placeFrom(-1, 0)).toThrow(/expected a distance >= 0 km, got -1/);
    expect(() => placeFrom(3, Number.NaN)).toThrow(/expected a bearing/);
  });

  test('a fault beneath the place is said at its depth: whole km under 20 km, nearest 5 km from 20 km', () => {
    expect(placeFrom(0, 90, 38.2)).toEqual({ kind: 'below', depthKm: 40 });
    expect(placeFrom(0, 90, 37.4)).toEqual({ kind: 'below', depthKm: 35 });
    expect(placeFrom(0, 90, 19.4)).toEqual({ kind: 'below', depthKm: 19 });
    expect(placeFrom(0, 90, 19.6)).toEqual({ kind: 'below', depthKm: 20 });
    // Only what truly lies under the place is "below": half a km off, a depth is not said.
    expect(placeFrom(0.5, 90, 3)).toEqual({ kind: 'beside' });
    // At the fault's top edge (depth under half a km) or with no depth known it is "here".
    expect(placeFrom(0, 90, 0.4)).toEqual({ kind: 'here' });
    expect(placeFrom(0, 90)).toEqual({ kind: 'here' });
    // Beyond 1 km the horizontal distance and direction are said, whatever the depth.
    expect(placeFrom(12, 90, 30)).toEqual({ kind: 'away', distanceKm: 12, compass: 'E' });
    expect(translator('en').place(0, 90, 41)).toBe('about 40 km below this place');
  });
});

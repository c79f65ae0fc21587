import { describe, expect, test } from 'vitest';
import { parseCoordinates } from '../../../web/data/source-form.ts';

/** Typed coordinates: the order stated or told from the values, and asked for when it cannot be. */
describe('parseCoordinates', () => {
  test('"lon lat" lines and "lat, lon" lines give the same GeoJSON points', () => {
    const lonLat = parseCoordinates('-140.2 -47.4\n-140.5 -47.9\n', 'auto');
    const latLon = parseCoordinates('-47.4, -140.2\r\n-47.9, -140.5', 'auto');
    expect(lonLat).toEqual({
      ok: true,
      points: [
        [-140.2, -47.4],
        [-140.5, -47.9],
      ],
    });
    expect(latLon).toEqual(lonLat);
  });

  test('when every number is within ±90 the order is asked for, and a stated order is used', () => {
    const asked = parseCoordinates('10 20\n11 21', 'auto');
    expect(asked.ok).toBe(false);
    if (!asked.ok) expect(asked.issue.message).toContain('choose whether each line');
    expect(parseCoordinates('10 20', 'lat-lon')).toEqual({ ok: true, points: [[20, 10]] });
    expect(parseCoordinates('10 20', 'lon-lat')).toEqual({ ok: true, points: [[10, 20]] });
  });

  test('a line that is not two numbers is named by its number', () => {
    const bad = parseCoordinates('-140.2 -47.4\n-140.5 south', 'auto');
    expect(bad).toEqual({
      ok: false,
      issue: {
        path: 'coordinates',
        message:
          'line 2: expected two numbers in decimal degrees ("lon lat" or "lat, lon"), got "-140.5 south"',
      },
    });
    expect(parseCoordinates('  \n', 'auto').ok).toBe(false);
  });
});

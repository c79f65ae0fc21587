import { describe, expect, it } from 'vitest';
import { matchColumns, recogniseColumn } from '../../../api/study/community-files/column-names.ts';

describe('recogniseColumn', () => {
  it.each([
    ['Name', 'name'],
    ['VILLAGE', 'name'],
    ['Latitude', 'lat'],
    ['Latitude_DD', 'lat'],
    ['y', 'lat'],
    ['Long', 'lon'],
    ['X', 'lon'],
    ['Vs30 (m/s)', 'vs30'],
    ['Site Class', 'siteClass'],
    ['site_class', 'siteClass'],
    ['Pop', 'population'],
    ['Elevation (m)', 'elevationM'],
    ['elevationM', 'elevationM'],
    ['\uFEFFid', 'id'],
  ])('recognises %s as %s', (column, key) => {
    expect(recogniseColumn(column)).toBe(key);
  });

  it('leaves other columns alone', () => {
    expect(['School', 'Clinic', 'Airstrip', 'Notes', ''].map(recogniseColumn)).toEqual([
      undefined,
      undefined,
      undefined,
      undefined,
      undefined,
    ]);
  });
});

describe('matchColumns', () => {
  it('takes a picked column first, then the first recognised one, and keeps the rest as details', () => {
    const match = matchColumns(['Village', 'Name', 'Breite', 'Lon', 'School'], { lat: 'Breite' });
    expect(Object.fromEntries(match.columnOf)).toEqual({
      lat: 'Breite',
      name: 'Village',
      lon: 'Lon',
    });
    expect(match.otherColumns).toEqual(['Name', 'School']);
  });

  it('skips fields the geometry gives', () => {
    const match = matchColumns(['name', 'x', 'y'], {}, ['lon', 'lat']);
    expect(match.columnOf.has('lon')).toBe(false);
    expect(match.otherColumns).toEqual(['x', 'y']);
  });
});

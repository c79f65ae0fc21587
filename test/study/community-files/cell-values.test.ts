import { describe, expect, it } from 'vitest';
import {
  idFromName,
  readCoordinate,
  readNumber,
  readYesNo,
} from '../../../api/study/community-files/cell-values.ts';
import { expectClose } from '../../helpers/close.ts';

// Degrees, minutes and seconds: 1° = 60′ = 3600″ (the sexagesimal definition). Tolerance 1e-12°
// (well under a millimetre) allows for floating-point rounding only.
const TOL = 1e-12;

describe('readCoordinate', () => {
  it('reads decimal degrees with a point or a comma', () => {
    expect(readCoordinate('-47.25', 'lat')).toBe(-47.25);
    expect(readCoordinate('-47,25', 'lat')).toBe(-47.25);
    expect(readCoordinate(-140.5, 'lon')).toBe(-140.5);
    expect(readCoordinate('  ', 'lat')).toBeUndefined();
  });

  it.each([
    [`47°15'S`, 'lat', -(47 + 15 / 60)],
    [`47°15'36"S`, 'lat', -(47 + 15 / 60 + 36 / 3600)],
    [`S 47 15 36`, 'lat', -(47 + 15 / 60 + 36 / 3600)],
    [`47 15.6 S`, 'lat', -(47 + 15.6 / 60)],
    [`140°30′45″W`, 'lon', -(140 + 30 / 60 + 45 / 3600)],
    [`140:30:45 W`, 'lon', -(140 + 30 / 60 + 45 / 3600)],
    [`-140° 30.5'`, 'lon', -(140 + 30.5 / 60)],
    [`12°30'N`, 'lat', 12.5],
    [`12° 30' 0,5" E`, 'lon', 12 + 30 / 60 + 0.5 / 3600],
    [`47°15''S`, 'lat', -(47 + 15 / 60)],
  ] as const)('reads %s', (text, axis, expected) => {
    const value = readCoordinate(text, axis);
    expect(typeof value).toBe('number');
    expectClose(
      value as number,
      expected,
      TOL,
      'sexagesimal degrees: d + m/60 + s/3600, negative for S and W',
    );
  });

  it.each([
    [`47°75'S`, 'lat', /minutes and seconds must be below 60/],
    [`47°15'S`, 'lon', /S is not a hemisphere of longitude \(E or W\)/],
    [`-47°15'S`, 'lat', /either a minus sign or a hemisphere letter/],
    [`47.5°15'S`, 'lat', /only the last part may have decimals/],
    ['north', 'lat', /expected a latitude in decimal degrees or degrees, minutes and seconds/],
  ] as const)('refuses %s, saying what was expected', (text, axis, message) => {
    const value = readCoordinate(text, axis);
    expect(value).toMatchObject({ message: expect.stringMatching(message) });
  });
});

describe('readNumber', () => {
  it('reads a decimal point or comma and spaced digit groups', () => {
    expect(readNumber('612,5')).toBe(612.5);
    expect(readNumber('612.5')).toBe(612.5);
    expect(readNumber('1 250', true)).toBe(1250);
    expect(readNumber('1,250', true)).toBe(1250);
    expect(readNumber('1.250', true)).toBe(1250);
    expect(readNumber('about 40')).toBe('about 40');
    expect(readNumber('')).toBeUndefined();
  });
});

describe('readYesNo and idFromName', () => {
  it('reads the usual yes and no words', () => {
    expect([
      readYesNo('Yes'),
      readYesNo('n'),
      readYesNo('x'),
      readYesNo(1),
      readYesNo('maybe'),
    ]).toEqual([true, false, true, true, 'maybe']);
  });

  it('makes an id from a name: lower case, accents dropped, dashes', () => {
    expect(idFromName('Ōtaki Bay (upper)')).toBe('otaki-bay-upper');
    expect(idFromName('***')).toBe('community');
  });
});

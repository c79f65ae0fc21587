import { describe, expect, it } from 'vitest';
import { parseIsoTimeMs } from '../../api/catalog/iso-time.ts';

const ms = (text: string): number => {
  const r = parseIsoTimeMs(text);
  if (!r.ok) throw new Error(r.message);
  return r.timeMs;
};

describe('ISO 8601 times', () => {
  it('read the forms catalogs write, as UTC unless a zone is given', () => {
    expect(ms('2021-03-04T05:06:07Z')).toBe(Date.UTC(2021, 2, 4, 5, 6, 7));
    expect(ms('2021-03-04T05:06:07')).toBe(Date.UTC(2021, 2, 4, 5, 6, 7));
    expect(ms('2021-03-04 05:06:07.5')).toBe(Date.UTC(2021, 2, 4, 5, 6, 7, 500));
    expect(ms('2021-03-04T05:06:07.123456Z')).toBe(Date.UTC(2021, 2, 4, 5, 6, 7, 123));
    expect(ms('2021-03-04T05:06:07-09:30')).toBe(Date.UTC(2021, 2, 4, 14, 36, 7));
    expect(ms('2021-03-04T05:06+0100')).toBe(Date.UTC(2021, 2, 4, 4, 6));
    expect(ms('1850-06-01')).toBe(Date.UTC(1850, 5, 1));
    // A leap second reads as the next minute's first instant.
    expect(ms('2016-12-31T23:59:60Z')).toBe(Date.UTC(2017, 0, 1));
  });

  it('say what is wrong with a bad time', () => {
    expect(parseIsoTimeMs('04/03/2021')).toEqual({
      ok: false,
      message: 'expected an ISO 8601 time such as 2021-03-04T05:06:07Z; got "04/03/2021"',
    });
    expect(parseIsoTimeMs('2021-02-29T00:00:00Z').ok).toBe(false);
    expect(parseIsoTimeMs('2020-02-29T00:00:00Z').ok).toBe(true);
    expect(parseIsoTimeMs('2021-01-01T24:00:00Z').ok).toBe(false);
    expect(parseIsoTimeMs('2021-01-01T00:00:00+15:00').ok).toBe(false);
  });

  it('read years 0 to 99 as written, not as 1900 to 1999', () => {
    // The check values come from the ECMA-262 date-time string format (section 21.4.1.32),
    // which reads a four-digit year as written, independently of the code under test.
    for (const text of [
      '0050-06-01T00:00:00Z',
      '0099-12-31T23:59:59Z',
      '0001-01-01T00:00:00Z',
      '0000-02-29T12:00:00Z',
    ]) {
      expect(ms(text), text).toBe(new Date(text).getTime());
      expect(new Date(ms(text)).toISOString().slice(0, 19), text).toBe(text.slice(0, 19));
    }
    // Year 0 of the proleptic Gregorian calendar is a leap year (divisible by 400); 100 is not.
    expect(parseIsoTimeMs('0100-02-29').ok).toBe(false);
  });
});

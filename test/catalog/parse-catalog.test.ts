import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { detectCatalogFormat, parseCatalog } from '../../api/catalog/parse-catalog.ts';

const read = (name: string): string =>
  readFileSync(new URL(`./fixtures/${name}`, import.meta.url), 'utf8');

describe('parseCatalog', () => {
  it('detects the format from the text', () => {
    expect(detectCatalogFormat(read('small-catalog.csv'))).toBe('csv');
    expect(detectCatalogFormat(read('small-catalog.txt'))).toBe('fdsn-text');
    expect(detectCatalogFormat(read('small-catalog.quakeml'))).toBe('quakeml');
    expect(detectCatalogFormat('\uFEFF  <q:quakeml/>')).toBe('quakeml');
  });

  it('parses each fixture through the detected format', () => {
    expect(parseCatalog(read('small-catalog.csv')).summary.loaded).toBe(5);
    expect(parseCatalog(read('small-catalog.txt')).summary.loaded).toBe(4);
    expect(parseCatalog(read('small-catalog.quakeml')).summary.loaded).toBe(3);
  });

  it('keeps events of years 0 to 99 in their century, in every format', () => {
    const year = (text: string) =>
      parseCatalog(text).events.map((e) => new Date(e.timeMs).getUTCFullYear());
    const csv = read('small-catalog.csv').replace('2001-02-03T04:05:06Z', '0079-08-24T13:00:00Z');
    const fdsn = read('small-catalog.txt').replace(
      '2010-01-02T03:04:05.678',
      '0062-02-05T12:00:00',
    );
    const quakeml = read('small-catalog.quakeml').replaceAll(
      '2015-03-04T05:06:07',
      '0026-03-04T05:06:07',
    );
    expect(year(csv)).toContain(79);
    expect(year(fdsn)).toContain(62);
    expect(year(quakeml)).toContain(26);
    for (const text of [csv, fdsn, quakeml])
      expect(year(text).every((y) => y < 1900 || y >= 2000)).toBe(true);
  });
});

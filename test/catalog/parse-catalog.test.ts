import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { detectCatalogFormat, parseCatalog } from '../../api/catalog/parse-catalog.ts';

const read = (name: string): string => readFileSync(new URL(`./fixtures/${name}`, import.meta.url), 'utf8');

describe('parseCatalog', () => {
  it('detects the format from the text', () => {
    expect(detectCatalogFormat(read('small-catalog.csv'))).toBe('csv');
    expect(detectCatalogFormat(read('small-catalog.txt'))).toBe('fdsn-text');
    expect(detectCatalogFormat(read('small-catalog.quakeml'))).toBe('quakeml');
    expect(detectCatalogFormat('\uFEFF  <q:quakeml/>')).toBe('quakeml');
  });

  it('parses each fixture through the detected format', () => {
    expect(parseCatalog(read('small-catalog.csv')).summary.loaded).toBe(4);
    expect(parseCatalog(read('small-catalog.txt')).summary.loaded).toBe(4);
    expect(parseCatalog(read('small-catalog.quakeml')).summary.loaded).toBe(2);
  });
});

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  CATALOG_FORMATS,
  catalogFormat,
  formatOfMediaType,
} from '../../api/catalog/catalog-formats.ts';
import { parseCatalog } from '../../api/catalog/parse-catalog.ts';

const read = (name: string): string =>
  readFileSync(new URL(`./fixtures/${name}`, import.meta.url), 'utf8');
const SAMPLES = {
  csv: 'small-catalog.csv',
  'fdsn-text': 'small-catalog.txt',
  quakeml: 'small-catalog.quakeml',
} as const;

describe('the catalog format registry', () => {
  it('gives each format a distinct name, file name and media types, and reads each format back from its media types', () => {
    const names = CATALOG_FORMATS.map((f) => f.name);
    expect(new Set(names).size).toBe(names.length);
    expect(new Set(CATALOG_FORMATS.map((f) => f.fileName)).size).toBe(names.length);
    for (const format of CATALOG_FORMATS) {
      expect(format.mediaTypes.length).toBeGreaterThan(0);
      for (const type of format.mediaTypes) expect(formatOfMediaType(type)).toBe(format.name);
    }
    expect(formatOfMediaType('application/octet-stream')).toBeUndefined();
  });

  it("parses a sample of each format with that format's parser, and the load names the format", () => {
    for (const [name, file] of Object.entries(SAMPLES) as [keyof typeof SAMPLES, string][]) {
      const load = parseCatalog(read(file), name);
      expect(load.format).toBe(name);
      expect(load.events.length).toBeGreaterThan(0);
      expect(catalogFormat(name).parse(read(file))).toEqual(load);
    }
  });
});

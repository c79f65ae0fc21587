import { parseCatalogCsv } from './csv.ts';
import type { CatalogFormat, CatalogLoad } from './catalog-load.ts';
import { parseFdsnText } from './fdsn-text.ts';
import { parseQuakeMl } from './quakeml.ts';

/**
 * The format of catalog text: XML is QuakeML; a first non-blank line starting with "#" and
 * holding "|" is FDSN text; anything else is read as Tremora's CSV.
 */
export function detectCatalogFormat(text: string): CatalogFormat {
  const first = text.replace(/^\uFEFF/, '').trimStart();
  if (first.startsWith('<')) return 'quakeml';
  const line = first.split(/\r\n?|\n/, 1)[0] ?? '';
  return line.startsWith('#') && line.includes('|') ? 'fdsn-text' : 'csv';
}

/** Parses catalog text in the given format, or the detected one. */
export function parseCatalog(text: string, format: CatalogFormat = detectCatalogFormat(text)): CatalogLoad {
  switch (format) {
    case 'csv':
      return parseCatalogCsv(text);
    case 'fdsn-text':
      return parseFdsnText(text);
    case 'quakeml':
      return parseQuakeMl(text);
  }
}

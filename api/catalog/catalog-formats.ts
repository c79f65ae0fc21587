import type { CatalogLoad } from './catalog-load.ts';
import { parseCatalogCsv } from './csv.ts';
import { parseFdsnText } from './fdsn-text.ts';
import { parseQuakeMl } from './quakeml.ts';

/** One catalog format: everything the rest of the code needs to know about it. */
export interface CatalogFormatSpec {
  readonly name: string;
  /** How messages name it ("our CSV"). */
  readonly label: string;
  /**
   * Whether text is in this format, given its first non-blank character onwards (byte-order
   * mark removed). Formats are tried in CATALOG_FORMATS order; the last one takes anything.
   */
  readonly detect: (text: string) => boolean;
  readonly parse: (text: string) => CatalogLoad;
  /** Media types of a raw upload in this format (PUT /api/studies/{id}/catalog). */
  readonly mediaTypes: readonly string[];
  /** The file name kept for an upload that gives none. */
  readonly fileName: string;
}

const firstLine = (text: string): string => text.split(/\r\n?|\n/, 1)[0] ?? '';

/** The formats Tremora reads, in the order detection tries them. */
export const CATALOG_FORMATS = [
  {
    name: 'quakeml',
    label: 'QuakeML 1.2',
    detect: (text: string) => text.startsWith('<'),
    parse: parseQuakeMl,
    mediaTypes: ['application/xml', 'text/xml'],
    fileName: 'catalog.xml',
  },
  {
    name: 'fdsn-text',
    label: 'FDSN event text',
    // The FDSN text header: a comment line of "|"-separated column names.
    detect: (text: string) => firstLine(text).startsWith('#') && firstLine(text).includes('|'),
    parse: parseFdsnText,
    mediaTypes: ['text/plain'],
    fileName: 'catalog.txt',
  },
  {
    name: 'csv',
    label: 'our CSV',
    detect: () => true,
    parse: parseCatalogCsv,
    mediaTypes: ['text/csv'],
    fileName: 'catalog.csv',
  },
] as const satisfies readonly CatalogFormatSpec[];

export type CatalogFormat = (typeof CATALOG_FORMATS)[number]['name'];

export const CATALOG_FORMAT_NAMES: readonly CatalogFormat[] = CATALOG_FORMATS.map((f) => f.name);

/** The formats' labels as a list for messages: "QuakeML 1.2, FDSN event text or our CSV". */
export const CATALOG_FORMAT_LABELS = CATALOG_FORMATS.map((f) => f.label)
  .join(', ')
  .replace(/, ([^,]*)$/, ' or $1');

export function catalogFormat(name: CatalogFormat): CatalogFormatSpec {
  return CATALOG_FORMATS.find((f) => f.name === name)!;
}

/** The format of a raw upload's media type, if it names one. */
export function formatOfMediaType(mediaType: string): CatalogFormat | undefined {
  return CATALOG_FORMATS.find((f) => (f.mediaTypes as readonly string[]).includes(mediaType))?.name;
}

import { CATALOG_FORMATS, catalogFormat, type CatalogFormat } from './catalog-formats.ts';
import type { CatalogLoad } from './catalog-load.ts';

/** The format of catalog text: the first of CATALOG_FORMATS whose detection takes it. */
export function detectCatalogFormat(text: string): CatalogFormat {
  const start = text.replace(/^\uFEFF/, '').trimStart();
  return CATALOG_FORMATS.find((f) => f.detect(start))!.name;
}

/** Parses catalog text in the given format, or the detected one. */
export function parseCatalog(
  text: string,
  format: CatalogFormat = detectCatalogFormat(text),
): CatalogLoad {
  return catalogFormat(format).parse(text);
}

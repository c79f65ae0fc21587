import type { IssueList } from '../issues.ts';
import type { CommunityTable } from './community-table.ts';
import { csvTable } from './csv-table.ts';
import { CommunityFileProblem } from './file-problem.ts';
import { geojsonTable } from './geojson-table.ts';
import { kmlTable, kmzTable } from './kml-table.ts';
import { shapefileTable } from './shapefile-table.ts';
import { decodeText } from './text-decoding.ts';
import { xlsxTable } from './xlsx-table.ts';
import { zipEntries } from './zip-entries.ts';

export type CommunityFileFormat = 'csv' | 'xlsx' | 'kml' | 'kmz' | 'shapefile' | 'geojson';

/** The extensions each format is known by. */
export const FORMAT_EXTENSIONS: Readonly<Record<CommunityFileFormat, readonly string[]>> = {
  csv: ['.csv', '.txt', '.tsv'],
  xlsx: ['.xlsx'],
  kml: ['.kml'],
  kmz: ['.kmz'],
  shapefile: ['.zip'],
  geojson: ['.geojson', '.json'],
};

const isZip = (b: Uint8Array) => b[0] === 0x50 && b[1] === 0x4b;

/**
 * The format of a communities file: by its extension, else by its first bytes (a zip holding
 * a workbook, a KML or a shapefile; XML; JSON; otherwise CSV).
 */
export function detectFormat(fileName: string, bytes: Uint8Array): CommunityFileFormat {
  const lower = fileName.toLowerCase();
  if (lower.endsWith('.xls'))
    throw new CommunityFileProblem(
      `${fileName}: expected a newer spreadsheet; the old .xls format is not read (save it as .xlsx or CSV UTF-8)`,
    );
  for (const [format, extensions] of Object.entries(FORMAT_EXTENSIONS)) {
    if (extensions.some((e) => lower.endsWith(e))) return format as CommunityFileFormat;
  }
  if (isZip(bytes)) {
    const names = [...zipEntries(bytes, fileName).keys()].map((n) => n.toLowerCase());
    if (names.some((n) => n.startsWith('xl/'))) return 'xlsx';
    if (names.some((n) => n.endsWith('.kml'))) return 'kmz';
    return 'shapefile';
  }
  return textKind(bytes) ?? 'csv';
}

/** Whether a text file looks like XML (KML) or JSON (GeoJSON) by its first characters. */
export function textKind(bytes: Uint8Array): 'kml' | 'geojson' | undefined {
  const head = new TextDecoder()
    .decode(bytes.subarray(0, 200))
    .replace(/^\uFEFF/, '')
    .trimStart();
  if (head.startsWith('<')) return 'kml';
  if (head.startsWith('{')) return 'geojson';
  return undefined;
}

/**
 * Reads a communities file of any accepted format into a table. A file that cannot be read at
 * all throws CommunityFileProblem; problems of single rows, placemarks or features go to
 * `issues` under `rootPath`.
 */
export async function readCommunityFile(
  bytes: Uint8Array,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): Promise<CommunityTable> {
  const format = detectFormat(fileName, bytes);
  switch (format) {
    case 'xlsx':
      return xlsxTable(bytes, fileName);
    case 'kmz':
      return kmzTable(bytes, fileName, rootPath, issues);
    case 'shapefile':
      return shapefileTable(bytes, fileName, rootPath, issues);
    case 'kml':
      return kmlTable(decodeText(bytes, fileName), fileName, rootPath, issues);
    case 'geojson':
      return geojsonTable(decodeText(bytes, fileName), fileName, rootPath, issues);
    case 'csv':
      return csvTable(decodeText(bytes, fileName), fileName, rootPath, issues);
  }
}

import Papa from 'papaparse';
import type { CatalogEvent } from '../engine/catalog/event.ts';
import { InvalidInput } from '../engine/errors.ts';
import { catalogLoad, type CatalogLoad, type RejectedRecord } from './catalog-load.ts';
import { eventFromFields } from './event-fields.ts';

/**
 * Tremora's own catalog CSV, header `time,lon,lat,depthKm,magnitude,magnitudeType,id`
 * (columns in any order; `id` optional, other columns ignored). time ISO 8601 (UTC when no
 * zone), lon/lat WGS84 degrees, depthKm km below sea level.
 */
export const CATALOG_CSV_COLUMNS = [
  'time',
  'lon',
  'lat',
  'depthKm',
  'magnitude',
  'magnitudeType',
  'id',
] as const;
const REQUIRED = CATALOG_CSV_COLUMNS.filter((c) => c !== 'id');

/**
 * Parses catalog CSV text. Bad rows are rejected with their line number and every problem
 * found; good rows still load. A missing header column throws InvalidInput.
 */
export function parseCatalogCsv(text: string): CatalogLoad {
  const normalised = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  const rows: { cells: string[]; line: number }[] = [];
  let line = 1;
  let consumed = 0;
  // Rows are read one at a time so each keeps the line it starts on, even past a quoted newline.
  Papa.parse<string[]>(normalised, {
    delimiter: ',',
    newline: '\n',
    skipEmptyLines: false,
    step: (result) => {
      rows.push({ cells: result.data, line });
      const end = result.meta.cursor;
      for (let i = consumed; i < end; i++) if (normalised.charCodeAt(i) === 10) line++;
      consumed = end;
    },
  });
  const headerRow = rows.find((r) => r.cells.some((c) => c.trim() !== ''));
  if (!headerRow)
    throw new InvalidInput([
      { path: 'line 1', message: `expected a header row: ${CATALOG_CSV_COLUMNS.join(',')}` },
    ]);
  const header = headerRow.cells.map((c) => c.trim());
  const missing = REQUIRED.filter((c) => !header.includes(c));
  if (missing.length > 0) {
    throw new InvalidInput([
      {
        path: `line ${headerRow.line}`,
        message: `expected the columns ${CATALOG_CSV_COLUMNS.join(',')} (id optional); missing ${missing.join(', ')}`,
      },
    ]);
  }
  const column = (name: string): number => header.indexOf(name);
  const notes: string[] = [];
  const ignored = header.filter(
    (h) => h !== '' && !(CATALOG_CSV_COLUMNS as readonly string[]).includes(h),
  );
  if (ignored.length > 0) notes.push(`ignored columns: ${ignored.join(', ')}`);
  const candidates: { event: CatalogEvent; where: RejectedRecord }[] = [];
  const rejected: RejectedRecord[] = [];
  let generatedIds = 0;
  for (const row of rows) {
    if (row.line <= headerRow.line || row.cells.every((c) => c.trim() === '')) continue;
    const where = `line ${row.line}`;
    if (row.cells.length !== header.length) {
      rejected.push({
        where,
        line: row.line,
        reasons: [`expected ${header.length} fields; got ${row.cells.length}`],
      });
      continue;
    }
    const cell = (name: string): string | undefined =>
      column(name) >= 0 ? row.cells[column(name)] : undefined;
    const givenId = cell('id')?.trim() ?? '';
    if (givenId === '') generatedIds++;
    const id = givenId === '' ? `line-${row.line}` : givenId;
    const result = eventFromFields({
      id,
      time: cell('time'),
      lon: cell('lon'),
      lat: cell('lat'),
      depthKm: cell('depthKm'),
      magnitude: cell('magnitude'),
      magnitudeType: cell('magnitudeType'),
    });
    if ('event' in result)
      candidates.push({ event: result.event, where: { where, line: row.line, reasons: [] } });
    else
      rejected.push({
        where,
        line: row.line,
        ...(givenId === '' ? {} : { id: givenId }),
        reasons: result.reasons,
      });
  }
  if (generatedIds > 0) notes.push(`${generatedIds} rows had no id and were given "line-<number>"`);
  return catalogLoad('csv', candidates, rejected, notes);
}

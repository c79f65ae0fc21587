import { readSheet } from 'read-excel-file/node';
import type { CommunityTable, TableCell, TableRow } from './community-table.ts';
import { CommunityFileProblem } from './file-problem.ts';

/** A spreadsheet cell as a table cell: dates as ISO dates, everything else as it is. */
function cellOf(value: unknown): TableCell {
  if (value === null || value === undefined) return null;
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean')
    return value;
  return String(value);
}

/**
 * The first sheet of an XLSX workbook (read-excel-file) as a table: the first row that has
 * content is the header; rows are named by their row number in the sheet (`[row 5]`).
 */
export async function xlsxTable(bytes: Uint8Array, fileName: string): Promise<CommunityTable> {
  let sheet: unknown[][];
  try {
    sheet = (await readSheet(
      Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength),
    )) as unknown[][];
  } catch (error) {
    throw new CommunityFileProblem(
      `${fileName}: expected an XLSX workbook (Excel 2007 or later; save an older .xls as .xlsx or CSV), but it cannot be read (${(error as Error).message})`,
    );
  }
  const headerAt = sheet.findIndex((r) => r.some((c) => c !== null && String(c).trim() !== ''));
  if (headerAt < 0)
    throw new CommunityFileProblem(
      `${fileName}: expected a header row and one row per community on the first sheet, got an empty sheet`,
    );
  const columns = (sheet[headerAt] as unknown[]).map((c) => (c === null ? '' : String(c).trim()));
  const rows: TableRow[] = [];
  for (let i = headerAt + 1; i < sheet.length; i++) {
    const cells = sheet[i] as unknown[];
    if (cells.every((c) => c === null || String(c).trim() === '')) continue;
    const record: Record<string, TableCell> = {};
    columns.forEach((column, j) => {
      if (column !== '' && !(column in record)) record[column] = cellOf(cells[j]);
    });
    rows.push({ where: `[row ${i + 1}]`, cells: record });
  }
  return {
    fileName,
    format: 'XLSX',
    columns: columns.filter((c) => c !== ''),
    rows,
    hasGeometry: false,
  };
}

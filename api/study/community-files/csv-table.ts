import Papa from 'papaparse';
import type { IssueList } from '../issues.ts';
import type { CommunityTable, TableCell, TableRow } from './community-table.ts';

/** Delimiters a spreadsheet's CSV export uses, in the order preferred when the header is ambiguous. */
const DELIMITERS = ['\t', ';', ',', '|'] as const;

/**
 * The delimiter of a CSV, from its header line: the candidate found most often outside quotes.
 * The header decides because data lines may hold decimal commas (`12,5` with `;` between
 * cells) while headers hold names.
 */
export function guessDelimiter(text: string): string {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  const unquoted = header.replace(/"[^"]*"/g, '');
  let best: string = ',';
  let bestCount = 0;
  for (const d of DELIMITERS) {
    const count = unquoted.split(d).length - 1;
    if (count > bestCount) {
      best = d;
      bestCount = count;
    }
  }
  return best;
}

/**
 * A CSV read into a table (papaparse, the project's one CSV parser): the delimiter guessed from
 * the header, a byte-order mark dropped, blank lines skipped. Rows are named by their line in
 * the file (`[line 5]`, the header being line 1); a row with the wrong number of cells is
 * reported and left out.
 */
export function csvTable(
  text: string,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): CommunityTable {
  const csvText = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const lines: { line: number; cells: string[] }[] = [];
  let line = 1;
  let consumed = 0;
  Papa.parse<string[]>(csvText, {
    header: false,
    delimiter: guessDelimiter(csvText),
    skipEmptyLines: false,
    step: (result) => {
      // meta.cursor is the offset just past the row and its line break.
      const end = result.meta.cursor;
      const cells = result.data;
      if (!cells.every((c) => c.trim() === '')) lines.push({ line, cells });
      for (let i = consumed; i < end; i++) if (csvText.charCodeAt(i) === 10) line++;
      consumed = end;
    },
  });
  const header = lines.shift();
  const columns = header ? header.cells.map((c) => c.trim()) : [];
  const rows: TableRow[] = [];
  for (const { line: at, cells } of lines) {
    // Spreadsheets often pad rows with empty trailing cells: those beyond the header are let pass.
    const width = cells.length - [...cells].reverse().findIndex((c) => c.trim() !== '');
    if (cells.length < columns.length || width > columns.length) {
      issues.add(
        [...rootPath, `[line ${at}]`],
        `expected ${columns.length} columns (${columns.join(',')}), got ${cells.length}`,
      );
      continue;
    }
    const record: Record<string, TableCell> = {};
    columns.forEach((column, i) => {
      if (!(column in record)) record[column] = cells[i] ?? null;
    });
    rows.push({ where: `[line ${at}]`, cells: record });
  }
  return { fileName, format: 'CSV', columns, rows, hasGeometry: false };
}

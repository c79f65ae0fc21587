import Papa from 'papaparse';
import type { FileProblem, ReadRow, TranslationRow } from './translation-rows.ts';

/**
 * CSV translation files: columns key, English, translation; UTF-8; every field quoted and
 * lines ended by CRLF as RFC 4180 writes them (papaparse writes and reads them, quotes doubled
 * inside a field, line breaks kept inside quotes).
 */
export const CSV_COLUMNS = ['key', 'English', 'translation'] as const;

export function writeCsv(rows: readonly TranslationRow[]): string {
  return `${Papa.unparse(
    {
      fields: [...CSV_COLUMNS],
      data: rows.map((row) => [row.id, row.english, row.translation]),
    },
    { quotes: true, newline: '\r\n' },
  )}\r\n`;
}

export interface ReadCsv {
  readonly rows: ReadRow[];
  readonly problems: FileProblem[];
}

export function readCsv(source: string): ReadCsv {
  const text = source.replace(/^\uFEFF/, '');
  const rows: ReadRow[] = [];
  const problems: FileProblem[] = [];
  let start = 0;
  let header: { key: number; translation: number } | undefined;
  let headerSeen = false;
  Papa.parse<string[]>(text, {
    delimiter: ',',
    step: (result) => {
      const line = 1 + (text.slice(0, start).match(/\n/g)?.length ?? 0);
      start = result.meta.cursor;
      const cells = result.data;
      if (cells.every((cell) => cell.trim() === '')) return;
      for (const error of result.errors) problems.push({ line, message: error.message });
      if (!headerSeen) {
        headerSeen = true;
        const names = cells.map((cell) => cell.trim().toLowerCase());
        const key = names.indexOf('key');
        const translation = names.indexOf('translation');
        if (key < 0 || translation < 0)
          problems.push({
            line,
            message: `the first line names the columns: ${CSV_COLUMNS.join(', ')}; got ${cells.join(', ')}`,
          });
        else header = { key, translation };
        return;
      }
      if (!header) return;
      const id = cells[header.key]?.trim();
      if (!id) {
        problems.push({ line, message: 'a line without a key' });
        return;
      }
      rows.push({ id, translation: cells[header.translation] ?? '', line });
    },
  });
  if (!headerSeen)
    problems.push({
      line: 1,
      message: `an empty file: expected columns ${CSV_COLUMNS.join(', ')}`,
    });
  return { rows, problems };
}

import Papa from 'papaparse';
import type { Community } from '../engine/model.ts';
import { COMMUNITY_KEYS, MAX_COMMUNITIES, readCommunities } from './community-schema.ts';
import { IssueList } from './issues.ts';

/** Columns every communities CSV must have; vs30 may be replaced by siteClass. */
const REQUIRED_COLUMNS = ['id', 'name', 'lon', 'lat'] as const;
const NUMERIC_COLUMNS = new Set(['lon', 'lat', 'vs30', 'population', 'elevationM']);
const TRUE_WORDS = new Set(['true', 'yes', 'y', '1']);
const FALSE_WORDS = new Set(['false', 'no', 'n', '0']);

/** A CSV cell as the JSON value the community schema expects; an empty cell is absent. */
function cellValue(column: string, cell: string): unknown {
  const trimmed = cell.trim();
  if (trimmed === '') return undefined;
  if (NUMERIC_COLUMNS.has(column)) {
    const n = Number(trimmed);
    return Number.isFinite(n) ? n : trimmed;
  }
  if (column === 'coastal') {
    const word = trimmed.toLowerCase();
    if (TRUE_WORDS.has(word)) return true;
    if (FALSE_WORDS.has(word)) return false;
    return trimmed;
  }
  return trimmed;
}

export interface CsvCommunities {
  readonly communities: Community[];
  readonly issues: IssueList;
}

/**
 * Reads communities from CSV text with the header `id,name,lon,lat,vs30,population,coastal,elevationM`
 * (siteClass may replace or join vs30; columns in any order). Every problem is reported with
 * its line number (the header is line 1) under `rootPath`; valid rows are kept.
 */
export function readCommunitiesCsv(text: string, rootPath: readonly PropertyKey[] = ['communities'], issues = new IssueList()): CsvCommunities {
  // A byte-order mark from spreadsheet exports would otherwise stick to the first column name.
  const csvText = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const rows: { line: number; cells: string[] }[] = [];
  let line = 1;
  let consumed = 0;
  Papa.parse<string[]>(csvText, {
    header: false,
    skipEmptyLines: false,
    step: (result) => {
      // meta.cursor is the offset just past the row and its line break.
      const end = result.meta.cursor;
      const cells = result.data;
      if (!(cells.length === 1 && (cells[0] ?? '').trim() === '')) rows.push({ line, cells });
      for (let i = consumed; i < end; i++) if (csvText.charCodeAt(i) === 10) line++;
      consumed = end;
    },
  });

  const header = rows.shift();
  if (!header) {
    issues.add(rootPath, `expected CSV with a header line (${COMMUNITY_KEYS.join(',')}), got no lines`);
    return { communities: [], issues };
  }
  const columns = header.cells.map((c) => c.trim());
  const headerPath = [...rootPath, '[line 1]'];
  const missing = REQUIRED_COLUMNS.filter((c) => !columns.includes(c));
  if (!columns.includes('vs30') && !columns.includes('siteClass')) missing.push('vs30 or siteClass' as never);
  if (missing.length > 0) {
    issues.add(headerPath, `header is missing column(s) ${missing.join(', ')}; expected ${COMMUNITY_KEYS.join(',')}`);
    return { communities: [], issues };
  }
  for (const c of columns) {
    if (!(COMMUNITY_KEYS as readonly string[]).includes(c)) issues.warn(headerPath, `unknown column "${c}" ignored`);
  }
  if (rows.length > MAX_COMMUNITIES) {
    issues.add(rootPath, `expected at most ${MAX_COMMUNITIES} communities, got ${rows.length}`);
    return { communities: [], issues };
  }

  const raw: Record<string, unknown>[] = [];
  const lines: number[] = [];
  for (const row of rows) {
    if (row.cells.length !== columns.length) {
      issues.add(
        [...rootPath, `[line ${row.line}]`],
        `expected ${columns.length} columns (${columns.join(',')}), got ${row.cells.length}`,
      );
      continue;
    }
    const record: Record<string, unknown> = {};
    columns.forEach((column, i) => {
      if (!(COMMUNITY_KEYS as readonly string[]).includes(column)) return;
      const value = cellValue(column, row.cells[i] ?? '');
      if (value !== undefined) record[column] = value;
    });
    raw.push(record);
    lines.push(row.line);
  }
  const communities = readCommunities(raw, issues, (i) => [...rootPath, `[line ${lines[i]}]`]);
  return { communities, issues };
}

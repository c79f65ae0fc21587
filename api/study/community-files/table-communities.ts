import type { Community } from '../../engine/model.ts';
import type { SiteProxy } from '../../engine/terrain/site-proxy.ts';
import { MAX_COMMUNITIES, readCommunities } from '../community-schema.ts';
import type { IssueList } from '../issues.ts';
import { cellText, idFromName, readCoordinate, readNumber, readYesNo } from './cell-values.ts';
import {
  acceptedSpellings,
  COLUMN_MEANINGS,
  matchColumns,
  type ColumnChoice,
  type CommunityColumn,
} from './column-names.ts';
import type { CommunityTable, TableRow } from './community-table.ts';

/** Most columns kept as a community's details, and the longest value kept (a screening list, not a database). */
export const MAX_DETAIL_COLUMNS = 30;
export const MAX_DETAIL_LENGTH = 500;

export interface TableCommunities {
  readonly communities: Community[];
  /** Fields no column was found for; the page offers the file's columns to pick from. */
  readonly missingColumns: readonly CommunityColumn[];
  /** The file's columns, for that choice. */
  readonly columns: readonly string[];
}

/** Fields a file must give: a name, a position (unless the rows are placemarks or features) and vs30 or a site class. */
function missingFields(
  columnOf: ReadonlyMap<CommunityColumn, string>,
  hasGeometry: boolean,
  hasProxy: boolean,
): CommunityColumn[] {
  const missing: CommunityColumn[] = [];
  if (!columnOf.has('name')) missing.push('name');
  if (!hasGeometry && !columnOf.has('lat')) missing.push('lat');
  if (!hasGeometry && !columnOf.has('lon')) missing.push('lon');
  if (!hasProxy && !columnOf.has('vs30') && !columnOf.has('siteClass'))
    missing.push('vs30', 'siteClass');
  return missing;
}

/** Marks a raw row whose coordinates did not read (its problem is listed already). */
const BAD_POSITION = Symbol('bad position');

/** The raw community (as a study document would give it) of one row. */
function rowRecord(
  row: TableRow,
  columnOf: ReadonlyMap<CommunityColumn, string>,
  otherColumns: readonly string[],
  rowIssue: (field: string, message: string) => void,
): Record<string | symbol, unknown> {
  const cell = (key: CommunityColumn) => {
    const column = columnOf.get(key);
    return column === undefined ? undefined : row.cells[column];
  };
  const record: Record<string | symbol, unknown> = {};
  const put = (key: string, value: unknown) => {
    if (value !== undefined) record[key] = value;
  };
  put('id', cellText(cell('id')));
  put('name', cellText(cell('name')));
  if (row.lonLat) {
    record.lon = row.lonLat[0];
    record.lat = row.lonLat[1];
  } else {
    for (const axis of ['lon', 'lat'] as const) {
      const value = readCoordinate(cell(axis), axis);
      if (typeof value !== 'object') put(axis, value);
      else {
        rowIssue(axis, value.message);
        // A stand-in so the row's other fields are still checked; the row is dropped after.
        record[axis] = 0;
        record[BAD_POSITION] = true;
      }
    }
  }
  put('vs30', readNumber(cell('vs30')));
  put('siteClass', cellText(cell('siteClass'))?.toUpperCase());
  put('population', readNumber(cell('population'), true));
  put('coastal', readYesNo(cell('coastal')));
  put('elevationM', readNumber(cell('elevationM')));
  const details: Record<string, string> = {};
  for (const column of otherColumns.slice(0, MAX_DETAIL_COLUMNS)) {
    const text = cellText(row.cells[column]);
    if (text !== undefined) details[column.trim().slice(0, 80)] = text.slice(0, MAX_DETAIL_LENGTH);
  }
  if (Object.keys(details).length > 0) record.details = details;
  return record;
}

/**
 * The communities of a file read into a table. Columns are matched by their usual spellings
 * (or by `choice`); a missing id is made from the name; columns Tremora does not use are kept
 * as each community's details. Every problem goes to `issues` under `rootPath` and the row's
 * place in the file; valid rows are returned. With `proxy` (the study's terrain grid), vs30 and
 * site class may be missing: such rows take the slope–Vs30 proxy.
 */
export function tableCommunities(
  table: CommunityTable,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
  choice: ColumnChoice = {},
  proxy?: SiteProxy,
): TableCommunities {
  const { columnOf, otherColumns } = matchColumns(
    table.columns,
    choice,
    table.hasGeometry ? ['lon', 'lat'] : [],
  );
  const missingColumns = missingFields(columnOf, table.hasGeometry, proxy !== undefined);
  const result = (communities: Community[]): TableCommunities => ({
    communities,
    missingColumns,
    columns: table.columns,
  });
  if (missingColumns.length > 0) {
    const where = table.hasGeometry
      ? `${table.fileName} (${table.format} properties)`
      : `${table.fileName} (header)`;
    const said = missingColumns.includes('vs30')
      ? [...missingColumns.filter((k) => k !== 'vs30' && k !== 'siteClass'), 'vs30' as const]
      : missingColumns;
    for (const key of said) {
      const accepts =
        key === 'vs30'
          ? `vs30 (m/s), accepted as ${acceptedSpellings('vs30')}; or site class, accepted as ${acceptedSpellings('siteClass')}`
          : `${COLUMN_MEANINGS[key]}, accepted as ${acceptedSpellings(key)}`;
      issues.add(
        [
          ...rootPath,
          table.hasGeometry ? '[properties]' : table.format === 'CSV' ? '[line 1]' : '[header]',
        ],
        `${where}: no column recognised for ${accepts} (any case); the file's columns are ${table.columns.map((c) => `"${c}"`).join(', ') || 'none'}`,
      );
    }
    return result([]);
  }
  if (table.rows.length === 0) {
    issues.add(rootPath, `${table.fileName}: expected at least one community, got none`);
    return result([]);
  }
  if (table.rows.length > MAX_COMMUNITIES) {
    issues.add(
      rootPath,
      `${table.fileName}: expected at most ${MAX_COMMUNITIES} communities, got ${table.rows.length}`,
    );
    return result([]);
  }
  const givenIds = new Set(
    table.rows
      .map((r) => cellText(r.cells[columnOf.get('id') ?? '']))
      .filter((id) => id !== undefined),
  );
  const raw = table.rows.map((row) => {
    const record = rowRecord(row, columnOf, otherColumns, (field, message) =>
      issues.add([...rootPath, row.where, field], message),
    );
    if (record.id === undefined && typeof record.name === 'string') {
      // Made ids stay unique among themselves and the file's own ids: a second "Lower Bay" is lower-bay-2.
      const base = idFromName(record.name);
      let id = base;
      for (let n = 2; givenIds.has(id); n++) id = `${base}-${n}`;
      givenIds.add(id);
      record.id = id;
    }
    return record;
  });
  const valid = readCommunities(
    raw,
    issues,
    (i) => [...rootPath, (table.rows[i] as TableRow).where],
    proxy,
  );
  const badIds = new Set(raw.filter((r) => r[BAD_POSITION] === true).map((r) => r.id));
  return result(valid.filter((c) => !badIds.has(c.id)));
}

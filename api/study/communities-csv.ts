import type { Community } from '../engine/model.ts';
import type { SiteProxy } from '../engine/terrain/site-proxy.ts';
import { csvTable } from './community-files/csv-table.ts';
import { tableCommunities } from './community-files/table-communities.ts';
import { IssueList } from './issues.ts';

export interface CsvCommunities {
  readonly communities: Community[];
  readonly issues: IssueList;
}

/**
 * Reads communities from CSV text: any of the usual delimiters, a decimal point or comma, the
 * usual spellings of the column names (community-files/column-names.ts) in any order and case,
 * other columns kept as details. Every problem is reported with its line number (the header is
 * line 1) under `rootPath`; valid rows are kept.
 */
export function readCommunitiesCsv(
  text: string,
  rootPath: readonly PropertyKey[] = ['communities'],
  issues = new IssueList(),
  fileName = 'the communities CSV',
  proxy?: SiteProxy,
): CsvCommunities {
  const table = csvTable(text, fileName, rootPath, issues);
  if (table.columns.length === 0) {
    issues.add(
      rootPath,
      `${fileName}: expected CSV with a header line (e.g. name,lat,lon,vs30), got no lines`,
    );
    return { communities: [], issues };
  }
  return { communities: tableCommunities(table, rootPath, issues, {}, proxy).communities, issues };
}

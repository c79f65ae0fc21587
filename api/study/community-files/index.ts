export type { CommunityTable, TableRow, TableCell } from './community-table.ts';
export {
  COMMUNITY_COLUMNS,
  COLUMN_MEANINGS,
  type ColumnChoice,
  type CommunityColumn,
} from './column-names.ts';
export { CommunityFileProblem } from './file-problem.ts';
export { csvTable } from './csv-table.ts';
export { readCommunityFile, detectFormat, FORMAT_EXTENSIONS } from './read-community-file.ts';
export { tableCommunities, type TableCommunities } from './table-communities.ts';
export { communitiesCsvText } from './communities-csv-text.ts';

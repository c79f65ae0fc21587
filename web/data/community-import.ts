import type { InputIssue } from '../../api/engine/errors.ts';
import type { ModelCatalog } from '../../api/engine/motion/catalog.ts';
import type { StoredInputs } from '../../api/operations/study-input.ts';
import type {
  ColumnChoice,
  CommunityColumn,
} from '../../api/study/community-files/column-names.ts';
import { communitiesCsvText } from '../../api/study/community-files/communities-csv-text.ts';
import { CommunityFileProblem } from '../../api/study/community-files/file-problem.ts';
import { readCommunityFile } from '../../api/study/community-files/read-community-file.ts';
import { tableCommunities } from '../../api/study/community-files/table-communities.ts';
import { IssueList } from '../../api/study/issues.ts';
import { importCommunitiesCsv, type EditOutcome } from './study-edits.ts';

/**
 * Largest file sent back in the column-choice form (as base64, a third larger) so the user need
 * not choose it again; a larger one is asked for again, as the request limit is 5 MiB.
 */
export const MAX_CARRIED_BYTES = 3 * 1024 * 1024;

/** A file whose required columns were not recognised: its columns to pick from. */
export interface ColumnPick {
  readonly fileName: string;
  /** The file as base64, when small enough to carry in the form. */
  readonly fileData?: string;
  readonly columns: readonly string[];
  readonly missing: readonly CommunityColumn[];
  readonly chosen: ColumnChoice;
}

/** A file's problems, with the columns to pick from where required ones were not recognised. */
export interface CommunityFileRefusal {
  readonly ok: false;
  readonly issues: readonly InputIssue[];
  readonly pick?: ColumnPick;
  readonly text?: string;
}

/** A file read as communities, in CSV with Tremora's header, ready to apply to a study. */
export type CommunityFileRead =
  { readonly ok: true; readonly csvText: string } | CommunityFileRefusal;

export type CommunityImport = (EditOutcome & { readonly ok: true }) | CommunityFileRefusal;

/**
 * Reads communities from a file in any accepted format (CSV, XLSX, KML, KMZ, zipped shapefile,
 * GeoJSON), with columns picked by the user where their names were not recognised. The
 * communities come out as CSV with Tremora's header (communitiesCsvText), so the saved study
 * reads back the same whatever the file was. Reading is asynchronous and touches no study:
 * applying it (applyCommunitiesFile) is done on the study as read inside the write's transaction.
 */
export async function readCommunitiesFile(
  bytes: Uint8Array,
  fileName: string,
  choice: ColumnChoice,
): Promise<CommunityFileRead> {
  const issues = new IssueList();
  let table;
  try {
    table = await readCommunityFile(bytes, fileName, ['communities'], issues);
  } catch (error) {
    if (!(error instanceof CommunityFileProblem)) throw error;
    return { ok: false, issues: [{ path: 'communities', message: error.message }] };
  }
  const { communities, missingColumns, columns } = tableCommunities(
    table,
    ['communities'],
    issues,
    choice,
  );
  if (issues.issues.length > 0) {
    const text = table.format === 'CSV' ? new TextDecoder().decode(bytes) : undefined;
    const pick: ColumnPick | undefined =
      missingColumns.length === 0
        ? undefined
        : {
            fileName,
            columns,
            missing: missingColumns,
            chosen: choice,
            ...(bytes.byteLength <= MAX_CARRIED_BYTES
              ? { fileData: Buffer.from(bytes).toString('base64') }
              : {}),
          };
    return {
      ok: false,
      issues: issues.issues,
      ...(pick ? { pick } : {}),
      ...(text !== undefined ? { text } : {}),
    };
  }
  return { ok: true, csvText: communitiesCsvText(communities) };
}

/** Replaces a study's communities with those read from a file; nothing is saved on any problem. */
export function applyCommunitiesFile(
  inputs: StoredInputs,
  read: CommunityFileRead,
  models: ModelCatalog,
): CommunityImport {
  if (!read.ok) return read;
  return importCommunitiesCsv(inputs, read.csvText, models) as CommunityImport;
}

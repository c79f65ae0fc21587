import Papa from 'papaparse';
import type { VisitRecord } from '../store/visit-repository.ts';
import { FORMULA_START } from './run-csv.ts';

const FIELDS = [
  'communityId',
  'communityName',
  'visitedOn',
  'language',
  'peopleReached',
  'topics',
  'followUps',
  'referral',
  'recordedAt',
] as const;

/**
 * A study's visits as CSV, one row per visit, with the community's name beside its id. Text
 * cells that a spreadsheet could run as a formula get a leading ' (the same rule as the
 * results' CSV, run-csv.ts).
 */
export function visitCsv(
  visits: readonly VisitRecord[],
  names: ReadonlyMap<string, string>,
): string {
  return Papa.unparse(
    {
      fields: [...FIELDS],
      data: visits.map((v) => [
        v.communityId,
        names.get(v.communityId) ?? '',
        v.visitedOn,
        v.language,
        v.peopleReached,
        v.topics,
        v.followUps,
        v.referral,
        v.recordedAt,
      ]),
    },
    { newline: '\r\n', escapeFormulae: FORMULA_START },
  );
}

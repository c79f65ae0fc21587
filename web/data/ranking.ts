import {
  SCREENING_BANDS,
  type ScreeningBandId,
} from '../../api/engine/intensity/screening-band.ts';
import type { Study } from '../../api/engine/model.ts';
import type { CommunityResult, NearestFault, StudyResult } from '../../api/engine/results.ts';

/** The horizon the pages lead with: 50 years when the study computes it, else its longest. */
export function leadHorizonYears(horizonsYears: readonly number[]): number {
  if (horizonsYears.includes(50)) return 50;
  return Math.max(...horizonsYears);
}

export interface RankedCommunity {
  /** 1 for the community to reach first. */
  readonly rank: number;
  readonly communityId: string;
  readonly name: string;
  readonly bandId: ScreeningBandId;
  /** Chance of reaching MMI VII or more within `years`. */
  readonly chanceVii: number;
  readonly years: number;
  readonly population?: number;
  readonly nearestFault?: NearestFault;
  readonly result: CommunityResult;
}

const BAND_ORDER: readonly string[] = SCREENING_BANDS.map((b) => b.id);

/**
 * Communities in the order to reach them for outreach and referral: band first (Refer first
 * before Refer soon ...), then the chance of strong shaking (MMI VII or more) in the lead
 * horizon, highest first, then the number of people, most first, then name. Our rule: the
 * band says how soon, the chance and the people say who first within it.
 */
export function rankCommunities(study: Study, results: StudyResult): RankedCommunity[] {
  const years = leadHorizonYears(study.settings.horizonsYears);
  const people = new Map(study.communities.map((c) => [c.id, c.population]));
  const rows = results.communities.map((r) => {
    const population = people.get(r.communityId);
    const nearestFault = r.nearestFaults[0];
    return {
      communityId: r.communityId,
      name: r.name,
      bandId: r.band.id as ScreeningBandId,
      chanceVii: r.intensity.chanceOfReaching[String(years)]?.VII ?? 0,
      years,
      ...(population === undefined ? {} : { population }),
      ...(nearestFault ? { nearestFault } : {}),
      result: r,
    };
  });
  rows.sort(
    (a, b) =>
      BAND_ORDER.indexOf(a.bandId) - BAND_ORDER.indexOf(b.bandId) ||
      b.chanceVii - a.chanceVii ||
      (b.population ?? -1) - (a.population ?? -1) ||
      a.name.localeCompare(b.name),
  );
  return rows.map((row, i) => ({ ...row, rank: i + 1 }));
}

export const SORT_KEYS = ['rank', 'name', 'band', 'chance', 'people', 'fault'] as const;
export type SortKey = (typeof SORT_KEYS)[number];
export type SortDirection = 'ascending' | 'descending';

export const isSortKey = (key: unknown): key is SortKey =>
  (SORT_KEYS as readonly unknown[]).includes(key);

/** The direction a column sorts in when first chosen: the most pressing first. */
export const FIRST_DIRECTION: Readonly<Record<SortKey, SortDirection>> = {
  rank: 'ascending',
  name: 'ascending',
  band: 'ascending',
  chance: 'descending',
  people: 'descending',
  fault: 'ascending',
};

/** A column's value for a row; undefined (sorted last) where the row has none. */
type SortValue = (row: RankedCommunity) => number | string | undefined;

/** What each column sorts by. */
const SORT_VALUE: Readonly<Record<SortKey, SortValue>> = {
  rank: (r) => r.rank,
  name: (r) => r.name,
  band: (r) => BAND_ORDER.indexOf(r.bandId),
  chance: (r) => r.chanceVii,
  people: (r) => r.population,
  // Results saved before faults carried rrupKm sort by their Joyner-Boore distance.
  fault: (r) => r.nearestFault && (r.nearestFault.rrupKm ?? r.nearestFault.distanceKm),
};

/**
 * The ranked rows sorted by one column; ties keep the ranking's order. "band" ascending puts
 * Refer first on top; a missing population or fault sorts last either way.
 */
export function sortRanked(
  rows: readonly RankedCommunity[],
  key: SortKey,
  direction: SortDirection,
): RankedCommunity[] {
  const sign = direction === 'ascending' ? 1 : -1;
  const value = SORT_VALUE[key];
  return [...rows].sort((a, b) => {
    const va = value(a);
    const vb = value(b);
    if (va === undefined || vb === undefined)
      return va === vb ? a.rank - b.rank : va === undefined ? 1 : -1;
    const order = typeof va === 'string' ? va.localeCompare(vb as string) : va - (vb as number);
    return sign * order || a.rank - b.rank;
  });
}

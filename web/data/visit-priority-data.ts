import { z } from 'zod';
import type { Community, Study } from '../../api/engine/model.ts';
import type { StudyResult } from '../../api/engine/results.ts';
import {
  DEFAULT_PRIORITY_WEIGHTS,
  PRIORITY_COMPONENTS,
  visitPriorities,
  type PriorityWeights,
  type VisitPriority,
} from '../../api/results/visit-priority.ts';
import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';
import { leadHorizonYears } from './ranking.ts';

/** The largest weight the page accepts: weights are relative, so 0–10 is room enough. */
const MAX_WEIGHT = 10;

const weightSchema = z.coerce.number().min(0).max(MAX_WEIGHT);

/**
 * The weights asked for in the query (`w-people=3&w-chance=3...`); a weight missing or outside
 * 0–10 keeps its default and is named in `problems` (query key and what was expected).
 */
export function weightsFromQuery(query: (key: string) => string | undefined): {
  readonly weights: PriorityWeights;
  readonly problems: readonly { readonly path: string; readonly message: string }[];
} {
  const weights: Record<string, number> = { ...DEFAULT_PRIORITY_WEIGHTS };
  const problems: { path: string; message: string }[] = [];
  for (const id of PRIORITY_COMPONENTS) {
    const text = query(`w-${id}`);
    if (text === undefined || text.trim() === '') continue;
    const parsed = weightSchema.safeParse(text.trim().replace(',', '.'));
    if (parsed.success) weights[id] = parsed.data;
    else
      problems.push({
        path: `w-${id}`,
        message: `expected a number from 0 to ${MAX_WEIGHT}, got "${text.slice(0, 20)}"`,
      });
  }
  return { weights: weights as PriorityWeights, problems };
}

/** A details key without case, accents, spaces or units: "Airstrip (km)" → "airstrip". */
const plainKey = (key: string): string =>
  key
    .normalize('NFD')
    .replace(/\([^)]*\)|\[[^\]]*\]/g, '')
    .toLowerCase()
    .replace(/[^a-z]/g, '');

/** Details that name facilities (schools, clinics, health posts), in English and French. */
const FACILITY_KEY = /school|clinic|health|hospital|ecole|dispensaire|sante/;
/** Details that give a distance to an airstrip or the nearest larger place, km. */
const ISOLATION_KEY = /airstrip|nearesttown|nearestplace|isolation|piste|villeproche/;

const NO = /^(no|n|false|non|none|aucun|aucune|-)?$/i;

/** How many facilities a detail counts: its number, 1 for yes or a name, 0 for no. */
function facilityCount(value: string): number {
  const text = value.trim();
  const number = Number(text.replace(',', '.'));
  if (text !== '' && Number.isFinite(number)) return Math.max(0, number);
  if (NO.test(text)) return 0;
  // "yes", "oui" or a name ("Upper school") all say there is one.
  return 1;
}

/** The first number in the text, km; undefined when there is none. */
function firstNumber(value: string): number | undefined {
  const match = /\d+(?:[.,]\d+)?/.exec(value);
  return match ? Number(match[0].replace(',', '.')) : undefined;
}

/**
 * Facilities (sum over the details that name them) and isolation (km, from the first detail
 * that gives a distance to an airstrip or larger place), undefined where the details say nothing.
 */
export function detailValues(details: Community['details']): {
  readonly facilities?: number;
  readonly isolation?: number;
} {
  let facilities: number | undefined;
  let isolation: number | undefined;
  for (const [key, value] of Object.entries(details ?? {})) {
    const plain = plainKey(key);
    if (FACILITY_KEY.test(plain)) facilities = (facilities ?? 0) + facilityCount(value);
    else if (ISOLATION_KEY.test(plain) && isolation === undefined) isolation = firstNumber(value);
  }
  return {
    ...(facilities === undefined ? {} : { facilities }),
    ...(isolation === undefined ? {} : { isolation }),
  };
}

export interface PriorityRow {
  readonly priority: VisitPriority;
  readonly rank: number;
  readonly name: string;
  readonly bandId: ScreeningBandId;
}

/**
 * Every screened community's visit priority, highest first: the people, the chance of MMI VII
 * or more in the lead horizon (the damaging level of the screening bands), the band's firmness
 * (the share of the logic tree's weight that gives the community's own band: a band most
 * choices agree on is firmer ground for what a visit tells people; unknown in results saved
 * before the tree was summarised), and what its details say of facilities and isolation.
 */
export function priorityRows(
  study: Study,
  results: StudyResult,
  weights: PriorityWeights,
): PriorityRow[] {
  const years = leadHorizonYears(study.settings.horizonsYears);
  const communities = new Map(study.communities.map((c) => [c.id, c]));
  const byId = new Map(results.communities.map((r) => [r.communityId, r]));
  const scored = visitPriorities(
    results.communities.map((r) => {
      const community = communities.get(r.communityId);
      return {
        communityId: r.communityId,
        values: {
          ...(community?.population === undefined ? {} : { people: community.population }),
          chance: r.intensity.chanceOfReaching[String(years)]?.VII ?? 0,
          ...(r.bandRobustness === undefined
            ? {}
            : { firmness: r.bandRobustness.bandShares[r.band.id] ?? 0 }),
          ...detailValues(community?.details),
        },
      };
    }),
    weights,
  );
  return scored.map((priority, i) => {
    const result = byId.get(priority.communityId);
    return {
      priority,
      rank: i + 1,
      name: result?.name ?? priority.communityId,
      bandId: (result?.band.id ?? 'inform') as ScreeningBandId,
    };
  });
}

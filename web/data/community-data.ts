import { levelAtReturnPeriod } from '../../api/engine/hazard/curve-interpolation.ts';
import { INTENSITY_MEASURE } from '../../api/engine/intensity/site-intensity.ts';
import type { Community, Study } from '../../api/engine/model.ts';
import type { CommunityResult, Provenance } from '../../api/engine/results.ts';
import { leadHorizonYears } from './ranking.ts';

/** One level of shaking described on the community page: its return period, chance and MMI. */
export interface ShakingLevel {
  readonly returnPeriodYears: number;
  /** Poisson chance of reaching it within the lead horizon: 1 − exp(−years / T). */
  readonly chance: number;
  readonly mmi: number | null;
  /** Whole MMI level reached (1–10), as mmiRoman names it. */
  readonly mmiLevel: number | null;
  readonly roman: string | null;
  readonly pgaG: number | null;
}

export interface SourceShare {
  readonly sourceId: string | null;
  readonly name: string;
  readonly share: number;
}

export interface CommunityPageData {
  readonly community: Community;
  readonly result: CommunityResult;
  readonly years: number;
  /** Chance of reaching MMI VI, VII, VIII within `years`. */
  readonly chances: Readonly<Record<'VI' | 'VII' | 'VIII', number>>;
  readonly levels: readonly ShakingLevel[];
  /** Top sources by share of the first return period's shaking; the rest summed as one row. */
  readonly sources: readonly SourceShare[];
  readonly sourcesReturnPeriod?: number;
  readonly meanMagnitude?: number;
  readonly meanDistanceKm?: number;
  /** Spread of the branches' PGA at the first return period, g. */
  readonly spread?: {
    readonly returnPeriodYears: number;
    readonly lowG: number;
    readonly highG: number;
    readonly branches: number;
  };
}

/** Sources listed by name before the rest are summed. */
export const TOP_SOURCES = 4;

/** The smallest share listed: it shows as 1% (shares are shown as whole percentages). */
export const SHOWN_SHARE = 0.005;

/** What the community page shows, from the study and the run's result for the community. */
export function communityPageData(
  study: Study,
  community: Community,
  result: CommunityResult,
): CommunityPageData {
  const years = leadHorizonYears(study.settings.horizonsYears);
  const chances = result.intensity.chanceOfReaching[String(years)] ?? { VI: 0, VII: 0, VIII: 0 };
  const returnPeriods = [...study.settings.returnPeriodsYears].sort((a, b) => a - b);
  const levels = returnPeriods.map((t): ShakingLevel => {
    const at = result.intensity.atReturnPeriod[String(t)];
    const mmi = at?.mmi ?? null;
    return {
      returnPeriodYears: t,
      chance: 1 - Math.exp(-years / t),
      mmi,
      mmiLevel: mmi === null ? null : Math.min(10, Math.max(1, Math.floor(mmi))),
      roman: at?.roman ?? null,
      pgaG: result.atReturnPeriod[String(t)]?.[INTENSITY_MEASURE] ?? null,
    };
  });
  const firstPeriod = returnPeriods[0];
  const deagg = firstPeriod === undefined ? undefined : result.deaggregation[String(firstPeriod)];
  const ordered = [...(deagg?.bySource ?? [])].sort((a, b) => b.share - a.share);
  // A source (or the rest together) is listed only when its share shows as 1% or more.
  const named = ordered.slice(0, TOP_SOURCES).filter((s) => s.share >= SHOWN_SHARE);
  const sources: SourceShare[] = named.map((s) => ({
    sourceId: s.sourceId,
    name: s.name,
    share: s.share,
  }));
  const rest = ordered.slice(named.length).reduce((sum, s) => sum + s.share, 0);
  if (rest >= SHOWN_SHARE) sources.push({ sourceId: null, name: '', share: rest });
  const curve = result.curves[INTENSITY_MEASURE];
  let spread: CommunityPageData['spread'];
  if (curve?.branches && curve.branches.length > 1 && firstPeriod !== undefined) {
    const values = curve.branches
      .map((b) => levelAtReturnPeriod(curve.levels, b.annualRate, firstPeriod).level)
      .filter((v): v is number => v !== null);
    if (values.length > 1)
      spread = {
        returnPeriodYears: firstPeriod,
        lowG: Math.min(...values),
        highG: Math.max(...values),
        branches: curve.branches.length,
      };
  }
  return {
    community,
    result,
    years,
    chances,
    levels,
    sources,
    ...(firstPeriod !== undefined && deagg
      ? {
          sourcesReturnPeriod: firstPeriod,
          meanMagnitude: deagg.mean.magnitude,
          meanDistanceKm: deagg.mean.distanceKm,
        }
      : {}),
    ...(spread ? { spread } : {}),
  };
}

/** The models of a provenance in one line: "crustal: BSSA14 (0.5), CB14 (0.5); interface: AGA16". */
export function modelsLine(provenance: Provenance): string {
  return Object.entries(provenance.models)
    .map(
      ([setting, branches]) =>
        `${setting}: ${branches.map((b) => (branches.length > 1 ? `${b.model} (${b.weight})` : b.model)).join(', ')}`,
    )
    .join('; ');
}

/** Characters of the input hash shown in provenance lines (enough to tell runs apart by eye). */
export const HASH_PREFIX_LENGTH = 12;

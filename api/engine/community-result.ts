import { nearestFaults } from './geometry/nearest-faults.ts';
import type { LocalFrame } from './geometry/projection.ts';
import { levelAtReturnPeriod } from './hazard/curve-interpolation.ts';
import { poissonProbability } from './hazard/poisson.ts';
import type { HazardMeasure, ValiditySummary } from './hazard/hazard-types.ts';
import { intensityMeasureOf, siteIntensity } from './intensity/site-intensity.ts';
import { INTENSITY_CONVERSIONS } from './intensity/worden2012.ts';
import type { Community, Study, Vs30Proxy } from './model.ts';
import type {
  BandRobustness,
  CommunityResult,
  Deaggregation,
  HazardCurve,
  ReturnPeriodStatus,
} from './results.ts';

/** Each community's list of nearest faults holds this many. */
export const NEAREST_FAULT_COUNT = 3;

/** The study's measures with their levels; `all` adds PGA (not reported) when missing, for intensity. */
export interface ScreeningMeasures {
  readonly reported: readonly HazardMeasure[];
  readonly all: readonly HazardMeasure[];
}

/** What either path of the hazard integral gives for one community. */
export interface CommunityHazard {
  /** Curves of every measure in ScreeningMeasures.all, by key. */
  readonly curves: Readonly<Record<string, HazardCurve>>;
  readonly validity: readonly ValiditySummary[];
  /** Fractile curves (by measure key, then fractile) and band robustness over the whole logic tree. */
  readonly tree?: {
    readonly fractiles: Readonly<Record<string, Readonly<Record<string, readonly number[]>>>>;
    readonly robustness: BandRobustness;
  };
  /** Deaggregation of the mean hazard of the first reported measure at `level`, or null when nothing exceeds it. */
  deaggregate(
    measure: HazardMeasure,
    level: number,
    returnPeriodYears: number,
  ): Deaggregation | null;
}

const WHY_NO_LEVEL: Readonly<Record<ReturnPeriodStatus, string>> = {
  ok: 'is exceeded by no rupture',
  'below-lowest-level': 'is below the lowest computed level',
  'above-highest-level': 'is above the highest computed level',
};

/**
 * One community's results from its hazard: levels at the return periods, Poisson chances over
 * the horizons, intensity and band, deaggregation at each return period, nearest faults and
 * warnings (the result shape of results.ts).
 */
export function communityResult(
  study: Study,
  community: Community,
  frame: LocalFrame,
  measures: ScreeningMeasures,
  hazard: CommunityHazard,
): CommunityResult {
  const { settings } = study;
  const warnings: string[] = hazard.validity.map(
    (v) =>
      `${v.model}: ${v.outside} of ${v.evaluated} rupture predictions within ${settings.maxDistanceKm} km are outside its validity range ` +
      `(for example, ${v.firstNote})`,
  );

  if (community.vs30Proxy !== undefined)
    warnings.push(proxyNote(community.vs30, community.vs30Proxy));

  const curves: CommunityResult['curves'] = Object.fromEntries(
    measures.reported.map((m) => {
      const fractiles = hazard.tree?.fractiles[m.key];
      return [m.key, fractiles ? { ...hazard.curves[m.key]!, fractiles } : hazard.curves[m.key]!];
    }),
  );
  const atReturnPeriod: Record<string, Record<string, number | null>> = {};
  const returnPeriodStatus: Record<string, Record<string, ReturnPeriodStatus>> = {};
  for (const years of settings.returnPeriodsYears) {
    const levels: Record<string, number | null> = {};
    const statuses: Record<string, ReturnPeriodStatus> = {};
    for (const m of measures.reported) {
      const curve = hazard.curves[m.key]!;
      const { level, status } = levelAtReturnPeriod(curve.levels, curve.annualRate, years);
      levels[m.key] = level;
      statuses[m.key] = status;
    }
    atReturnPeriod[String(years)] = levels;
    returnPeriodStatus[String(years)] = statuses;
  }

  const chanceOfExceeding: Record<string, Record<string, number[]>> = {};
  for (const years of settings.horizonsYears) {
    chanceOfExceeding[String(years)] = Object.fromEntries(
      measures.reported.map((m) => [
        m.key,
        hazard.curves[m.key]!.annualRate.map((rate) => poissonProbability(rate, years)),
      ]),
    );
  }

  const intensityMeasure = intensityMeasureOf(settings);
  const curve = hazard.curves[intensityMeasure]!;
  const intensity = siteIntensity({
    levels: curve.levels,
    annualRate: curve.annualRate,
    returnPeriodsYears: settings.returnPeriodsYears,
    horizonsYears: settings.horizonsYears,
    conversion: INTENSITY_CONVERSIONS[intensityMeasure],
  });
  warnings.push(...intensity.warnings);

  const first = measures.reported[0]!;
  const firstCurve = hazard.curves[first.key]!;
  const deaggregation: Record<string, Deaggregation> = {};
  for (const years of settings.returnPeriodsYears) {
    const { level, status } = levelAtReturnPeriod(firstCurve.levels, firstCurve.annualRate, years);
    const result = level === null ? null : hazard.deaggregate(first, level, years);
    if (result) deaggregation[String(years)] = result;
    else
      warnings.push(
        `no deaggregation at ${years} years: the ${years}-year ${first.key} ${WHY_NO_LEVEL[status]}`,
      );
  }

  const lonLat = [community.lon, community.lat] as const;
  return {
    communityId: community.id,
    name: community.name,
    curves,
    atReturnPeriod,
    returnPeriodStatus,
    chanceOfExceeding,
    intensity: intensity.intensity,
    deaggregation,
    nearestFaults: nearestFaults(study.sources, frame, lonLat, NEAREST_FAULT_COUNT),
    band: intensity.band,
    ...(hazard.tree ? { bandRobustness: hazard.tree.robustness } : {}),
    ...(community.vs30Proxy !== undefined
      ? { vs30Proxy: { vs30: community.vs30, ...community.vs30Proxy } }
      : {}),
    warnings,
  };
}

/** The warning every export carries for a Vs30 from the slope proxy, with its stated range. */
function proxyNote(vs30: number, proxy: Vs30Proxy): string {
  const [min, max] = proxy.vs30Range;
  return (
    `Vs30 ${Math.round(vs30)} m/s is a proxy from the topographic slope (${proxy.slope.toPrecision(2)} m/m; ` +
    `Wald & Allen 2007, active regions), not a measurement: class ${proxy.siteClass}, likely ${min}–${max} m/s`
  );
}

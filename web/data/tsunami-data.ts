import { InvalidInput } from '../../api/engine/errors.ts';
import type { Study } from '../../api/engine/model.ts';
import type { ScenarioRequest } from '../../api/engine/scenario/index.ts';
import type { TsunamiCommunity, TsunamiResult } from '../../api/engine/tsunami/index.ts';
import { inputHash } from '../../api/results/input-hash.ts';
import type { ServiceContext } from '../../api/operations/service-context.ts';
import { tsunamiTimesOf } from '../../api/operations/tsunami-times.ts';

/** Tsunami times for a page: the result, or the problem that stopped it (never a silent gap). */
export type TsunamiPageResult =
  | { readonly ok: true; readonly result: TsunamiResult }
  | { readonly ok: false; readonly problem: string };

/** Whether a study asks for tsunami times: a terrain grid, an interface source and a coastal community. */
export const hasTsunamiTimes = (study: Study): boolean =>
  study.terrain !== undefined &&
  study.sources.some((s) => s.setting === 'interface') &&
  study.communities.some((c) => c.coastal);

async function attempt(work: () => Promise<TsunamiResult>): Promise<TsunamiPageResult> {
  try {
    return { ok: true, result: await work() };
  } catch (error) {
    if (error instanceof InvalidInput)
      return { ok: false, problem: error.issues.map((i) => i.message).join('; ') };
    throw error;
  }
}

/** The study's tsunami times from all its interface sources; undefined when it asks for none. */
export async function studyTsunami(
  ctx: ServiceContext,
  study: Study,
): Promise<TsunamiPageResult | undefined> {
  if (!hasTsunamiTimes(study)) return undefined;
  return attempt(() => tsunamiTimesOf(ctx).forStudy(study, inputHash(study)));
}

/** The times for one scenario rupture; undefined unless its source is an interface source. */
export async function scenarioTsunamiTimes(
  ctx: ServiceContext,
  study: Study,
  request: Pick<ScenarioRequest, 'sourceId' | 'magnitude' | 'position'>,
): Promise<TsunamiPageResult | undefined> {
  const source = study.sources.find((s) => s.id === request.sourceId);
  if (!hasTsunamiTimes(study) || source?.setting !== 'interface') return undefined;
  return attempt(() => tsunamiTimesOf(ctx).forScenario(study, inputHash(study), request));
}

/** Coastal communities by time to act: earliest first arrival first, then the high end; no estimate last. */
export function rankByTimeToAct(result: TsunamiResult): TsunamiCommunity[] {
  const key = (c: TsunamiCommunity) => c.firstArrivalMinutes ?? Infinity;
  return [...result.communities].sort(
    (a, b) =>
      key(a) - key(b) ||
      (a.latestMinutes ?? Infinity) - (b.latestMinutes ?? Infinity) ||
      a.name.localeCompare(b.name),
  );
}

import { z } from 'zod';
import { InvalidInput } from '../engine/errors.ts';
import type { ScenarioPosition, ScenarioRequest } from '../engine/scenario/index.ts';
import { describeValue, identifier, numberIn } from '../study/fields.ts';
import { IssueList } from '../study/issues.ts';

/** Keys a scenario request may have (besides the posted study). */
export const SCENARIO_KEYS = [
  'sourceId',
  'magnitude',
  'position',
  'gridSpacingKm',
  'gridVs30',
] as const;

const scenarioSchema = z.object({
  sourceId: identifier(),
  // The scenario engine's own range (engine/scenario/scenario.ts): M 3 to 9.6.
  magnitude: numberIn({ min: 3, max: 9.6, unit: '(moment magnitude)' }),
  // Finer than 0.5 km adds points without detail at screening scale; the engine caps the count.
  gridSpacingKm: numberIn({ min: 0.5, max: 100, unit: 'km' }).optional(),
  gridVs30: numberIn({ min: 50, max: 5000, unit: 'm/s' }).optional(),
});

const POSITION_EXPECTED =
  'expected "closest", "middle", { "communityId" }, { "alongStrikeKm", "downDipKm" } (km, faults) or { "lon", "lat" } (degrees)';

function readPosition(
  raw: unknown,
  issues: IssueList,
  path: readonly PropertyKey[],
): ScenarioPosition | undefined {
  // Left out: the engine's default ("middle" with a map, "closest" without).
  if (raw === undefined) return undefined;
  if (raw === 'closest' || raw === 'middle') return raw;
  const given = raw as Record<string, unknown> | null;
  if (typeof given !== 'object' || given === null || Array.isArray(given)) {
    issues.add(path, `${POSITION_EXPECTED}, got ${describeValue(raw)}`);
    return undefined;
  }
  if ('communityId' in given)
    return issues.parse(z.object({ communityId: identifier() }), given, path);
  if ('alongStrikeKm' in given || 'downDipKm' in given) {
    const distance = numberIn({ min: 0, max: 2000, unit: 'km' });
    return issues.parse(z.object({ alongStrikeKm: distance, downDipKm: distance }), given, path);
  }
  if ('lon' in given || 'lat' in given) {
    return issues.parse(
      z.object({
        lon: numberIn({ min: -180, max: 180, unit: 'degrees' }),
        lat: numberIn({ min: -90, max: 90, unit: 'degrees' }),
      }),
      given,
      path,
    );
  }
  issues.add(
    path,
    `${POSITION_EXPECTED}, got an object with ${Object.keys(given).join(', ') || 'no keys'}`,
  );
  return undefined;
}

/**
 * Validates a scenario request (sourceId, magnitude, optional position and map grid); keys
 * in `extraKeys` (the posted study) are the caller's. Throws InvalidInput listing every problem.
 */
export function readScenarioRequest(
  raw: Record<string, unknown>,
  extraKeys: readonly string[] = [],
): ScenarioRequest {
  const issues = new IssueList();
  for (const key of Object.keys(raw)) {
    if (!(SCENARIO_KEYS as readonly string[]).includes(key) && !extraKeys.includes(key)) {
      issues.add(
        [key],
        `unknown key; expected one of ${[...extraKeys, ...SCENARIO_KEYS].join(', ')}`,
      );
    }
  }
  const fields = issues.parse(scenarioSchema, raw, []);
  const position = readPosition(raw.position, issues, ['position']);
  if (issues.issues.length > 0 || !fields || (raw.position !== undefined && !position))
    throw new InvalidInput(issues.issues, 'invalid scenario request');
  return {
    sourceId: fields.sourceId,
    magnitude: fields.magnitude,
    ...(position === undefined ? {} : { position }),
    ...(fields.gridSpacingKm === undefined ? {} : { gridSpacingKm: fields.gridSpacingKm }),
    ...(fields.gridVs30 === undefined ? {} : { gridVs30: fields.gridVs30 }),
  };
}

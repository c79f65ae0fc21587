import { z } from 'zod';
import type { Branch, GroundMotionBranches, Settings, TectonicSetting } from '../engine/model.ts';
import { TECTONIC_SETTINGS } from '../engine/model.ts';
import type { ModelCatalog } from '../engine/motion/catalog.ts';
import { measureSupport } from '../engine/motion/catalog.ts';
import { parseMeasure } from '../engine/motion/measure.ts';
import { describeValue, listOf, numberIn } from './fields.ts';
import type { IssueList } from './issues.ts';

/** Logic-tree weights must sum to 1 within this (DESIGN.md: weights sum to 1). */
export const WEIGHT_SUM_TOLERANCE = 1e-6;

const branchSchema = z.object({
  model: z.string({ error: (i) => `expected a model name, got ${describeValue(i.input)}` }),
  weight: numberIn({ min: 0, minOpen: true, max: 1 }),
});

/**
 * Validates the logic-tree branches per tectonic setting. Model names must be known, suit the
 * setting and cover every measure; weights must sum to 1. A setting that the sources use but the
 * study leaves out gets the catalog's default branches, with a warning.
 */
export function readBranches(
  raw: unknown,
  usedSettings: ReadonlySet<TectonicSetting>,
  settings: Settings | undefined,
  models: ModelCatalog,
  issues: IssueList,
  path: readonly PropertyKey[],
): GroundMotionBranches | undefined {
  if (raw !== undefined && (typeof raw !== 'object' || raw === null || Array.isArray(raw))) {
    issues.add(
      path,
      `expected an object with branch lists for ${TECTONIC_SETTINGS.join(', ')}, got ${describeValue(raw)}`,
    );
    return undefined;
  }
  const given = (raw ?? {}) as Record<string, unknown>;
  issues.warnUnknownKeys(given, TECTONIC_SETTINGS, path);
  const measures = settings?.measures.map(parseMeasure) ?? [];
  const out = {} as Record<TectonicSetting, readonly Branch[]>;
  let ok = true;
  for (const setting of TECTONIC_SETTINGS) {
    const settingPath = [...path, setting];
    if (given[setting] === undefined) {
      out[setting] = models.defaultBranches[setting];
      if (usedSettings.has(setting)) {
        const list = out[setting].map((b) => `${b.model} (weight ${b.weight})`).join(', ');
        issues.warn(settingPath, `not given; the ${setting} sources use the default ${list}`);
      }
      continue;
    }
    const branches = issues.parse(
      listOf(branchSchema, 1, 10, 'branches'),
      given[setting],
      settingPath,
    );
    if (!branches) {
      ok = false;
      continue;
    }
    // Model names are matched in any case and kept as the catalog spells them.
    const named = branches.map((branch) => ({
      ...branch,
      model: models.find(branch.model)?.name ?? branch.model,
    }));
    named.forEach((branch, i) => {
      const modelPath = [...settingPath, i, 'model'];
      const model = models.find(branch.model);
      if (!model) {
        issues.add(
          modelPath,
          `unknown model "${branch.model}"; expected one of ${models.names.join(', ')}`,
        );
        ok = false;
        return;
      }
      if (!model.settings.includes(setting)) {
        issues.add(
          modelPath,
          `${model.name} is for ${model.settings.join(' and ')} earthquakes; expected a model for ${setting} earthquakes`,
        );
        ok = false;
      }
      if (named.findIndex((b) => b.model === branch.model) !== i) {
        issues.add(
          modelPath,
          `${branch.model} is listed twice; expected each model once per setting`,
        );
        ok = false;
      }
      if (!usedSettings.has(setting)) return;
      measures.forEach((measure, m) => {
        const reason = measureSupport(model, measure);
        if (reason) {
          issues.add(modelPath, `${reason}, which settings.measures[${m}] asks for`);
          ok = false;
        }
      });
    });
    const sum = branches.reduce((s, b) => s + b.weight, 0);
    if (Math.abs(sum - 1) > WEIGHT_SUM_TOLERANCE) {
      issues.add(
        settingPath,
        `expected weights summing to 1 (within ${WEIGHT_SUM_TOLERANCE}), got ${Number(sum.toPrecision(12))}`,
      );
      ok = false;
    }
    out[setting] = named;
  }
  return ok ? out : undefined;
}

import { UnknownModel } from '../errors.ts';
import type { Branch, TectonicSetting } from '../model.ts';
import type { Measure } from './measure.ts';
import { canDerivePgv, PGV_FROM_SA_PERIOD_S } from './pgv-from-sa.ts';
import type { GroundMotionModel } from './types.ts';

/** The ground-motion models a study may name, and the branches used where it names none. */
export interface ModelCatalog {
  readonly names: readonly string[];
  /** Any case: "bssa14" finds BSSA14 (a model's name is not case-sensitive for people). */
  find(name: string): GroundMotionModel | undefined;
  /** Throws UnknownModel. */
  get(name: string): GroundMotionModel;
  readonly defaultBranches: Readonly<Record<TectonicSetting, readonly Branch[]>>;
}

export function createModelCatalog(
  models: readonly GroundMotionModel[],
  defaultBranches: Readonly<Record<TectonicSetting, readonly Branch[]>>,
): ModelCatalog {
  const byName = new Map(models.map((m) => [m.name.toLowerCase(), m]));
  const names = models.map((m) => m.name);
  return {
    names,
    find: (name) => byName.get(name.toLowerCase()),
    get(name) {
      const model = byName.get(name.toLowerCase());
      if (!model) throw new UnknownModel(name, names);
      return model;
    },
    defaultBranches,
  };
}

/**
 * Why `model` cannot give `measure`, or undefined when it can. PGV is available from any model
 * that has PGV or SA at the period it is derived from (pgv-from-sa.ts); SA only inside the model's period table (no extrapolation).
 */
export function measureSupport(model: GroundMotionModel, measure: Measure): string | undefined {
  const first = model.periodsS[0];
  const last = model.periodsS[model.periodsS.length - 1];
  const inTable = (t: number) =>
    first !== undefined && last !== undefined && t >= first * (1 - 1e-6) && t <= last * (1 + 1e-6);
  switch (measure.kind) {
    case 'PGA':
      return model.hasPga ? undefined : `${model.name} has no PGA`;
    case 'PGV':
      return model.hasPgv || canDerivePgv(model)
        ? undefined
        : `${model.name} has no PGV and no SA(${PGV_FROM_SA_PERIOD_S}) to derive it from`;
    case 'SA':
      if (first === undefined || last === undefined)
        return `${model.name} has no spectral accelerations`;
      return inTable(measure.periodS)
        ? undefined
        : `${model.name} covers SA periods ${first} to ${last} s; got ${measure.periodS} s`;
  }
}

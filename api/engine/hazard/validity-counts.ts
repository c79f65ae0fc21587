import type { ValiditySummary } from './hazard-types.ts';

/** One model's predictions evaluated, how many were outside its validity, and the first note. */
export interface ModelValidityCounts {
  outside: number;
  evaluated: number;
  firstNote: string;
}

/** Per-model validity counts, gathered as pairs are evaluated. */
export type ValidityCounts = Map<string, ModelValidityCounts>;

/** The counts of `model`, started at zero the first time the model is met. */
export function countsOf(counts: ValidityCounts, model: string): ModelValidityCounts {
  let c = counts.get(model);
  if (c === undefined) counts.set(model, (c = { outside: 0, evaluated: 0, firstNote: '' }));
  return c;
}

/** The models that had a prediction outside their validity, in the order they were met. */
export const validitySummaries = (counts: ValidityCounts): ValiditySummary[] =>
  [...counts.entries()].filter(([, s]) => s.outside > 0).map(([model, s]) => ({ model, ...s }));

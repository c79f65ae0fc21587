import type { Recurrence, RecurrenceAlternatives } from '../model.ts';

/** The recurrence parameters a source's logic tree may vary, in the order variants list them. */
export const ALTERNATIVE_KEYS = ['mMax', 'bValue', 'shape', 'slipRateMmYr', 'rate'] as const;
export type AlternativeKey = (typeof ALTERNATIVE_KEYS)[number];

/**
 * Most variants (combinations of one alternative per parameter) one source may have: e.g.
 * 3 maximum magnitudes × 3 b-values × 2 shapes × 3 slip rates = 54. The study schema refuses
 * more, so a source's curves stay few enough to compute at every site.
 */
export const MAX_SOURCE_VARIANTS = 64;

/** One variant of a source's recurrence: the parameters chosen, its weight, and the recurrence it makes. */
export interface RecurrenceVariant {
  readonly weight: number;
  /** The recurrence with the chosen values in place of the single ones (and no alternatives). */
  readonly recurrence: Recurrence;
  /** Index of the alternative chosen for each varied parameter. */
  readonly choices: Readonly<Partial<Record<AlternativeKey, number>>>;
}

/** The parameters a recurrence's tree varies (listed with at least one alternative), in ALTERNATIVE_KEYS order. */
export function variedKeys(alternatives: RecurrenceAlternatives | undefined): AlternativeKey[] {
  if (!alternatives) return [];
  return ALTERNATIVE_KEYS.filter((key) => (alternatives[key]?.length ?? 0) > 0);
}

/** How many variants a recurrence has (1 without alternatives). */
export function variantCount(recurrence: Recurrence): number {
  const alternatives = recurrence.alternatives;
  return variedKeys(alternatives).reduce((n, key) => n * alternatives![key]!.length, 1);
}

/**
 * Every variant of a recurrence, the first varied parameter changing slowest; weights are the
 * products of the chosen alternatives' weights (the parameters are taken as independent), so
 * they sum to 1. Without alternatives: the recurrence itself, weight 1.
 */
export function recurrenceVariants(recurrence: Recurrence): RecurrenceVariant[] {
  const { alternatives, ...single } = recurrence;
  let variants: RecurrenceVariant[] = [
    { weight: 1, recurrence: single as Recurrence, choices: {} },
  ];
  for (const key of variedKeys(alternatives)) {
    const list = alternatives![key]!;
    variants = variants.flatMap((v) =>
      list.map((alternative, index) => ({
        weight: v.weight * alternative.weight,
        recurrence: { ...v.recurrence, [key]: alternative.value } as Recurrence,
        choices: { ...v.choices, [key]: index },
      })),
    );
  }
  return variants;
}

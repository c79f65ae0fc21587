/**
 * Priority for awareness visits, beside the screening band (which stays a statement about
 * shaking). Each component is scaled to its share of the largest value among the communities
 * ranked (min-max scaling with a minimum of zero), and the score is the weighted mean of the
 * shares, 0 to 100: the linear aggregation of normalised indicators that composite indices
 * commonly use (OECD & JRC 2008, "Handbook on Constructing Composite Indicators", sections 5
 * and 6; from memory). Every share and weight is returned so a page can show how a score came
 * about.
 */

/** The components, in the order pages show them. */
export const PRIORITY_COMPONENTS = [
  'people',
  'chance',
  'firmness',
  'facilities',
  'isolation',
] as const;
export type PriorityComponentId = (typeof PRIORITY_COMPONENTS)[number];

export type PriorityWeights = Readonly<Record<PriorityComponentId, number>>;

/**
 * Default weights (relative; any non-negative numbers): the people exposed and the chance of
 * damaging shaking count three times as much as the band's firmness, facilities and
 * isolation, which refine the choice but say nothing about the shaking or the number of
 * people (common practice).
 */
export const DEFAULT_PRIORITY_WEIGHTS: PriorityWeights = {
  people: 3,
  chance: 3,
  firmness: 1,
  facilities: 1,
  isolation: 1,
};

export interface PriorityInput {
  readonly communityId: string;
  /** people: residents; chance: probability 0–1 of damaging shaking in the horizon; firmness: share 0–1 of the logic tree's weight in the community's band; facilities: schools and clinics; isolation: km to the nearest airstrip or larger place. Undefined when unknown. */
  readonly values: Readonly<Partial<Record<PriorityComponentId, number>>>;
}

export interface PriorityComponent {
  readonly id: PriorityComponentId;
  /** The value given, undefined when unknown (it then counts as none). */
  readonly value: number | undefined;
  /** The value as a share of the largest among the communities, 0–1. */
  readonly share: number;
  readonly weight: number;
  /** Whether any community has this value: a component nobody has is left out of every score. */
  readonly used: boolean;
  /** This component's part of the score, in score points. */
  readonly points: number;
}

export interface VisitPriority {
  readonly communityId: string;
  /** Weighted mean of the used components' shares, 0–100. */
  readonly score: number;
  readonly components: readonly PriorityComponent[];
}

/**
 * Scores `inputs` with `weights` and returns them highest score first (ties keep the input
 * order). Values below zero count as zero; when every used weight is zero, every score is 0.
 */
export function visitPriorities(
  inputs: readonly PriorityInput[],
  weights: PriorityWeights = DEFAULT_PRIORITY_WEIGHTS,
): VisitPriority[] {
  const largest = new Map<PriorityComponentId, number>();
  for (const id of PRIORITY_COMPONENTS) {
    const known = inputs.map((i) => i.values[id]).filter((v): v is number => v !== undefined);
    if (known.length > 0) largest.set(id, Math.max(0, ...known));
  }
  const weightSum = PRIORITY_COMPONENTS.reduce(
    (sum, id) => sum + (largest.has(id) ? Math.max(0, weights[id]) : 0),
    0,
  );
  const scored = inputs.map((input, order) => {
    const components = PRIORITY_COMPONENTS.map((id): PriorityComponent => {
      const value = input.values[id];
      const max = largest.get(id);
      const share =
        value !== undefined && max !== undefined && max > 0 ? Math.max(0, value) / max : 0;
      const weight = Math.max(0, weights[id]);
      const used = max !== undefined;
      const points = used && weightSum > 0 ? (100 * weight * share) / weightSum : 0;
      return { id, value, share, weight, used, points };
    });
    const score = components.reduce((sum, c) => sum + c.points, 0);
    return { priority: { communityId: input.communityId, score, components }, order };
  });
  scored.sort((a, b) => b.priority.score - a.priority.score || a.order - b.order);
  return scored.map((s) => s.priority);
}

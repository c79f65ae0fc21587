import { describe, expect, it } from 'vitest';
import {
  PRIORITY_COMPONENTS,
  visitPriorities,
  type PriorityComponentId,
  type PriorityInput,
  type PriorityWeights,
} from '../../api/results/visit-priority.ts';
import { expectClose } from '../helpers/close.ts';

// Check values worked by hand from the weighted mean of max-scaled shares (the scoring's own
// definition, api/results/visit-priority.ts); a tolerance of 1e-9 points covers rounding only.
const TOL = 1e-9;

const a: PriorityInput = {
  communityId: 'a',
  values: { people: 1000, chance: 0.2, facilities: 2, isolation: 10 },
};
const b: PriorityInput = {
  communityId: 'b',
  values: { people: 500, chance: 0.4, isolation: 40 },
};

/** Weight 1 on the named components, 0 on every other. */
const onlyWeights = (...on: PriorityComponentId[]): PriorityWeights =>
  Object.fromEntries(
    PRIORITY_COMPONENTS.map((id) => [id, on.includes(id) ? 1 : 0]),
  ) as PriorityWeights;

describe('visitPriorities', () => {
  it('weights shares of the largest value with the default weights 3, 3, 1, 1 (no firmness known)', () => {
    const [first, second] = visitPriorities([b, a]);
    expect(first?.communityId).toBe('a');
    // a: shares 1000/1000, 0.2/0.4, 2/2, 10/40 -> (3·1 + 3·0.5 + 1·1 + 1·0.25) / 8 = 0.71875
    expectClose(first?.score ?? NaN, 71.875, TOL, 'by hand: 5.75 / 8');
    // b: shares 0.5, 1, 0 (unknown facilities count as none), 1 -> (1.5 + 3 + 0 + 1) / 8 = 0.6875
    expectClose(second?.score ?? NaN, 68.75, TOL, 'by hand: 5.5 / 8');
    const chance = first?.components.find((c) => c.id === 'chance');
    expectClose(chance?.share ?? NaN, 0.5, TOL, 'by hand: 0.2 / 0.4');
    expectClose(chance?.points ?? NaN, 18.75, TOL, 'by hand: 100 · 3 · 0.5 / 8');
  });

  it('leaves out a component no community has, and keeps the input order on a tie', () => {
    const bare = (p: PriorityInput): PriorityInput => ({
      communityId: p.communityId,
      values: { people: p.values.people, chance: p.values.chance },
    });
    const scored = visitPriorities([bare(b), bare(a)]);
    // Both: (3·1 + 3·0.5) / 6 = 0.75 -> a tie, b stays first.
    expect(scored.map((s) => s.communityId)).toEqual(['b', 'a']);
    for (const s of scored) expectClose(s.score, 75, TOL, 'by hand: 4.5 / 6');
    expect(scored[0]?.components.find((c) => c.id === 'isolation')?.used).toBe(false);
  });

  it('follows changed weights: the chance alone puts b first', () => {
    const scored = visitPriorities([a, b], onlyWeights('chance'));
    expect(scored.map((s) => [s.communityId, s.score])).toEqual([
      ['b', 100],
      ['a', 50],
    ]);
  });

  it("counts the band's firmness as one more share with its default weight of 1", () => {
    const firm: PriorityInput = { communityId: 'a', values: { ...a.values, firmness: 0.9 } };
    const loose: PriorityInput = { communityId: 'b', values: { ...b.values, firmness: 0.6 } };
    const [first, second] = visitPriorities([loose, firm]);
    // a: shares 1, 0.5, 0.9/0.9, 1, 0.25 -> (3 + 1.5 + 1 + 1 + 0.25) / 9 = 0.75
    expect(first?.communityId).toBe('a');
    expectClose(first?.score ?? NaN, 75, TOL, 'by hand: 6.75 / 9');
    // b: shares 0.5, 1, 0.6/0.9, 0, 1 -> (1.5 + 3 + 2/3 + 0 + 1) / 9 = 0.685185...
    expectClose(second?.score ?? NaN, (100 * (5.5 + 2 / 3)) / 9, TOL, 'by hand: 6.1667 / 9');
    const firmness = second?.components.find((c) => c.id === 'firmness');
    expectClose(firmness?.share ?? NaN, 2 / 3, TOL, 'by hand: 0.6 / 0.9');
    expectClose(firmness?.points ?? NaN, (100 * 2) / 3 / 9, TOL, 'by hand: 100 · 1 · (2/3) / 9');
    const alone = visitPriorities([firm, loose], onlyWeights('firmness'));
    expect(alone.map((s) => s.communityId)).toEqual(['a', 'b']);
    expectClose(alone[1]?.score ?? NaN, (100 * 2) / 3, TOL, 'by hand: 0.6 / 0.9');
  });

  it('gives every score 0 when every weight is 0', () => {
    const scored = visitPriorities([a, b], onlyWeights());
    expect(scored.map((s) => s.score)).toEqual([0, 0]);
  });
});

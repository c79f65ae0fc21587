import { describe, expect, it } from 'vitest';
import type { MomentBalancedRecurrence } from '../../api/engine/model.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { testCatalog } from '../helpers/test-catalog.ts';
import { validStudy } from './fixtures.ts';

/** validStudy with fault-b's (moment-balanced) recurrence given `alternatives`. */
function withAlternatives(alternatives: unknown, recurrence: Record<string, unknown> = {}) {
  const study = validStudy();
  const props = study.sources.features[1].properties;
  props.recurrence = { ...props.recurrence, ...recurrence, alternatives };
  return loadStudy(study, { models: testCatalog });
}
const path = 'sources.features[1].properties.recurrence.alternatives';
const problems = (result: ReturnType<typeof withAlternatives>) =>
  result.ok ? [] : result.issues.map((i) => `${i.path}: ${i.message}`);

describe('study format: source-model alternatives', () => {
  it('reads alternatives for mMax, bValue, shape and slip rate', () => {
    const result = withAlternatives({
      mMax: [
        { value: 7.0, weight: 0.5 },
        { value: 7.4, weight: 0.5 },
      ],
      shape: [
        { value: 'gutenberg-richter', weight: 0.6 },
        { value: 'characteristic', weight: 0.4 },
      ],
      slipRateMmYr: [{ value: 2, weight: 1 }],
    });
    expect(problems(result)).toEqual([]);
    if (!result.ok) return;
    const recurrence = result.study.sources[1]!.recurrence as MomentBalancedRecurrence;
    expect(recurrence.alternatives?.shape?.[1]).toEqual({ value: 'characteristic', weight: 0.4 });
  });

  it('refuses weights that do not sum to 1, naming the source and the parameter', () => {
    const result = withAlternatives({
      bValue: [
        { value: 0.9, weight: 0.5 },
        { value: 1.1, weight: 0.4 },
      ],
    });
    expect(problems(result)).toEqual([
      `${path}.bValue: source "fault-b": the weights of the bValue alternatives sum to 0.9; expected 1`,
    ]);
  });

  it('refuses a parameter the recurrence type cannot vary', () => {
    expect(problems(withAlternatives({ rate: [{ value: 0.1, weight: 1 }] }))[0]).toContain(
      `${path}.rate: source "fault-b": a moment-balanced recurrence cannot vary "rate"`,
    );
  });

  it('refuses an mMax alternative not above mMin, and a bad value with its range', () => {
    expect(problems(withAlternatives({ mMax: [{ value: 4, weight: 1 }] }))[0]).toContain(
      `${path}.mMax: source "fault-b": expected every mMax alternative greater than mMin`,
    );
    expect(problems(withAlternatives({ bValue: [{ value: 3, weight: 1 }] }))[0]).toMatch(
      /alternatives\.bValue\[0\]\.value: expected a number in \(0\.3, 2\.5\)/,
    );
  });

  it('accepts 64 variants and refuses 80', () => {
    const four = (v: number) => [0, 1, 2, 3].map((k) => ({ value: v + 0.1 * k, weight: 0.25 }));
    const result = withAlternatives({
      mMax: four(7),
      bValue: four(0.8),
      slipRateMmYr: four(1),
      shape: [{ value: 'gutenberg-richter', weight: 1 }],
    });
    expect(problems(result)).toEqual([]);
    const five = withAlternatives({
      mMax: four(7),
      bValue: four(0.8),
      slipRateMmYr: [...four(1).map((a) => ({ ...a, weight: 0.2 })), { value: 2, weight: 0.2 }],
    });
    expect(problems(five)).toEqual([
      `${path}: source "fault-b": the alternatives make 80 combinations; expected at most 64`,
    ]);
  });
});

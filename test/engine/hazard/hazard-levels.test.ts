import { describe, expect, it } from 'vitest';
import { InvalidInput } from '../../../api/engine/errors.ts';
import {
  DEFAULT_LEVEL_COUNT,
  defaultLevels,
  levelsFor,
} from '../../../api/engine/hazard/hazard-levels.ts';
import { expectRelative } from '../../helpers/close.ts';

describe('hazard-curve levels', () => {
  it('defaults to 25 levels log-spaced from 0.001 to 3 g for PGA and SA (our default, stated in hazard-levels.ts)', () => {
    for (const measure of [{ kind: 'PGA' } as const, { kind: 'SA', periodS: 1 } as const]) {
      const levels = defaultLevels(measure);
      expect(levels.length).toBe(DEFAULT_LEVEL_COUNT);
      expect(levels[0]).toBe(0.001);
      expect(levels[24]).toBe(3);
      // Ratio 3000^(1/24) = 1.3959; rounding to 3 figures moves a level by at most 0.5%.
      levels
        .slice(1)
        .forEach((x, i) =>
          expectRelative(x / (levels[i] as number), 3000 ** (1 / 24), 0.011, 'log spacing'),
        );
    }
  });

  it('defaults to 0.1–300 cm/s for PGV (our default, stated in hazard-levels.ts)', () => {
    const levels = defaultLevels({ kind: 'PGV' });
    expect([levels[0], levels[24], levels.length]).toEqual([0.1, 300, 25]);
  });

  it('uses the study levels when given, and refuses unordered or non-positive ones naming the field', () => {
    expect(levelsFor({ PGA: [0.1, 0.2] }, 'PGA', { kind: 'PGA' })).toEqual([0.1, 0.2]);
    expect(levelsFor({ PGA: [0.1, 0.2] }, 'PGV', { kind: 'PGV' }).length).toBe(25);
    expect(() => levelsFor({ PGA: [0.2, 0.1] }, 'PGA', { kind: 'PGA' })).toThrow(
      /settings\.levels\.PGA\[1\]/,
    );
    expect(() => levelsFor({ PGA: [0, 0.1] }, 'PGA', { kind: 'PGA' })).toThrow(InvalidInput);
    expect(() => levelsFor({ PGA: [] }, 'PGA', { kind: 'PGA' })).toThrow(/at least one/);
  });
});

import { describe, expect, it } from 'vitest';
import { UnsupportedMeasure } from '../../../api/engine/errors.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import { checkPreparedModel } from './prepared-checks.ts';

// The hook's numbers against predict() (cornell79.ts); predict() itself is checked by hand arithmetic in cornell79.test.ts.
describe('Cornell79 precomputation hook', () => {
  it("gives predict()'s ln PGA, σ and applicability, within 1e-12", () => {
    checkPreparedModel(cornell79, [{ kind: 'PGA' }], ['crustal']);
  });

  it('asks only for Rhypo and refuses SA as predict does', () => {
    expect(cornell79.prepare!([], { kind: 'PGA' }).distances).toEqual(['rhypoKm']);
    expect(() => cornell79.prepare!([], { kind: 'SA', periodS: 1 })).toThrow(UnsupportedMeasure);
  });
});

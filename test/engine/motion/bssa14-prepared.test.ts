import { describe, expect, it } from 'vitest';
import { UnsupportedPeriod } from '../../../api/engine/errors.ts';
import { bssa14 } from '../../../api/engine/motion/bssa14.ts';
import { checkPreparedMeasures, checkPreparedModel } from './prepared-checks.ts';
import { sa } from './measures.ts';

// The hook's numbers against predict() (bssa14.ts); predict() itself is checked against the paper in bssa14.test.ts.

describe('BSSA14 precomputation hook', () => {
  it("gives predict()'s ln median, σ and applicability, within 1e-12: PGA, PGV, SA on rows and between rows", () => {
    checkPreparedModel(
      bssa14,
      [{ kind: 'PGA' }, { kind: 'PGV' }, sa(0.2), sa(1), sa(0.12), sa(2.5)],
      ['crustal', 'crustal', 'interface'],
    );
  });

  it("prepared for several measures at once gives each measure's own numbers exactly (the shared rock motion and distance terms change none)", () => {
    checkPreparedMeasures(
      bssa14,
      [{ kind: 'PGA' }, sa(0.2), sa(1), { kind: 'PGV' }, sa(0.12), sa(2.5)],
      ['crustal', 'crustal', 'interface'],
    );
  });

  it('asks only for Rjb, and refuses a period outside the table as predict does', () => {
    expect(bssa14.prepare!([], { kind: 'PGA' }).distances).toEqual(['rjbKm']);
    expect(() => bssa14.prepare!([], sa(12))).toThrow(UnsupportedPeriod);
  });
});

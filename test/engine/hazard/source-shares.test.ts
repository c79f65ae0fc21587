import { describe, expect, it } from 'vitest';
import { sourceShares } from '../../../api/engine/hazard/source-shares.ts';
import { expectClose } from '../../helpers/close.ts';

describe('sourceShares', () => {
  it('gives each source its rate over the total, largest first, equal shares by source id', () => {
    const shares = sourceShares([
      { sourceId: 'c', name: 'Fault C', rate: 1e-4 },
      { sourceId: 'a', name: 'Fault A', rate: 3e-4 },
      { sourceId: 'b', name: 'Fault B', rate: 1e-4 },
    ]);
    expect(shares.map((s) => s.sourceId)).toEqual(['a', 'b', 'c']);
    expect(shares.map((s) => s.name)).toEqual(['Fault A', 'Fault B', 'Fault C']);
    // Hand computation: 3e-4 / 5e-4 and 1e-4 / 5e-4; 1e-15 is the rounding of the division.
    expectClose(shares[0]!.share, 0.6, 1e-15, 'hand computation');
    expectClose(shares[1]!.share, 0.2, 1e-15, 'hand computation');
    expectClose(shares[2]!.share, 0.2, 1e-15, 'hand computation');
  });

  it('lists nothing for no sources', () => {
    expect(sourceShares([])).toEqual([]);
  });
});

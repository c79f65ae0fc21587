import { describe, expect, test } from 'vitest';
import { tickLabel } from '../../../web/plots/log-axis.tsx';

// The labelling rule is ours (stated in web/plots/log-axis.tsx): one style per axis.
describe('axis labels', () => {
  test('an axis reaching below 0.001 labels every tick as a power of ten', () => {
    const ticks = [1e-5, 1e-4, 1e-3, 1e-2, 0.1, 1];
    expect(ticks.map((t) => tickLabel(t, 'en', ticks))).toEqual([
      '10⁻⁵',
      '10⁻⁴',
      '10⁻³',
      '10⁻²',
      '10⁻¹',
      '10⁰',
    ]);
    expect(tickLabel(2e-4, 'en', [1e-4, 2e-4, 5e-4])).toBe('2×10⁻⁴');
  });

  test('an axis from 0.001 up keeps decimals', () => {
    const ticks = [0.001, 0.002, 0.005, 0.01, 0.02, 1];
    expect(ticks.map((t) => tickLabel(t, 'en', ticks))).toEqual([
      '0.001',
      '0.002',
      '0.005',
      '0.01',
      '0.02',
      '1',
    ]);
  });
});

import { describe, expect, it } from 'vitest';
import { akiUtsuBValue } from '../../../api/engine/catalog/aki-utsu.ts';
import { syntheticCatalog } from '../../../api/engine/catalog/synthetic-catalog.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectClose } from '../../helpers/close.ts';
import { SQUARE_ZONE } from '../fixtures/catalog-builders.ts';

const START = Date.UTC(1990, 0, 1);
const END = Date.UTC(2020, 0, 1);

/**
 * Aki–Utsu b (Mc 4.0, ΔM 0.1) of a synthetic catalog: `eventCount` magnitudes from 3.95 to 8.95
 * at 0.1 with the given b, 1990–2020, in the square test zone.
 */
function syntheticBValue(seed: number, bValue: number, eventCount: number) {
  const events = syntheticCatalog({
    random: createRandom(seed),
    bValue,
    mMin: 3.95,
    mMax: 8.95,
    eventCount,
    rings: SQUARE_ZONE,
    depthKm: [5, 15],
    startMs: START,
    endMs: END,
    magnitudeStep: 0.1,
  });
  return akiUtsuBValue(
    events.map((x) => x.magnitude),
    4.0,
    0.1,
  );
}

describe('Aki (1965) with the Utsu (1965) binning correction', () => {
  it('matches a hand computation on six binned magnitudes', () => {
    // Hand computation (calculator) of b = log10(e) / (mean M − (Mc − ΔM/2)), Aki 1965 with
    // Utsu 1965's correction (formula from memory): magnitudes 4.0, 4.0, 4.1, 4.3, 4.6, 5.0,
    // Mc 4.0, ΔM 0.1: mean 26.0 / 6 = 4.333333; b = 0.4342945 / 0.3833333 = 1.132942.
    const e = akiUtsuBValue([4.0, 4.0, 4.1, 4.3, 4.6, 5.0], 4.0, 0.1);
    expect(e.eventCount).toBe(6);
    expectClose(e.meanMagnitude, 4.333333, 1e-6, 'hand computation: mean of six magnitudes');
    expectClose(e.bValue, 1.132942, 1e-6, 'hand computation of Aki (1965) / Utsu (1965)');
    // Shi & Bolt (1982) σb = 2.30 b² sqrt(Σ(Mi − mean)² / (n(n − 1))) (formula from memory), with
    // ln 10 for their rounded 2.30: Σ(Mi − mean)² = 0.793333, so
    // σb = 2.302585 · 1.132942² · sqrt(0.793333 / 30) = 0.480616 (hand computation; 0.480077 with 2.30).
    expectClose(e.sigmaB, 0.480616, 2e-6, 'hand computation of Shi & Bolt (1982)');
  });

  it('reduces to Aki (1965) for unbinned magnitudes', () => {
    // Hand computation of b = log10(e) / (mean M − Mc) (Aki 1965, from memory): 1.2, 1.5, 2.0, 2.8
    // above Mc 1.0: mean 1.875, b = 0.4342945 / 0.875 = 0.496337; σb (Shi & Bolt 1982, with ln 10)
    // = 2.302585 · 0.496337² · sqrt(1.4675 / 12) = 0.198366.
    const e = akiUtsuBValue([1.2, 1.5, 2.0, 2.8, 0.7], 1.0, 0);
    expect(e.eventCount).toBe(4);
    expectClose(e.bValue, 0.496337, 1e-6, 'hand computation of Aki (1965)');
    expectClose(e.sigmaB, 0.198366, 1e-6, 'hand computation of Shi & Bolt (1982)');
  });

  it('rounds magnitudes to bins and leaves out those below Mc', () => {
    // 3.94 rounds to 3.9 (below Mc 4.0) and is left out; 3.96 and 4.04 round to 4.0 (binning as
    // catalogs report magnitudes; common practice). Same hand computation as the first case.
    const e = akiUtsuBValue([3.94, 3.96, 4.04, 4.1, 4.3, 4.6, 5.0], 4.0, 0.1);
    expect(e.eventCount).toBe(6);
    expectClose(e.bValue, 1.132942, 1e-6, 'hand computation of Aki (1965) / Utsu (1965)');
  });

  it('refuses too few events, or events that all share one magnitude', () => {
    expect(() => akiUtsuBValue([4.5], 4.0, 0.1)).toThrow(/at least 2 events at or above Mc 4/);
    expect(() => akiUtsuBValue([4.0, 4.0, 4.0], 4.0, 0.1)).toThrow(/share one magnitude/);
    expect(() => akiUtsuBValue([4.0, 4.2], Number.NaN, 0.1)).toThrow(/mc/);
    expect(() => akiUtsuBValue([4.0, 4.2], 4.0, -0.1)).toThrow(/magnitudeStep/);
  });
});

describe('b-value recovered from synthetic catalogs', () => {
  // Catalogs drawn from a known b with fixed seeds (1 to 9, in this order, chosen before the
  // first run), magnitudes from Mc − ΔM/2 = 3.95 rounded to 0.1 and truncated far above
  // (8.95) so the untruncated Aki–Utsu estimator applies. The estimate should fall within two
  // Shi & Bolt (1982) standard errors of the truth (a 95% interval for a normal estimator).
  const cases: [number, number][] = [];
  for (const n of [200, 1000, 5000]) for (const b of [0.8, 1.0, 1.2]) cases.push([n, b]);
  cases.forEach(([n, b], i) => {
    it(`recovers b = ${b} from ${n} events`, () => {
      const e = syntheticBValue(i + 1, b, n);
      expect(e.eventCount).toBe(n);
      expectClose(
        e.bValue,
        b,
        2 * e.sigmaB,
        `true b of the synthetic catalog, within 2 Shi & Bolt (1982) standard errors (seed ${i + 1})`,
      );
    });
  });

  it('covers the true b about 95% of the time over many catalogs', () => {
    // 200 catalogs of 500 events (seeds 101–300), b = 1: the share of 2σ intervals holding the
    // truth should be near 0.954 (normal approximation); with 200 trials its binomial standard
    // error is 0.015, so the bounds 0.90–0.995 are about 3.5 standard errors wide.
    // Utsu's correction itself is an approximation: the exact MLE for binned magnitudes
    // (Bender 1983, from memory) is larger by (βΔM)²/12 ≈ 0.4% at b = 1, which is small against σb ≈ 0.045.
    let covered = 0;
    for (let seed = 101; seed <= 300; seed++) {
      const e = syntheticBValue(seed, 1, 500);
      if (Math.abs(e.bValue - 1) <= 2 * e.sigmaB) covered++;
    }
    expect(covered / 200).toBeGreaterThanOrEqual(0.9);
    expect(covered / 200).toBeLessThanOrEqual(0.995);
  });
});

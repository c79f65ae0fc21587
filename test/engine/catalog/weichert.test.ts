import { describe, expect, it } from 'vitest';
import { akiUtsuBValue } from '../../../api/engine/catalog/aki-utsu.ts';
import { observationBins } from '../../../api/engine/catalog/completeness-periods.ts';
import { MS_PER_YEAR } from '../../../api/engine/catalog/event.ts';
import { syntheticCatalog } from '../../../api/engine/catalog/synthetic-catalog.ts';
import { weichertFit } from '../../../api/engine/catalog/weichert.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectClose, expectRelative } from '../../helpers/close.ts';
import { SQUARE_ZONE } from '../fixtures/catalog-builders.ts';

describe('Weichert (1980) maximum likelihood', () => {
  it('solves a table built to fit b exactly, with unequal periods', () => {
    // Hand construction: 100 events in each of the bins 4.0, 4.5, 5.0, 5.5 observed 10, 20, 40
    // and 80 years. Counts proportional to t_i · 10^(−b m_i) with 10^(−0.5 b) = 1/2 satisfy
    // Weichert's likelihood equation exactly (Weichert 1980, from memory), so
    // b = log10(2) / 0.5 = 0.602060. Rate over the bins N Σe^(−βm) / Σ t e^(−βm)
    // = 400 · 1.875 / 40 = 18.75 a year (= 10 + 5 + 2.5 + 1.25 per bin) of M >= 3.75.
    // var(β) = 1 / (N · var_w(m)) with equal weights on 0, 0.5, 1, 1.5: 1 / (400 · 0.3125),
    // σβ = 0.0894427, σb = σβ / ln 10 = 0.0388445.
    const fit = weichertFit(
      [
        { magnitude: 4.0, count: 100, years: 10 },
        { magnitude: 4.5, count: 100, years: 20 },
        { magnitude: 5.0, count: 100, years: 40 },
        { magnitude: 5.5, count: 100, years: 80 },
      ],
      { magnitudeStep: 0.5 },
    );
    expectClose(fit.bValue, 0.60206, 1e-8, 'hand construction satisfying Weichert (1980) exactly');
    expectClose(fit.rateAtReference, 18.75, 1e-8, 'hand computation of the Weichert (1980) rate');
    expectClose(fit.referenceMagnitude, 3.75, 1e-12, 'lowest bin centre − ΔM/2 (Utsu 1965)');
    expectClose(fit.aValue, 3.5307262, 1e-7, 'log10(18.75) + b · 3.75, hand computation');
    expectClose(fit.sigmaBeta, 0.0894427, 1e-7, 'hand computation of Weichert (1980) var(β)');
    expectClose(fit.sigmaB, 0.0388445, 1e-7, 'σβ / ln 10');
    expectClose(fit.sigmaRate, 0.9375, 1e-8, 'rate / sqrt(N), hand computation');
    expect(fit.eventCount).toBe(400);
  });

  describe('with one completeness period', () => {
    const start = Date.UTC(1990, 0, 1);
    const end = start + 30 * MS_PER_YEAR;
    for (const [seed, b] of [
      [21, 0.8],
      [22, 1.0],
      [23, 1.2],
    ] as const) {
      const events = syntheticCatalog({
        random: createRandom(seed),
        bValue: b,
        mMin: 3.95,
        mMax: 8.95,
        eventCount: 2000,
        rings: SQUARE_ZONE,
        depthKm: [5, 15],
        startMs: start,
        endMs: end,
        magnitudeStep: 0.1,
      });
      // Bins continue with zero counts up to 20, so the fit is effectively untruncated (the
      // missing tail is under e^(−1.8 · 16) ≈ 1e-13 of the total).
      const bins = observationBins(events, {
        periods: [{ magnitude: 4.0, startMs: start }],
        endMs: end,
        magnitudeStep: 0.1,
        upperMagnitude: 20,
      });
      const fit = weichertFit(bins, { magnitudeStep: 0.1 });
      const au = akiUtsuBValue(
        events.map((e) => e.magnitude),
        4.0,
        0.1,
      );

      it(`equals the exact binned-magnitude MLE (b = ${b})`, () => {
        // With equal periods Weichert's equation is the MLE of a geometric distribution of bins,
        // solved in closed form by b = ln(1 + ΔM / (mean − Mc)) / (ΔM ln 10) (Bender 1983;
        // Tinti & Mulargia 1987; from memory, and derivable by hand).
        const closed = Math.log(1 + 0.1 / (au.meanMagnitude - 4.0)) / (0.1 * Math.LN10);
        expectRelative(
          fit.bValue,
          closed,
          1e-9,
          'closed-form binned MLE (Bender 1983, from memory)',
        );
      });

      it(`equals Aki–Utsu up to the known binning term (b = ${b})`, () => {
        // Aki–Utsu gives 1/β_U = mean − Mc + ΔM/2; the exact binned MLE above then is
        // β = β_U · 2 artanh(y/2) / y with y = β_U ΔM, i.e. larger by y²/12 + y⁴/80 + ...
        // (derived here from the two formulas). Checked to 1e-9; the plain difference is
        // 0.3% (b = 0.8) to 0.7% (b = 1.2), the tolerance any "equal" claim must allow.
        const y = au.bValue * Math.LN10 * 0.1;
        expectRelative(
          fit.bValue,
          (au.bValue * 2 * Math.atanh(y / 2)) / y,
          1e-9,
          'Aki (1965) / Utsu (1965) with the binning term',
        );
        expectRelative(
          fit.bValue,
          au.bValue,
          0.008,
          'Aki–Utsu, within the binning term (under 0.8% for b ≤ 1.3)',
        );
      });

      it(`gives the count over the span as the rate, and Aki's σ in the limit (b = ${b})`, () => {
        // One period: rate = N Σe / (T Σe) = N / T exactly (Weichert 1980). σβ for the geometric
        // distribution of bins: 2 sinh(βΔM/2) / (ΔM sqrt N) (derived here), which tends to
        // Aki's (1965) β / sqrt N as ΔM → 0.
        expectRelative(fit.rateAtReference, 2000 / 30, 1e-12, 'N / T');
        const expected = (2 * Math.sinh((fit.beta * 0.1) / 2)) / (0.1 * Math.sqrt(2000));
        expectRelative(fit.sigmaBeta, expected, 1e-6, 'σβ of the binned geometric distribution');
        expect(fit.iterations).toBeLessThan(20);
      });
    }
  });

  it('refuses bins it cannot fit', () => {
    expect(() =>
      weichertFit(
        [
          { magnitude: 4, count: 10, years: 5 },
          { magnitude: 4.1, count: 0, years: 5 },
        ],
        { magnitudeStep: 0.1 },
      ),
    ).toThrow(/at least 2 magnitude bins/);
    expect(() =>
      weichertFit([{ magnitude: 4, count: 1.5, years: 5 }], { magnitudeStep: 0.1 }),
    ).toThrow(/bins\[0\]\.count/);
    expect(() =>
      weichertFit([{ magnitude: 4, count: 1, years: 0 }], { magnitudeStep: 0.1 }),
    ).toThrow(/bins\[0\]\.years/);
  });
});

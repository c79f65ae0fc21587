import { describe, expect, it } from 'vitest';
import { fitCatalog } from '../../../api/catalog/catalog-fit.ts';
import {
  bOutsideUsual,
  completenessChanges,
  largeMagnitudesDisagree,
  mostRemoved,
  poissonAtMost,
} from '../../../api/engine/catalog/fit-checks.ts';
import { syntheticCatalog } from '../../../api/engine/catalog/synthetic-catalog.ts';
import { createRandom } from '../../../api/engine/random.ts';
import { expectRelative } from '../../helpers/close.ts';
import { boxRing } from '../../helpers/box-ring.ts';

const YEAR_MS = 365.25 * 86_400_000;

describe('checks of a Gutenberg–Richter fit', () => {
  it('b outside about 0.6–1.4 (common practice) is flagged at the bounds', () => {
    expect(bOutsideUsual(0.59)).toEqual({ kind: 'b-outside-usual', bValue: 0.59 });
    expect(bOutsideUsual(0.6)).toBeUndefined();
    expect(bOutsideUsual(1.4)).toBeUndefined();
    expect(bOutsideUsual(1.41)?.kind).toBe('b-outside-usual');
  });

  it('Poisson P(N <= k) by its definition, sum of e^-mu mu^i / i!', () => {
    // e^-10 (1 + 10 + 50) = 61 e^-10, worked by hand.
    expectRelative(poissonAtMost(2, 10), 61 * Math.exp(-10), 1e-12, 'P(N <= 2 | mu = 10)');
    expectRelative(poissonAtMost(0, 3), Math.exp(-3), 1e-12, 'P(N = 0 | mu = 3)');
    expect(poissonAtMost(-1, 3)).toBe(0);
  });

  it('the line against the count of the largest events, one unit below the largest', () => {
    // a = 4, b = 1, 10 years: from M 5.95 the line gives 10 · 10^(4 − 5.95) = 0.112 events.
    const base = {
      aValue: 4,
      bValue: 1,
      referenceMagnitude: 3.95,
      observationYears: 10,
      magnitudeStep: 0.1,
    };
    const agreeing = largeMagnitudesDisagree({ ...base, magnitudes: [4, 4.5, 5, 5.5, 6.96] });
    // One observed against 0.112 predicted: P(N >= 1) = 1 − e^-0.112 = 0.106, two-sided 0.21: no finding.
    expect(agreeing).toBeUndefined();
    // Five observed from M 5.95 against 0.112: P(N >= 5) is about 1.4e-7.
    const over = largeMagnitudesDisagree({ ...base, magnitudes: [4, 6, 6.2, 6.5, 6.8, 7] });
    expect(over?.kind).toBe('large-magnitudes-disagree');
    if (over?.kind !== 'large-magnitudes-disagree') return;
    expectRelative(over.magnitude, 5.95, 1e-9, 'bin edge one unit below M 7.0');
    expectRelative(over.predicted, 10 * 10 ** (4 - 5.95), 1e-12, 'T 10^(a − b m)');
    expect(over.observed).toBe(5);
    expectRelative(over.chance, 1 - poissonAtMost(4, over.predicted), 1e-12, 'P(N >= 5)');
    // Too few magnitude units above the reference to count apart from the fit: no check.
    expect(largeMagnitudesDisagree({ ...base, magnitudes: [4, 4.5, 4.9] })).toBeUndefined();
  });

  it('completeness changing over time, and declustering removing most events', () => {
    const window = (startYear: number, mc: number) => ({
      startMs: startYear * YEAR_MS,
      endMs: (startYear + 10) * YEAR_MS,
      eventCount: 100,
      mc,
    });
    expect(completenessChanges([window(0, 4.2), window(10, 3.2)], 3.2)).toEqual({
      kind: 'completeness-changes',
      mcUsed: 3.2,
      earliestMc: 4.2,
      highestMc: 4.2,
    });
    expect(completenessChanges([window(0, 3.3), window(10, 3.2)], 3.2)).toBeUndefined();
    expect(mostRemoved(800, 1000)).toEqual({ kind: 'most-removed', removed: 800, total: 1000 });
    expect(mostRemoved(500, 1000)).toBeUndefined();
  });

  it('a dense catalog with no clusters, mostly removed by declustering, is said so with the option to check', () => {
    // 2,000 independent events in twenty years inside a 1° square: Gardner & Knopoff windows (tens
    // of km, weeks to months) join most of them though none is an aftershock.
    const events = syntheticCatalog({
      random: createRandom(20261202),
      bValue: 1,
      mMin: 4,
      mMax: 6,
      eventCount: 2000,
      rings: [boxRing(-140, -50, -139, -49)],
      depthKm: [5, 15],
      startMs: Date.UTC(2001, 0, 1),
      endMs: Date.UTC(2021, 0, 1),
    });
    const fit = fitCatalog(events, {
      mc: 4,
      startMs: Date.UTC(2001, 0, 1),
      endMs: Date.UTC(2021, 0, 1),
      optionNames: {
        span: '--start and --end',
        mMax: '--m-max',
        periods: '--periods',
        decluster: '--no-decluster',
      },
    });
    const removed = fit.declustering?.removed.length ?? 0;
    expect(removed / events.length).toBeGreaterThan(0.5);
    const warning = fit.warnings.find((w) => w.startsWith('declustering removed'));
    expect(warning).toContain(`(${removed} of ${events.length})`);
    expect(warning).toContain('--no-decluster');
    expect([...fit.notes, ...fit.warnings].join(' ')).not.toMatch(/startTime|mMax[^-]/);
  });
});

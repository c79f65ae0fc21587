import { expect } from 'vitest';
import type { CommunityResult } from '../../api/engine/results.ts';
import type { ScreeningOutput } from '../../api/engine/screen-study.ts';
import { expectClose } from '../helpers/close.ts';

/**
 * How close the fast path must come to the reference path (test scaffolding for the tests that
 * compare them; not a check of the science). They differ by rounding (√ for Math.hypot, the
 * order of sums) and by the fast path's tabulated exceedance (under 1e-10 in probability,
 * exceedance-table.ts); on the test studies the rates agree to about 1e-10. RELATIVE is 10⁴
 * times that and still 10³ times finer than the 0.1% the benchmark holds the paths to. Rates
 * below RATE_FLOOR per year (return periods beyond 10¹⁵ years) are compared absolutely.
 */
export const RELATIVE = 1e-6;
export const RATE_FLOOR = 1e-15;

const near = (actual: number, expected: number, what: string): void =>
  expectClose(
    actual,
    expected,
    RELATIVE * Math.abs(expected) + RATE_FLOOR,
    `${what}: fast path against the reference path`,
  );

const nearOrNull = (
  actual: number | null | undefined,
  expected: number | null | undefined,
  what: string,
): void => {
  if (expected === null || expected === undefined) expect(actual, what).toBe(expected);
  else near(actual as number, expected, what);
};

export function expectCommunityMatches(fast: CommunityResult, reference: CommunityResult): void {
  const id = fast.communityId;
  expect(id).toBe(reference.communityId);
  for (const [key, curve] of Object.entries(reference.curves)) {
    const f = fast.curves[key]!;
    expect(f.levels).toEqual(curve.levels);
    curve.annualRate.forEach((rate, j) =>
      near(f.annualRate[j]!, rate, `${id} ${key} mean rate at level ${j}`),
    );
    expect(f.branches?.map((b) => [b.label, b.weight])).toEqual(
      curve.branches?.map((b) => [b.label, b.weight]),
    );
    curve.branches?.forEach((b, i) =>
      b.annualRate.forEach((rate, j) =>
        near(f.branches![i]!.annualRate[j]!, rate, `${id} ${key} ${b.label} at level ${j}`),
      ),
    );
  }
  for (const [years, byMeasure] of Object.entries(reference.atReturnPeriod)) {
    for (const [key, level] of Object.entries(byMeasure))
      nearOrNull(fast.atReturnPeriod[years]![key], level, `${id} ${years}-year ${key}`);
  }
  expect(fast.returnPeriodStatus).toEqual(reference.returnPeriodStatus);
  for (const [years, byMeasure] of Object.entries(reference.chanceOfExceeding)) {
    for (const [key, chances] of Object.entries(byMeasure))
      chances.forEach((p, j) =>
        near(
          fast.chanceOfExceeding[years]![key]![j]!,
          p,
          `${id} chance in ${years} years, ${key} level ${j}`,
        ),
      );
  }
  for (const [years, value] of Object.entries(reference.intensity.atReturnPeriod))
    nearOrNull(fast.intensity.atReturnPeriod[years]!.mmi, value.mmi, `${id} MMI at ${years} years`);
  expect(fast.band.id).toBe(reference.band.id);
  expect(fast.nearestFaults).toEqual(reference.nearestFaults);
  expect(fast.warnings).toEqual(reference.warnings);
  expect(Object.keys(fast.deaggregation)).toEqual(Object.keys(reference.deaggregation));
  for (const [years, d] of Object.entries(reference.deaggregation)) {
    const f = fast.deaggregation[years]!;
    near(f.level, d.level, `${id} deaggregated level at ${years} years`);
    expect(f.bySource.map((s) => s.sourceId).sort()).toEqual(
      d.bySource.map((s) => s.sourceId).sort(),
    );
    for (const s of d.bySource)
      expectClose(
        f.bySource.find((x) => x.sourceId === s.sourceId)!.share,
        s.share,
        RELATIVE,
        `${id} share of ${s.sourceId} at ${years} years`,
      );
    near(f.mean.magnitude, d.mean.magnitude, `${id} mean M at ${years} years`);
    near(f.mean.distanceKm, d.mean.distanceKm, `${id} mean R at ${years} years`);
    expectClose(f.mean.epsilon, d.mean.epsilon, RELATIVE, `${id} mean ε at ${years} years`);
    expect(f.bins.length).toBe(d.bins.length);
    d.bins.forEach((b, i) =>
      expectClose(f.bins[i]!.share, b.share, RELATIVE, `${id} bin ${i} share at ${years} years`),
    );
  }
}

export function expectScreeningMatches(fast: ScreeningOutput, reference: ScreeningOutput): void {
  expect(fast.studyName).toBe(reference.studyName);
  expect(fast.warnings).toEqual(reference.warnings);
  expect(fast.communities.length).toBe(reference.communities.length);
  fast.communities.forEach((c, i) => expectCommunityMatches(c, reference.communities[i]!));
}

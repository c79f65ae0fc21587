import { readFileSync } from 'node:fs';
import { expect, it } from 'vitest';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import { createPairPredictions } from '../../../api/engine/motion/prepared-period.ts';
import type {
  GmmInput,
  GmmPrediction,
  GroundMotionModel,
} from '../../../api/engine/motion/types.ts';
import { expectClose } from '../../helpers/close.ts';
import { pairColumns } from './prepared-checks.ts';

/**
 * The independent test vectors of the ground-motion models, copied unchanged from
 * `../shared/reference/gmm/vectors/<model>.json` into `vectors/` beside this file (see the README
 * there). Their provenance (`../shared/reference/gmm/README.md`): computed by a reference
 * implementation that is not Tremora's, from the published coefficient tables, with every input
 * written in each case and the expected ln median, τ, φ and σ to 10 significant digits; compare
 * with an absolute tolerance of 1e-4 in natural-log units. Each file's `reference`,
 * `generatedBy` and `conventions` fields say which paper and which conventions (region, Z1
 * default, Vs30 measured or inferred) its numbers follow.
 */
export interface VectorCase {
  readonly id: string;
  readonly setting: 'crustal' | 'interface' | 'intraslab';
  readonly measure: string;
  readonly periodS: number;
  readonly magnitude: number;
  readonly mechanism: string;
  readonly rakeDeg: number | null;
  readonly dipDeg: number;
  readonly ztorKm: number;
  readonly widthKm: number;
  readonly hypoDepthKm: number;
  readonly rrupKm: number;
  readonly rjbKm: number;
  readonly rxKm: number;
  readonly ry0Km: number;
  readonly rhypoKm: number;
  readonly repiKm: number;
  readonly vs30: number;
  readonly vs30Measured: boolean;
  /** The model's own default Z1 for the case's Vs30, km (crustal models), else null. */
  readonly z1Km?: number | null;
  readonly lnMedian: number;
  readonly tau: number;
  readonly phi: number;
  readonly sigma: number;
  readonly [extra: string]: unknown;
}

export interface VectorFile {
  readonly model: string;
  readonly reference: string;
  readonly generatedBy: string;
  readonly conventions?: readonly string[];
  readonly caseCount: number;
  readonly cases: readonly VectorCase[];
}

/** The tolerance every vector file states: 1e-4 in natural-log units. */
export const VECTOR_TOLERANCE = 1e-4;

export function readVectors(file: string): VectorFile {
  return JSON.parse(
    readFileSync(new URL(`./vectors/${file}`, import.meta.url), 'utf8'),
  ) as VectorFile;
}

export function vectorMeasure(c: VectorCase): Measure {
  if (c.measure === 'PGA') return { kind: 'PGA' };
  if (c.measure === 'PGV') return { kind: 'PGV' };
  return { kind: 'SA', periodS: c.periodS };
}

/**
 * The case as Tremora's model input; the basin depth left to the model's default, as the vectors
 * assume, unless `z1` is 'given' (the case's own z1Km passed in, which must give the same answer).
 */
export function vectorInput(c: VectorCase, z1: 'default' | 'given' = 'default'): GmmInput {
  const mechanism =
    c.mechanism === 'reverse' || c.mechanism === 'normal' ? c.mechanism : 'strike-slip';
  return {
    magnitude: c.magnitude,
    rakeDeg: c.rakeDeg ?? 0,
    mechanism,
    setting: c.setting,
    dipDeg: c.dipDeg,
    ztorKm: c.ztorKm,
    widthKm: c.widthKm,
    hypoDepthKm: c.hypoDepthKm,
    rjbKm: c.rjbKm,
    rrupKm: c.rrupKm,
    rxKm: c.rxKm,
    ry0Km: c.ry0Km,
    rhypoKm: c.rhypoKm,
    repiKm: c.repiKm,
    vs30: c.vs30,
    vs30Measured: c.vs30Measured,
    ...(z1 === 'given' && c.z1Km != null ? { z1Km: c.z1Km } : {}),
  };
}

/** Asserts one prediction against a case: ln median, τ, φ and σ within VECTOR_TOLERANCE. */
export function expectMatchesVector(
  p: Pick<GmmPrediction, 'lnMedian' | 'tau' | 'phi' | 'sigma'>,
  c: VectorCase,
  source: string,
): void {
  const where = `${source}, case ${c.id} (${c.measure}, M ${c.magnitude}, Vs30 ${c.vs30})`;
  expectClose(p.lnMedian, c.lnMedian, VECTOR_TOLERANCE, `${where}: ln median`);
  expectClose(p.tau, c.tau, VECTOR_TOLERANCE, `${where}: tau`);
  expectClose(p.phi, c.phi, VECTOR_TOLERANCE, `${where}: phi`);
  expectClose(p.sigma, c.sigma, VECTOR_TOLERANCE, `${where}: sigma`);
}

/**
 * Asserts the fast path (the model's prepare hook, one rupture–site pair per case) gives the
 * case's ln median and σ within VECTOR_TOLERANCE (it reports no τ and φ).
 */
export function expectFastPathMatchesVector(
  model: GroundMotionModel,
  c: VectorCase,
  source: string,
): void {
  const input = vectorInput(c);
  const out = createPairPredictions(1);
  expect(model.prepare, `${model.name} has a fast path`).toBeDefined();
  model.prepare!([input], vectorMeasure(c)).predictPairs(
    input,
    pairColumns([{ rupture: input, distances: input }]),
    out,
  );
  const where = `${source}, case ${c.id} (${c.measure}, M ${c.magnitude}, Vs30 ${c.vs30}), fast path`;
  expectClose(out.lnMedian[0]!, c.lnMedian, VECTOR_TOLERANCE, `${where}: ln median`);
  expectClose(out.sigma[0]!, c.sigma, VECTOR_TOLERANCE, `${where}: sigma`);
}

/** A case through both of the model's paths: predict() (expectMatchesVector) and the fast path. */
export function expectModelMatchesVector(
  model: GroundMotionModel,
  c: VectorCase,
  source: string,
): void {
  expectMatchesVector(model.predict(vectorInput(c), vectorMeasure(c)), c, source);
  expectFastPathMatchesVector(model, c, source);
}

/**
 * The tests every vectors file gets: it is the file the README describes (the model's name, the
 * case count, both Vs30 kinds, so the measured and inferred Vs30 coefficients are both checked),
 * and each case's ln median, τ, φ and σ are within VECTOR_TOLERANCE.
 */
export function itMatchesVectorFile(
  model: GroundMotionModel,
  vectors: VectorFile,
  source: string,
  caseCount: number,
): void {
  it('are the file the README describes', () => {
    expect(vectors.model).toBe(model.name);
    expect(vectors.cases.length).toBe(vectors.caseCount);
    expect(vectors.caseCount).toBe(caseCount);
    expect(new Set(vectors.cases.map((c) => c.vs30Measured))).toEqual(new Set([true, false]));
  });

  it.each(vectors.cases.map((c) => [c.id, c.measure, c] as const))(
    '%s %s: ln median, τ, φ, σ within 1e-4',
    (_id, _measure, c) => {
      expectMatchesVector(model.predict(vectorInput(c), vectorMeasure(c)), c, source);
    },
  );
}

/**
 * For a file written with the paper's default Z1: each case's Z1 is `defaultZ1Km(Vs30)` within
 * 1e-6 km (the file rounds Z1 to that), and passing it in gives the same ln median.
 */
export function itMatchesWithZ1Given(
  model: GroundMotionModel,
  vectors: VectorFile,
  source: string,
  defaultZ1Km: (vs30: number) => number,
): void {
  it("gives the same numbers with the vectors' Z1 passed in (it is the paper's default)", () => {
    for (const c of vectors.cases) {
      expect(c.z1Km).not.toBeNull();
      expectClose(
        defaultZ1Km(c.vs30),
        c.z1Km as number,
        1e-6,
        `${source} ${c.id} default Z1(Vs30)`,
      );
      expectClose(
        model.predict(vectorInput(c, 'given'), vectorMeasure(c)).lnMedian,
        c.lnMedian,
        VECTOR_TOLERANCE,
        `${source} ${c.id} with Z1 given`,
      );
    }
  });
}

/** One test a case of `vectors`, named by its id: `check` compares the case within 1e-4. */
export function itEachVectorCase(vectors: VectorFile, check: (c: VectorCase) => void): void {
  it.each(vectors.cases.map((c) => [c.id, c] as const))(
    '%s: ln median, τ, φ, σ within 1e-4',
    (_id, c) => {
      check(c);
    },
  );
}

/** Every case's rake falls in the mechanism class the vectors file gives it. */
export function itClassesRakesAsTheVectors(
  vectors: VectorFile,
  mechanismFromRake: (rakeDeg: number) => string,
): void {
  it("classes every case's rake as the vectors do", () => {
    for (const c of vectors.cases)
      expect(mechanismFromRake(c.rakeDeg ?? 0), c.id).toBe(c.mechanism);
  });
}

import { readFileSync } from 'node:fs';
import { expect } from 'vitest';
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
 * The independent test vectors of test/engine/motion/vectors/ (see the README there): each case
 * names every input of one prediction and the expected ln median, τ, φ and σ.
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

/** The case as Tremora's model input; basin depths left to the model's defaults, as the vectors assume. */
export function vectorInput(c: VectorCase): GmmInput {
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

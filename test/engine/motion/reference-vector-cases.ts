/**
 * The independent test vectors of the crustal ground-motion models, copied unchanged from
 * `../shared/reference/gmm/vectors/<model>.json` into `vectors/` beside this file. Their
 * provenance (`../shared/reference/gmm/README.md`): computed by a reference implementation that
 * is not Tremora's, from the published coefficient tables, with every input written in each case
 * and the expected ln median, τ, φ and σ to 10 significant digits; compare with an absolute
 * tolerance of 1e-4 in natural-log units. Each file's `reference`, `generatedBy` and
 * `conventions` fields say which paper and which conventions (region, Z1 default, Vs30
 * measured or inferred) its numbers follow.
 */
import { readFileSync } from 'node:fs';
import type { Mechanism } from '../../../api/engine/model.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import type { GmmInput } from '../../../api/engine/motion/types.ts';

/** One case: every input of the rupture, the distances and the site, and the expected outputs. */
export interface ReferenceCase {
  readonly id: string;
  readonly measure: string;
  /** 0 for PGA, −1 for PGV. */
  readonly periodS: number;
  readonly magnitude: number;
  readonly mechanism: Mechanism;
  readonly rakeDeg: number;
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
  /** The model's own default Z1 for the case's Vs30, km. */
  readonly z1Km: number | null;
  readonly lnMedian: number;
  readonly tau: number;
  readonly phi: number;
  readonly sigma: number;
}

export interface ReferenceVectors {
  readonly model: string;
  readonly reference: string;
  readonly generatedBy: string;
  readonly conventions: readonly string[];
  readonly caseCount: number;
  readonly cases: readonly ReferenceCase[];
}

/** The vector file `vectors/<file>` beside this module. */
export function readReferenceVectors(file: string): ReferenceVectors {
  return JSON.parse(
    readFileSync(new URL(`vectors/${file}`, import.meta.url), 'utf8'),
  ) as ReferenceVectors;
}

export function measureOf(c: ReferenceCase): Measure {
  if (c.periodS === 0) return { kind: 'PGA' };
  if (c.periodS === -1) return { kind: 'PGV' };
  return { kind: 'SA', periodS: c.periodS };
}

/** The case as a model input; the basin depth left to the model's default unless `z1` is 'given'. */
export function inputOf(c: ReferenceCase, z1: 'default' | 'given' = 'default'): GmmInput {
  return {
    magnitude: c.magnitude,
    rakeDeg: c.rakeDeg,
    mechanism: c.mechanism,
    setting: 'crustal',
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
    ...(z1 === 'given' && c.z1Km !== null ? { z1Km: c.z1Km } : {}),
  };
}

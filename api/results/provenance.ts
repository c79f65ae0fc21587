import { TECTONIC_SETTINGS, type Study } from '../engine/model.ts';
import type { Provenance } from '../engine/results.ts';

/** The branches of the settings the study's sources use: the models that produced its numbers. */
export function modelsUsed(study: Study): Provenance['models'] {
  const used = TECTONIC_SETTINGS.filter((setting) =>
    study.sources.some((s) => s.setting === setting),
  );
  return Object.fromEntries(
    used.map((setting) => [
      setting,
      study.groundMotion[setting].map((b) => ({ model: b.model, weight: b.weight })),
    ]),
  );
}

export interface ProvenanceOptions {
  readonly study: Study;
  readonly toolVersion: string;
  /** input-hash.ts inputHash(study). */
  readonly inputHash: string;
  /** ISO 8601 times. */
  readonly startedAt: string;
  readonly finishedAt: string;
}

/** The provenance block every result carries (DESIGN.md section 2). */
export function buildProvenance(options: ProvenanceOptions): Provenance {
  return {
    tool: 'tremora',
    toolVersion: options.toolVersion,
    inputHash: options.inputHash,
    models: modelsUsed(options.study),
    settings: options.study.settings,
    startedAt: options.startedAt,
    finishedAt: options.finishedAt,
  };
}

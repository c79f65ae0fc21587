import { expect, it } from 'vitest';
import { runCli } from '../../../api/cli.ts';
import type { TectonicSetting } from '../../../api/engine/model.ts';
import { probeMotion } from '../../../api/engine/motion/probe.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import type { GroundMotionModel } from '../../../api/engine/motion/types.ts';
import { readProbeRequest } from '../../../api/operations/probe-request.ts';
import { PGA } from './measures.ts';

export interface RegistryEntry {
  /** The name studies, the CLI and the API give. */
  readonly name: string;
  readonly distanceMetric: GroundMotionModel['distanceMetric'];
  readonly settings: readonly TectonicSetting[];
}

/**
 * The model is in the registry under `entry.name`, and `tremora motion` and /api/probe answer for it
 * at M 6.5, Rjb 20 km with its own PGA median (to 12 digits through the probe, exactly through
 * the CLI's JSON).
 */
export function itIsInTheRegistry(model: GroundMotionModel, entry: RegistryEntry): void {
  it('is in the registry, so studies, `tremora motion` and /api/probe can name it', async () => {
    expect(modelCatalog.get(entry.name)).toBe(model);
    const request = readProbeRequest(
      { model: entry.name, magnitude: 6.5, rjbKm: 20 },
      modelCatalog,
    );
    const result = probeMotion(request, modelCatalog);
    expect(Object.keys(result.measures)).toEqual(['PGA', 'PGV', 'SA(0.2)', 'SA(1.0)']);
    expect(result.measures.PGA?.median).toBeCloseTo(
      Math.exp(model.predict(result.input, PGA).lnMedian),
      12,
    );
    expect(model.distanceMetric).toBe(entry.distanceMetric);
    expect(model.settings).toEqual(entry.settings);
    let out = '';
    const code = await runCli(
      ['motion', '--model', entry.name, '--magnitude', '6.5', '--rjb', '20', '--json'],
      { out: (t) => (out += t), err: () => undefined },
    );
    expect(code).toBe(0);
    expect(
      (JSON.parse(out) as { model: string; measures: Record<string, { median: number }> }).measures
        .PGA?.median,
    ).toBe(result.measures.PGA?.median);
  });
}

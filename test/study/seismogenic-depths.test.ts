import { describe, expect, it } from 'vitest';
import { modelCatalog } from '../../api/engine/motion/registry.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { smallStudy } from '../service/helpers/small-study.ts';

/** The small study with its point source's properties extended by `extra`. */
function withDepths(extra: Record<string, unknown>) {
  const raw = smallStudy();
  const sources = raw.sources as { features: { properties: Record<string, unknown> }[] };
  const feature = sources.features[0]!;
  Object.assign(feature.properties, extra);
  return loadStudy(raw, { models: modelCatalog });
}

describe('seismogenic depths of zone and point sources (virtual ruptures)', () => {
  it('are read when given, with no warning of an unknown key', () => {
    const result = withDepths({ upperDepthKm: 2, lowerDepthKm: 18 });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.study.sources[0]).toMatchObject({ upperDepthKm: 2, lowerDepthKm: 18 });
    expect(result.warnings.some((w) => w.path.includes('DepthKm'))).toBe(false);
  });

  it('refuse a lower depth at or above the upper one, naming the field', () => {
    const result = withDepths({ upperDepthKm: 12, lowerDepthKm: 12 });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues[0]?.path).toBe('sources.features[0].properties.lowerDepthKm');
    expect(result.issues[0]?.message).toMatch(/expected lowerDepthKm greater than upperDepthKm/);
  });
});

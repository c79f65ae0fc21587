import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import { sourceSanity } from '../../../api/engine/sanity/source-sanity.ts';
import { DEMO_STUDY_URL } from '../../../api/operations/demo-seed.ts';
import { loadStudy } from '../../../api/study/load-study.ts';

// The demo's source model is invented (data-demo/README.md); these check only that it is one the
// source checks accept, so that the demo does not teach users to ignore their warnings.
const raw = JSON.parse(readFileSync(DEMO_STUDY_URL, 'utf8')) as {
  notes: string;
  sources: {
    features: {
      properties: {
        id: string;
        setting: string;
        recurrence: { type: string; mMin: number; mMax: number; slipRateMmYr?: number };
      };
    }[];
  };
};
const loaded = loadStudy(raw, { models: modelCatalog });
if (!loaded.ok) throw new Error('the demo study does not load');
const props = (id: string) => {
  const found = raw.sources.features.find((f) => f.properties.id === id)?.properties;
  if (!found) throw new Error(`demo source ${id} missing`);
  return found;
};

describe('the demo source model', () => {
  it('raises no source sanity warning, neither from the engine nor on loading', () => {
    expect(sourceSanity(loaded.study)).toEqual([]);
    expect(loaded.warnings.filter((w) => w.path.startsWith('sources'))).toEqual([]);
  });

  it('ends the background zone where the crustal faults begin', () => {
    const zoneMax = props('orle-background').recurrence.mMax;
    for (const id of ['vennick-fault', 'pellow-thrust', 'lisk-fault'])
      expect(props(id).recurrence.mMin).toBeGreaterThanOrEqual(zoneMax);
  });

  it('slips the interface at the convergence times the coupling its notes state', () => {
    const convergence = Number(/convergence of (\d+) mm\/yr/.exec(raw.notes)?.[1]);
    const coupling = Number(/coupling of (0\.\d+)/.exec(raw.notes)?.[1]);
    // Both read from the study's own words and numbers; 1e-9 mm/yr covers the product's rounding.
    expect(convergence * coupling).toBeCloseTo(
      props('orle-interface').recurrence.slipRateMmYr ?? NaN,
      9,
    );
  });
});

import { readFileSync } from 'node:fs';
import { DEMO_STUDY_URL } from '../../../api/operations/demo-seed.ts';

/**
 * The demo study cut down so a screening is quick: the named villages and sources, PGA only,
 * half-magnitude steps, a 50-year horizon, no terrain grid.
 */
export function cutDownDemo(
  name: string,
  communityIds: readonly string[],
  sourceIds: readonly string[],
): { readonly name: string } & Record<string, unknown> {
  const demo = JSON.parse(readFileSync(DEMO_STUDY_URL, 'utf8')) as Record<string, any>;
  const { terrain: _terrain, ...rest } = demo;
  return {
    ...rest,
    name,
    communities: demo.communities.filter((c: { id: string }) => communityIds.includes(c.id)),
    sources: {
      type: 'FeatureCollection',
      features: demo.sources.features.filter((f: { properties: { id: string } }) =>
        sourceIds.includes(f.properties.id),
      ),
    },
    settings: { ...demo.settings, measures: ['PGA'], magnitudeStep: 0.5, horizonsYears: [50] },
  };
}

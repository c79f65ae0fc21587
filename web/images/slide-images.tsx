import type { Study } from '../../api/engine/model.ts';
import { INTENSITY_MEASURE } from '../../api/engine/intensity/site-intensity.ts';
import type { CommunityPageData } from '../data/community-data.ts';
import { VillageMap, villageFrame } from '../maps/village-map.tsx';
import { CommunityCurvePlot } from '../plots/community-curve-plot.tsx';
import type { Translator } from '../text/translator.ts';
import { ShakingCards, SLIDE } from './shaking-cards.tsx';
import { standaloneSvg } from './svg-file.ts';

/** The pictures a community's page offers for slides, by the name in their address. */
export const SLIDE_IMAGES = ['map', 'hazard-curve', 'shaking-cards'] as const;
export type SlideImage = (typeof SLIDE_IMAGES)[number];

export const isSlideImage = (name: string): name is SlideImage =>
  (SLIDE_IMAGES as readonly string[]).includes(name);

/** The map on a slide: the slide's height, a little narrower than the slide. */
const SLIDE_MAP = { width: 960, maxHeight: SLIDE.height, padding: 8 } as const;

/**
 * One picture of a community as an SVG file, or undefined when the community has nothing to
 * draw (a hazard curve needs the screening's intensity measure).
 */
export async function slideImageSvg(
  name: SlideImage,
  tr: Translator,
  study: Study,
  data: CommunityPageData,
): Promise<string | undefined> {
  const { community, result } = data;
  if (name === 'map') {
    const frame = villageFrame(study, community, result.nearestFaults, SLIDE_MAP);
    return standaloneSvg(
      await (
        <VillageMap tr={tr} study={study} community={community} frame={frame} idPrefix="map" />
      ).toString(),
    );
  }
  if (name === 'hazard-curve') {
    const curve = result.curves[INTENSITY_MEASURE];
    if (!curve) return undefined;
    return standaloneSvg(
      await (
        <CommunityCurvePlot
          tr={tr}
          study={study}
          result={result}
          curve={curve}
          width={960}
          height={600}
        />
      ).toString(),
    );
  }
  return standaloneSvg(await (<ShakingCards tr={tr} data={data} />).toString());
}

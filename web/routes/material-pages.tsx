import type { Context, Hono } from 'hono';
import type { Study } from '../../api/engine/model.ts';
import type { Provenance } from '../../api/engine/results.ts';
import type { CommunityPageData } from '../data/community-data.ts';
import { isSlideImage, slideImageSvg } from '../images/slide-images.tsx';
import { svgToPng } from '../images/svg-file.ts';
import { villageFrame } from '../maps/village-map.tsx';
import type { Translator } from '../text/translator.ts';
import { PosterView } from '../views/poster-view.tsx';
import type { CommunitySheetProps } from '../views/print-sheet.tsx';
import type { PageKit } from './page-kit.ts';
import { notFoundPage } from './message-pages.tsx';

/** A community of a study's newest done run, or the answer to give instead (study-pages.tsx). */
export type FoundCommunity =
  | { readonly kind: 'response'; readonly response: Response | Promise<Response> }
  | {
      readonly kind: 'page';
      readonly tr: Translator;
      readonly id: string;
      readonly study: Study;
      readonly screening: { readonly results: { readonly provenance: Provenance } };
      readonly page: CommunityPageData;
    };

/** What a community's printed sheet (handout, poster) is made from, printed now. */
export function communitySheet(
  kit: PageKit,
  c: Context,
  found: FoundCommunity & { readonly kind: 'page' },
): CommunitySheetProps {
  const { id, study, screening, page } = found;
  return {
    page: kit.page(c),
    studyId: id,
    study,
    data: page,
    frame: villageFrame(study, page.community, page.result.nearestFaults),
    provenance: screening.results.provenance,
    printedAt: new Date().toISOString(),
  };
}

/** The media type of each picture format offered for slides. */
const MEDIA_TYPES = { svg: 'image/svg+xml; charset=utf-8', png: 'image/png' } as const;

/** A community id made safe for a file name: letters, digits, dot, dash and underscore. */
const fileStem = (id: string): string => id.replace(/[^A-Za-z0-9._-]+/g, '-');

/**
 * Session material beyond the handout: a village's A3 poster, and its pictures for slides
 * (the village map, the hazard curve, the shaking cards) as SVG or PNG downloads.
 */
export function materialPages(
  app: Hono,
  kit: PageKit,
  findCommunity: (c: Context) => FoundCommunity,
): void {
  app.get('/studies/:id/communities/:cid/poster', (c) => {
    const found = findCommunity(c);
    if (found.kind === 'response') return found.response;
    return kit.render(c, <PosterView {...communitySheet(kit, c, found)} />);
  });

  app.get('/studies/:id/communities/:cid/images/:file', async (c) => {
    const file = c.req.param('file');
    const match = /^([a-z-]+)\.(svg|png)$/.exec(file);
    const name = match?.[1] ?? '';
    const format = match?.[2] as 'svg' | 'png' | undefined;
    const notFound = () => notFoundPage(kit, c);
    if (!format || !isSlideImage(name)) return notFound();
    const found = findCommunity(c);
    if (found.kind === 'response') return found.response;
    const svg = await slideImageSvg(name, found.tr, found.study, found.page);
    if (svg === undefined) return notFound();
    const headers = {
      'Content-Type': MEDIA_TYPES[format],
      'Content-Disposition': `attachment; filename="${fileStem(found.page.community.id)}-${name}.${format}"`,
    };
    return format === 'svg'
      ? c.body(svg, 200, headers)
      : c.body(new Uint8Array(svgToPng(svg)), 200, headers);
  });
}

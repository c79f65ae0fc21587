import { LanguageSwitch } from '../layout/language-switch.tsx';
import type { CommunityFeltHistory } from '../../api/engine/catalog/felt-history.ts';
import type { Study } from '../../api/engine/model.ts';
import type { Provenance } from '../../api/engine/results.ts';
import type { CommunityPageData } from '../data/community-data.ts';
import type { MapFrame } from '../maps/map-frame.ts';
import type { Translator } from '../text/translator.ts';
import { FeltList } from './felt-list.tsx';
import { Headline, ProvenanceLine, ShakingLevels } from './community-view.tsx';
import { SafetyAdvice } from './safety-advice.tsx';
import type { TsunamiPageResult } from '../data/tsunami-data.ts';
import { TsunamiTime } from './tsunami-time.tsx';
import { IntensityStrip } from './intensity-pictograms.tsx';
import { VillageMapSection } from './village-map-section.tsx';

export interface HandoutViewProps {
  readonly tr: Translator;
  readonly path: string;
  readonly studyId: string;
  /** The study as screened (its faults and places for the village map). */
  readonly study: Study;
  readonly data: CommunityPageData;
  /** The village map's frame (maps/village-map.tsx). */
  readonly frame: MapFrame;
  readonly provenance: Provenance;
  /** When the handout was made (ISO), printed on it. */
  readonly printedAt: string;
  readonly felt?: { readonly history: CommunityFeltHistory; readonly eventCount: number };
  /** Tsunami time to act, for a coastal community of a study with a terrain grid. */
  readonly tsunami?: TsunamiPageResult;
}

/**
 * The printable handout: one or two pages of A4 or Letter, readable in greyscale. The caution
 * and the provenance sit in a table footer that Chromium repeats at the foot of every printed
 * page (a <tfoot> of a table split across pages; CSS 2.1 section 17.2, display
 * table-footer-group). Boxes of advice are kept whole on one page (break-inside: avoid).
 * It is for residents: no screening band or other planner's label appears on it.
 */
export function HandoutView(props: HandoutViewProps) {
  const { tr, data } = props;
  const { community } = data;
  const top = data.sources
    .filter((s) => s.sourceId !== null)
    .slice(0, 3)
    .map(
      (s) => `${s.name} (${tr.t('chance.percent', { p: tr.number(Math.round(s.share * 100)) })})`,
    )
    .join(', ');
  const title = tr.t('handout.title', { name: community.name });
  return (
    <html lang={tr.lang}>
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title lang={tr.fallbackLang('handout.title')}>{`${title} · ${tr.t('site.name')}`}</title>
        <link rel="icon" href="data:," />
        <link rel="stylesheet" href="/static/tremora.css" />
        <link rel="stylesheet" href="/static/handout.css" />
        <script src="/static/tremora.js" defer></script>
      </head>
      <body class="handout-page">
        <a class="skip-link" href="#main">
          {tr.text('site.skip')}
        </a>
        <header class="handout-tools no-print">
          <nav aria-label={tr.t('nav.main')}>
            <a href={`/studies/${props.studyId}/communities/${community.id}`}>
              {tr.text('handout.back')}
            </a>
          </nav>
          <p>{tr.text('handout.printHint')}</p>
          <LanguageSwitch tr={tr} path={props.path} />
          <p
            data-print-button="true"
            data-print-label={tr.t('handout.print')}
            lang={tr.fallbackLang('handout.print')}
            class="print-slot"
          ></p>
        </header>
        <table class="handout-frame" role="presentation">
          <tbody>
            <tr>
              <td>
                <main id="main" tabindex={-1} class="handout">
                  <h1>{tr.text('handout.title', { name: community.name })}</h1>
                  <Headline tr={tr} data={data} name={community.name} explainMmi={false} />
                  {props.tsunami && (
                    <TsunamiTime
                      tr={tr}
                      communityId={community.id}
                      tsunami={props.tsunami}
                      headingLevel={2}
                      compact
                    />
                  )}
                  <section aria-labelledby="h-levels">
                    <h2 id="h-levels">{tr.text('community.levels')}</h2>
                    <p class="intensity-sentence">{tr.text('material.intensity')}</p>
                    <ShakingLevels tr={tr} data={data} headingLevel={2} compact={true} />
                    {top && <p>{tr.text('handout.topSources', { sources: top })}</p>}
                  </section>
                  <section aria-labelledby="h-pictures" class="pictures">
                    <h2 id="h-pictures">{tr.text('material.pictures')}</h2>
                    <IntensityStrip tr={tr} />
                  </section>
                  <VillageMapSection
                    tr={tr}
                    study={props.study}
                    data={data}
                    frame={props.frame}
                    idPrefix="village-map"
                    headingLevel={2}
                  />
                  {props.felt && props.felt.history.felt.length > 0 && (
                    <FeltList
                      tr={tr}
                      studyId={props.studyId}
                      communityName={community.name}
                      felt={props.felt}
                      limit={3}
                      headingLevel={2}
                      compact={true}
                    />
                  )}
                  <section aria-labelledby="h-todo" class="handout-todo">
                    <h2 id="h-todo">{tr.text('community.todo')}</h2>
                    <SafetyAdvice tr={tr} coastal={community.coastal} headingLevel={3} />
                  </section>
                </main>
              </td>
            </tr>
          </tbody>
          <tfoot>
            <tr>
              <td>
                <div class="handout-footer">
                  <p class="handout-caution">
                    <strong>{tr.text('caution.short')}</strong>
                  </p>
                  <ProvenanceLine tr={tr} provenance={props.provenance} />
                  <p class="printed">
                    {tr.text('provenance.printed', { date: tr.date(props.printedAt) })}
                  </p>
                </div>
              </td>
            </tr>
          </tfoot>
        </table>
      </body>
    </html>
  );
}

import type { CommunityFeltHistory } from '../../api/engine/catalog/felt-history.ts';
import { FeltList } from './felt-list.tsx';
import { Headline, ShakingLevels } from './community-view.tsx';
import { SafetyAdvice } from './safety-advice.tsx';
import type { TsunamiPageResult } from '../data/tsunami-data.ts';
import { TsunamiTime } from './tsunami-time.tsx';
import { IntensityStrip } from './intensity-pictograms.tsx';
import { VillageMapSection } from './village-map-section.tsx';
import { PrintSheet, PrintedFooter } from './print-sheet.tsx';
import type { CommunitySheetProps } from './print-sheet.tsx';

export interface HandoutViewProps extends CommunitySheetProps {
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
  const { tr } = props.page;
  const { data } = props;
  const { community } = data;
  const top = data.sources
    .filter((s) => s.sourceId !== null)
    .slice(0, 3)
    .map(
      (s) => `${s.name} (${tr.t('chance.percent', { p: tr.number(Math.round(s.share * 100)) })})`,
    )
    .join(', ');
  return (
    <PrintSheet
      page={props.page}
      sheet="handout"
      studyId={props.studyId}
      community={community}
      languageSwitch
    >
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
                <VillageMapSection sheet={props} idPrefix="village-map" />
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
                <PrintedFooter sheet="handout" of={props} />
              </div>
            </td>
          </tr>
        </tfoot>
      </table>
    </PrintSheet>
  );
}

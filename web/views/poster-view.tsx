import type { TextKey } from '../text/text-key.ts';
import { Pictogram, PICTOGRAM_LEVELS, type PictogramLevel } from './intensity-pictograms.tsx';
import { VillageMapSection } from './village-map-section.tsx';
import { PrintSheet, PrintedFooter } from './print-sheet.tsx';
import type { CommunitySheetProps } from './print-sheet.tsx';

export type PosterViewProps = CommunitySheetProps;

/** What to do during shaking, from the safety advice: its first lines, the ones a poster can hold. */
const DURING_LINES = 3;

/**
 * A village's poster: one sheet of A3, upright, in large type for a wall. Greyscale-safe:
 * black on white, the pictures in line and grey, every meaning in words. For residents, so
 * no screening band or planner's label.
 */
export function PosterView(props: PosterViewProps) {
  const { tr } = props.page;
  const { data } = props;
  const { community } = data;
  const vii = tr.chance(data.chances.VII);
  const title = tr.t('material.posterTitle', { name: community.name });
  const during = tr.t('safety.during').split('\n').slice(0, DURING_LINES);
  return (
    <PrintSheet page={props.page} sheet="poster" studyId={props.studyId} community={community}>
      <main id="main" class="poster">
        <h1>{title}</h1>
        <p class="poster-headline" data-probability={data.chances.VII}>
          {tr.text('community.headline', {
            name: community.name,
            chance: vii.frequency,
            years: data.years,
            percent: vii.percent,
          })}
        </p>
        <p class="intensity-sentence">{tr.text('material.intensity')}</p>
        <section aria-labelledby="poster-levels" class="poster-levels">
          <h2 id="poster-levels">{tr.text('material.posterLevels')}</h2>
          <ul>
            {data.levels.map((level) =>
              level.mmiLevel === null ? null : (
                <li data-mmi-level={level.mmiLevel}>
                  {PICTOGRAM_LEVELS.includes(level.mmiLevel as PictogramLevel) && (
                    <svg
                      viewBox="0 0 100 100"
                      class="pictogram-svg"
                      aria-hidden="true"
                      focusable="false"
                    >
                      <Pictogram level={level.mmiLevel as PictogramLevel} />
                    </svg>
                  )}
                  <div>
                    <p class="poster-level-period">
                      {tr.text('community.level', { period: tr.number(level.returnPeriodYears) })}
                    </p>
                    <p class="poster-level-name">
                      {tr.text('community.levelMmi', {
                        mmi: tr.mmi(level.mmi ?? level.mmiLevel),
                        name: tr.text(`mmi.${level.mmiLevel}.name` as TextKey),
                      })}
                    </p>
                    <p>{tr.text(`mmi.${level.mmiLevel}.feel` as TextKey)}</p>
                    <p>{tr.text(`mmi.${level.mmiLevel}.buildings` as TextKey)}</p>
                  </div>
                </li>
              ),
            )}
          </ul>
        </section>
        <section aria-labelledby="poster-do" class="poster-do">
          <h2 id="poster-do">{tr.text('material.posterDo')}</h2>
          <ul lang={tr.fallbackLang('safety.during')}>
            {during.map((line) => (
              <li>{line}</li>
            ))}
          </ul>
          {community.coastal && (
            <div class="poster-tsunami">
              <h3>{tr.text('tsunami.title')}</h3>
              <ul lang={tr.fallbackLang('tsunami.text')}>
                {tr
                  .t('tsunami.text')
                  .split('\n')
                  .slice(0, 1)
                  .map((line) => (
                    <li>{line}</li>
                  ))}
              </ul>
            </div>
          )}
        </section>
        <VillageMapSection sheet={props} idPrefix="poster-map" />
        <footer class="poster-footer">
          <PrintedFooter sheet="poster" of={props} more={<> {tr.text('safety.local')}</>} />
        </footer>
      </main>
    </PrintSheet>
  );
}

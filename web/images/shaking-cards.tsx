import type { CommunityPageData } from '../data/community-data.ts';
import { INK, MAP_COLOURS, PAPER } from '../style/palette.ts';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';
import {
  Pictogram,
  PICTOGRAM_LEVELS,
  type PictogramLevel,
} from '../views/intensity-pictograms.tsx';
import { wrapWords } from './wrap-words.ts';

/** A slide's size, px (16:9). */
export const SLIDE = { width: 1280, height: 720 } as const;

const MARGIN = 40;
const GAP = 28;
const TITLE_PX = 36;
const HEADING_PX = 22;
const TEXT_PX = 20;
const LINE = 1.3;
const PICTURE_PX = 150;

const isPictured = (level: number | null): level is PictogramLevel =>
  PICTOGRAM_LEVELS.includes(level as PictogramLevel);

/** Lines of text from `y` down, each `fontSize` × LINE apart. */
function Lines(props: {
  readonly lines: readonly string[];
  readonly x: number;
  readonly y: number;
  readonly fontSize: number;
  readonly bold?: boolean;
}) {
  return (
    <text
      x={props.x}
      y={props.y}
      font-size={props.fontSize}
      fill={INK}
      font-weight={props.bold ? 'bold' : undefined}
    >
      {props.lines.map((text, i) => (
        <tspan x={props.x} dy={i === 0 ? 0 : props.fontSize * LINE}>
          {text}
        </tspan>
      ))}
    </text>
  );
}

/**
 * The "what shaking would feel like" cards as one slide: a card per return period with its
 * picture (levels IV to VIII have one), its level and what people feel and buildings do.
 * Black on white with grey lines only: it reads in greyscale and on any projector.
 */
export function ShakingCards(props: { readonly tr: Translator; readonly data: CommunityPageData }) {
  const { tr, data } = props;
  const count = Math.max(1, data.levels.length);
  const cardWidth = (SLIDE.width - 2 * MARGIN - (count - 1) * GAP) / count;
  const top = MARGIN + TITLE_PX + 24;
  const textWidth = cardWidth - 40;
  const title = tr.t('material.cardsTitle', { name: data.community.name });
  return (
    <svg
      viewBox={`0 0 ${SLIDE.width} ${SLIDE.height}`}
      width={SLIDE.width}
      height={SLIDE.height}
      role="img"
      aria-labelledby="cards-title"
    >
      <title id="cards-title">{title}</title>
      <rect width={SLIDE.width} height={SLIDE.height} fill={PAPER} />
      <text x={MARGIN} y={MARGIN + TITLE_PX} font-size={TITLE_PX} font-weight="bold" fill={INK}>
        {title}
      </text>
      {data.levels.map((level, i) => {
        const x = MARGIN + i * (cardWidth + GAP);
        const left = x + 20;
        const heading = wrapWords(
          tr.t('community.level', { period: tr.number(level.returnPeriodYears) }),
          textWidth,
          HEADING_PX,
        );
        let y = top + 36;
        const headingY = y;
        y += heading.length * HEADING_PX * LINE;
        const pictured = isPictured(level.mmiLevel);
        const pictureY = y;
        if (pictured) y += PICTURE_PX + 16;
        const mmiY = y + TEXT_PX;
        const mmiText =
          level.mmiLevel === null
            ? [tr.t('community.levelOffCurve')]
            : wrapWords(
                tr.t('community.levelMmi', {
                  mmi: tr.mmi(level.mmi ?? level.mmiLevel),
                  name: tr.t(`mmi.${level.mmiLevel}.name` as TextKey),
                }),
                textWidth,
                TEXT_PX,
              );
        /** The level's words on one aspect of the shaking, after their label, as lines. */
        const aspectLines = (label: TextKey, aspect: 'feel' | 'buildings') =>
          level.mmiLevel === null
            ? []
            : wrapWords(
                `${tr.t(label)}: ${tr.t(`mmi.${level.mmiLevel}.${aspect}` as TextKey)}`,
                textWidth,
                TEXT_PX,
              );
        const feel = aspectLines('community.feels', 'feel');
        const buildings = aspectLines('community.buildings', 'buildings');
        const feelY = mmiY + (mmiText.length + 0.6) * TEXT_PX * LINE;
        const buildingsY = feelY + (feel.length + 0.4) * TEXT_PX * LINE;
        return (
          <g
            class="shaking-card"
            data-return-period={level.returnPeriodYears}
            data-mmi-level={level.mmiLevel ?? undefined}
          >
            <rect
              x={x}
              y={top}
              width={cardWidth}
              height={SLIDE.height - top - MARGIN}
              fill={PAPER}
              stroke={MAP_COLOURS.axis}
              stroke-width={2}
              rx={10}
            />
            <Lines lines={heading} x={left} y={headingY} fontSize={HEADING_PX} bold />
            {pictured && (
              <g
                transform={`translate(${x + (cardWidth - PICTURE_PX) / 2},${pictureY}) scale(${PICTURE_PX / 100})`}
              >
                <Pictogram level={level.mmiLevel as PictogramLevel} />
              </g>
            )}
            <Lines lines={mmiText} x={left} y={mmiY} fontSize={TEXT_PX} bold />
            <Lines lines={feel} x={left} y={feelY} fontSize={TEXT_PX} />
            <Lines lines={buildings} x={left} y={buildingsY} fontSize={TEXT_PX} />
          </g>
        );
      })}
    </svg>
  );
}

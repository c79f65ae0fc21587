import type { Child } from 'hono/jsx';
import { INK, PAPER } from '../style/palette.ts';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/** The levels the picture strip shows: from the first felt by many to heavy damage. */
export const PICTOGRAM_LEVELS = [4, 5, 6, 7, 8] as const;
export type PictogramLevel = (typeof PICTOGRAM_LEVELS)[number];

/** Greys of the drawings: each drawing reads in black line alone, the greys only fill. */
const LIGHT = '#d9d9d9';
const MID = '#8c8c8c';

const line = { stroke: INK, 'stroke-width': 3, 'stroke-linecap': 'round', fill: 'none' } as const;
const thin = { ...line, 'stroke-width': 2 } as const;

/** A wall of a house with its roof, drawn in a 100 × 100 box (VII and VIII build on it). */
const house = (roof: string) => (
  <>
    <path d={roof} fill={MID} stroke={INK} stroke-width={3} stroke-linejoin="round" />
    <rect x={22} y={50} width={56} height={40} fill={LIGHT} stroke={INK} stroke-width={3} />
  </>
);

/** A box of `fill` turned by `degrees` about its own centre (things that fall or hang askew). */
const tilted = (
  box: { readonly x: number; readonly y: number; readonly width: number; readonly height: number },
  fill: string,
  strokeWidth: number,
  degrees: number,
) => (
  <rect
    x={box.x}
    y={box.y}
    width={box.width}
    height={box.height}
    fill={fill}
    stroke={INK}
    stroke-width={strokeWidth}
    transform={`rotate(${degrees} ${box.x + box.width / 2} ${box.y + box.height / 2})`}
  />
);

/** Our own drawings, one per level, in a 100 × 100 box. */
const DRAWINGS: Readonly<Record<PictogramLevel, Child>> = {
  // IV: a hanging lamp swings; cups rattle on the shelf.
  4: (
    <>
      <line x1={10} y1={8} x2={90} y2={8} {...line} />
      <line x1={50} y1={8} x2={62} y2={50} {...thin} />
      <path d="M48,52 L76,48 L70,62 L54,64 Z" fill={MID} stroke={INK} stroke-width={2.5} />
      <path d="M32,40 Q28,52 34,62" {...thin} />
      <path d="M84,34 Q90,46 86,58" {...thin} />
      <line x1={14} y1={86} x2={86} y2={86} {...line} />
      <rect x={26} y={74} width={12} height={12} fill={LIGHT} stroke={INK} stroke-width={2} />
      <rect x={46} y={74} width={12} height={12} fill={LIGHT} stroke={INK} stroke-width={2} />
      <path d="M22,70 l-4,-4 M64,70 l4,-4" {...thin} />
    </>
  ),
  // V: things fall off a shelf.
  5: (
    <>
      <line x1={12} y1={36} x2={70} y2={36} {...line} />
      <rect x={18} y={16} width={12} height={20} fill={LIGHT} stroke={INK} stroke-width={2} />
      <rect x={38} y={22} width={14} height={14} fill={MID} stroke={INK} stroke-width={2} />
      {tilted({ x: 66, y: 46, width: 14, height: 18 }, LIGHT, 2, 35)}
      <path d="M58,40 l-6,8 M62,50 l-8,4" {...thin} />
      <line x1={10} y1={90} x2={90} y2={90} {...line} />
      <path d="M56,90 l6,-8 l6,8 M72,90 l8,-6" {...thin} />
    </>
  ),
  // VI: a picture hangs askew, the plaster cracks, people go outside.
  6: (
    <>
      <rect x={8} y={8} width={84} height={84} fill={PAPER} stroke={INK} stroke-width={3} />
      {tilted({ x: 24, y: 20, width: 30, height: 22 }, LIGHT, 2.5, -14)}
      <path d="M70,12 L64,28 L72,40 L62,58" {...thin} />
      <circle cx={72} cy={66} r={5} fill={INK} />
      <path d="M72,71 L70,84 M70,84 L62,92 M70,84 L80,92 M71,76 L60,72 M71,76 L82,70" {...thin} />
      <path d="M20,80 h8 M24,74 h6" {...thin} />
    </>
  ),
  // VII: a chimney breaks and walls crack.
  7: (
    <>
      {house('M16,52 L50,22 L84,52 Z')}
      {tilted({ x: 62, y: 18, width: 10, height: 16 }, MID, 2.5, 20)}
      <rect x={84} y={40} width={8} height={6} fill={MID} stroke={INK} stroke-width={2} />
      <rect x={88} y={60} width={7} height={5} fill={MID} stroke={INK} stroke-width={2} />
      <path d="M36,52 L42,64 L36,74 L42,88" {...thin} />
      <path d="M66,54 L60,66 L66,76" {...thin} />
      <rect x={44} y={68} width={12} height={22} fill={PAPER} stroke={INK} stroke-width={2} />
    </>
  ),
  // VIII: part of a house falls down.
  8: (
    <>
      <path d="M10,54 L44,26 L70,60 Z" fill={MID} stroke={INK} stroke-width={3} />
      <path
        d="M16,52 L16,90 L58,90 L58,68 L46,60 L30,52 Z"
        fill={LIGHT}
        stroke={INK}
        stroke-width={3}
      />
      <path d="M30,60 L36,72 L30,82" {...thin} />
      <path
        d="M60,90 L66,78 L74,82 L80,72 L88,80 L92,90 Z"
        fill={MID}
        stroke={INK}
        stroke-width={2.5}
        stroke-linejoin="round"
      />
      {tilted({ x: 74, y: 60, width: 8, height: 6 }, MID, 2, 25)}
      <line x1={6} y1={92} x2={94} y2={92} {...line} />
    </>
  ),
};

/** One level's drawing as SVG content in a 100 × 100 box, for a page's picture or a slide. */
export function Pictogram(props: { readonly level: PictogramLevel }) {
  return (
    <g class="pictogram" data-mmi-level={props.level}>
      {DRAWINGS[props.level]}
    </g>
  );
}

const pictoKey = (level: PictogramLevel) => `material.picture.${level}` as TextKey;

/** What a level's picture shows, in words (its text alternative and caption). */
export const pictureWords = (tr: Translator, level: PictogramLevel): string =>
  tr.t(pictoKey(level));

/**
 * The picture strip: one drawing per level from IV to VIII, each with its level, its name
 * and what the picture shows. Black line on white with grey fills: it reads printed in
 * greyscale, and the words carry the meaning without the picture.
 */
export function IntensityStrip(props: { readonly tr: Translator }) {
  const { tr } = props;
  return (
    <ol class="picture-strip">
      {PICTOGRAM_LEVELS.map((level) => (
        <li data-mmi-level={level}>
          <svg
            viewBox="0 0 100 100"
            width="100"
            height="100"
            class="pictogram-svg"
            aria-hidden="true"
            focusable="false"
          >
            <Pictogram level={level} />
          </svg>
          <p class="picture-level">
            <strong>{tr.mmi(level)}</strong>{' '}
            <span lang={tr.fallbackLang(`mmi.${level}.name` as TextKey)}>
              {tr.t(`mmi.${level}.name` as TextKey)}
            </span>
          </p>
          <p class="picture-words" lang={tr.fallbackLang(pictoKey(level))}>
            {pictureWords(tr, level)}
          </p>
        </li>
      ))}
    </ol>
  );
}

import { describe, expect, test } from 'vitest';
import {
  BAND_STYLES,
  DUSK,
  INK,
  MMI_CLASSES,
  mmiClass,
  onDusk,
  PAPER,
  paletteCss,
} from '../../../web/style/palette.ts';
import { expectClose } from '../../helpers/close.ts';

/** sRGB decoding to linear light (IEC 61966-2-1). */
const linear = (hex: string): [number, number, number] =>
  [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];

/** Relative luminance Y of linear sRGB (ITU-R BT.709 primaries, D65). */
const luminance = ([r, g, b]: readonly number[]): number =>
  0.2126 * (r as number) + 0.7152 * (g as number) + 0.0722 * (b as number);

/** CIE 1976 L* from Y (white Y = 1). */
const lightness = (y: number): number =>
  y > (6 / 29) ** 3 ? 116 * Math.cbrt(y) - 16 : (29 / 3) ** 3 * y;

/**
 * Severity-1 simulation matrices of Machado, Oliveira & Fernandes (2009), "A physiologically-
 * based model for simulation of color vision deficiency", IEEE TVCG 15(6), applied to linear
 * RGB (from memory).
 */
const MACHADO_2009: Record<string, readonly (readonly number[])[]> = {
  protanopia: [
    [0.152286, 1.052583, -0.204868],
    [0.114503, 0.786281, 0.099216],
    [-0.003882, -0.048116, 1.051998],
  ],
  deuteranopia: [
    [0.367322, 0.860646, -0.227968],
    [0.280085, 0.672501, 0.047413],
    [-0.01182, 0.04294, 0.968881],
  ],
  tritanopia: [
    [1.255528, -0.076749, -0.178779],
    [-0.078411, 0.930809, 0.147602],
    [0.004733, 0.691367, 0.3039],
  ],
};

const simulate = (rgb: readonly number[], m: readonly (readonly number[])[]) =>
  m.map((row) =>
    Math.min(
      1,
      Math.max(
        0,
        row.reduce((sum, k, j) => sum + k * (rgb[j] as number), 0),
      ),
    ),
  );

/** WCAG 2 contrast ratio of two colours. */
const contrast = (a: string, b: string): number => {
  const [hi, lo] = [luminance(linear(a)), luminance(linear(b))].sort((x, y) => y - x) as [
    number,
    number,
  ];
  return (hi + 0.05) / (lo + 0.05);
};

/** Neighbouring steps of the scale differ by at least this much lightness, in every view (our design rule). */
const MIN_STEP_LSTAR = 12;

describe('the dusk scale', () => {
  test('sanity of the method: white has L* 100 and each Machado matrix keeps white white (rows sum to 1)', () => {
    expectClose(lightness(luminance(linear('#ffffff'))), 100, 1e-9, 'CIE 1976 L* of white');
    for (const [name, m] of Object.entries(MACHADO_2009)) {
      for (const row of m)
        expectClose(
          row.reduce((a, b) => a + b, 0),
          1,
          2e-6,
          `Machado et al. 2009 ${name} row sum`,
        );
    }
  });

  test('the designed lightness: L* 97, 84, 71, 58, 44.5, 31, 17 within 0.6', () => {
    const designed = [97, 84, 71, 58, 44.5, 31, 17];
    DUSK.forEach((hex, i) =>
      expectClose(
        lightness(luminance(linear(hex))),
        designed[i] as number,
        0.6,
        `CIE 1976 L* of dusk step ${i} ${hex}`,
      ),
    );
  });

  const views: Record<string, (hex: string) => number> = {
    'normal vision': (hex) => lightness(luminance(linear(hex))),
    ...Object.fromEntries(
      Object.entries(MACHADO_2009).map(([name, m]) => [
        name,
        (hex: string) => lightness(luminance(simulate(linear(hex), m))),
      ]),
    ),
  };
  for (const [view, lstar] of Object.entries(views)) {
    test(`${view}: every neighbouring pair at least ${MIN_STEP_LSTAR} L* apart, darkening steadily`, () => {
      for (let i = 1; i < DUSK.length; i++) {
        const step = lstar(DUSK[i - 1] as string) - lstar(DUSK[i] as string);
        expect(step, `${view}: L* step between dusk ${i - 1} and ${i}`).toBeGreaterThanOrEqual(
          MIN_STEP_LSTAR,
        );
      }
    });
  }

  test('band chips: text on each band colour has WCAG 2 contrast of at least 4.5:1', () => {
    for (const [id, style] of Object.entries(BAND_STYLES)) {
      expect(
        contrast(style.fill, style.text),
        `${id}: ${style.text} on ${style.fill}`,
      ).toBeGreaterThanOrEqual(4.5);
    }
    for (let i = 0; i < DUSK.length; i++)
      expect(contrast(DUSK[i] as string, onDusk(i)), `text on dusk ${i}`).toBeGreaterThanOrEqual(
        4.5,
      );
  });

  test('bands: four distinct shapes, darker for the bands to refer sooner', () => {
    const order = ['inform', 'prepare', 'refer-soon', 'refer-first'] as const;
    expect(new Set(order.map((b) => BAND_STYLES[b].shape)).size).toBe(4);
    for (let i = 1; i < order.length; i++)
      expect(BAND_STYLES[order[i] as 'inform'].step).toBeGreaterThan(
        BAND_STYLES[order[i - 1] as 'inform'].step,
      );
  });

  test('MMI classes: a level is in the class it has reached (6.99 is VI, 7.0 is VII)', () => {
    expect(mmiClass(3.9).label).toBe('I–III');
    expect(mmiClass(6.99).label).toBe('VI');
    expect(mmiClass(7).label).toBe('VII');
    expect(mmiClass(9.7).label).toBe('IX+');
    expect(MMI_CLASSES.map((c) => c.step)).toEqual([0, 1, 2, 3, 4, 5, 6]);
  });

  test('the style sheet gets the palette as custom properties', () => {
    const css = paletteCss();
    DUSK.forEach((hex, i) => expect(css).toContain(`--dusk-${i}: ${hex};`));
    expect(css).toContain(`--ink: ${INK};`);
    expect(css).toContain(`--paper: ${PAPER};`);
  });
});

import type { ScreeningBandId } from '../../api/engine/intensity/screening-band.ts';

/**
 * Tremora's own colours. One sequential scale, "dusk", runs from a warm paper white through
 * lilac to a deep blue ink: seven steps designed in CIE L*C*h (L* 97, 84, 71, 58, 44.5, 31, 17;
 * hue turning from 75° to 282°), so neighbouring steps differ by about 13 in lightness and stay
 * apart in greyscale. How it was checked (test/web/style/palette.test.ts does it again): L* of each
 * step from sRGB (IEC 61966-2-1 decoding, CIE 1976 L*), and L* again after simulating
 * protanopia, deuteranopia and tritanopia with the severity-1 matrices of Machado, Oliveira &
 * Fernandes (2009) applied to linear RGB: every neighbouring pair stays at least 12 apart in
 * all four views. Meaning never rests on colour alone: bands also carry a shape and their
 * name, maps a legend in words, intensities their Roman numerals.
 */
export const DUSK = [
  '#fef5eb',
  '#eac8e0',
  '#c8a1d1',
  '#9b7fc3',
  '#6661aa',
  '#344584',
  '#12294e',
] as const;

/** Text on the scale: dark ink on the light steps, paper on the dark ones (contrast above 4.5:1). */
export const INK = '#1b1a2b';
export const PAPER = '#ffffff';
export const onDusk = (step: number): string => (step <= 3 ? INK : PAPER);

export interface BandStyle {
  /** Index into DUSK. */
  readonly step: number;
  readonly fill: string;
  readonly text: string;
  /** Map and swatch marker: a shape per band, so shape alone tells them apart. */
  readonly shape: 'circle' | 'square' | 'diamond' | 'triangle';
}

/** The screening bands: lighter for the calmer bands, darker for those to refer first. */
export const BAND_STYLES: Readonly<Record<ScreeningBandId, BandStyle>> = {
  inform: { step: 1, fill: DUSK[1], text: onDusk(1), shape: 'circle' },
  prepare: { step: 3, fill: DUSK[3], text: onDusk(3), shape: 'square' },
  'refer-soon': { step: 4, fill: DUSK[4], text: onDusk(4), shape: 'diamond' },
  'refer-first': { step: 6, fill: DUSK[6], text: onDusk(6), shape: 'triangle' },
};

/** The scenario map's classes: MMI below IV, then IV, V, VI, VII, VIII, and IX or more. */
export const MMI_CLASSES = [
  { from: 1, label: 'I–III', step: 0 },
  { from: 4, label: 'IV', step: 1 },
  { from: 5, label: 'V', step: 2 },
  { from: 6, label: 'VI', step: 3 },
  { from: 7, label: 'VII', step: 4 },
  { from: 8, label: 'VIII', step: 5 },
  { from: 9, label: 'IX+', step: 6 },
] as const;

/** The class of an MMI value (levels reached: 6.8 is in VI, as mmiRoman names it). */
export function mmiClass(mmi: number): (typeof MMI_CLASSES)[number] {
  let found: (typeof MMI_CLASSES)[number] = MMI_CLASSES[0];
  for (const c of MMI_CLASSES) if (Math.floor(mmi) >= c.from) found = c;
  return found;
}

/** Map and plot colours outside the scale: greys and the scale's ends. */
export const MAP_COLOURS = {
  sea: '#f4f6f8',
  land: '#e9e3d6',
  coast: '#6b6459',
  fault: INK,
  zoneHatch: DUSK[4],
  grid: '#d5d3da',
  axis: '#3c3a4a',
  branch: DUSK[3],
  mean: DUSK[6],
  returnPeriod: '#5d5a6b',
} as const;

/** The palette as CSS custom properties, served at the top of the style sheet. */
export function paletteCss(): string {
  const lines = DUSK.map((c, i) => `  --dusk-${i}: ${c};`);
  for (const [id, style] of Object.entries(BAND_STYLES))
    lines.push(`  --band-${id}: ${style.fill};`, `  --band-${id}-text: ${style.text};`);
  for (const [name, colour] of Object.entries(MAP_COLOURS))
    lines.push(`  --map-${name.replace(/[A-Z]/g, (m) => `-${m.toLowerCase()}`)}: ${colour};`);
  lines.push(`  --ink: ${INK};`, `  --paper: ${PAPER};`);
  return `:root {\n${lines.join('\n')}\n}\n`;
}

import { Resvg } from '@resvg/resvg-js';

/**
 * Fonts a saved SVG asks for, first found wins: the page's own text is set in the reader's
 * sans-serif, so a file away from the page names common ones outright.
 */
export const SVG_FONTS = 'DejaVu Sans, Liberation Sans, Arial, Helvetica, sans-serif';

/** The font resvg falls back to when none of SVG_FONTS is installed under that name. */
const DEFAULT_FONT = 'DejaVu Sans';

/** A PNG is drawn at this many pixels per SVG pixel, sharp on a projector and in print. */
export const PNG_SCALE = 2;

/**
 * An SVG element as a file of its own: the XML declaration, the SVG namespace (a browser
 * needs it on a file, not inline in HTML) and SVG_FONTS in place of the page's inherited
 * font.
 */
export function standaloneSvg(markup: string): string {
  const open = /^<svg\b([^>]*)>/.exec(markup);
  if (!open) throw new Error(`expected markup starting with <svg>, got "${markup.slice(0, 20)}"`);
  const attributes = (open[1] ?? '').replace(/\s(?:xmlns|font-family)="[^"]*"/g, '');
  return `<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg"${attributes} font-family="${SVG_FONTS}">${markup.slice(open[0].length)}`;
}

/** Width and height of an SVG file's root, px. */
export function svgSize(svg: string): { readonly width: number; readonly height: number } {
  const root = /<svg\b[^>]*>/.exec(svg)?.[0] ?? '';
  const width = Number(/\swidth="([\d.]+)"/.exec(root)?.[1]);
  const height = Number(/\sheight="([\d.]+)"/.exec(root)?.[1]);
  if (!(width > 0 && height > 0))
    throw new Error(`expected an SVG root with a positive width and height, got "${root}"`);
  return { width, height };
}

/**
 * The PNG of an SVG file, PNG_SCALE pixels per SVG pixel on a white ground, drawn by resvg
 * (@resvg/resvg-js: its binary comes inside the npm package, nothing is built or fetched at
 * install). Text uses the machine's fonts.
 */
export function svgToPng(svg: string): Buffer {
  const { width } = svgSize(svg);
  const resvg = new Resvg(svg, {
    fitTo: { mode: 'width', value: Math.round(width * PNG_SCALE) },
    background: 'white',
    font: { loadSystemFonts: true, defaultFontFamily: DEFAULT_FONT },
  });
  return resvg.render().asPng();
}

/**
 * Text width estimated at 0.6 em per character, as map labels are (maps/label-placement.ts;
 * common practice for sans-serif text where nothing is measured on the server).
 */
const EM_PER_CHARACTER = 0.6;

/**
 * Words broken into lines no wider than `widthPx` at `fontSizePx` (greedy: each line takes
 * as many words as fit; a word longer than a line stands alone). SVG text does not wrap.
 */
export function wrapWords(text: string, widthPx: number, fontSizePx: number): string[] {
  if (!(widthPx > 0 && fontSizePx > 0))
    throw new RangeError(`expected a positive width and font size, got ${widthPx}, ${fontSizePx}`);
  const perLine = Math.max(1, Math.floor(widthPx / (fontSizePx * EM_PER_CHARACTER)));
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    const next = current === '' ? word : `${current} ${word}`;
    if (next.length <= perLine || current === '') current = next;
    else {
      lines.push(current);
      current = word;
    }
  }
  if (current !== '') lines.push(current);
  return lines;
}

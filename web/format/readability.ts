/**
 * Flesch–Kincaid grade level (Kincaid, Fishburne, Rogers & Chissom 1975, "Derivation of new
 * readability formulas ... for Navy enlisted personnel", Research Branch Report 8-75):
 *   grade = 0.39 (words / sentences) + 11.8 (syllables / words) − 15.59.
 *
 * Counting, stated because every tool counts a little differently:
 * - sentences end at ".", "!", "?" or ":" followed by space or the end, and at each line
 *   break (list items and headings count as sentences); a text with words has at least one;
 * - words are runs of letters (apostrophes and inner hyphens kept: "don't", "north-east" is
 *   one word); numbers and symbols are not words;
 * - syllables are counted by vowel groups (a, e, i, o, u, y), less a silent final "e" (but not
 *   in "-le" after a consonant: "table" keeps 2), less "-es"/"-ed" endings that add no sound
 *   (not after t, d, s, x, z, c, g, sh or ch for "-es"; not after t, d or consonant + l for
 *   "-ed": "shakes" 1, "moved" 1, "rattled" 2, "wanted" 2),
 *   at least one per word. A hyphenated word counts the syllables of its parts. This
 *   heuristic (common practice) is off by one on some words; over a page it averages out.
 */

const WORD = /[A-Za-zÀ-ÿ]+(?:['’-][A-Za-zÀ-ÿ]+)*/g;
const VOWEL_GROUP = /[aeiouyàâäéèêëïîôöùûü]+/g;
const HAS_LETTER = /[A-Za-zÀ-ÿ]/;

/** Syllables in one word by the vowel-group heuristic above. */
export function countSyllables(word: string): number {
  const parts = word
    .toLowerCase()
    .replace(/['’]/g, '')
    .split('-')
    .filter((p) => p.length > 0);
  let total = 0;
  for (const part of parts) total += partSyllables(part);
  return Math.max(1, total);
}

function partSyllables(w: string): number {
  let count = (w.match(VOWEL_GROUP) ?? []).length;
  if (count <= 1) return 1;
  if (w.endsWith('e') && !/[^aeiouy]le$/.test(w) && !/[aeiouy]e$/.test(w)) count--;
  else if (/[^aeiouy]es$/.test(w) && !/(?:[tdsxzcg]|sh|ch)es$/.test(w)) count--;
  else if (/[^aeiouy]ed$/.test(w) && !/(?:[td]|[^aeiouy]l)ed$/.test(w)) count--;
  return Math.max(1, count);
}

export interface TextCounts {
  readonly sentences: number;
  readonly words: number;
  readonly syllables: number;
}

/** Sentence, word and syllable counts by the rules above. */
export function countText(text: string): TextCounts {
  const words = text.match(WORD) ?? [];
  const pieces = text.split(/[.!?:](?=\s|$)|\n+/).filter((s) => HAS_LETTER.test(s));
  const syllables = words.reduce((n, w) => n + countSyllables(w), 0);
  return {
    sentences: words.length === 0 ? 0 : Math.max(1, pieces.length),
    words: words.length,
    syllables,
  };
}

/** Flesch–Kincaid grade level of `text`; NaN-free: a text without words is grade 0. */
export function fleschKincaidGrade(text: string): number {
  const { sentences, words, syllables } = countText(text);
  if (words === 0) return 0;
  return 0.39 * (words / sentences) + 11.8 * (syllables / words) - 15.59;
}

import { describe, expect, test } from 'vitest';
import { countSyllables, countText, fleschKincaidGrade } from '../../../web/format/readability.ts';
import { expectClose } from '../../helpers/close.ts';

const FK =
  'Flesch–Kincaid grade, Kincaid et al. (1975): 0.39 words/sentence + 11.8 syllables/word − 15.59';

describe('syllable counting (vowel groups, silent e, -es and -ed)', () => {
  // Dictionary syllable counts (common knowledge); the heuristic gets these right.
  const words: [string, number][] = [
    ['the', 1],
    ['cat', 1],
    ['shaking', 2],
    ['earthquake', 2],
    ['table', 2],
    ['people', 2],
    ['furniture', 3],
    ['everyone', 3],
    ['shakes', 1],
    ['houses', 2],
    ['moved', 1],
    ['rattled', 2],
    ['wanted', 2],
    ['agree', 2],
    ['whole', 1],
    ['building', 2],
    ['damaging', 3],
    ['north-east', 2],
    ["don't", 1],
    ['tsunami', 3],
    ['water', 2],
  ];
  for (const [word, syllables] of words) {
    test(`${word}: ${syllables}`, () => expect(countSyllables(word)).toBe(syllables));
  }

  test('a word always has at least one syllable', () => {
    expect(countSyllables('hmm')).toBe(1);
  });
});

describe('counting text', () => {
  test('sentences end at . ! ? : and at line breaks; numbers are not words', () => {
    expect(countText('Drop. Cover! Hold on?')).toEqual({ sentences: 3, words: 4, syllables: 5 }); // Drop, Co-ver, Hold, on
    expect(countText('First item\nSecond item')).toEqual({ sentences: 2, words: 4, syllables: 7 }); // First, i-tem, Sec-ond, i-tem
    expect(countText('It is 14 km: far.')).toEqual({ sentences: 2, words: 4, syllables: 4 });
    expect(countText('')).toEqual({ sentences: 0, words: 0, syllables: 0 });
  });
});

describe('Flesch–Kincaid grade', () => {
  test('hand-counted: "The cat sat on the mat." 6 words, 1 sentence, 6 syllables', () => {
    expectClose(
      fleschKincaidGrade('The cat sat on the mat.'),
      0.39 * 6 + 11.8 * 1 - 15.59,
      1e-12,
      FK,
    );
  });

  test('hand-counted: two sentences, 13 words, 16 syllables', () => {
    // "Keep heavy things low. Fix tall shelves and water heaters to the wall."
    // Keep(1) heav-y(2) things(1) low(1) | Fix(1) tall(1) shelves(1) and(1) wa-ter(2) heat-ers(2) to(1) the(1) wall(1)
    const text = 'Keep heavy things low. Fix tall shelves and water heaters to the wall.';
    expect(countText(text)).toEqual({ sentences: 2, words: 13, syllables: 16 });
    expectClose(fleschKincaidGrade(text), 0.39 * (13 / 2) + 11.8 * (16 / 13) - 15.59, 1e-12, FK);
  });

  test('long words and sentences raise the grade', () => {
    const plain = 'Drop to the ground. Cover your head. Hold on.';
    const dense =
      'Occupants should immediately assume a protective posture beneath substantial furniture, maintaining that position throughout the duration of ground motion.';
    expect(fleschKincaidGrade(dense)).toBeGreaterThan(fleschKincaidGrade(plain) + 10);
  });

  test('a text without words is grade 0, not NaN', () => {
    expect(fleschKincaidGrade('42 — 7')).toBe(0);
  });
});

import { describe, expect, test } from 'vitest';
import { groupedDigits, numberInWords } from '../../../web/format/number-words.ts';
import { translator } from '../../../web/text/translator.ts';

// Zero to ten in words, larger numbers in grouped digits (the rule in
// web/format/number-words.ts; spelling out small numbers is common practice in plain writing).
describe('number words', () => {
  const en = translator('en');
  const fr = translator('fr');

  test('zero to ten are words', () => {
    expect([0, 1, 2, 3, 7, 10].map((n) => en.count(n))).toEqual([
      'zero',
      'one',
      'two',
      'three',
      'seven',
      'ten',
    ]);
    expect(fr.count(3)).toBe('trois');
  });

  test('eleven and up, and fractions, are digits grouped by the language', () => {
    expect(en.count(11)).toBe('11');
    expect(en.count(2900)).toBe('2,900');
    expect(en.count(2.5)).toBe('3');
    expect(groupedDigits(1850, 'fr')).toBe('1\u202f850'); // a narrow no-break space, as Intl groups French
  });

  test('negative numbers stay digits', () => {
    expect(en.count(-2)).toBe('-2');
  });

  test('a vocabulary missing a word says so', () => {
    expect(() => numberInWords(4, { smallNumbers: ['zero', 'one'], locale: 'en' })).toThrow(
      /no word for 4; expected 11 words/,
    );
  });

  test('infinite counts are refused', () => {
    expect(() => en.count(Number.POSITIVE_INFINITY)).toThrow(/expected a finite number/);
  });
});

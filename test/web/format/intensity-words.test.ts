import { describe, expect, test } from 'vitest';
import { intensityWords } from '../../../web/format/intensity-words.ts';
import { translator } from '../../../web/text/translator.ts';

// The rule is ours (stated in web/format/intensity-words.ts): the level reached (rounded down, as
// the screening bands count it), and "almost" the next one from halfway.
describe('intensity in words', () => {
  test('the cases seen: 6.97 at 475 years and 7.99 in a scenario are almost the next level', () => {
    expect(intensityWords(6.97)).toEqual({ roman: 'VI', almost: 'VII', level: 6 });
    expect(intensityWords(7.99)).toEqual({ roman: 'VII', almost: 'VIII', level: 7 });
    expect(translator('en').mmi(6.97)).toBe('MMI VI, almost VII');
  });

  test('below halfway the level reached alone; at halfway, almost the next', () => {
    expect(intensityWords(6.49)).toEqual({ roman: 'VI', level: 6 });
    expect(intensityWords(6.5)).toEqual({ roman: 'VI', almost: 'VII', level: 6 });
    expect(intensityWords(7)).toEqual({ roman: 'VII', level: 7 });
    expect(translator('en').mmi(7.2)).toBe('MMI VII');
  });

  test('held to I–XII, with nothing beyond XII', () => {
    expect(intensityWords(0.4)).toEqual({ roman: 'I', level: 1 });
    expect(intensityWords(11.7)).toEqual({ roman: 'XI', almost: 'XII', level: 11 });
    expect(intensityWords(12.6)).toEqual({ roman: 'XII', level: 12 });
    expect(() => intensityWords(Number.NaN)).toThrow(/expected a finite MMI/);
  });
});

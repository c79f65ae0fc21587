import { describe, expect, test } from 'vitest';
import { SCREENING_BANDS } from '../../../api/engine/intensity/screening-band.ts';
import type { TextKey } from '../../../web/text/text-key.ts';
import { EN, FR } from '../helpers/bundles.ts';
import { fill, translator } from '../../../web/text/translator.ts';

const placeholders = (text: string): string[] =>
  [...text.matchAll(/\{(\w+)\}/g)].map((m) => m[1] as string).sort();

describe('text bundles', () => {
  test('the French bundle has only keys English has, with the same placeholders', () => {
    for (const [key, text] of Object.entries(FR)) {
      expect(Object.keys(EN), `French key ${key}`).toContain(key);
      expect(placeholders(text as string), `placeholders of ${key}`).toEqual(
        placeholders(EN[key as TextKey]),
      );
    }
  });

  test('the French speaks of a preliminary assessment, not a medical screening', () => {
    const fr = translator('fr');
    expect(fr.t('caution.title')).toBe('Une évaluation préliminaire, pas une valeur de calcul');
    for (const [key, text] of Object.entries(FR)) expect(text, key).not.toMatch(/dépist/i);
  });

  test('French directions take their own article: "à l’est", "au nord"', () => {
    const fr = translator('fr');
    expect(fr.place(14, 90)).toBe('à 14 km à l’est');
    expect(fr.place(14, 0)).toBe('à 14 km au nord');
    expect(fr.place(3, 270)).toBe('à 3 km à l’ouest');
    expect(translator('en').place(14, 90)).toBe('14 km to the east');
  });

  test('no English text is empty', () => {
    for (const [key, text] of Object.entries(EN)) expect(text.trim(), key).not.toBe('');
  });

  test("band names are the engine's own labels (api/engine/intensity/screening-band.ts)", () => {
    for (const band of SCREENING_BANDS) expect(EN[`band.${band.id}` as TextKey]).toBe(band.label);
  });

  test('every MMI level I to X has a name, a feeling and what it does to buildings', () => {
    for (let level = 1; level <= 10; level++) {
      for (const part of ['name', 'feel', 'buildings'])
        expect(EN[`mmi.${level}.${part}` as TextKey], `mmi.${level}.${part}`).toBeTruthy();
    }
  });

  test('numbers.small lists the words for 0 to 10 in each bundle that has it', () => {
    expect(EN['numbers.small'].split('|')).toHaveLength(11);
    expect((FR['numbers.small'] as string).split('|')).toHaveLength(11);
  });

  test('fill puts values in and leaves unknown placeholders visible', () => {
    expect(fill('{a} and {b}', { a: 1 })).toBe('1 and {b}');
  });

  test('dates are in UTC, in the language', () => {
    expect(translator('en').date('2026-03-05T23:30:00Z')).toBe('March 5, 2026');
    expect(translator('fr').date('2026-03-05T23:30:00Z')).toBe('5 mars 2026');
  });
});

import { describe, expect, test } from 'vitest';
import { checkImport } from '../../../../web/text/exchange/import-check.ts';
import { shippedTextBundles } from '../../../../web/text/text-bundles.ts';

const english = shippedTextBundles().english;
const fr = { code: 'fr', name: 'Français', locale: 'fr' };
const row = (id: string, translation: string, line: number) => ({ id, translation, line });

describe('an imported translation is checked against the English', () => {
  test('good lines become the bundle text; empty ones are reported and left out', () => {
    const checked = checkImport(english, fr, [
      row('lang.label', 'Langue', 2),
      row('place.away', 'à {km} km {direction}', 3),
      row('hazardMap.class.points|one', '{n} point de grille', 4),
      row('hazardMap.class.points|other', '{n} points de grille', 5),
      row('lang.change', '  ', 6),
    ]);
    expect(checked.problems).toEqual([]);
    expect(checked.text).toEqual({
      'lang.label': 'Langue',
      'place.away': 'à {km} km {direction}',
      'hazardMap.class.points': { one: '{n} point de grille', other: '{n} points de grille' },
    });
    expect(checked.empty).toEqual([
      { line: 6, key: 'lang.change', message: 'empty: the English stands in' },
    ]);
  });

  test('unknown keys, placeholders that differ, wrong plural forms and repeats refuse, by key and line', () => {
    const checked = checkImport(english, fr, [
      row('lang.lable', 'Langue', 2),
      row('place.away', 'à {km} km', 3),
      row('chance.oneIn', 'environ 1 sur {m}', 4),
      row('hazardMap.class.points|few', '{n} points', 5),
      row('lang.label|one', 'Langue', 6),
      row('lang.label', 'Langue', 7),
      row('lang.label', 'Langue', 8),
      row('plot.branch|one', '{n} ligne', 9),
    ]);
    expect(checked.text).toEqual({});
    expect(checked.problems).toEqual([
      { line: 2, key: 'lang.lable', message: 'unknown key: the English bundle has no such text' },
      { line: 3, key: 'place.away', message: 'missing placeholder {direction} (keep it as it is)' },
      { line: 4, key: 'chance.oneIn', message: 'missing placeholder {n} (keep it as it is)' },
      { line: 4, key: 'chance.oneIn', message: 'placeholder {m} is not in the English' },
      {
        line: 5,
        key: 'hazardMap.class.points|few',
        message:
          '"hazardMap.class.points" is plural: one line per form, hazardMap.class.points|one, hazardMap.class.points|many, hazardMap.class.points|other',
      },
      { line: 6, key: 'lang.label|one', message: '"lang.label" has one form, not plural forms' },
      { line: 8, key: 'lang.label', message: 'this key comes twice (first on line 7)' },
      {
        line: 9,
        key: 'plot.branch',
        message: '"plot.branch|other" is needed with the other forms',
      },
    ]);
  });
});

import { Fragment, jsx, type Child } from 'hono/jsx';
import { describe, expect, test } from 'vitest';
import { placeholdersOf, pluralCategoriesOf } from '../../../web/text/plural-forms.ts';
import { translator } from '../../../web/text/translator.ts';

const render = async (child: Child): Promise<string> =>
  String(await jsx(Fragment, {}, child).toString());

describe('plural and number formats follow the language', () => {
  // CLDR plural rules (Unicode TR35 part 3, from memory): English 1 is "one"; French 0 and 1 are
  // "one", and 1,000,000 is "many"; Polish has one, few, many, other.
  test('each language uses its CLDR plural categories', () => {
    expect(pluralCategoriesOf('en')).toEqual(['one', 'other']);
    expect(pluralCategoriesOf('fr')).toEqual(['one', 'many', 'other']);
    expect(pluralCategoriesOf('pl')).toEqual(['one', 'few', 'many', 'other']);
  });

  test('English picks "one" for 1 and "other" otherwise, numbers in its own format', async () => {
    const en = translator('en');
    expect(await render(en.plural('hazardMap.class.points', 1))).toBe('1 grid point');
    expect(await render(en.plural('hazardMap.class.points', 0))).toBe('0 grid points');
    expect(await render(en.plural('hazardMap.class.points', 12500))).toBe('12,500 grid points');
  });

  test('French takes "one" for 0 and 1, and groups digits with a narrow no-break space', async () => {
    const fr = translator('fr');
    expect(await render(fr.plural('hazardMap.class.points', 0))).toBe('0 point de grille');
    expect(await render(fr.plural('hazardMap.class.points', 1))).toBe('1 point de grille');
    expect(await render(fr.plural('hazardMap.class.points', 12500))).toBe(
      '12\u202f500 points de grille',
    );
  });

  test('a value given for {n} is used instead of the number', async () => {
    const en = translator('en');
    expect(await render(en.plural('plot.branch', 1, { n: en.count(1) }))).toBe(
      'Each model choice, one line each (one line)',
    );
  });

  test('placeholders are listed once each, sorted', () => {
    expect(placeholdersOf('{km} km {direction}, {km}')).toEqual(['direction', 'km']);
    expect(placeholdersOf('no values')).toEqual([]);
  });
});

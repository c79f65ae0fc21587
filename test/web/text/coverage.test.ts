import { describe, expect, test } from 'vitest';
import { coverage } from '../../../web/text/coverage.ts';
import { PAGES_BY_PREFIX, prefixOf } from '../../../web/text/key-pages.ts';
import { TextBundles, shippedTextBundles } from '../../../web/text/text-bundles.ts';

const english = shippedTextBundles().english;
const keys = Object.keys(english.text);

describe('coverage: what each language lacks, and where it shows', () => {
  test('a partial language lacks every other key, in the English order, with its pages', () => {
    const bundles = new TextBundles([
      english,
      {
        language: { code: 'eo', name: 'Esperanto', locale: 'eo' },
        text: { 'lang.label': 'Lingvo', 'plot.branch': { other: '{n} linioj' } },
      },
    ]);
    const [eo] = coverage(bundles);
    expect(eo?.language.code).toBe('eo');
    expect(eo?.total).toBe(keys.length);
    expect(eo?.translated).toBe(2);
    expect(eo?.missing.map((m) => m.key)).toEqual(
      keys.filter((k) => k !== 'lang.label' && k !== 'plot.branch'),
    );
    expect(eo?.missing.find((m) => m.key === 'visits.caption')?.pages).toEqual([
      'languages.page.community',
      'nav.overview',
    ]);
  });

  test('the shipped French is complete', () => {
    const fr = coverage(shippedTextBundles()).find((c) => c.language.code === 'fr');
    expect(fr?.missing.map((m) => m.key)).toEqual([]);
  });

  test('every key prefix of the English bundle has its pages in the map', () => {
    const prefixes = [...new Set(keys.map(prefixOf))];
    expect(prefixes.filter((p) => !(p in PAGES_BY_PREFIX))).toEqual([]);
  });
});

import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { readCsv, writeCsv } from '../../../../web/text/exchange/csv-file.ts';
import { readPo, writePo } from '../../../../web/text/exchange/po-file.ts';
import { translationRows } from '../../../../web/text/exchange/translation-rows.ts';
import { shippedTextBundles } from '../../../../web/text/text-bundles.ts';
import '../../../helpers/property-seed.ts';

const bundles = shippedTextBundles();
const french = bundles.get('fr');
const language = { code: 'xx', name: 'Test "quoted", with\\ back', locale: 'xx' };

describe('translation files: gettext PO and CSV', () => {
  test('the export has every English text once, plural texts once per form of the language', () => {
    if (!french) throw new Error('no French bundle');
    const rows = translationRows(bundles.english, french);
    const strings = Object.values(bundles.english.text).filter((v) => typeof v === 'string');
    const plurals = Object.keys(bundles.english.text).length - strings.length;
    // French uses one, many and other (CLDR).
    expect(rows).toHaveLength(strings.length + 3 * plurals);
    expect(rows.find((r) => r.id === 'hazardMap.class.points|many')).toEqual({
      id: 'hazardMap.class.points|many',
      english: '{n} grid points',
      translation: '',
    });
    expect(rows.find((r) => r.id === 'lang.label')).toEqual({
      id: 'lang.label',
      english: 'Language',
      translation: 'Langue',
    });
  });

  test('PO: key in msgctxt, English in msgid, the language in the header', () => {
    const po = writePo(language, [{ id: 'a.b', english: 'Say "hi"\nthen go', translation: '' }]);
    expect(po).toContain('"Language: xx\\n"');
    expect(po).toContain('msgctxt "a.b"\nmsgid "Say \\"hi\\"\\nthen go"\nmsgstr ""');
    const read = readPo(po);
    expect(read.code).toBe('xx');
    expect(read.name).toBe('Test "quoted", with\\ back');
    expect(read.rows).toEqual([{ id: 'a.b', translation: '', line: 9 }]);
  });

  test('PO reads continued strings and leaves fuzzy entries untranslated', () => {
    const read = readPo(
      [
        'msgctxt "a"',
        'msgid "x"',
        'msgstr "one "',
        '"two"',
        '',
        '#, fuzzy',
        'msgctxt "b"',
        'msgid "y"',
        'msgstr "guess"',
      ].join('\n'),
    );
    expect(read.rows).toEqual([
      { id: 'a', translation: 'one two', line: 1 },
      { id: 'b', translation: '', line: 7 },
    ]);
    expect(read.problems).toEqual([]);
  });

  test('PO problems come with their line', () => {
    const read = readPo(
      [
        'msgid "no context"',
        'msgstr "z"',
        '',
        'msgctxt "k"',
        'msgid "x"',
        'msgstr oops',
        'junk',
      ].join('\n'),
    );
    expect(read.problems).toEqual([
      { line: 6, message: 'expected a quoted string after msgstr' },
      { line: 7, message: 'not a PO line (expected msgctxt, msgid, msgstr or a quoted string)' },
      { line: 1, message: 'an entry without msgctxt: msgctxt holds the text key' },
      { line: 4, key: 'k', message: 'an entry without msgstr' },
    ]);
  });

  test('CSV is RFC 4180: every field quoted, quotes doubled, CRLF lines', () => {
    const csv = writeCsv([{ id: 'a', english: 'He said "no", then\nleft', translation: 'é' }]);
    expect(csv).toBe('"key","English","translation"\r\n"a","He said ""no"", then\nleft","é"\r\n');
  });

  test('CSV lines are counted in the file, line breaks inside quotes included', () => {
    const read = readCsv('\uFEFFkey,English,translation\r\na,"x\r\ny",z\r\n\r\nb,c,d\r\n');
    expect(read.rows).toEqual([
      { id: 'a', translation: 'z', line: 2 },
      { id: 'b', translation: 'd', line: 5 },
    ]);
    expect(readCsv('id,text\r\na,b\r\n').problems).toEqual([
      {
        line: 1,
        message: 'the first line names the columns: key, English, translation; got id, text',
      },
    ]);
  });

  test('any text survives a round trip through PO and through CSV', () => {
    const text = fc.string({ unit: 'grapheme', maxLength: 40 });
    fc.assert(
      fc.property(
        fc.array(fc.record({ english: text, translation: text }), { maxLength: 8 }),
        (entries) => {
          const rows = entries.map((e, i) => ({ id: `k.${i}`, ...e }));
          const back = (read: { rows: { id: string; translation: string }[] }) =>
            read.rows.map((r) => [r.id, r.translation]);
          const expected = rows.map((r) => [r.id, r.translation]);
          expect(back(readPo(writePo(language, rows)))).toEqual(expected);
          expect(back(readCsv(writeCsv(rows)))).toEqual(expected);
        },
      ),
      { numRuns: 200 },
    );
  });
});

import type { Language } from '../text-bundles.ts';
import type { FileProblem, ReadRow, TranslationRow } from './translation-rows.ts';

/**
 * gettext PO files (GNU gettext manual, "The Format of PO Files"): one entry per text, msgctxt
 * the text key, msgid the English, msgstr the translation. The header carries the language
 * (Language:) and its name in itself (X-Tremora-Language-Name:). Strings are written on one
 * line each, with the C escapes the format uses (\\, \", \n, \t).
 */

const escape = (text: string): string =>
  text
    .replace(/\\/g, '\\\\')
    .replace(/"/g, '\\"')
    .replace(/\n/g, '\\n')
    .replace(/\t/g, '\\t')
    .replace(/\r/g, '\\r');

const quoted = (text: string): string => `"${escape(text)}"`;

export function writePo(language: Language, rows: readonly TranslationRow[]): string {
  const header = [
    `# Tremora text bundle: ${language.name} (${language.code}).`,
    '# msgctxt is the text key, msgid the English. Keep every {name} placeholder as it is.',
    'msgid ""',
    'msgstr ""',
    quoted('Content-Type: text/plain; charset=UTF-8\n'),
    quoted(`Language: ${language.code}\n`),
    quoted(`X-Tremora-Language-Name: ${language.name}\n`),
  ];
  const entries = rows.map((row) =>
    [
      `msgctxt ${quoted(row.id)}`,
      `msgid ${quoted(row.english)}`,
      `msgstr ${quoted(row.translation)}`,
    ].join('\n'),
  );
  return `${[header.join('\n'), ...entries].join('\n\n')}\n`;
}

export interface ReadPo {
  readonly rows: ReadRow[];
  readonly problems: FileProblem[];
  /** From the header's Language: and X-Tremora-Language-Name:, when present. */
  readonly code?: string;
  readonly name?: string;
}

const ESCAPES: Record<string, string> = { n: '\n', t: '\t', r: '\r', '"': '"', '\\': '\\' };

/** The text of a quoted PO string, or undefined when it is not one. */
function unquote(text: string): string | undefined {
  const m = /^"((?:[^"\\]|\\.)*)"$/.exec(text.trim());
  if (!m) return undefined;
  let bad = false;
  const value = (m[1] as string).replace(/\\(.)/g, (_, c: string) => {
    const out = ESCAPES[c];
    if (out === undefined) bad = true;
    return out ?? c;
  });
  return bad ? undefined : value;
}

type Field = 'msgctxt' | 'msgid' | 'msgid_plural' | 'msgstr';

interface Entry {
  line: number;
  fuzzy: boolean;
  fields: Partial<Record<Field, string>>;
}

export function readPo(source: string): ReadPo {
  const problems: FileProblem[] = [];
  const entries: Entry[] = [];
  let entry: Entry | undefined;
  let field: Field | undefined;
  let fuzzyNext = false;
  const lines = source.replace(/^\uFEFF/, '').split(/\r?\n/);
  lines.forEach((raw, index) => {
    const line = index + 1;
    const text = raw.trim();
    if (text === '') {
      field = undefined;
      return;
    }
    if (text.startsWith('#')) {
      if (/^#,.*\bfuzzy\b/.test(text)) fuzzyNext = true;
      return;
    }
    const keyword = /^(msgctxt|msgid_plural|msgid|msgstr(?:\[\d+\])?)\s+(.*)$/.exec(text);
    if (keyword) {
      const name = keyword[1] as string;
      if (name.startsWith('msgstr[')) {
        problems.push({
          line,
          message: 'plural forms are separate entries here ("key|one", "key|other"), not msgstr[n]',
        });
        field = undefined;
        return;
      }
      const starts =
        name === 'msgctxt' || (name === 'msgid' && entry?.fields.msgctxt === undefined);
      if (
        !entry ||
        (starts && (entry.fields.msgid !== undefined || entry.fields.msgstr !== undefined))
      ) {
        entry = { line, fuzzy: fuzzyNext, fields: {} };
        fuzzyNext = false;
        entries.push(entry);
      }
      const value = unquote(keyword[2] as string);
      if (value === undefined) {
        problems.push({ line, message: `expected a quoted string after ${name}` });
        field = undefined;
        return;
      }
      field = name as Field;
      entry.fields[field] = value;
      return;
    }
    const more = unquote(text);
    if (more !== undefined && entry && field) {
      entry.fields[field] = `${entry.fields[field] ?? ''}${more}`;
      return;
    }
    problems.push({
      line,
      message: 'not a PO line (expected msgctxt, msgid, msgstr or a quoted string)',
    });
  });

  let code: string | undefined;
  let name: string | undefined;
  const rows: ReadRow[] = [];
  for (const e of entries) {
    const { msgctxt, msgid, msgstr } = e.fields;
    if (msgctxt === undefined && msgid === '') {
      code = /^Language:\s*(.+)$/m.exec(msgstr ?? '')?.[1]?.trim();
      name = /^X-Tremora-Language-Name:\s*(.+)$/m.exec(msgstr ?? '')?.[1]?.trim();
      continue;
    }
    if (e.fields.msgid_plural !== undefined) {
      problems.push({
        line: e.line,
        ...(msgctxt === undefined ? {} : { key: msgctxt }),
        message:
          'plural forms are separate entries here ("key|one", "key|other"), not msgid_plural',
      });
      continue;
    }
    if (msgctxt === undefined) {
      problems.push({
        line: e.line,
        message: 'an entry without msgctxt: msgctxt holds the text key',
      });
      continue;
    }
    if (msgstr === undefined) {
      problems.push({ line: e.line, key: msgctxt, message: 'an entry without msgstr' });
      continue;
    }
    // gettext leaves fuzzy entries out of a compiled catalogue; so does this (the English stands in).
    rows.push({ id: msgctxt, translation: e.fuzzy ? '' : msgstr, line: e.line });
  }
  return { rows, problems, ...(code ? { code } : {}), ...(name ? { name } : {}) };
}

import type { Context, Hono } from 'hono';
import { coverage } from '../text/coverage.ts';
import { readCsv, writeCsv } from '../text/exchange/csv-file.ts';
import { checkImport } from '../text/exchange/import-check.ts';
import { readPo, writePo } from '../text/exchange/po-file.ts';
import {
  translationRows,
  type FileProblem,
  type ReadRow,
} from '../text/exchange/translation-rows.ts';
import { saveImportedBundle } from '../text/imported-bundles.ts';
import {
  isLanguageCode,
  loadTextBundles,
  type Language,
  type TextBundle,
  type TextBundleFolders,
} from '../text/text-bundles.ts';
import { LanguagesView, type ImportOutcome } from '../views/languages-view.tsx';
import { field, fileField, type PageKit } from './page-kit.ts';

/** Largest translation file taken, bytes (the whole English bundle as PO is about 100 kB). */
const MAX_TRANSLATION_FILE_BYTES = 2_000_000;

/**
 * The Languages page (coverage, export, import) and its routes. An import is checked whole
 * (exchange/import-check.ts) and saved only when nothing refuses it, into the imported folder;
 * the bundles are then read again, so the language shows at once, and after a restart.
 */
export function languagePages(app: Hono, kit: PageKit, folders: TextBundleFolders): void {
  const show = (c: Context, outcome?: ImportOutcome, status: 200 | 422 = 200) =>
    kit.render(
      c,
      <LanguagesView
        page={kit.page(c)}
        bundles={kit.bundles}
        coverage={coverage(kit.bundles)}
        canImport={folders.importedDir !== undefined}
        {...(outcome ? { outcome } : {})}
      />,
      status,
    );

  app.get('/languages', (c) => show(c));

  app.get('/languages/export', (c) => {
    const tr = kit.tr(c);
    const code = c.req.query('code')?.trim() ?? '';
    const format = c.req.query('format') === 'csv' ? 'csv' : 'po';
    if (!isLanguageCode(code))
      return show(c, { kind: 'form', message: tr.t('languages.badCode') }, 422);
    const target: TextBundle = kit.bundles.get(code) ?? {
      language: { code, name: code, locale: code },
      text: {},
    };
    const rows = translationRows(kit.bundles.english, target);
    const body = format === 'po' ? writePo(target.language, rows) : writeCsv(rows);
    return c.body(body, 200, {
      'Content-Type':
        format === 'po' ? 'text/x-gettext-translation; charset=utf-8' : 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="tremora-${code}.${format}"`,
    });
  });

  app.post('/languages/import', async (c) => {
    const tr = kit.tr(c);
    const refuse = (message: string) => show(c, { kind: 'form', message }, 422);
    if (folders.importedDir === undefined) return refuse(tr.t('languages.noImports'));
    const form = await c.req.parseBody();
    const code = field(form, 'code')?.trim() ?? '';
    if (!isLanguageCode(code)) return refuse(tr.t('languages.badCode'));
    const known = kit.bundles.get(code)?.language;
    const name = field(form, 'name')?.trim() || known?.name;
    const file = fileField(form, 'file');
    if (!file) return refuse(tr.t('languages.noFile'));
    const kind = /\.po$/i.test(file.name) ? 'po' : /\.csv$/i.test(file.name) ? 'csv' : undefined;
    if (!kind || file.size > MAX_TRANSLATION_FILE_BYTES) return refuse(tr.t('languages.badFormat'));
    const source = await file.text();
    let rows: ReadRow[];
    let problems: FileProblem[];
    let fileName = name;
    if (kind === 'po') {
      const po = readPo(source);
      if (po.code !== undefined && po.code !== code)
        return refuse(tr.t('languages.otherLanguage', { code: po.code, expected: code }));
      ({ rows, problems } = po);
      fileName = name ?? po.name;
    } else ({ rows, problems } = readCsv(source));
    if (!fileName) return refuse(tr.t('languages.needName'));
    const language: Language = { code, name: fileName, locale: known?.locale ?? code };
    const checked = checkImport(kit.bundles.english, language, rows);
    const all = [...problems, ...checked.problems].sort((a, b) => a.line - b.line);
    if (all.length > 0) return show(c, { kind: 'refused', problems: all }, 422);
    saveImportedBundle(folders.importedDir, language, checked.text);
    kit.bundles = loadTextBundles(folders);
    return show(c, {
      kind: 'saved',
      name: language.name,
      count: Object.keys(checked.text).length,
      empty: checked.empty.length,
    });
  });
}

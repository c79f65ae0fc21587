import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import type { LanguageCoverage } from '../text/coverage.ts';
import type { FileProblem } from '../text/exchange/translation-rows.ts';
import type { TextBundles } from '../text/text-bundles.ts';

/** What an import came to, shown above the forms. */
export type ImportOutcome =
  | {
      readonly kind: 'saved';
      readonly name: string;
      readonly count: number;
      readonly empty: number;
    }
  | { readonly kind: 'refused'; readonly problems: readonly FileProblem[] }
  | { readonly kind: 'form'; readonly message: string };

export interface LanguagesViewProps {
  readonly page: PageContext;
  readonly bundles: TextBundles;
  readonly coverage: readonly LanguageCoverage[];
  /** False when the service has no data folder to keep imports in. */
  readonly canImport: boolean;
  readonly outcome?: ImportOutcome;
}

function Outcome(props: { page: PageContext; outcome: ImportOutcome }) {
  const { tr } = props.page;
  const o = props.outcome;
  if (o.kind === 'form')
    return (
      <p class="notice" role="alert" id="import-outcome">
        {o.message}
      </p>
    );
  if (o.kind === 'saved')
    return (
      <div class="notice" role="status" id="import-outcome">
        <p>{tr.plural('languages.imported', o.count, { name: o.name })}</p>
        {o.empty > 0 && <p>{tr.plural('languages.emptyLines', o.empty)}</p>}
      </div>
    );
  return (
    <div class="notice" role="alert" id="import-outcome">
      <p>{tr.text('languages.refused')}</p>
      <ul class="import-problems">
        {o.problems.map((p) => (
          <li data-line={p.line} data-key={p.key}>
            {p.key === undefined
              ? tr.text('languages.problemNoKey', { line: p.line, message: tr.english(p.message) })
              : tr.text('languages.problem', {
                  line: p.line,
                  key: <code>{p.key}</code>,
                  message: tr.english(p.message),
                })}
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The Languages page: coverage per language, export for translation, import a translation. */
export function LanguagesView(props: LanguagesViewProps) {
  const { tr } = props.page;
  const english = props.bundles.english.text;
  return (
    <TitledPage page={props.page} titleKey="languages.title">
      <p class="lead">{tr.text('languages.intro')}</p>
      {props.outcome && <Outcome page={props.page} outcome={props.outcome} />}

      <h2>{tr.text('languages.coverage')}</h2>
      <ul class="language-coverage">
        {props.coverage.map((c) => (
          <li data-language={c.language.code}>
            <strong lang={c.language.code}>{c.language.name}</strong> ({c.language.code}):{' '}
            {tr.text('languages.translated', {
              translated: tr.number(c.translated),
              total: tr.number(c.total),
              percent: new Intl.NumberFormat(tr.locale, { style: 'percent' }).format(
                c.translated / c.total,
              ),
            })}
          </li>
        ))}
      </ul>
      {props.coverage.map((c) => (
        <section class="language-missing" data-language={c.language.code}>
          <h3>{tr.text('languages.missing', { name: c.language.name })}</h3>
          {c.missing.length === 0 ? (
            <p>{tr.text('languages.complete')}</p>
          ) : (
            <details>
              <summary>{tr.plural('languages.missingCount', c.missing.length)}</summary>
              <ul class="missing-texts">
                {c.missing.map((m) => {
                  const entry = english[m.key];
                  return (
                    <li data-key={m.key}>
                      <code>{m.key}</code>:{' '}
                      <span lang="en">{typeof entry === 'string' ? entry : entry?.other}</span> —{' '}
                      {tr.text('languages.col.pages')}: {m.pages.map((p) => tr.t(p)).join(', ')}
                    </li>
                  );
                })}
              </ul>
            </details>
          )}
        </section>
      ))}

      <h2>{tr.text('languages.export')}</h2>
      <p>{tr.text('languages.exportHint')}</p>
      <form method="get" action="/languages/export" class="stacked-form">
        <label for="export-code">{tr.text('languages.code')}</label>
        <input id="export-code" name="code" list="language-codes" required value={tr.lang} />
        <datalist id="language-codes">
          {tr.languages.map((l) => (
            <option value={l.code}>{l.name}</option>
          ))}
        </datalist>
        <fieldset>
          <legend>{tr.text('languages.format')}</legend>
          <label>
            <input type="radio" name="format" value="po" checked /> {tr.text('languages.format.po')}
          </label>
          <label>
            <input type="radio" name="format" value="csv" /> {tr.text('languages.format.csv')}
          </label>
        </fieldset>
        <button type="submit">{tr.text('languages.exportSubmit')}</button>
      </form>
      <p>{tr.text('languages.pluralNote', { name: <code>{'{name}'}</code> })}</p>

      <h2>{tr.text('languages.import')}</h2>
      {props.canImport ? (
        <>
          <p>{tr.text('languages.kept')}</p>
          <form
            method="post"
            action="/languages/import"
            enctype="multipart/form-data"
            class="stacked-form"
          >
            <label for="import-code">{tr.text('languages.code')}</label>
            <input id="import-code" name="code" list="language-codes" required />
            <label for="import-name">{tr.text('languages.name')}</label>
            <input id="import-name" name="name" />
            <label for="import-file">{tr.text('languages.file')}</label>
            <input id="import-file" name="file" type="file" accept=".po,.csv" required />
            <button type="submit">{tr.text('languages.importSubmit')}</button>
          </form>
        </>
      ) : (
        <p>{tr.text('languages.noImports')}</p>
      )}
    </TitledPage>
  );
}

import { LanguageSwitch } from './language-switch.tsx';
import type { Child } from 'hono/jsx';
import { isDemoStudy } from '../data/demo-study.ts';
import type { Translator } from '../text/translator.ts';
import { Caution } from './caution.tsx';

export type StudySection = 'overview' | 'scenario' | 'catalog' | 'edit';

/** What every page needs from its request: the reader's language, where it is, and the tool's version. */
export interface PageContext {
  readonly tr: Translator;
  /** This page's path and query, where the language switch comes back to. */
  readonly path: string;
  readonly toolVersion: string;
}

export interface PageShellProps {
  readonly page: PageContext;
  readonly title: string;
  /** "en" when the title is English standing in for a missing translation (Translator.fallbackLang). */
  readonly titleLang?: string | undefined;
  readonly study?: { readonly id: string; readonly name: string };
  readonly section?: StudySection;
  /** Extra style sheets (the handout's print sheet). */
  readonly styles?: readonly string[];
  /** Pages that show numbers carry the caution at the top of their content as well. */
  readonly showsNumbers?: boolean;
  readonly bodyClass?: string;
  readonly children?: Child;
}

const STUDY_SECTIONS: readonly {
  readonly id: StudySection;
  readonly key: 'nav.overview' | 'nav.scenario' | 'nav.catalog' | 'nav.edit';
  readonly suffix: string;
}[] = [
  { id: 'overview', key: 'nav.overview', suffix: '' },
  { id: 'scenario', key: 'nav.scenario', suffix: '/scenario' },
  { id: 'catalog', key: 'nav.catalog', suffix: '/catalog' },
  { id: 'edit', key: 'nav.edit', suffix: '/edit' },
];

/** The title of each section's own page ("… of {name}", the study's name). */
export const STUDY_SECTION_TITLES = {
  overview: 'overview.title',
  scenario: 'scenario.title',
  catalog: 'catalog.title',
  edit: 'editor.title',
} as const satisfies Record<StudySection, string>;

/**
 * The frame of every page: skip link, header with the main navigation and the language switch,
 * the study's own navigation, the main content, and a footer with the caution and the limits.
 * The one script (enhancements only) and the style sheets come from this service's origin.
 */
export function PageShell(props: PageShellProps) {
  const { study } = props;
  const { tr, path, toolVersion } = props.page;
  return (
    <html lang={tr.lang}>
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title lang={props.titleLang}>{`${props.title} · ${tr.t('site.name')}`}</title>
        <link rel="icon" href="data:," />
        <link rel="stylesheet" href="/static/tremora.css" />
        {(props.styles ?? []).map((href) => (
          <link rel="stylesheet" href={href} />
        ))}
        <script src="/static/tremora.js" defer></script>
      </head>
      <body class={props.bodyClass}>
        <a class="skip-link" href="#main">
          {tr.text('site.skip')}
        </a>
        <header class="site-header">
          <div class="brand">
            <a href="/" class="brand-name">
              {tr.text('site.name')}
            </a>
            <span class="brand-tagline">{tr.text('site.tagline')}</span>
          </div>
          <nav aria-label={tr.t('nav.main')} class="main-nav">
            <ul>
              <li>
                <a href="/">{tr.text('nav.studies')}</a>
              </li>
              <li>
                <a href="/limits">{tr.text('nav.limits')}</a>
              </li>
              <li>
                <a href="/languages">{tr.text('nav.languages')}</a>
              </li>
            </ul>
          </nav>
          <LanguageSwitch tr={tr} path={path} />
        </header>
        {study && (
          <nav aria-label={tr.t('nav.study')} class="study-nav">
            <span class="study-nav-name">{study.name}</span>
            <ul>
              {STUDY_SECTIONS.map((s) => (
                <li>
                  <a
                    href={`/studies/${study.id}${s.suffix}`}
                    aria-current={props.section === s.id ? 'page' : undefined}
                  >
                    {tr.text(s.key)}
                  </a>
                </li>
              ))}
            </ul>
          </nav>
        )}
        <main id="main" tabindex={-1}>
          {props.showsNumbers && <Caution tr={tr} />}
          {props.children}
        </main>
        <footer class="site-footer">
          <p class="footer-caution">
            <strong>{tr.text('caution.short')}</strong>{' '}
            <a href="/limits">{tr.text('caution.limitsLink')}</a>.
          </p>
          <p>
            {tr.text('footer.version', { version: toolVersion })}
            {isDemoStudy(props.study) && <> {tr.text('footer.demo')}</>}
          </p>
        </footer>
      </body>
    </html>
  );
}

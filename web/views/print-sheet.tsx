import type { Child } from 'hono/jsx';
import type { Study } from '../../api/engine/model.ts';
import type { Provenance } from '../../api/engine/results.ts';
import type { CommunityPageData } from '../data/community-data.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import type { MapFrame } from '../maps/map-frame.ts';
import { LanguageSwitch } from '../layout/language-switch.tsx';
import type { TextKey } from '../text/text-key.ts';
import { ProvenanceLine } from './community-view.tsx';

/** What a printed sheet for one community is made from (handout, poster). */
export interface CommunitySheetProps {
  readonly page: PageContext;
  readonly studyId: string;
  /** The study as screened (its faults and places for the village map). */
  readonly study: Study;
  readonly data: CommunityPageData;
  /** The village map's frame (maps/village-map.tsx). */
  readonly frame: MapFrame;
  readonly provenance: Provenance;
  /** When the sheet was made (ISO), printed on it. */
  readonly printedAt: string;
}

/** The text of each sheet's title and tools bar. */
const SHEET_TEXT = {
  handout: {
    title: 'handout.title',
    back: 'handout.back',
    hint: 'handout.printHint',
    print: 'handout.print',
  },
  poster: {
    title: 'material.posterTitle',
    back: 'material.posterBack',
    hint: 'material.posterHint',
    print: 'material.poster',
  },
} as const satisfies Record<string, Record<string, TextKey>>;

export interface PrintSheetProps {
  readonly page: PageContext;
  /** The sheet: its text, its stylesheet (`/static/<sheet>.css`) and its class prefix. */
  readonly sheet: keyof typeof SHEET_TEXT;
  readonly studyId: string;
  readonly community: { readonly id: string; readonly name: string };
  /** Whether the tools offer the language switch. */
  readonly languageSwitch?: boolean;
  readonly children: Child;
}

/**
 * A printed sheet for residents (handout, poster): its own document without the site's
 * navigation, and a tools bar (back to the community page, a hint, the print button) that is
 * not printed.
 */
export function PrintSheet(props: PrintSheetProps) {
  const { tr, path } = props.page;
  const text = SHEET_TEXT[props.sheet];
  const title = tr.t(text.title, { name: props.community.name });
  return (
    <html lang={tr.lang}>
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title lang={tr.fallbackLang(text.title)}>{`${title} · ${tr.t('site.name')}`}</title>
        <link rel="icon" href="data:," />
        <link rel="stylesheet" href="/static/tremora.css" />
        <link rel="stylesheet" href={`/static/${props.sheet}.css`} />
        <script src="/static/tremora.js" defer></script>
      </head>
      <body class={`${props.sheet}-page`}>
        <a class="skip-link" href="#main">
          {tr.text('site.skip')}
        </a>
        <header class={`${props.sheet}-tools no-print`}>
          <nav aria-label={tr.t('nav.main')}>
            <a href={`/studies/${props.studyId}/communities/${props.community.id}`}>
              {tr.text(text.back)}
            </a>
          </nav>
          <p>{tr.text(text.hint)}</p>
          {props.languageSwitch && <LanguageSwitch tr={tr} path={path} />}
          <p
            data-print-button="true"
            data-print-label={tr.t(text.print)}
            lang={tr.fallbackLang(text.print)}
            class="print-slot"
          ></p>
        </header>
        {props.children}
      </body>
    </html>
  );
}

/**
 * The foot of a printed sheet: the short caution (with `more` after it), where the numbers
 * come from, and when the sheet was printed (SAFETY.md: every printed page carries the caution).
 */
export function PrintedFooter(props: {
  readonly sheet: 'handout' | 'poster';
  /** What the sheet is made from: its provenance and when it was printed. */
  readonly of: CommunitySheetProps;
  readonly more?: Child;
}) {
  const { tr } = props.of.page;
  return (
    <>
      <p class={`${props.sheet}-caution`}>
        <strong>{tr.text('caution.short')}</strong>
        {props.more}
      </p>
      <ProvenanceLine tr={tr} provenance={props.of.provenance} />
      <p class="printed">{tr.text('provenance.printed', { date: tr.date(props.of.printedAt) })}</p>
    </>
  );
}

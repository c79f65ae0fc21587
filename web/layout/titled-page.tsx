import type { TextKey } from '../text/text-key.ts';
import type { TextValues } from '../text/translator.ts';
import { PageShell, type PageShellProps } from './page-shell.tsx';

export interface TitledPageProps extends Omit<PageShellProps, 'title' | 'titleLang'> {
  /** The text that is both the page's title and its heading. */
  readonly titleKey: TextKey;
  readonly titleValues?: TextValues;
}

/** A page whose title is one text of the bundles, shown again as its first heading. */
export function TitledPage(props: TitledPageProps) {
  const { titleKey, titleValues, children, ...shell } = props;
  const { tr } = props.page;
  return (
    <PageShell {...shell} title={tr.t(titleKey, titleValues)} titleLang={tr.fallbackLang(titleKey)}>
      <h1>{tr.text(titleKey, titleValues)}</h1>
      {children}
    </PageShell>
  );
}

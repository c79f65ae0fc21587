import type { TextKey } from '../text/text-key.ts';
import type { TextValues } from '../text/translator.ts';
import {
  PageShell,
  type PageShellProps,
  STUDY_SECTION_TITLES,
  type StudySection,
} from './page-shell.tsx';

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

export type StudyPageProps = Omit<
  TitledPageProps,
  'study' | 'titleKey' | 'titleValues' | 'section'
> & {
  readonly study: { readonly id: string; readonly name: string };
} & (
    | { readonly section: StudySection; readonly titleKey?: undefined }
    | { readonly section?: StudySection; readonly titleKey: TextKey }
  );

/**
 * A page of one study, titled "… of {name}" with the study's name: its section's own title
 * unless it has one of its own (a run, a trip, the ground-motion settings).
 */
export function StudyPage(props: StudyPageProps) {
  const titleKey =
    props.titleKey === undefined ? STUDY_SECTION_TITLES[props.section] : props.titleKey;
  return <TitledPage {...props} titleKey={titleKey} titleValues={{ name: props.study.name }} />;
}

import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import type { Translator } from '../text/translator.ts';
import { SafetyAdvice } from './safety-advice.tsx';

/** The limits of a screening and the safety advice (SAFETY.md in plain words). */
export function LimitsView(props: { readonly page: PageContext }) {
  const { tr } = props.page;
  return (
    <TitledPage page={props.page} titleKey="limits.title">
      <p class="lead">{tr.text('limits.intro')}</p>
      <LimitsList tr={tr} />
      <p>{tr.text('limits.source')}</p>
      <h2>{tr.text('community.todo')}</h2>
      <SafetyAdvice tr={tr} coastal={true} headingLevel={3} />
    </TitledPage>
  );
}

/** The limits of a screening, one item a line of their text. */
export function LimitsList(props: { readonly tr: Translator }) {
  const { tr } = props;
  return (
    <ul class="limits" lang={tr.fallbackLang('limits.list')}>
      {tr
        .t('limits.list')
        .split('\n')
        .map((item) => (
          <li>{item}</li>
        ))}
    </ul>
  );
}

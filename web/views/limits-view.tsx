import { type PageContext, PageShell } from '../layout/page-shell.tsx';
import { SafetyAdvice } from './safety-advice.tsx';

/** The limits of a screening and the safety advice (SAFETY.md in plain words). */
export function LimitsView(props: { readonly page: PageContext }) {
  const { tr } = props.page;
  return (
    <PageShell
      page={props.page}
      title={tr.t('limits.title')}
      titleLang={tr.fallbackLang('limits.title')}
    >
      <h1>{tr.text('limits.title')}</h1>
      <p class="lead">{tr.text('limits.intro')}</p>
      <ul class="limits" lang={tr.fallbackLang('limits.list')}>
        {tr
          .t('limits.list')
          .split('\n')
          .map((item) => (
            <li>{item}</li>
          ))}
      </ul>
      <p>{tr.text('limits.source')}</p>
      <h2>{tr.text('community.todo')}</h2>
      <SafetyAdvice tr={tr} coastal={true} headingLevel={3} />
    </PageShell>
  );
}

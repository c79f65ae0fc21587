import { PageShell } from '../layout/page-shell.tsx';
import type { Translator } from '../text/translator.ts';
import { SafetyAdvice } from './safety-advice.tsx';

/** The limits of a screening and the safety advice (SAFETY.md in plain words). */
export function LimitsView(props: { readonly tr: Translator; readonly path: string; readonly toolVersion: string }) {
  const { tr } = props;
  return (
    <PageShell tr={tr} title={tr.t('limits.title')} path={props.path} toolVersion={props.toolVersion}>
      <h1>{tr.t('limits.title')}</h1>
      <p class="lead">{tr.t('limits.intro')}</p>
      <ul class="limits">
        {tr
          .t('limits.list')
          .split('\n')
          .map((item) => (
            <li>{item}</li>
          ))}
      </ul>
      <p>{tr.t('limits.source')}</p>
      <h2>{tr.t('community.todo')}</h2>
      <SafetyAdvice tr={tr} coastal={true} headingLevel={3} />
    </PageShell>
  );
}

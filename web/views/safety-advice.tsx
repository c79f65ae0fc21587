import type { Translator } from '../text/translator.ts';

const lines = (text: string) => text.split('\n').map((item) => <li>{item}</li>);

/** Before, during and after shaking; the tsunami advice for coastal places (SAFETY.md). */
export function SafetyAdvice(props: { readonly tr: Translator; readonly coastal: boolean; readonly headingLevel: 2 | 3 }) {
  const { tr } = props;
  const H = props.headingLevel === 2 ? 'h2' : 'h3';
  return (
    <div class="safety">
      {props.coastal && (
        <section class="tsunami" aria-labelledby="tsunami-title">
          <H id="tsunami-title">{tr.t('tsunami.title')}</H>
          <ul>{lines(tr.t('tsunami.text'))}</ul>
        </section>
      )}
      <div class="safety-columns">
        <section aria-labelledby="before-title">
          <H id="before-title">{tr.t('safety.before.title')}</H>
          <ul>{lines(tr.t('safety.before'))}</ul>
        </section>
        <section aria-labelledby="during-title">
          <H id="during-title">{tr.t('safety.during.title')}</H>
          <ul>{lines(tr.t('safety.during'))}</ul>
        </section>
        <section aria-labelledby="after-title">
          <H id="after-title">{tr.t('safety.after.title')}</H>
          <ul>{lines(tr.t('safety.after'))}</ul>
        </section>
      </div>
      <p class="safety-local">{tr.t('safety.local')}</p>
    </div>
  );
}

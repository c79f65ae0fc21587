import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/** A list from a one-item-per-line text; English standing in for a translation marks the whole list. */
const Lines = (props: { readonly tr: Translator; readonly k: TextKey }) => (
  <ul lang={props.tr.fallbackLang(props.k)}>
    {props.tr
      .t(props.k)
      .split('\n')
      .map((item) => (
        <li>{item}</li>
      ))}
  </ul>
);

/** Before, during and after shaking; the tsunami advice for coastal places (SAFETY.md). */
export function SafetyAdvice(props: {
  readonly tr: Translator;
  readonly coastal: boolean;
  readonly headingLevel: 2 | 3;
}) {
  const { tr } = props;
  const H = props.headingLevel === 2 ? 'h2' : 'h3';
  return (
    <div class="safety">
      {props.coastal && (
        <section class="tsunami" aria-labelledby="tsunami-title">
          <H id="tsunami-title">{tr.text('tsunami.title')}</H>
          <Lines tr={tr} k="tsunami.text" />
        </section>
      )}
      <div class="safety-columns">
        <section aria-labelledby="before-title">
          <H id="before-title">{tr.text('safety.before.title')}</H>
          <Lines tr={tr} k="safety.before" />
        </section>
        <section aria-labelledby="during-title">
          <H id="during-title">{tr.text('safety.during.title')}</H>
          <Lines tr={tr} k="safety.during" />
        </section>
        <section aria-labelledby="after-title">
          <H id="after-title">{tr.text('safety.after.title')}</H>
          <Lines tr={tr} k="safety.after" />
        </section>
      </div>
      <p class="safety-local">{tr.text('safety.local')}</p>
    </div>
  );
}

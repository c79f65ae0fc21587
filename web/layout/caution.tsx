import type { Translator } from '../text/translator.ts';

/** The caution every page with a number carries (SAFETY.md), with the link to the limits. */
export function Caution(props: { readonly tr: Translator; readonly compact?: boolean }) {
  const { tr } = props;
  return (
    <aside
      class={props.compact ? 'caution caution-compact' : 'caution'}
      aria-label={tr.t('caution.title')}
    >
      <p class="caution-title">{tr.text('caution.title')}</p>
      <p>
        {tr.text('caution.text')} <a href="/limits">{tr.text('caution.limitsLink')}</a>.
      </p>
    </aside>
  );
}

import type { Translator } from '../text/translator.ts';

/**
 * The language switch: a plain GET form to /language (it works without script), listing every
 * language that has a bundle file (web/text/text-bundles.ts), each name in its own language.
 */
export function LanguageSwitch(props: { tr: Translator; path: string }) {
  const { tr } = props;
  return (
    <form class="lang-switch" action="/language" method="get">
      <label for="lang-select">{tr.text('lang.label')}</label>
      <select id="lang-select" name="lang">
        {tr.languages.map((l) => (
          <option value={l.code} lang={l.code} selected={l.code === tr.lang}>
            {l.name}
          </option>
        ))}
      </select>
      <input type="hidden" name="back" value={props.path} />
      <button type="submit">{tr.text('lang.change')}</button>
    </form>
  );
}

import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/**
 * A computation's warnings folded under `summary`, each in English as the engine writes it
 * (marked so); nothing at all when there are none.
 */
export function WarningDetails(props: {
  readonly tr: Translator;
  readonly summary: TextKey;
  readonly warnings: readonly string[];
}) {
  const { tr, warnings } = props;
  if (warnings.length === 0) return <></>;
  return (
    <details>
      <summary>{tr.text(props.summary)}</summary>
      <ul>
        {warnings.map((w) => (
          <li>{tr.english(w)}</li>
        ))}
      </ul>
    </details>
  );
}

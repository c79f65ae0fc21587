import type { StudyPart } from '../../api/study/load-study.ts';
import type { Translator } from '../text/translator.ts';

/** What a draft study still lacks before it can be screened, with the way to the editor. */
export function DraftNotice(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly missing: readonly StudyPart[];
  /** False on the editor itself. */
  readonly linkToEditor?: boolean;
}) {
  const { tr } = props;
  if (props.missing.length === 0) return null;
  return (
    <section class="notice draft-notice" aria-labelledby="draft-heading" data-draft>
      <h2 id="draft-heading">{tr.text('draft.title')}</h2>
      <p>{tr.text('draft.text')}</p>
      <ul>
        {props.missing.map((part) => (
          <li data-missing={part}>{tr.text(`draft.${part}`)}</li>
        ))}
      </ul>
      {props.linkToEditor !== false && (
        <p>
          <a class="button" href={`/studies/${props.studyId}/edit`}>
            {tr.text('draft.edit')}
          </a>
        </p>
      )}
    </section>
  );
}

import type { StudyDependents } from '../../api/operations/study-records.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';

/** Asks before a study is deleted, saying what goes with it (counted from the store). */
export function DeleteStudyView(props: {
  readonly page: PageContext;
  readonly study: { readonly id: string; readonly name: string };
  readonly dependents: StudyDependents;
}) {
  const { tr } = props.page;
  const { dependents: d, study } = props;
  const title = { name: study.name };
  return (
    <TitledPage page={props.page} titleKey="deleteStudy.title" titleValues={title} study={study}>
      <p>{tr.text('deleteStudy.intro')}</p>
      <ul class="delete-list">
        <li>{tr.text('deleteStudy.document')}</li>
        <li data-count="runs">{tr.text('deleteStudy.runs', { n: tr.number(d.runs) })}</li>
        <li data-count="maps">{tr.text('deleteStudy.maps', { n: tr.number(d.maps) })}</li>
        <li data-count="catalogs">
          {tr.text('deleteStudy.catalogs', { n: tr.number(d.catalogs) })}
        </li>
        <li data-count="visits">{tr.text('deleteStudy.visits', { n: tr.number(d.visits) })}</li>
      </ul>
      {d.unfinished > 0 && (
        <p class="notice">{tr.plural('deleteStudy.unfinished', d.unfinished)}</p>
      )}
      <form method="post" action={`/studies/${study.id}/delete`} class="inline-form">
        <button type="submit" class="button-primary">
          {tr.text('deleteStudy.button')}
        </button>
      </form>{' '}
      <a class="button" href={`/studies/${study.id}`}>
        {tr.text('deleteStudy.keep')}
      </a>
    </TitledPage>
  );
}

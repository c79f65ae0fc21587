import type { VisitRecord } from '../../api/store/visit-repository.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';

/** Asks before one visit record is deleted, showing what it holds. */
export function DeleteVisitView(props: {
  readonly page: PageContext;
  readonly study: { readonly id: string; readonly name: string };
  readonly community: { readonly id: string; readonly name: string };
  readonly visit: VisitRecord;
}) {
  const { tr } = props.page;
  const { study, community, visit } = props;
  const title = { name: community.name, date: tr.date(`${visit.visitedOn}T12:00:00Z`) };
  const back = `/studies/${study.id}/communities/${community.id}#visits-heading`;
  return (
    <TitledPage
      page={props.page}
      titleKey="visits.deleteTitle"
      titleValues={title}
      study={study}
      section="overview"
    >
      <p>{tr.text('visits.deleteIntro')}</p>
      <dl class="visit-summary">
        <dt>{tr.text('visits.field.language')}</dt>
        <dd>{visit.language}</dd>
        <dt>{tr.text('visits.field.peopleReached')}</dt>
        <dd>{tr.number(visit.peopleReached)}</dd>
        <dt>{tr.text('visits.field.topics')}</dt>
        <dd>{visit.topics}</dd>
        <dt>{tr.text('visits.field.followUps')}</dt>
        <dd>{visit.followUps}</dd>
        <dt>{tr.text('visits.field.referral')}</dt>
        <dd>{tr.text(`visits.referral.${visit.referral}`)}</dd>
      </dl>
      <form
        method="post"
        action={`/studies/${study.id}/communities/${community.id}/visits/${visit.id}/delete`}
        class="inline-form"
      >
        <button type="submit" class="button-primary">
          {tr.text('visits.deleteButton')}
        </button>
      </form>{' '}
      <a class="button" href={back}>
        {tr.text('visits.keep')}
      </a>
    </TitledPage>
  );
}

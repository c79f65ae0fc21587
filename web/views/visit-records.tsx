import type { InputIssue } from '../../api/engine/errors.ts';
import { REFERRAL_STATUSES, type VisitRecord } from '../../api/store/visit-repository.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import type { Translator } from '../text/translator.ts';
import { FieldProblems } from './field-problems.tsx';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

/** A community's recorded visits, newest first, each with a link to delete it (asked first), and a link to record another. */
export function VisitRecords(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly communityId: string;
  readonly visits: readonly VisitRecord[];
}) {
  const { tr, studyId, communityId, visits } = props;
  return (
    <section aria-labelledby="visits-heading" class="visit-records">
      <h2 id="visits-heading">{tr.text('visits.heading')}</h2>
      {visits.length === 0 ? (
        <p>{tr.text('visits.none')}</p>
      ) : (
        <DataTable
          tr={tr}
          caption={tr.text('visits.caption')}
          columns={[
            'visits.field.visitedOn',
            'visits.field.language',
            { key: 'visits.field.peopleReached', numeric: true },
            'visits.field.topics',
            'visits.field.followUps',
            'visits.field.referral',
            { blank: true },
          ]}
        >
          {visits.map((v) => (
            <tr data-visit={v.id}>
              <th scope="row">{tr.date(`${v.visitedOn}T12:00:00Z`)}</th>
              <LabelledCell tr={tr} column="visits.field.language">
                {v.language}
              </LabelledCell>
              <LabelledCell tr={tr} column="visits.field.peopleReached" numeric>
                {tr.number(v.peopleReached)}
              </LabelledCell>
              <LabelledCell tr={tr} column="visits.field.topics">
                {v.topics}
              </LabelledCell>
              <LabelledCell tr={tr} column="visits.field.followUps">
                {v.followUps}
              </LabelledCell>
              <LabelledCell tr={tr} column="visits.field.referral">
                {tr.text(`visits.referral.${v.referral}`)}
              </LabelledCell>
              <td>
                <a
                  class="button button-quiet"
                  href={`/studies/${studyId}/communities/${communityId}/visits/${v.id}/delete`}
                >
                  {tr.text('visits.delete', {
                    date: tr.date(`${v.visitedOn}T12:00:00Z`),
                  })}
                </a>
              </td>
            </tr>
          ))}
        </DataTable>
      )}
      <p>
        <a href={`/studies/${studyId}/communities/${communityId}/visits/new`}>
          {tr.text('visits.record')}
        </a>
      </p>
    </section>
  );
}

/** The visit form's fields as sent, to show again beside their problems. */
export type VisitFormValues = Readonly<Record<string, string>>;

export interface VisitFormViewProps {
  readonly page: PageContext;
  readonly studyId: string;
  readonly studyName: string;
  readonly communityId: string;
  readonly communityName: string;
  readonly values: VisitFormValues;
  readonly issues: readonly InputIssue[];
}

const TEXT_FIELDS = [
  { name: 'visitedOn', type: 'date' },
  { name: 'language', type: 'text' },
  { name: 'peopleReached', type: 'number' },
] as const;

/** The form that records one visit to a community (a plain POST; no script needed). */
export function VisitFormView(props: VisitFormViewProps) {
  const { tr } = props.page;
  const { values, issues } = props;
  const issuesOf = (name: string) => issues.filter((i) => i.path === name);
  const described = (name: string) =>
    issuesOf(name).length > 0 ? `visit-${name}-problems` : undefined;
  return (
    <TitledPage
      page={props.page}
      titleKey="visits.formTitle"
      titleValues={{ name: props.communityName }}
      study={{ id: props.studyId, name: props.studyName }}
      section="overview"
    >
      {issues.length > 0 && (
        <p role="alert" class="form-problems">
          {tr.text('visits.problems')}
        </p>
      )}
      <form
        method="post"
        action={`/studies/${props.studyId}/communities/${props.communityId}/visits`}
        class="visit-form"
      >
        <fieldset>
          <legend>{tr.text('visits.heading')}</legend>
          {TEXT_FIELDS.map((f) => (
            <label>
              {tr.text(`visits.field.${f.name}`)}
              <input
                type={f.type}
                name={f.name}
                value={values[f.name] ?? ''}
                required
                {...(f.type === 'number' ? { min: '0', step: '1' } : {})}
                aria-invalid={issuesOf(f.name).length > 0 ? 'true' : undefined}
                aria-describedby={described(f.name)}
              />
              <FieldProblems tr={tr} id={`visit-${f.name}-problems`} issues={issuesOf(f.name)} />
            </label>
          ))}
          {(['topics', 'followUps'] as const).map((name) => (
            <label>
              {tr.text(`visits.field.${name}`)}
              <textarea
                name={name}
                rows={3}
                aria-invalid={issuesOf(name).length > 0 ? 'true' : undefined}
                aria-describedby={described(name)}
              >
                {values[name] ?? ''}
              </textarea>
              <FieldProblems tr={tr} id={`visit-${name}-problems`} issues={issuesOf(name)} />
            </label>
          ))}
          <label>
            {tr.text('visits.field.referral')}
            <select name="referral">
              {REFERRAL_STATUSES.map((status) => (
                <option value={status} selected={(values['referral'] ?? 'none') === status}>
                  {tr.t(`visits.referral.${status}`)}
                </option>
              ))}
            </select>
            <FieldProblems tr={tr} id="visit-referral-problems" issues={issuesOf('referral')} />
          </label>
          <button type="submit">{tr.text('visits.save')}</button>
        </fieldset>
      </form>
      <p>
        <a href={`/studies/${props.studyId}/communities/${props.communityId}#visits-heading`}>
          {tr.text('visits.backToCommunity', { name: props.communityName })}
        </a>
      </p>
    </TitledPage>
  );
}

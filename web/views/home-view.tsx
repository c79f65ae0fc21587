import type { StudySummary } from '../../api/store/index.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import { Notice } from '../components/notice.tsx';
import { DataTable, LabelledCell } from '../components/data-table.tsx';

export function HomeView(props: {
  readonly page: PageContext;
  readonly studies: readonly StudySummary[];
  /** A study was just deleted. */
  readonly deleted?: boolean;
}) {
  const { tr } = props.page;
  return (
    <TitledPage page={props.page} titleKey="home.title">
      {props.deleted && <Notice>{tr.text('deleteStudy.done')}</Notice>}
      <p class="lead">{tr.text('home.intro')}</p>
      <p>{tr.text('home.start')}</p>
      <p>
        <a class="button button-primary" href="/studies/new">
          {tr.text('home.new')}
        </a>
      </p>
      {props.studies.length === 0 ? (
        <p>{tr.text('home.none')}</p>
      ) : (
        <DataTable
          tr={tr}
          caption={tr.text('home.caption')}
          columns={['home.col.name', 'home.col.updated', 'home.col.actions']}
        >
          {props.studies.map((s) => (
            <tr>
              <th scope="row">
                <a href={`/studies/${s.id}`}>{s.name}</a>
              </th>
              <LabelledCell tr={tr} column="home.col.updated">
                {tr.date(s.updatedAt)}
              </LabelledCell>
              <td class="row-actions">
                <a href={`/studies/${s.id}/rename`}>
                  {tr.text('studyActions.rename', { name: s.name })}
                </a>{' '}
                <a href={`/studies/${s.id}/duplicate`}>
                  {tr.text('studyActions.duplicate', { name: s.name })}
                </a>{' '}
                <a href={`/studies/${s.id}/delete`}>
                  {tr.text('studyActions.delete', { name: s.name })}
                </a>
              </td>
            </tr>
          ))}
        </DataTable>
      )}
    </TitledPage>
  );
}

import type { StudySummary } from '../../api/store/index.ts';
import { PageShell } from '../layout/page-shell.tsx';
import type { Translator } from '../text/translator.ts';

export function HomeView(props: { readonly tr: Translator; readonly path: string; readonly toolVersion: string; readonly studies: readonly StudySummary[] }) {
  const { tr } = props;
  return (
    <PageShell tr={tr} title={tr.t('home.title')} path={props.path} toolVersion={props.toolVersion}>
      <h1>{tr.t('home.title')}</h1>
      <p class="lead">{tr.t('home.intro')}</p>
      <p>{tr.t('home.start')}</p>
      {props.studies.length === 0 ? (
        <p>{tr.t('home.none')}</p>
      ) : (
        <table class="data-table">
          <caption>{tr.t('home.caption')}</caption>
          <thead>
            <tr>
              <th scope="col">{tr.t('home.col.name')}</th>
              <th scope="col">{tr.t('home.col.updated')}</th>
            </tr>
          </thead>
          <tbody>
            {props.studies.map((s) => (
              <tr>
                <th scope="row">
                  <a href={`/studies/${s.id}`}>{s.name}</a>
                </th>
                <td>{tr.date(s.updatedAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </PageShell>
  );
}

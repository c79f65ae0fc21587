import { ACCESS_PATH, LEAVE_PATH } from '../../api/service/page-access.ts';
import type { PageContext } from '../layout/page-shell.tsx';
import { TitledPage } from '../layout/titled-page.tsx';
import { Notice } from '../components/notice.tsx';

/** What the access page has to say: why the user is here, or how their last try went. */
export type AccessNotice = 'needed' | 'missing' | 'wrong' | 'ended';

export interface AccessViewProps {
  readonly page: PageContext;
  /** `open`: the service has no token; `granted`: this browser has access; `closed`: it has not. */
  readonly state: 'open' | 'granted' | 'closed';
  readonly notice?: AccessNotice | undefined;
  /** Where to go afterwards: a path of this origin (safeBackPath); this page when none was given. */
  readonly back: string;
  readonly keptDays: number;
}

/** The access page: enter the token once, or end this browser's access (plain form posts). */
export function AccessView(props: AccessViewProps) {
  const { tr } = props.page;
  const { state, notice } = props;
  const refused = notice === 'missing' || notice === 'wrong';
  return (
    <TitledPage page={props.page} titleKey="access.title">
      {state === 'open' ? (
        <p>{tr.text('access.open')}</p>
      ) : (
        <>
          <p class="lead">{tr.text('access.intro')}</p>
          {notice === 'needed' && state === 'closed' && <Notice>{tr.text('access.needed')}</Notice>}
          {notice === 'ended' && <Notice>{tr.text('access.ended')}</Notice>}
          {state === 'granted' ? (
            <>
              <Notice>
                {tr.text('access.granted')}{' '}
                {tr.text('access.kept', { days: tr.number(props.keptDays) })}
              </Notice>
              <form method="post" action={LEAVE_PATH} class="inline-form">
                <button type="submit" class="button-quiet">
                  {tr.text('access.end')}
                </button>
              </form>
            </>
          ) : (
            <form method="post" action={ACCESS_PATH} class="access-form" novalidate>
              <input type="hidden" name="back" value={props.back} />
              <div class={refused ? 'field field-bad' : 'field'}>
                <label for="access-token">{tr.text('access.token')}</label>
                <input
                  id="access-token"
                  name="token"
                  type="password"
                  autocomplete="current-password"
                  aria-invalid={refused ? 'true' : undefined}
                  aria-describedby={
                    refused ? 'access-token-problem access-token-help' : 'access-token-help'
                  }
                />
                {refused && (
                  <p class="problem" id="access-token-problem" role="alert">
                    {tr.text(notice === 'missing' ? 'access.missing' : 'access.wrong')}
                  </p>
                )}
                <p class="help" id="access-token-help">
                  {tr.text('access.tokenHelp')}
                </p>
              </div>
              <p class="form-actions">
                <button type="submit" class="button-primary">
                  {tr.text('access.enter')}
                </button>
              </p>
            </form>
          )}
        </>
      )}
      {props.back !== ACCESS_PATH && (
        <p>
          <a href={props.back}>{tr.text('access.back')}</a>
        </p>
      )}
    </TitledPage>
  );
}

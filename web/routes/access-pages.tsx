import type { Context, Hono } from 'hono';
import {
  ACCESS_MAX_AGE_S,
  ACCESS_PATH,
  LEAVE_PATH,
  endPageAccess,
  grantPageAccess,
  hasPageAccess,
  sameSecret,
} from '../../api/service/page-access.ts';
import { AccessView, type AccessNotice, type AccessViewProps } from '../views/access-view.tsx';
import { field, safeBackPath, type PageKit } from './page-kit.ts';

const DAY_S = 24 * 3600;

/** Where to go once access is given: the page asked for, else back to this page. */
const backFrom = (asked: string | undefined): string =>
  asked === undefined || asked === '' ? ACCESS_PATH : safeBackPath(asked);

/**
 * The access page (api/service/page-access.ts): with TREMORA_TOKEN set, a form to enter the
 * token once, which sets the access cookie, and a button that ends this browser's access.
 * Without a token the page only says that none is needed.
 */
export function accessPages(app: Hono, kit: PageKit, token: string | undefined): void {
  const view = (
    c: Context,
    state: AccessViewProps['state'],
    notice: AccessNotice | undefined,
    back: string,
    status: 200 | 403 | 422 = 200,
  ) =>
    kit.render(
      c,
      <AccessView
        page={kit.page(c)}
        state={state}
        notice={notice}
        back={back}
        keptDays={ACCESS_MAX_AGE_S / DAY_S}
      />,
      status,
    );

  app.get(ACCESS_PATH, (c) => {
    const why = c.req.query('why');
    const notice = why === 'needed' || why === 'ended' ? why : undefined;
    const state =
      token === undefined
        ? 'open'
        : hasPageAccess(c, token, kit.ctx.store.pageAccess)
          ? 'granted'
          : 'closed';
    return view(c, state, notice, backFrom(c.req.query('back')));
  });

  if (token === undefined) return;

  app.post(ACCESS_PATH, async (c) => {
    const form = await c.req.parseBody();
    const back = backFrom(field(form, 'back'));
    // Tokens hold no spaces (api/service/config.ts); spaces around one come from copying it.
    const given = field(form, 'token')?.trim() ?? '';
    if (given === '') return view(c, 'closed', 'missing', back, 422);
    if (!sameSecret(given, token)) return view(c, 'closed', 'wrong', back, 403);
    grantPageAccess(c, token, kit.ctx.store.pageAccess);
    return c.redirect(back, 303);
  });

  app.post(LEAVE_PATH, (c) => {
    endPageAccess(c, token, kit.ctx.store.pageAccess);
    return c.redirect(`${ACCESS_PATH}?why=ended`, 303);
  });
}

import type { Context } from 'hono';
import type { Child } from 'hono/jsx';
import type { StudyData } from '../data/study-data.ts';
import { MessageView } from '../views/message-view.tsx';
import type { PageKit } from './page-kit.ts';

/** 404 as a page: "not found" with `text`, by default the general "no such page". */
export function notFoundPage(kit: PageKit, c: Context, text?: Child) {
  const tr = kit.tr(c);
  return kit.render(
    c,
    <MessageView
      page={kit.page(c)}
      title={tr.t('error.notFound')}
      text={text ?? tr.text('error.notFoundText')}
    />,
    404,
  );
}

/** 404 for a route's `:id` that names no saved study. */
export function studyNotFoundPage(kit: PageKit, c: Context) {
  const id = c.req.param('id') ?? '';
  return notFoundPage(kit, c, kit.tr(c).text('error.studyNotFound', { id }));
}

/** 422 for a saved study that no longer validates: the service's messages, one a line. */
export function invalidStudyPage(kit: PageKit, c: Context, data: StudyData & { ok: false }) {
  return kit.render(
    c,
    <MessageView
      page={kit.page(c)}
      title={data.record.name}
      text={kit.tr(c).text('editor.otherProblems')}
      details={data.issues.map((i) => `${i.path}: ${i.message}`)}
    />,
    422,
  );
}

import type { Child } from 'hono/jsx';
import { type PageContext, PageShell } from '../layout/page-shell.tsx';

/** A page with one message: not found, or a study that no longer validates (details: the service's messages, in English). */
export function MessageView(props: {
  readonly page: PageContext;
  readonly title: string;
  readonly text: Child;
  readonly details?: readonly string[];
  /** More content below the text (a draft's notice). */
  readonly children?: Child;
}) {
  const { tr } = props.page;
  return (
    <PageShell page={props.page} title={props.title}>
      <h1>{props.title}</h1>
      {props.text !== '' && <p>{props.text}</p>}
      {props.children}
      {props.details && props.details.length > 0 && (
        <ul class="problems">
          {props.details.map((d) => (
            <li>{tr.english(d)}</li>
          ))}
        </ul>
      )}
      <p>
        <a href="/">{tr.text('error.home')}</a>
      </p>
    </PageShell>
  );
}

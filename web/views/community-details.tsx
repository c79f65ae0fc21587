import type { Translator } from '../text/translator.ts';

/** What the community's file said that the computation does not use (school, clinic, notes), as given. */
export function CommunityDetails(props: {
  readonly tr: Translator;
  readonly details: Readonly<Record<string, string>> | undefined;
}) {
  const entries = Object.entries(props.details ?? {});
  if (entries.length === 0) return null;
  return (
    <section aria-labelledby="details-heading" class="community-details">
      <h2 id="details-heading">{props.tr.text('community.details')}</h2>
      <p>{props.tr.text('community.detailsIntro')}</p>
      <dl>
        {entries.map(([name, value]) => (
          <div>
            <dt>{name}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

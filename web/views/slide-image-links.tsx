import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/** Each picture for slides with the words that name its link. */
const IMAGES: readonly { readonly name: string; readonly label: TextKey }[] = [
  { name: 'map', label: 'material.image.map' },
  { name: 'hazard-curve', label: 'material.image.curve' },
  { name: 'shaking-cards', label: 'material.image.cards' },
];

/** Links to a community's pictures for slides, each as SVG and PNG (routes/material-pages.tsx). */
export function SlideImageLinks(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly communityId: string;
  readonly hasCurve: boolean;
}) {
  const { tr } = props;
  const base = `/studies/${props.studyId}/communities/${props.communityId}/images`;
  return (
    <section aria-labelledby="images-heading" class="slide-images">
      <h2 id="images-heading">{tr.text('material.images')}</h2>
      <p>{tr.text('material.imagesIntro')}</p>
      <ul>
        {IMAGES.filter((image) => props.hasCurve || image.name !== 'hazard-curve').map((image) => (
          <li data-image={image.name}>
            {tr.text(image.label)}:{' '}
            <a href={`${base}/${image.name}.svg`} download="">
              SVG
            </a>
            {', '}
            <a href={`${base}/${image.name}.png`} download="">
              PNG
            </a>
          </li>
        ))}
      </ul>
    </section>
  );
}

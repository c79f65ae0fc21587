import type { Study } from '../../api/engine/model.ts';
import type { CommunityPageData } from '../data/community-data.ts';
import type { MapFrame } from '../maps/map-frame.ts';
import { plateBoundary, traceFrom, VillageMap } from '../maps/village-map.tsx';
import type { Translator } from '../text/translator.ts';
import { NearestFaults } from './nearest-faults.tsx';

/**
 * The village's map with its faults and the plate boundary, then the same in words: the
 * plate boundary's trace and each nearest fault with its distance and direction.
 */
export function VillageMapSection(props: {
  readonly tr: Translator;
  readonly study: Study;
  readonly data: CommunityPageData;
  readonly frame: MapFrame;
  readonly idPrefix: string;
  readonly headingLevel: 2 | 3;
}) {
  const { tr, study, data } = props;
  const { community, result } = data;
  const H = props.headingLevel === 2 ? 'h2' : 'h3';
  const boundary = plateBoundary(study);
  const trace = boundary ? traceFrom(community, boundary) : undefined;
  const headingId = `${props.idPrefix}-heading`;
  return (
    <section aria-labelledby={headingId} class="village-map">
      <H id={headingId}>{tr.text('material.mapHeading', { name: community.name })}</H>
      <div class="village-map-body">
        <figure class="village-map-figure">
          <VillageMap
            tr={tr}
            study={study}
            community={community}
            frame={props.frame}
            idPrefix={props.idPrefix}
          />
          <figcaption>{tr.text('material.mapCaption', { name: community.name })}</figcaption>
        </figure>
        <div class="village-map-words">
          {boundary && trace && (
            <p class="plate-boundary" data-source={boundary.id}>
              {tr.text('material.plateBoundary', {
                name: boundary.name,
                place: tr.place(trace.distanceKm, trace.bearingDeg),
              })}
            </p>
          )}
          {result.nearestFaults.length > 0 && (
            <NearestFaults tr={tr} faults={result.nearestFaults} />
          )}
        </div>
      </div>
    </section>
  );
}

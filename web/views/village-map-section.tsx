import { plateBoundary, traceFrom, VillageMap } from '../maps/village-map.tsx';
import { NearestFaults } from './nearest-faults.tsx';
import type { CommunitySheetProps } from './print-sheet.tsx';

/**
 * The village's map with its faults and the plate boundary, then the same in words: the
 * plate boundary's trace and each nearest fault with its distance and direction.
 */
export function VillageMapSection(props: {
  /** The sheet the section is on: its study, community data and map frame. */
  readonly sheet: CommunitySheetProps;
  readonly idPrefix: string;
}) {
  const { study, data } = props.sheet;
  const { tr } = props.sheet.page;
  const { community, result } = data;
  const boundary = plateBoundary(study);
  const trace = boundary ? traceFrom(community, boundary) : undefined;
  const headingId = `${props.idPrefix}-heading`;
  return (
    <section aria-labelledby={headingId} class="village-map">
      <h2 id={headingId}>{tr.text('material.mapHeading', { name: community.name })}</h2>
      <div class="village-map-body">
        <figure class="village-map-figure">
          <VillageMap
            tr={tr}
            study={study}
            community={community}
            frame={props.sheet.frame}
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

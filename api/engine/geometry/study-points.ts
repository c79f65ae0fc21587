import type { LonLat, Source, Study } from '../model.ts';

/** Every coordinate of the sources, WGS84: fault traces (or their contours), zone rings, points. */
export function sourcePoints(sources: readonly Source[]): LonLat[] {
  const points: LonLat[] = [];
  for (const source of sources) {
    if (source.kind === 'fault') points.push(...(source.contours?.lines.flat() ?? source.trace));
    else if (source.kind === 'zone') for (const ring of source.rings) points.push(...ring);
    else points.push(source.location);
  }
  return points;
}

/** Every coordinate of the study a map shows, WGS84: communities, sources, outline. */
export function studyPoints(study: Pick<Study, 'communities' | 'sources' | 'outline'>): LonLat[] {
  const points: LonLat[] = study.communities.map((c) => [c.lon, c.lat] as const);
  points.push(...sourcePoints(study.sources));
  for (const ring of study.outline ?? []) points.push(...ring);
  return points;
}

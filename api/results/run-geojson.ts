import type { Feature, FeatureCollection, Point } from 'geojson';
import type { Study } from '../engine/model.ts';
import type { Provenance, StudyResult } from '../engine/results.ts';

export type RunFeatureCollection = FeatureCollection<Point> & {
  readonly name: string;
  readonly provenance: Provenance;
};

/**
 * A run's results as a GeoJSON FeatureCollection (RFC 7946): each community a Point
 * [lon, lat] whose properties carry its results (levels at the return periods, intensity,
 * band, chances, nearest faults, warnings). Hazard curves and deaggregation stay in the JSON
 * results. The run's provenance is a foreign member of the collection (RFC 7946 section 6.1).
 */
export function runGeoJson(study: Study, result: StudyResult): RunFeatureCollection {
  const features: Feature<Point>[] = [];
  for (const community of result.communities) {
    const site = study.communities.find((c) => c.id === community.communityId);
    if (!site) continue;
    features.push({
      type: 'Feature',
      id: community.communityId,
      geometry: { type: 'Point', coordinates: [site.lon, site.lat] },
      properties: {
        communityId: community.communityId,
        name: community.name,
        vs30: site.vs30,
        vs30Basis: site.vs30Basis,
        population: site.population ?? null,
        coastal: site.coastal,
        band: community.band,
        atReturnPeriod: community.atReturnPeriod,
        returnPeriodStatus: community.returnPeriodStatus,
        intensity: community.intensity,
        nearestFaults: community.nearestFaults,
        warnings: community.warnings,
      },
    });
  }
  return {
    type: 'FeatureCollection',
    name: result.studyName,
    features,
    provenance: result.provenance,
  };
}

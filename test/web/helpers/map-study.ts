import { COMMUNITY } from '../../service/helpers/small-study.ts';

/**
 * A small study spread over about 15 × 17 km of open ocean, for hazard maps that draw a few
 * hundred cells quickly: two invented villages and one invented earthquake source between
 * them (one magnitude, one rate), with the Cornell et al. (1979) PGA model (small-study.ts),
 * so a map costs one rupture per grid point. Names, places and rates are invented.
 */
export const SPREAD_SOURCE = {
  lon: -140.1,
  lat: -47.33,
  depthKm: 10,
  magnitude: 6.5,
  rate: 0.01,
} as const;

export function spreadStudy(name = 'Spread test study'): Record<string, unknown> {
  return {
    name,
    communities: [
      // Where the small study's one village stands.
      { ...COMMUNITY, id: 'low-cove', name: 'Low Cove' },
      {
        id: 'ridge-end',
        name: 'Ridge End',
        lon: -140.0,
        lat: -47.25,
        vs30: 700,
        population: 60,
        coastal: false,
        elevationM: 180,
      },
    ],
    sources: {
      type: 'FeatureCollection',
      features: [
        {
          type: 'Feature',
          geometry: { type: 'Point', coordinates: [SPREAD_SOURCE.lon, SPREAD_SOURCE.lat] },
          properties: {
            id: 'mid-spot',
            name: 'Mid spot',
            setting: 'crustal',
            mechanism: 'strike-slip',
            depthKm: SPREAD_SOURCE.depthKm,
            recurrence: {
              type: 'fixed',
              magnitude: SPREAD_SOURCE.magnitude,
              rate: SPREAD_SOURCE.rate,
            },
          },
        },
      ],
    },
    groundMotion: { crustal: [{ model: 'Cornell79', weight: 1 }] },
    settings: {
      measures: ['PGA'],
      horizonsYears: [50],
      returnPeriodsYears: [475, 2475],
      truncationSigma: 3,
    },
  };
}

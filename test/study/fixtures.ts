import { boxRing } from '../helpers/box-ring.ts';
import { lineFeature } from '../helpers/line-feature.ts';

/**
 * A small valid study in an invented open-ocean setting (all values invented, for validation
 * tests only). Each test copies and breaks it.
 */
export function validStudy(): Record<string, any> {
  return {
    name: 'Test shore',
    communities: [
      {
        id: 'north-cove',
        name: 'North Cove',
        lon: -140.1,
        lat: -47.2,
        vs30: 450,
        population: 300,
        coastal: true,
        elevationM: 5,
      },
      { id: 'ridge-camp', name: 'Ridge Camp', lon: -140.3, lat: -47.4, siteClass: 'C' },
    ],
    sources: {
      type: 'FeatureCollection',
      features: [
        lineFeature(
          [
            [-140.5, -47.6],
            [-140.5, -47.2],
          ],
          {
            id: 'fault-a',
            name: 'Fault A',
            setting: 'crustal',
            mechanism: 'strike-slip',
            dip: 90,
            upperDepthKm: 0,
            lowerDepthKm: 15,
            recurrence: { type: 'gutenberg-richter', bValue: 1, mMin: 5, mMax: 7.2, aValue: 3.1 },
          },
        ),
        lineFeature(
          [
            [-140.0, -47.8],
            [-139.8, -47.5],
            [-139.7, -47.1],
          ],
          {
            id: 'fault-b',
            setting: 'crustal',
            rake: 95,
            dip: 40,
            lowerDepthKm: 18,
            recurrence: {
              type: 'moment-balanced',
              slipRateMmYr: 2,
              bValue: 1,
              mMin: 5,
              mMax: 7.4,
              shape: 'characteristic',
            },
          },
        ),
        {
          type: 'Feature',
          geometry: {
            type: 'Polygon',
            coordinates: [boxRing(-141, -48, -139, -46.5)],
          },
          properties: {
            id: 'background',
            setting: 'crustal',
            mechanism: 'normal',
            depthKm: 10,
            recurrence: {
              type: 'gutenberg-richter',
              bValue: 1.05,
              mMin: 4.5,
              mMax: 6.5,
              rate: 0.2,
            },
          },
        },
        {
          type: 'Feature',
          geometry: { type: 'Point', coordinates: [-140.2, -47.9] },
          properties: {
            id: 'deep-spot',
            setting: 'intraslab',
            mechanism: 'normal',
            depthKm: 60,
            recurrence: { type: 'fixed', magnitude: 6.8, rate: 0.001 },
          },
        },
      ],
    },
    groundMotion: {
      crustal: [
        { model: 'CRUSTAL-A', weight: 0.5 },
        { model: 'CRUSTAL-B', weight: 0.5 },
      ],
    },
    settings: { measures: ['PGA', 'SA(1.0)'], horizonsYears: [50, 1] },
  };
}

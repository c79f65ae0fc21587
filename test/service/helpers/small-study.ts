/**
 * A one-source, one-community study in an invented open-ocean setting, built so its hazard
 * can be checked by hand: a point source of one magnitude straight below the community, the
 * Cornell et al. (1979) PGA model, and curve levels at the median and one sigma either side.
 * The place and rate are invented; the check values come from the published formulas below.
 */

/**
 * Cornell, Banon & Shakal (1979) as quoted in Baker (2008), "An introduction to probabilistic
 * seismic hazard analysis", white paper v1.3: ln PGA = -0.152 + 0.859 M - 1.803 ln(R + 25),
 * sigma 0.57, R hypocentral in km (from memory, as in api/engine/motion/cornell79.ts).
 */
export const CORNELL79 = {
  c0: -0.152,
  cM: 0.859,
  cLnR: -1.803,
  offsetKm: 25,
  sigma: 0.57,
} as const;

export const MAGNITUDE = 6.5;
export const DEPTH_KM = 10;
/** Annual rate of the one earthquake (invented). */
export const RATE_PER_YEAR = 0.01;

/** Median PGA (g) at the community: R = the source depth, the source being straight below. */
export const MEDIAN_PGA_G = Math.exp(
  CORNELL79.c0 +
    CORNELL79.cM * MAGNITUDE +
    CORNELL79.cLnR * Math.log(DEPTH_KM + CORNELL79.offsetKm),
);

/** Curve levels at epsilon = -1, 0, +1. */
export const LEVELS_G = [
  MEDIAN_PGA_G * Math.exp(-CORNELL79.sigma),
  MEDIAN_PGA_G,
  MEDIAN_PGA_G * Math.exp(CORNELL79.sigma),
];

export const COMMUNITY = {
  id: 'test-cove',
  name: 'Test Cove',
  lon: -140.2,
  lat: -47.4,
  vs30: 500,
  population: 120,
  coastal: true,
  elevationM: 4,
};

export function smallStudy(name = 'Small test study'): Record<string, unknown> {
  return {
    name,
    communities: [{ ...COMMUNITY }],
    sources: {
      type: 'FeatureCollection',
      features: [
        {
          type: 'Feature',
          geometry: { type: 'Point', coordinates: [COMMUNITY.lon, COMMUNITY.lat] },
          properties: {
            id: 'spot-below',
            name: 'Spot below',
            setting: 'crustal',
            mechanism: 'strike-slip',
            depthKm: DEPTH_KM,
            recurrence: { type: 'fixed', magnitude: MAGNITUDE, rate: RATE_PER_YEAR },
          },
        },
      ],
    },
    groundMotion: { crustal: [{ model: 'Cornell79', weight: 1 }] },
    settings: {
      measures: ['PGA'],
      levels: { PGA: LEVELS_G },
      horizonsYears: [50],
      returnPeriodsYears: [475],
      truncationSigma: 3,
    },
  };
}

/**
 * Upper-tail probabilities of the standard normal, Q(x) = 1 - Phi(x), with Phi(1) =
 * 0.8413447461 and Phi(3) = 0.9986501020 (Abramowitz & Stegun 1964, Table 26.1).
 */
const Q1 = 1 - 0.8413447461;
const Q3 = 1 - 0.998650102;

/**
 * P(PGA > level | the earthquake) at epsilon -1, 0, +1 for a normal truncated at +-3 sigma and
 * renormalised (the truncation of api/engine/hazard/truncated-exceedance.ts; classical PSHA as
 * in Baker 2008): (Q(e) - Q(3)) / (1 - 2 Q(3)), Q(-1) = 1 - Q(1), Q(0) = 1/2.
 */
export const EXCEEDANCE_AT_LEVELS = [
  (1 - Q1 - Q3) / (1 - 2 * Q3),
  (0.5 - Q3) / (1 - 2 * Q3),
  (Q1 - Q3) / (1 - 2 * Q3),
];

/** Poisson probability of at least one exceedance in `years` (Baker 2008, eq. for the Poisson model). */
export const poissonChance = (annualRate: number, years: number): number =>
  1 - Math.exp(-annualRate * years);

/** A communities CSV (DESIGN.md section 2 header) with two invented villages. */
export const COMMUNITIES_CSV = [
  'id,name,lon,lat,vs30,siteClass,population,coastal,elevationM',
  'test-cove,Test Cove,-140.2,-47.4,500,,120,true,4',
  'far-ridge,Far Ridge,-140.5,-47.6,,C,45,false,210',
].join('\n');

/** A sources FeatureCollection: the same point source and a small zone, all invented. */
export function sourcesCollection(): Record<string, unknown> {
  const study = smallStudy();
  const features = (study.sources as { features: unknown[] }).features;
  return {
    type: 'FeatureCollection',
    features: [
      ...features,
      {
        type: 'Feature',
        geometry: { type: 'Point', coordinates: [-140.6, -47.7] },
        properties: {
          id: 'spot-west',
          setting: 'crustal',
          mechanism: 'reverse',
          depthKm: 12,
          recurrence: { type: 'fixed', magnitude: 6.0, rate: 0.002 },
        },
      },
    ],
  };
}

import { describe, expect, test } from 'vitest';
import type { Community, Study } from '../../../api/engine/model.ts';
import type { CommunityResult, StudyResult } from '../../../api/engine/results.ts';
import { leadHorizonYears, rankCommunities, sortRanked } from '../../../web/data/ranking.ts';

// The ranking rule is ours (web/data/ranking.ts): band, then chance of MMI VII+ in the lead
// horizon, then people, then name. Fixtures are hand-written and invented; no computation is checked.

const community = (id: string, population?: number): Community => ({
  id,
  name: id.toUpperCase(),
  lon: -140,
  lat: -47,
  vs30: 500,
  vs30Basis: 'measured',
  coastal: false,
  ...(population === undefined ? {} : { population }),
});

const result = (id: string, band: string, vii: number, faultKm?: number): CommunityResult => ({
  communityId: id,
  name: id.toUpperCase(),
  curves: {},
  atReturnPeriod: {},
  returnPeriodStatus: {},
  chanceOfExceeding: {},
  intensity: {
    atReturnPeriod: {},
    chanceOfReaching: { '50': { VI: vii * 2, VII: vii, VIII: vii / 2 } },
  },
  deaggregation: {},
  nearestFaults:
    faultKm === undefined
      ? []
      : [{ sourceId: 'f', name: 'F', distanceKm: faultKm, bearingDeg: 0, rrupKm: faultKm }],
  band: { id: band, label: band, mmi475: null },
  warnings: [],
});

const study = (communities: Community[]): Study => ({
  name: 'Ranking fixture',
  communities,
  sources: [],
  groundMotion: { crustal: [], interface: [], intraslab: [] },
  settings: {
    measures: ['PGA'],
    levels: {},
    horizonsYears: [1, 30, 50],
    returnPeriodsYears: [475],
    truncationSigma: 3,
    maxDistanceKm: 300,
    magnitudeStep: 0.1,
    ruptureSpacingKm: 1,
    zoneCellKm: 5,
  },
});

const results = (communities: CommunityResult[]): StudyResult => ({
  studyName: 'Ranking fixture',
  communities,
  warnings: [],
  provenance: {
    tool: 'tremora',
    toolVersion: '0',
    inputHash: '0',
    models: {},
    settings: {},
    startedAt: '',
    finishedAt: '',
  },
});

const s = study([
  community('a', 100),
  community('b', 2000),
  community('c'),
  community('d', 50),
  community('e', 50),
]);
const r = results([
  result('a', 'inform', 0.01, 40),
  result('b', 'refer-soon', 0.2, 5),
  result('c', 'refer-first', 0.1),
  result('d', 'refer-soon', 0.2, 12),
  result('e', 'refer-soon', 0.3, 0),
]);

describe('ranking for outreach and referral', () => {
  test('band first, then chance, then people', () => {
    expect(rankCommunities(s, r).map((x) => `${x.rank}:${x.communityId}`)).toEqual([
      '1:c',
      '2:e',
      '3:b',
      '4:d',
      '5:a',
    ]);
  });

  test('the lead horizon is 50 years when computed, else the longest', () => {
    expect(leadHorizonYears([1, 30, 50])).toBe(50);
    expect(leadHorizonYears([10, 30])).toBe(30);
  });

  test('sorting by a column keeps the ranking order on ties; missing values go last', () => {
    const ranked = rankCommunities(s, r);
    expect(sortRanked(ranked, 'people', 'descending').map((x) => x.communityId)).toEqual([
      'b',
      'a',
      'e',
      'd',
      'c',
    ]);
    expect(sortRanked(ranked, 'people', 'ascending').map((x) => x.communityId)).toEqual([
      'e',
      'd',
      'a',
      'b',
      'c',
    ]);
    expect(sortRanked(ranked, 'fault', 'ascending').map((x) => x.communityId)).toEqual([
      'e',
      'b',
      'd',
      'a',
      'c',
    ]);
    expect(sortRanked(ranked, 'chance', 'ascending').map((x) => x.communityId)).toEqual([
      'a',
      'c',
      'b',
      'd',
      'e',
    ]);
    expect(sortRanked(ranked, 'name', 'descending').map((x) => x.communityId)).toEqual([
      'e',
      'd',
      'c',
      'b',
      'a',
    ]);
    expect(sortRanked(ranked, 'band', 'descending').map((x) => x.communityId)).toEqual([
      'a',
      'e',
      'b',
      'd',
      'c',
    ]);
  });
});

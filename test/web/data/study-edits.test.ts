import { describe, expect, test } from 'vitest';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import {
  communityFromForm,
  importCommunitiesCsv,
  importSourcesGeoJson,
  issueFeature,
  issueField,
  issueLine,
  saveCommunity,
} from '../../../web/data/study-edits.ts';
import { smallStudy } from '../../service/helpers/small-study.ts';
import { loadStudy } from '../../../api/study/load-study.ts';

const form = {
  id: ' new-spot ',
  name: 'New Spot',
  lon: '-140,3',
  lat: '-47.5',
  vs30: '',
  siteClass: 'C',
  population: '12',
  elevationM: 'high',
  coastal: true,
};

const inputsOf = (raw: Record<string, unknown>) => ({ document: JSON.stringify(raw), raw });
/** What an import (a communities CSV or a sources GeoJSON) of `text` into the small study gives. */
const importedIntoSmallStudy = (importer: typeof importCommunitiesCsv, text: string) =>
  importer(inputsOf(smallStudy()), text, modelCatalog);
const communitiesOf = (raw: Record<string, unknown>) => {
  const loaded = loadStudy(raw, { models: modelCatalog });
  if (!loaded.ok) throw new Error('fixture study does not load');
  return loaded.study.communities;
};

describe('study edits', () => {
  test('a form becomes document JSON: trimmed, numbers as numbers, text kept for the schema to name', () => {
    expect(communityFromForm(form)).toEqual({
      id: 'new-spot',
      name: 'New Spot',
      lon: -140.3,
      lat: -47.5,
      siteClass: 'C',
      population: 12,
      elevationM: 'high',
      coastal: true,
    });
  });

  test('a bad field comes back with its path, and nothing is returned to save', () => {
    const raw = smallStudy();
    const outcome = saveCommunity(inputsOf(raw), communitiesOf(raw), form, undefined, modelCatalog);
    expect(outcome.ok).toBe(false);
    expect(outcome.index).toBe(1);
    if (!outcome.ok)
      expect(outcome.issues.map((i) => i.path)).toEqual(['communities[1].elevationM']);
  });

  test('a good community is appended and the document validates', () => {
    const raw = smallStudy();
    const outcome = saveCommunity(
      inputsOf(raw),
      communitiesOf(raw),
      { ...form, elevationM: '12' },
      undefined,
      modelCatalog,
    );
    expect(outcome.ok).toBe(true);
    if (outcome.ok) expect((outcome.document.communities as unknown[]).length).toBe(2);
  });

  test('a CSV with a bad line names the line; a good one is kept as the study file', () => {
    const bad = importedIntoSmallStudy(
      importCommunitiesCsv,
      'id,name,lon,lat,vs30\ncove,Cove,-140.2,-47.4,500\nreef,Reef,-140.3,-95,500\n',
    );
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues.map((i) => i.path)).toEqual(['communities[line 3].lat']);
    const good = importedIntoSmallStudy(
      importCommunitiesCsv,
      'id,name,lon,lat,vs30\ncove,Cove,-140.2,-47.4,500\n',
    );
    expect(good.ok && good.file?.kind).toBe('communities-csv');
  });

  test('malformed GeoJSON is one issue at "sources"', () => {
    const outcome = importedIntoSmallStudy(
      importSourcesGeoJson,
      '{\n  "type": "FeatureCollection",\n  "features": [,]\n}',
    );
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) {
      expect(outcome.issues).toHaveLength(1);
      expect(outcome.issues[0]?.path).toBe('sources');
      expect(outcome.issues[0]?.message).toMatch(/^expected valid JSON/);
    }
  });

  test('issue paths: CSV line, feature index and community field', () => {
    expect(issueLine('communities[line 5].lat')).toBe(5);
    expect(issueLine('communities[2].lat')).toBeUndefined();
    expect(issueFeature('sources.features[3].properties.dip')).toBe(3);
    expect(issueField('communities[2].lat', 2)).toBe('lat');
    expect(issueField('communities[2]', 2)).toBe('(row)');
    expect(issueField('communities[12].lat', 1)).toBeUndefined();
  });
});

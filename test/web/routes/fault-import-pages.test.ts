import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { smallStudy } from '../../service/helpers/small-study.ts';
import { faultGeoJson, faultShapefileZip } from '../../study/fault-files/fixtures.ts';
import { saveStudy } from '../../service/helpers/saved-study.ts';
import { startPageApp, type PageApp } from '../helpers/page-app.ts';

/**
 * Faults from a regional file in the editor (app.request): the file is shown with its guessed
 * mapping and its problems before anything is saved; a refused save leaves the study as it was;
 * a valid one adds the faults beside the study's own source. The fixture faults
 * (test/study/fault-files/fixtures.ts) lie east of the demo coast, so the small study's community
 * and point source are moved beside them.
 */
let page: PageApp;
let studyId: string;

beforeAll(() => {
  page = startPageApp();
  const study = smallStudy('Fault import fixture') as {
    communities: { lon: number; lat: number }[];
    sources: { features: { geometry: { coordinates: number[] } }[] };
  };
  Object.assign(study.communities[0] as object, { lon: -150, lat: -47.4 });
  (study.sources.features[0] as { geometry: { coordinates: number[] } }).geometry.coordinates = [
    -150, -47.4,
  ];
  studyId = saveStudy(page.ctx.store, study);
});
afterAll(async () => page.close());

const path = () => `/studies/${studyId}/edit/import-faults`;
const document = () => page.ctx.store.studies.get(studyId)?.document;

const upload = (name: string, bytes: Uint8Array | string) => {
  const form = new FormData();
  form.set('file', new File([bytes], name));
  return page.app.request(path(), { method: 'POST', body: form });
};

/** The choice form posted again with the file carried, the guessed mapping and `defaults`. */
const carry = (bytes: Uint8Array | string, fields: Record<string, string>) => {
  const form = new FormData();
  const data = typeof bytes === 'string' ? Buffer.from(bytes) : Buffer.from(bytes);
  form.set('fileName', 'faults.geojson');
  form.set('fileData', data.toString('base64'));
  form.set('mapped', '1');
  const mapping = {
    'map.name': 'FAULT_NAME',
    'map.slipRateMmYr': 'SLIP_RATE',
    'map.dip': 'DIP',
    'map.dipDirection': 'DIP_DIR',
    'map.rake': 'RAKE',
    'map.lowerDepthKm': 'LSD',
  };
  const defaults = {
    'default.setting': 'crustal',
    'default.upperDepthKm': '0',
    'default.bValue': '1',
    'default.mMin': '5',
  };
  for (const [k, v] of Object.entries({ ...mapping, ...defaults, ...fields })) form.set(k, v);
  return page.app.request(path(), { method: 'POST', body: form });
};

describe('faults from a regional file in the editor', () => {
  test('a shapefile is shown with its guessed mapping, and nothing is saved', async () => {
    const before = document();
    const response = await upload('faults.zip', faultShapefileZip());
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain('faults.zip: 2 faults read. Nothing is saved yet.');
    expect(html).toMatch(
      /<select id="map-slipRateMmYr"[^>]*>.*<option value="SLIP_RATE" selected/s,
    );
    expect(html).toMatch(/<select id="map-upperDepthKm"[^>]*><option value="" selected/s);
    // Without a largest magnitude every fault lacks its recurrence: said beside the default.
    expect(html).toMatch(/id="default-mMax-problem"[^>]*>.*expected a number in \[0, 10\]/s);
    expect(document()).toBe(before);
  });

  test('a bad value is listed by feature and field, and a save is refused with nothing written', async () => {
    const before = document();
    const bytes = faultGeoJson([{ DIP: 95 }, {}]);
    const response = await carry(bytes, { 'default.mMax': '7', step: 'save' });
    expect(response.status).toBe(422);
    const html = await response.text();
    expect(html).toContain('1 values to fix before the faults can be added');
    expect(html).toMatch(
      /<tr data-feature="1" data-field="dip">.*Kessin Ridge fault.*DIP.*expected a number in \(0, 90\] degrees, got 95/s,
    );
    expect(document()).toBe(before);
  });

  test('a valid file is added beside the study’s own source', async () => {
    const response = await carry(faultGeoJson(), { 'default.mMax': '7', step: 'save' });
    expect(response.status).toBe(303);
    const ids = (
      JSON.parse(document() ?? '{}') as { sources: { features: { properties: { id: string } }[] } }
    ).sources.features.map((f) => f.properties.id);
    expect(ids).toEqual(['spot-below', 'kessin-ridge-fault', 'marrow-flats-fault']);
  });

  test('a file that is not a fault file is named, with what was expected', async () => {
    const response = await upload(
      'faults.kml',
      '<kml xmlns="http://www.opengis.net/kml/2.2"><Document/></kml>',
    );
    expect(response.status).toBe(422);
    expect(await response.text()).toContain(
      'faults.kml: expected KML with at least one Placemark (one line per fault), found none',
    );
  });
});

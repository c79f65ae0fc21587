import { mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCapturing as run } from './helpers/run-cli.ts';
import { faultGeoJson, faultShapefileZip } from '../study/fault-files/fixtures.ts';

const TINY = new URL('./fixtures/tiny.study.json', import.meta.url).pathname;

/**
 * The tiny test study with its community moved beside the fixture faults (test/study/fault-files/
 * fixtures.ts), and a fault file written beside it.
 */
async function studyAndFaults(
  fileName: string,
  content: Uint8Array | string,
): Promise<{ study: string; faults: string; before: string }> {
  const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-faults-'));
  const study = JSON.parse(await readFile(TINY, 'utf8'));
  Object.assign(study.communities[0], { lon: -150, lat: -47.4 });
  study.sources.features[0].geometry.coordinates = [-150, -47.4];
  const before = JSON.stringify(study);
  await writeFile(join(dir, 'study.json'), before);
  await writeFile(join(dir, fileName), content);
  return { study: join(dir, 'study.json'), faults: join(dir, fileName), before };
}

describe('tremora import-faults', () => {
  it('adds the faults of a zipped shapefile to the sources the study has, mapping guessed', async () => {
    const { study, faults } = await studyAndFaults('faults.zip', faultShapefileZip());
    const { code, out, err } = await run('import-faults', study, faults, '--m-max', '7');
    expect(err).toContain(
      'mapping: id=(none), name=FAULT_NAME, slipRateMmYr=SLIP_RATE, dip=DIP, dipDirection=DIP_DIR, rake=RAKE, upperDepthKm=(none), lowerDepthKm=LSD',
    );
    expect(code).toBe(0);
    expect(out).toContain('added 2 faults; 3 sources in all');
    const saved = JSON.parse(await readFile(study, 'utf8'));
    expect(
      saved.sources.features.map((f: { properties: { id: string } }) => f.properties.id),
    ).toEqual(['below', 'kessin-ridge-fault', 'marrow-flats-fault']);
    expect((await run('check', study)).code).toBe(0);
  });

  it('takes --map for attributes it does not recognise and defaults for what the file lacks', async () => {
    const text = faultGeoJson([{ SLIPMM: 1.5 }, { SLIPMM: 0.4 }]).replaceAll('"SLIP_RATE"', '"X"');
    const { study, faults } = await studyAndFaults('faults.geojson', text);
    const { code } = await run(
      'import-faults',
      study,
      faults,
      '--map',
      'slipRateMmYr=SLIPMM',
      '--upper-depth',
      '2',
      '--m-max',
      '7.2',
      '--setting',
      'crustal',
    );
    expect(code).toBe(0);
    const saved = JSON.parse(await readFile(study, 'utf8'));
    expect(saved.sources.features[1].properties).toMatchObject({
      upperDepthKm: 2,
      recurrence: { slipRateMmYr: 1.5, mMax: 7.2 },
    });
  });

  it('lists every bad value by feature and field and writes nothing', async () => {
    const { study, faults, before } = await studyAndFaults(
      'faults.geojson',
      faultGeoJson([{ DIP: 0 }, { LSD: null }]),
    );
    const { code, err } = await run('import-faults', study, faults, '--m-max', '7');
    expect(code).toBe(2);
    expect(err).toContain('nothing written; 2 problems:');
    expect(err).toContain(
      '  feature 1 (Kessin Ridge fault) dip [DIP]: expected a number in (0, 90] degrees, got 0',
    );
    expect(err).toContain(
      '  feature 2 (Marrow Flats fault) lowerDepthKm: missing: "LSD" is empty and there is no default',
    );
    expect(await readFile(study, 'utf8')).toBe(before);
  });

  it('writes nothing when the whole study refuses a fault (an id the study has)', async () => {
    const { study, faults, before } = await studyAndFaults(
      'faults.geojson',
      faultGeoJson([{ ID: 'below' }, { ID: 'second' }]),
    );
    const { code, err } = await run('import-faults', study, faults, '--m-max', '7');
    expect(code).toBe(2);
    expect(err).toMatch(/feature 1 \(Kessin Ridge fault\) id: duplicate id "below"/);
    expect(await readFile(study, 'utf8')).toBe(before);
  });

  it('names the fields --map accepts', async () => {
    const { study, faults } = await studyAndFaults('faults.geojson', faultGeoJson());
    const { code, err } = await run('import-faults', study, faults, '--map', 'slip=SLIP_RATE');
    expect(code).toBe(2);
    expect(err).toContain(
      '--map: expected FIELD=ATTRIBUTE with FIELD one of id, name, slipRateMmYr, dip, dipDirection, rake, upperDepthKm, lowerDepthKm, got "slip=SLIP_RATE"',
    );
  });
});

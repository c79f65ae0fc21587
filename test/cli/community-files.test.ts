import { mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCapturing as run } from './helpers/run-cli.ts';
import { kmlText, xlsxBytes } from '../study/community-files/fixtures.ts';

const DEMO = new URL('../../data-demo/demo.study.json', import.meta.url).pathname;

/** The demo study with `communities` naming `fileName`, written with that file beside it. */
async function studyWith(fileName: string, content: Uint8Array | string): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'tremora-cli-files-'));
  const study = JSON.parse(await readFile(DEMO, 'utf8'));
  study.communities = fileName;
  await writeFile(join(dir, 'study.json'), JSON.stringify(study));
  await writeFile(join(dir, fileName), content);
  return join(dir, 'study.json');
}

describe('tremora check with a communities file in another format', () => {
  it('reads an XLSX workbook named by the study', async () => {
    const path = await studyWith(
      'villages.xlsx',
      xlsxBytes([
        ['Village', 'Latitude', 'Longitude', 'Site class', 'School'],
        ['North Cove', -47.25, -140.5, 'D', 'primary'],
        ['Ridge Camp', -47.5, -140.75, 'C', null],
      ]),
    );
    const { code, out, err } = await run('check', path);
    // Warnings may name the default ground-motion branches; nothing may concern the communities.
    expect(err).not.toMatch(/communit/i);
    expect(code).toBe(0);
    expect(out).toContain('2 communities');
  });

  it('reads KML placemarks named by the study', async () => {
    const path = await studyWith(
      'villages.kml',
      kmlText([{ name: 'North Cove', data: { vs30: '400' }, point: [-140.5, -47.25] }]),
    );
    const { code, out } = await run('check', path);
    expect(code).toBe(0);
    expect(out).toContain('1 communities');
  });

  it('says which names it accepts for a column it cannot recognise, and exits 2', async () => {
    const path = await studyWith(
      'villages.csv',
      'Village;Breite;Lon;Vs30\nNorth Cove;-47,25;-140,5;400\n',
    );
    const { code, err } = await run('check', path);
    expect(code).toBe(2);
    expect(err).toContain(
      'no column recognised for latitude (degrees north), accepted as lat, latitude, y, lat dd, latitude dd, latitude deg (any case); the file\'s columns are "Village", "Breite", "Lon", "Vs30"',
    );
  });

  it('names the file and what was expected when it cannot be read at all', async () => {
    const path = await studyWith('villages.kml', kmlText([]));
    const { code, err } = await run('check', path);
    expect(code).toBe(2);
    expect(err).toContain(
      'communities: villages.kml: expected KML with at least one Placemark (one point per community), found none',
    );
  });
});

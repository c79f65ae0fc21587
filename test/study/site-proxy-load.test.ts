import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { createElevationGrid } from '../../api/engine/terrain/elevation-grid.ts';
import { siteProxy } from '../../api/engine/terrain/site-proxy.ts';
import { loadStudy } from '../../api/study/load-study.ts';
import { readCommunitiesCsv } from '../../api/study/communities-csv.ts';
import { readStudyFile } from '../../api/study/read-study-file.ts';
import { expectRelative } from '../helpers/close.ts';
import { testCatalog } from '../helpers/test-catalog.ts';
import { validStudy } from './fixtures.ts';

/**
 * A project-made terrain grid over the fixture study: 0.01° cells from 141° W to 139° W and
 * 46.5° S to 48° S, land rising 1,000 m per degree of longitude eastwards from 50 m at the west
 * edge, and sea (−100 m) south of 47.9° S.
 */
function rampGrid() {
  const cell = 0.01;
  const columns = 200;
  const rows = 150;
  const values: number[] = [];
  for (let r = 0; r < rows; r += 1) {
    const lat = -46.5 - (r + 0.5) * cell;
    for (let c = 0; c < columns; c += 1)
      values.push(lat < -47.9 ? -100 : 50 + 1000 * (c + 0.5) * cell);
  }
  return createElevationGrid({
    label: 'ramp.asc',
    crs: { kind: 'lonlat' },
    columns,
    rows,
    west: -141,
    north: -46.5,
    cellWidth: cell,
    cellHeight: cell,
    elevationM: values,
  });
}

const withoutSite = () => {
  const doc = validStudy() as { communities: Record<string, unknown>[] };
  const { vs30: _, ...bare } = doc.communities[0] as Record<string, unknown>;
  return { ...doc, communities: [bare, doc.communities[1]] };
};

describe('communities without vs30 or site class', () => {
  it('take the slope proxy where the study has a terrain grid', () => {
    const result = loadStudy(withoutSite(), {
      models: testCatalog,
      siteProxy: siteProxy(rampGrid()),
    });
    if (!result.ok) throw new Error(JSON.stringify(result.issues));
    const [bare, classed] = result.study.communities;
    // 1,000 m per degree of longitude at 47.2° S: 1000 / (111,195 m × cos 47.2°) = 0.01325 m/m,
    // in the 0.0063–0.018 row of Wald & Allen (2007) Table 1 (active regions, from memory):
    // 300 × (360/300)^(ln(0.01325/0.0063)/ln(0.018/0.0063)) m/s by log–log interpolation.
    const slope = 1000 / (((6_371_008.8 * Math.PI) / 180) * Math.cos((47.2 * Math.PI) / 180));
    const f = Math.log(slope / 0.0063) / Math.log(0.018 / 0.0063);
    expect(bare?.vs30Basis).toBe('slope-proxy');
    expect(bare?.vs30Proxy?.siteClass).toBe('D');
    expect(bare?.vs30Proxy?.vs30Range).toEqual([180, 360]);
    expectRelative(bare?.vs30 ?? 0, 300 * (360 / 300) ** f, 1e-4, 'Wald & Allen (2007) Table 1');
    // A community with a site class keeps it.
    expect(classed).toMatchObject({ vs30: 530, vs30Basis: 'site-class' });
  });

  it('are refused without a grid, or where the grid gives no slope', () => {
    const none = loadStudy(withoutSite(), { models: testCatalog });
    expect(none.ok).toBe(false);
    if (!none.ok) expect(none.issues[0]?.message).toMatch(/terrain grid/);
    const doc = withoutSite();
    (doc.communities[0] as Record<string, unknown>).lat = -47.95;
    const atSea = loadStudy(doc, { models: testCatalog, siteProxy: siteProxy(rampGrid()) });
    expect(atSea.ok).toBe(false);
    if (!atSea.ok) expect(atSea.issues[0]).toMatchObject({ path: 'communities[0].vs30' });
  });

  it('in a file, need no vs30 column when the grid is there', () => {
    const csv = 'name,lat,lon\nUpper Camp,-47.2,-140.1\n';
    const read = readCommunitiesCsv(
      csv,
      ['communities'],
      undefined,
      'camps.csv',
      siteProxy(rampGrid()),
    );
    expect(read.issues.issues).toEqual([]);
    expect(read.communities[0]?.vs30Basis).toBe('slope-proxy');
  });
});

describe('readStudyFile with a terrain grid beside the study', () => {
  // Project-made files in a temporary folder: an ESRI ASCII grid of 0.01° cells over the fixture
  // study, land rising 1,000 m per degree of longitude eastwards, and the fixture study naming it
  // with its first community's vs30 removed.
  const dirs: string[] = [];
  afterAll(() => Promise.all(dirs.map((d) => rm(d, { recursive: true, force: true }))));
  async function studyBeside(terrainText: string | undefined): Promise<string> {
    const dir = await mkdtemp(join(tmpdir(), 'tremora-proxy-'));
    dirs.push(dir);
    if (terrainText !== undefined) await writeFile(join(dir, 'ramp.asc'), terrainText);
    const path = join(dir, 'proxy.study.json');
    await writeFile(path, JSON.stringify({ ...withoutSite(), terrain: 'ramp.asc' }));
    return path;
  }
  const asc = () => {
    const grid = rampGrid();
    const rows: string[] = [];
    for (let r = 0; r < grid.rows; r += 1)
      rows.push(
        Array.from(grid.elevationM.subarray(r * grid.columns, (r + 1) * grid.columns)).join(' '),
      );
    return `ncols ${grid.columns}\nnrows ${grid.rows}\nxllcorner -141\nyllcorner -48\ncellsize 0.01\nNODATA_value -9999\n${rows.join('\n')}\n`;
  };

  it('reads the grid and gives the community without a site the proxy', async () => {
    const result = await readStudyFile(await studyBeside(asc()), testCatalog);
    if (!result.ok) throw new Error(JSON.stringify(result.issues));
    expect(result.study.communities[0]?.vs30Basis).toBe('slope-proxy');
  });

  it('names the missing grid when a community needed it', async () => {
    const result = await readStudyFile(await studyBeside(undefined), testCatalog);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((i) => i.path)).toContain('terrain');
  });
});

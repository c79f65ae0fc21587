import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCli } from '../api/cli.ts';
import { readStudyFile } from '../api/study/read-study-file.ts';
import { modelCatalog } from '../api/engine/motion/registry.ts';
import { screenStudy } from '../api/engine/screen-study.ts';
import { SCREENING_BANDS } from '../api/engine/intensity/screening-band.ts';
import { mmiRoman } from '../api/engine/intensity/mmi-roman.ts';

/** The README's tables, kept true to the code (STYLE.md: README tables kept true by a test). */
const README = readFileSync(new URL('../README.md', import.meta.url), 'utf8');

/** The first cell of each row of the table under `heading` (backticks and anything after a space or bracket dropped). */
function firstCells(heading: string): string[] {
  const start = README.indexOf(`\n## ${heading}\n`);
  expect(start, `README has a "## ${heading}" section`).toBeGreaterThan(-1);
  const section = README.slice(start + 1).split('\n## ')[0] as string;
  return section
    .split('\n')
    .filter((line) => line.startsWith('| `'))
    .map((line) => (/^\| `([^`]+)`/.exec(line)?.[1] ?? '').split(/[\s[(]/)[0] as string);
}

describe('README', () => {
  it('lists every result key of a community, as the engine gives them', async () => {
    const loaded = await readStudyFile(
      new URL('cli/fixtures/tiny.study.json', import.meta.url).pathname,
      modelCatalog,
    );
    if (!loaded.ok) throw new Error('the tiny study should load');
    const [community] = screenStudy(loaded.study, { models: modelCatalog }).communities;
    // communityId and name identify the row; returnPeriodStatus is explained in the atReturnPeriod row.
    const keys = Object.keys(community ?? {}).filter(
      (k) => !['communityId', 'name', 'returnPeriodStatus'].includes(k),
    );
    expect(firstCells('Results').sort()).toEqual(keys.sort());
    expect(README).toContain('returnPeriodStatus');
  });

  it('lists exactly the CLI verbs', async () => {
    let out = '';
    await runCli(['--help'], { out: (t) => (out += t), err: () => undefined });
    const verbs = [...out.matchAll(/^ {2}tremora (\S+)/gm)].map((m) => m[1]);
    const readmeVerbs = [
      ...README.split('## The command line')[1]!
        .split('\n## ')[0]!
        .matchAll(/^\| `tremora (\S+)/gm),
    ].map((m) => m[1]);
    expect(verbs.length).toBeGreaterThan(0);
    expect([...new Set(readmeVerbs)].sort()).toEqual([...new Set(verbs)].sort());
  });

  it('states the screening band thresholds the code uses', () => {
    const lowest = Math.min(...SCREENING_BANDS.map((b) => b.minMmi).filter(Number.isFinite));
    for (const band of SCREENING_BANDS) {
      const row = README.split('\n').find((line) => line.startsWith(`| ${band.label} |`));
      expect(row, `a README row for ${band.label}`).toBeDefined();
      const from = Number.isFinite(band.minMmi)
        ? `${mmiRoman(band.minMmi)} `
        : `below ${mmiRoman(lowest)} `;
      const rest = (row ?? '').slice(`| ${band.label} |`.length).trimStart();
      expect(rest.startsWith(from), `${row} gives ${from}`).toBe(true);
    }
  });
});

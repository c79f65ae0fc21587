import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../api/cli.ts';
import type { Io } from '../../api/cli/output.ts';
import { FIT_CATALOG_CSV } from '../helpers/catalog-fixtures.ts';

/** `tremora catalog fit --convert`: the fixture catalog has one ML 4.7 event among moment magnitudes. */
const dir = mkdtempSync(join(tmpdir(), 'tremora-convert-'));
const fitCsv = join(dir, 'fit.csv');
writeFileSync(fitCsv, FIT_CATALOG_CSV);

async function run(...argv: string[]): Promise<{ code: number; out: string[]; err: string[] }> {
  const out: string[] = [];
  const err: string[] = [];
  const io: Io = { out: (t) => out.push(...t.split('\n')), err: (t) => err.push(...t.split('\n')) };
  const code = await runCli(argv, io);
  return { code, out, err };
}

describe('tremora catalog fit --convert', () => {
  it('by default leaves the ML event out and says so', async () => {
    const { code, out } = await run('catalog', 'fit', fitCsv);
    expect(code).toBe(0);
    expect(out[1]).toBe('Magnitudes: moment magnitudes only (1 event of other types left out)');
    expect(out.join('\n')).not.toContain('Converted to Mw');
  });

  it('converts the ML event by the chosen relation, citing it, and no event is left out', async () => {
    const { code, out } = await run('catalog', 'fit', fitCsv, '--convert', 'grunthal2009-ml');
    expect(code).toBe(0);
    expect(out[1]).toBe('Magnitudes: moment magnitudes only');
    expect(out[2]).toMatch(
      /^Converted to Mw: 1 ML event by Grünthal, Wahlström & Stromeyer \(2009\), .*Mw = 0\.53 \+ 0\.646 ML \+ 0\.0376 ML² \(from memory\)/,
    );
  });

  it('refuses an unknown relation, naming the known ones', async () => {
    const { code, err } = await run('catalog', 'fit', fitCsv, '--convert', 'ml-guess');
    expect(code).toBe(2);
    expect(err.join('\n')).toContain(
      '--convert: expected relation ids among scordilis2006-ms, scordilis2006-mb, grunthal2009-ml; got "ml-guess"',
    );
  });
});

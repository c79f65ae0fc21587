import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { TECTONIC_SETTINGS } from '../api/engine/model.ts';
import { modelCatalog } from '../api/engine/motion/registry.ts';

// The README's model table and default logic tree against the registry (a documentation
// check, not a scientific one).
const readme = readFileSync(new URL('../README.md', import.meta.url), 'utf8');
const section = readme.slice(readme.indexOf('### Ground-motion models'));
const rows = (heading: string): string[][] => {
  const start = section.indexOf(heading);
  const lines = section.slice(start).split('\n').slice(2);
  const table: string[][] = [];
  for (const line of lines) {
    if (!line.startsWith('|')) break;
    if (line.startsWith('|---')) continue;
    table.push(
      line
        .split('|')
        .slice(1, -1)
        .map((cell) => cell.trim()),
    );
  }
  return table;
};

describe('README ground-motion models', () => {
  it('lists exactly the models a study may name, with the settings each model takes', () => {
    const table = rows('| model | paper |');
    expect(table.map((r) => r[0]!.replaceAll('`', ''))).toEqual([...modelCatalog.names]);
    for (const row of table) {
      const model = modelCatalog.get(row[0]!.replaceAll('`', ''));
      expect(row[2]!.split(', ').sort(), model.name).toEqual([...model.settings].sort());
    }
  });

  it('states the default branches and weights the registry uses', () => {
    const table = rows('| setting | branches (weight) |');
    expect(table.map((r) => r[0])).toEqual([...TECTONIC_SETTINGS]);
    for (const [setting, branches] of table) {
      const stated = branches!.split(', ').map((b) => {
        const [, model, weight] = /^`([^`]+)` ([\d.]+)$/.exec(b)!;
        return { model, weight: Number(weight) };
      });
      expect(stated, setting).toEqual(
        modelCatalog.defaultBranches[setting as (typeof TECTONIC_SETTINGS)[number]].map((b) => ({
          model: b.model,
          weight: b.weight,
        })),
      );
    }
  });
});

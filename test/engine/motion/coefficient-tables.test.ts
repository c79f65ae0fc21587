import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { AGA16_COLUMNS, AGA16_TABLE } from '../../../api/engine/motion/aga16-coefficients.ts';
import { aga16 } from '../../../api/engine/motion/aga16.ts';
import { ASK14_COLUMNS, ASK14_TABLE } from '../../../api/engine/motion/ask14-coefficients.ts';
import { ask14 } from '../../../api/engine/motion/ask14.ts';
import { BSSA14_COLUMNS, BSSA14_TABLE } from '../../../api/engine/motion/bssa14-coefficients.ts';
import { bssa14 } from '../../../api/engine/motion/bssa14.ts';
import { CB14_COLUMNS, CB14_TABLE } from '../../../api/engine/motion/cb14-coefficients.ts';
import { cb14 } from '../../../api/engine/motion/cb14.ts';
import { CY14_COLUMNS, CY14_TABLE } from '../../../api/engine/motion/cy14-coefficients.ts';
import { cy14 } from '../../../api/engine/motion/cy14.ts';
import { ZHAO06_COLUMNS, ZHAO06_TABLE } from '../../../api/engine/motion/zhao06-coefficients.ts';
import { zhao06 } from '../../../api/engine/motion/zhao06.ts';

// The shape of each published table as read from its data file (api/engine/motion/<model>.json):
// the rows (PGV −1, PGA 0, then the spectral periods) and columns of the paper's table, as
// counted in the shared reference README (../shared/reference/gmm/README.md, "The coefficient
// tables"), every cell finite, the model offering exactly the table's spectral periods. The
// file's column names are the reference record's (its spelling of the paper's symbols), which the
// reader maps in order onto the model's fields. The numbers themselves are checked through the
// models against the independent reference vectors (<model>.vectors.test.ts and the models'
// tests), never against the table itself.
const TABLES = [
  {
    name: 'BSSA14 (Boore et al. 2014, supplement table, revised 2014-07-15)',
    model: bssa14,
    file: 'bssa14.json',
    rows: BSSA14_TABLE.rows,
    columns: BSSA14_COLUMNS,
    columnCount: 36,
    hasPgv: true,
    spectral: { count: 105, first: 0.01, last: 10 },
  },
  {
    name: 'CB14 (Campbell & Bozorgnia 2014, Tables 1 and 2)',
    model: cb14,
    file: 'cb14.json',
    rows: CB14_TABLE.rows,
    columns: CB14_COLUMNS,
    columnCount: 45,
    hasPgv: true,
    spectral: { count: 21, first: 0.01, last: 10 },
  },
  {
    name: 'ASK14 (Abrahamson, Silva & Kamai 2014, supplement ask14_coeffs.m.txt)',
    model: ask14,
    file: 'ask14.json',
    rows: ASK14_TABLE.rows,
    columns: ASK14_COLUMNS,
    columnCount: 45,
    hasPgv: true,
    spectral: { count: 22, first: 0.01, last: 10 },
  },
  {
    name: 'CY14 (Chiou & Youngs 2014, coefficient tables of the median and variability models)',
    model: cy14,
    file: 'cy14.json',
    rows: CY14_TABLE.rows,
    columns: CY14_COLUMNS,
    columnCount: 45,
    hasPgv: true,
    spectral: { count: 24, first: 0.01, last: 10 },
  },
  {
    name: 'AGA16 (Abrahamson, Gregor & Addo 2016, Table 3)',
    model: aga16,
    file: 'aga16.json',
    rows: AGA16_TABLE.rows,
    columns: AGA16_COLUMNS,
    columnCount: 14,
    hasPgv: false,
    spectral: { count: 22, first: 0.02, last: 10 },
  },
  {
    name: 'Zhao06 (Zhao et al. 2006, coefficient tables with the magnitude-squared terms)',
    model: zhao06,
    file: 'zhao06.json',
    rows: ZHAO06_TABLE.rows,
    columns: ZHAO06_COLUMNS,
    columnCount: 27,
    hasPgv: false,
    spectral: { count: 20, first: 0.05, last: 5 },
  },
] as const;

/**
 * A field is its column's symbol as the reference README spells it in ASCII ("D stands for Δ"),
 * written in camelCase: the same but for case, underscores and Δ. Three fields say more than
 * their symbol (a unit, or ρ without its subscript).
 */
const FIELD_OF: Readonly<Record<string, string>> = {
  Rref: 'rRefKm',
  f3: 'f3G',
  rhoLnPGALnY: 'rho',
};
const spelling = (name: string): string =>
  name
    .replace(/^D(?=[a-z])/, 'delta')
    .replaceAll('_', '')
    .toLowerCase();

describe('published coefficient tables: shape', () => {
  it.each(TABLES)(
    '$name: PGV when published, PGA, then the spectral periods of the paper, increasing',
    ({ name, model, rows, hasPgv, spectral }) => {
      const leading = hasPgv ? [-1, 0] : [0];
      expect(rows.slice(0, leading.length).map((r) => r.periodS)).toEqual(leading);
      const periods = rows.slice(leading.length).map((r) => r.periodS);
      expect(periods.length, name).toBe(spectral.count);
      expect(periods[0]).toBe(spectral.first);
      expect(periods.at(-1)).toBe(spectral.last);
      periods.forEach((p, i) => {
        if (i > 0) expect(p, `${name} row ${i}`).toBeGreaterThan(periods[i - 1]!);
      });
      expect(model.periodsS).toEqual(periods);
      expect(model.hasPgv).toBe(hasPgv);
    },
  );

  it.each(TABLES)(
    "$name: every column of the paper's table ($columnCount), finite, in every row, and nothing else",
    ({ name, rows, columns, columnCount }) => {
      expect(columns.length).toBe(columnCount);
      for (const row of rows) {
        expect(Object.keys(row).sort()).toEqual(['periodS', ...columns].sort());
        for (const column of columns) {
          const value = (row as Record<string, number>)[column];
          expect(Number.isFinite(value), `${name} period ${row.periodS} ${column}`).toBe(true);
        }
      }
    },
  );

  it.each(TABLES)(
    '$name: $file names its columns in the order of the fields they are read into',
    ({ file, columns }) => {
      const table = JSON.parse(
        readFileSync(new URL(`../../../api/engine/motion/${file}`, import.meta.url), 'utf8'),
      ) as { columns: string[] };
      const [period, ...names] = table.columns;
      expect(period).toBe('period');
      expect(columns.map(spelling)).toEqual(names.map((name) => spelling(FIELD_OF[name] ?? name)));
    },
  );
});

import { describe, expect, it } from 'vitest';
import { AGA16_COLUMNS, AGA16_ROWS } from '../../../api/engine/motion/aga16-coefficients.ts';
import { BSSA14_COLUMNS, BSSA14_ROWS } from '../../../api/engine/motion/bssa14-coefficients.ts';
import { CB14_COLUMNS, CB14_ROWS } from '../../../api/engine/motion/cb14-coefficients.ts';

// The shape of each published table as the project holds it: the row counts and periods of
// the reference records (vectors/README.md and the shared reference README), every cell finite.
// The numbers themselves are checked through the models against the independent reference
// vectors (<model>.vectors.test.ts), never against the table itself.
const TABLES = [
  {
    name: 'BSSA14 (Boore et al. 2014, supplement, revised 2014-07-15)',
    rows: BSSA14_ROWS,
    columns: BSSA14_COLUMNS,
    count: 107,
    first: -1,
    last: 10,
  },
  {
    name: 'CB14 (Campbell & Bozorgnia 2014, Tables 1 and 2)',
    rows: CB14_ROWS,
    columns: CB14_COLUMNS,
    count: 23,
    first: -1,
    last: 10,
  },
  {
    name: 'AGA16 (Abrahamson et al. 2016, Table 3)',
    rows: AGA16_ROWS,
    columns: AGA16_COLUMNS,
    count: 23,
    first: 0,
    last: 10,
  },
] as const;

describe('published coefficient tables: shape', () => {
  for (const table of TABLES) {
    it(`${table.name}: ${table.count} rows from period ${table.first} to ${table.last} s, increasing, every cell finite`, () => {
      expect(table.rows.length).toBe(table.count);
      expect(table.rows[0]!.periodS).toBe(table.first);
      expect(table.rows.at(-1)!.periodS).toBe(table.last);
      table.rows.forEach((row, i) => {
        if (i > 0)
          expect(row.periodS, `${table.name} row ${i}`).toBeGreaterThan(table.rows[i - 1]!.periodS);
        for (const column of table.columns) {
          expect(
            Number.isFinite((row as Record<string, number>)[column]),
            `${table.name} period ${row.periodS} ${column}`,
          ).toBe(true);
        }
      });
    });
  }
});

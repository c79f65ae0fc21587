/**
 * A published coefficient table as the papers print it: one row per period (PGV −1, PGA 0,
 * then the spectral periods in s), the columns in a stated order. Each model keeps its table
 * in a CSV file beside its code (`<model>.csv`, copied unchanged from the project's reference
 * record, its citation in the file's `#` lines), read here once, when the model's module loads,
 * into frozen typed rows.
 *
 * Why the engine reads a file here and nowhere else: the engine is pure (inputs in, numbers
 * out), but a table of a thousand cells reads and proofreads best against its source as the
 * CSV the source is, not as TypeScript literals. The file is a fixed asset shipped beside this
 * module (the build copies it next to the compiled module), read synchronously at module load,
 * so every caller (vitest, the CLI from source or compiled, worker threads, the queue worker)
 * sees the same frozen rows and no computation ever waits on I/O. The lint rule in
 * eslint.config.js allows file access in the engine only in this module.
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';

export type CoefficientRow<Column extends string> = { readonly periodS: number } & {
  readonly [K in Column]: number;
};

/**
 * The rows of the CSV table `file` (beside this module, e.g. `cy14.csv`), frozen: `period`,
 * then the cells taken in the order of `columns`. The file's header keeps the reference
 * record's spelling of the paper's symbols (`Vlin` for the field `vlin`); that it names the
 * columns in this order is checked by test/engine/motion/coefficient-tables.test.ts. A file
 * with another number of columns or a cell that is not a number throws when the model's module
 * loads, naming the file, the row and the column.
 */
export function readCoefficientTable<Column extends string>(
  file: string,
  columns: readonly Column[],
): readonly CoefficientRow<Column>[] {
  const text = readFileSync(new URL(file, import.meta.url), 'utf8');
  const parsed = Papa.parse<string[]>(text, { comments: '#', skipEmptyLines: true });
  const fail = (what: string): never => {
    throw new Error(`coefficient table ${file}: ${what}`);
  };
  if (parsed.errors.length > 0) fail(`not readable as CSV (${parsed.errors[0]!.message})`);
  const [names = [], ...lines] = parsed.data;
  if (names[0] !== 'period' || names.length !== columns.length + 1)
    fail(`expected period and ${columns.length} columns, got ${names.join(',')}`);
  return Object.freeze(
    lines.map((cells, i) => {
      if (cells.length !== names.length)
        fail(`row ${i + 1} has ${cells.length} cells, expected ${names.length}`);
      const row: Record<string, number> = {};
      names.forEach((name, j) => {
        const cell = cells[j] ?? '';
        const value = Number(cell);
        if (cell.trim() === '' || !Number.isFinite(value))
          fail(`row ${i + 1}, column ${name}: expected a number, got "${cell}"`);
        row[j === 0 ? 'periodS' : (columns[j - 1] as string)] = value;
      });
      return Object.freeze(row) as CoefficientRow<Column>;
    }),
  );
}

/** The row of `periodS` (−1 PGV, 0 PGA); throws if the table has none (a slip in a coefficient file). */
export function rowOfPeriod<Row extends { readonly periodS: number }>(
  model: string,
  rows: readonly Row[],
  periodS: number,
): Row {
  const row = rows.find((r) => r.periodS === periodS);
  if (!row) throw new Error(`${model} coefficient table has no row for period ${periodS}`);
  return row;
}

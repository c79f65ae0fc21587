/**
 * A published coefficient table as the papers print it: one row per period (PGV −1, PGA 0,
 * then the spectral periods in s), the columns in a stated order. Each model keeps its table
 * in a JSON data file beside its code (`<model>.json`: its citation in `source`, the reference
 * record's column names in `columns`, and `rows` whose cells are the record's, copied as
 * written), imported as a JSON module, so the engine reads no file: the module loader does,
 * wherever the engine runs (vitest, the CLI from source or compiled, worker threads, the queue
 * worker). A table of a thousand cells reads and proofreads best against its source as such
 * rows, not as TypeScript literals.
 */
export interface PublishedTable {
  readonly source: string;
  readonly columns: readonly string[];
  readonly rows: readonly (readonly number[])[];
}

export type CoefficientRow<Column extends string> = { readonly periodS: number } & {
  readonly [K in Column]: number;
};

/**
 * The rows of `model`'s table (its `<model>.json`, imported as `table`), frozen: `period`, then the cells taken in
 * the order of `columns`. The table's `columns` keep the reference record's spelling of the
 * paper's symbols (`Vlin` for the field `vlin`); that they name the fields in this order is
 * checked by test/engine/motion/coefficient-tables.test.ts. A table with another number of
 * columns or a cell that is not a finite number throws when the model's module loads, naming
 * the model, the row and the column.
 */
function readCoefficientTable<Column extends string>(
  model: string,
  table: PublishedTable,
  columns: readonly Column[],
): readonly CoefficientRow<Column>[] {
  const fail = (what: string): never => {
    throw new Error(`${model} coefficient table: ${what}`);
  };
  const names = table.columns;
  if (names[0] !== 'period' || names.length !== columns.length + 1)
    fail(`expected period and ${columns.length} columns, got ${names.join(',')}`);
  return Object.freeze(
    table.rows.map((cells, i) => {
      if (cells.length !== names.length)
        fail(`row ${i + 1} has ${cells.length} cells, expected ${names.length}`);
      const row: Record<string, number> = {};
      names.forEach((name, j) => {
        const value = cells[j];
        if (typeof value !== 'number' || !Number.isFinite(value))
          fail(`row ${i + 1}, column ${name}: expected a number, got ${JSON.stringify(value)}`);
        row[j === 0 ? 'periodS' : (columns[j - 1] as string)] = value as number;
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

/** A model's table as its model reads it: every row, the PGA row, the spectral rows and their periods. */
export interface ModelTable<Row> {
  /** Every row as published: PGV (where the table has one), PGA, then the spectral periods increasing. */
  readonly rows: readonly Row[];
  /** The PGA row (period 0). */
  readonly pga: Row;
  /** The spectral-acceleration rows, periods increasing. */
  readonly sa: readonly Row[];
  /** The periods of `sa`, s. */
  readonly saPeriodsS: readonly number[];
}

/**
 * The table of `model` read by readCoefficientTable and split into the rows its model reads;
 * throws when the module loads if the table has no PGA row.
 */
export function readModelTable<Column extends string>(
  model: string,
  table: PublishedTable,
  columns: readonly Column[],
): ModelTable<CoefficientRow<Column>> {
  const rows = readCoefficientTable(model, table, columns);
  const sa = Object.freeze(rows.filter((r) => r.periodS > 0));
  return Object.freeze({
    rows,
    pga: rowOfPeriod(model, rows, 0),
    sa,
    saPeriodsS: Object.freeze(sa.map((r) => r.periodS)),
  });
}

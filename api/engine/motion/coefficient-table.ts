/**
 * A published coefficient table as the papers print it: one row per period (PGV −1, PGA 0,
 * then the spectral periods in s), the columns in a stated order. Each model's coefficient
 * file keeps its table as written in the reference record, digit for digit, and reads it into
 * typed rows here.
 */
export type CoefficientRow<Column extends string> = { readonly periodS: number } & {
  readonly [K in Column]: number;
};

/**
 * Rows of `cells` (each `[periodS, ...values in the order of columns]`), frozen. A row of the
 * wrong length is a typing slip in a coefficient file: it throws when the module loads.
 */
export function coefficientRows<Column extends string>(
  model: string,
  columns: readonly Column[],
  cells: readonly (readonly number[])[],
): readonly CoefficientRow<Column>[] {
  return Object.freeze(
    cells.map((values) => {
      if (values.length !== columns.length + 1) {
        throw new Error(
          `${model} coefficient table: the row of period ${values[0]} has ${values.length - 1} values, expected ${columns.length}`,
        );
      }
      const row: Record<string, number> = { periodS: values[0] as number };
      columns.forEach((column, i) => (row[column] = values[i + 1] as number));
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

/** One cell of a communities file as its reader found it; null for an empty cell. */
export type TableCell = string | number | boolean | null;

/** One community's row (a CSV line, a spreadsheet row, a placemark or a feature). */
export interface TableRow {
  /** Where the row is in the file, as issue paths name it: `[line 5]`, `[row 3]`, `[placemark 2]`, `[feature 4]`. */
  readonly where: string;
  /** Cells by column name; a column the row lacks is absent. */
  readonly cells: Readonly<Record<string, TableCell>>;
  /** WGS84 position from the row's geometry (KML, shapefile, GeoJSON); tables without geometry give coordinates as columns. */
  readonly lonLat?: readonly [number, number];
}

/**
 * A communities file read into columns and rows, whatever its format, before any column is
 * recognised: the common ground between the format readers and `tableCommunities`.
 */
export interface CommunityTable {
  /** The file's name, for messages. */
  readonly fileName: string;
  /** The format, for messages: 'CSV', 'XLSX', 'KML', 'KMZ', 'shapefile', 'GeoJSON'. */
  readonly format: string;
  /** Column names in the file's order (property names for geometry formats). */
  readonly columns: readonly string[];
  readonly rows: readonly TableRow[];
  /** Whether rows carry their position as geometry (then no latitude or longitude column is needed). */
  readonly hasGeometry: boolean;
}

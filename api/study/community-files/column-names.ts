import { COMMUNITY_COLUMNS, type CommunityColumn } from '../community-schema.ts';

export { COMMUNITY_COLUMNS, type CommunityColumn };

/**
 * The spellings recognised for each field, compared after `normaliseColumnName`. They are the
 * headers spreadsheets of villages commonly carry (common practice, not a standard); anything
 * else can be picked by hand (a column mapping) or renamed in the file.
 */
export const COLUMN_SPELLINGS: Readonly<Record<CommunityColumn, readonly string[]>> = {
  id: ['id', 'code', 'community id', 'village id', 'site id', 'place id'],
  name: [
    'name',
    'village',
    'village name',
    'community',
    'community name',
    'settlement',
    'place',
    'place name',
    'site name',
  ],
  lon: ['lon', 'long', 'lng', 'longitude', 'x', 'lon dd', 'longitude dd', 'longitude deg'],
  lat: ['lat', 'latitude', 'y', 'lat dd', 'latitude dd', 'latitude deg'],
  vs30: ['vs30', 'vs 30'],
  siteClass: ['site class', 'siteclass', 'soil class', 'ground class', 'class'],
  population: ['population', 'pop', 'people', 'inhabitants', 'residents'],
  coastal: ['coastal', 'coast', 'on coast', 'on the coast', 'by the sea'],
  elevationM: ['elevation', 'elevation m', 'elevationm', 'elev', 'altitude', 'height'],
};

/** What each field means, for messages that ask for a column. */
export const COLUMN_MEANINGS: Readonly<Record<CommunityColumn, string>> = {
  id: 'the community id',
  name: 'the community name',
  lon: 'longitude (degrees east)',
  lat: 'latitude (degrees north)',
  vs30: 'Vs30 (m/s)',
  siteClass: 'site class',
  population: 'population',
  coastal: 'whether it is on the coast',
  elevationM: 'elevation (m)',
};

/**
 * A header as compared with the spellings: case, a byte-order mark, a unit in brackets, and
 * the separators `_ - .` do not matter (`Latitude_DD`, `latitude (dd)` and `latitude dd` match).
 */
export function normaliseColumnName(column: string): string {
  return column
    .replace(/^\uFEFF/, '')
    .toLowerCase()
    .replace(/[([].*?[)\]]/g, ' ')
    .replace(/[_\-./]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
}

const squeeze = (s: string) => s.replace(/ /g, '');

/** The field a header names, if it is one of the recognised spellings. */
export function recogniseColumn(column: string): CommunityColumn | undefined {
  const n = squeeze(normaliseColumnName(column));
  if (n === '') return undefined;
  // The unit in brackets is dropped above, so "Vs30 (m/s)" and "Elevation (m)" match too.
  return COMMUNITY_COLUMNS.find(
    (key) =>
      squeeze(key.toLowerCase()) === n || COLUMN_SPELLINGS[key].some((s) => squeeze(s) === n),
  );
}

/** A mapping picked by the user: field -> the file's column name. */
export type ColumnChoice = Partial<Record<CommunityColumn, string>>;

export interface ColumnMatch {
  /** Field -> column name, for every field found. */
  readonly columnOf: ReadonlyMap<CommunityColumn, string>;
  /** Columns no field uses: kept with each community as its details. */
  readonly otherColumns: readonly string[];
}

/**
 * Matches a file's columns to fields: a picked column first, then the first column whose
 * header is a recognised spelling. `skip` lists fields the file gives otherwise (the position
 * of a placemark or feature), whose look-alike columns are then kept as details.
 */
export function matchColumns(
  columns: readonly string[],
  choice: ColumnChoice = {},
  skip: readonly CommunityColumn[] = [],
): ColumnMatch {
  const columnOf = new Map<CommunityColumn, string>();
  for (const key of COMMUNITY_COLUMNS) {
    const picked = choice[key];
    if (picked !== undefined && picked !== '' && columns.includes(picked) && !skip.includes(key))
      columnOf.set(key, picked);
  }
  const used = new Set(columnOf.values());
  for (const column of columns) {
    if (used.has(column)) continue;
    const key = recogniseColumn(column);
    if (key === undefined || skip.includes(key) || columnOf.has(key)) continue;
    columnOf.set(key, column);
    used.add(column);
  }
  return { columnOf, otherColumns: columns.filter((c) => !used.has(c) && c.trim() !== '') };
}

/** "lat, latitude, y, lat dd, ..." for a message. */
export function acceptedSpellings(key: CommunityColumn): string {
  return [key, ...COLUMN_SPELLINGS[key].filter((s) => s !== key.toLowerCase())].join(', ');
}

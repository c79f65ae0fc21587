import { InvalidInput, type InputIssue } from '../engine/errors.ts';
import {
  createElevationGrid,
  type ElevationGrid,
  type GridCrs,
} from '../engine/terrain/elevation-grid.ts';

const HEADER_KEYS = [
  'ncols',
  'nrows',
  'xllcorner',
  'xllcenter',
  'yllcorner',
  'yllcenter',
  'cellsize',
  'dx',
  'dy',
  'nodata_value',
] as const;
type HeaderKey = (typeof HEADER_KEYS)[number];

/**
 * Reads an ESRI ASCII grid (the plain-text raster of keyword lines `ncols`, `nrows`,
 * `xllcorner` or `xllcenter`, `yllcorner` or `yllcenter`, `cellsize` (or `dx` and `dy`),
 * optional `NODATA_value`, then `nrows` rows of `ncols` numbers, northernmost row first).
 * The format carries no CRS: the caller gives it (from a `.prj` beside the file, or lon/lat).
 * Every problem names the file and the line.
 */
export function readEsriAscii(text: string, label: string, crs: GridCrs): ElevationGrid {
  const issues: InputIssue[] = [];
  const lines = text.split(/\r?\n/);
  const header = new Map<HeaderKey, number>();
  let line = 0;
  for (; line < lines.length; line += 1) {
    const words = (lines[line] as string).trim().split(/\s+/);
    const key = (words[0] ?? '').toLowerCase() as HeaderKey;
    if (!HEADER_KEYS.includes(key)) break;
    const value = Number(words[1]);
    if (words.length !== 2 || !Number.isFinite(value))
      issues.push({
        path: `${label}:${line + 1}`,
        message: `expected "${words[0]} <number>", got "${(lines[line] as string).trim()}"`,
      });
    else header.set(key, value);
  }
  const ncols = header.get('ncols');
  const nrows = header.get('nrows');
  const cellWidth = header.get('cellsize') ?? header.get('dx');
  const cellHeight = header.get('cellsize') ?? header.get('dy');
  const xCorner =
    header.get('xllcorner') ??
    (header.has('xllcenter') && cellWidth !== undefined
      ? (header.get('xllcenter') as number) - cellWidth / 2
      : undefined);
  const yCorner =
    header.get('yllcorner') ??
    (header.has('yllcenter') && cellHeight !== undefined
      ? (header.get('yllcenter') as number) - cellHeight / 2
      : undefined);
  const missing = [
    ncols === undefined && 'ncols',
    nrows === undefined && 'nrows',
    xCorner === undefined && 'xllcorner (or xllcenter)',
    yCorner === undefined && 'yllcorner (or yllcenter)',
    cellWidth === undefined && 'cellsize (or dx and dy)',
    cellHeight === undefined && cellWidth !== undefined && 'dy',
  ].filter((k): k is string => typeof k === 'string');
  if (missing.length > 0)
    issues.push({
      path: label,
      message: `the grid has no georeferencing: expected the header lines ${missing.join(', ')} before the values`,
    });
  if (
    issues.length > 0 ||
    ncols === undefined ||
    nrows === undefined ||
    xCorner === undefined ||
    yCorner === undefined ||
    cellWidth === undefined ||
    cellHeight === undefined
  ) {
    throw new InvalidInput(issues, 'unusable terrain grid');
  }
  if (!(
    Number.isInteger(ncols) &&
    ncols >= 2 &&
    Number.isInteger(nrows) &&
    nrows >= 2 &&
    ncols * nrows <= 50_000_000
  )) {
    throw new InvalidInput(
      [
        {
          path: label,
          message: `expected whole ncols and nrows of at least 2 and at most 50 million cells, got ${ncols} × ${nrows}`,
        },
      ],
      'unusable terrain grid',
    );
  }
  const nodata = header.get('nodata_value');
  const values = new Float32Array(ncols * nrows);
  let filled = 0;
  for (; line < lines.length && issues.length < 5; line += 1) {
    const row = (lines[line] as string).trim();
    if (row === '') continue;
    for (const word of row.split(/\s+/)) {
      const value = Number(word);
      if (!Number.isFinite(value)) {
        issues.push({
          path: `${label}:${line + 1}`,
          message: `expected a number of metres, got "${word}"`,
        });
        continue;
      }
      if (filled < values.length) values[filled] = value === nodata ? NaN : value;
      filled += 1;
    }
  }
  if (issues.length === 0 && filled !== values.length)
    issues.push({
      path: label,
      message: `expected ${values.length} values (${ncols} columns × ${nrows} rows), got ${filled}`,
    });
  if (issues.length > 0) throw new InvalidInput(issues, 'unusable terrain grid');
  return createElevationGrid({
    label,
    crs,
    columns: ncols,
    rows: nrows,
    west: xCorner,
    north: yCorner + nrows * cellHeight,
    cellWidth,
    cellHeight,
    elevationM: values,
  });
}

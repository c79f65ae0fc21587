import type { Feature } from 'geojson';
import { parseJsonText } from '../json-text.ts';
import type { IssueList } from '../issues.ts';
import type { CommunityTable } from './community-table.ts';
import { CommunityFileProblem } from './file-problem.ts';
import { pointRows } from './point-rows.ts';

/**
 * The features of a GeoJSON FeatureCollection (or of one Feature); `what` names what they should
 * be, for the message when the text is some other JSON or holds no feature.
 */
export function geojsonFeatures(text: string, fileName: string, what: string): Feature[] {
  const parsed = parseJsonText(text, fileName);
  if (!parsed.ok) throw new CommunityFileProblem(`${parsed.issue.path}: ${parsed.issue.message}`);
  const value = parsed.value as { type?: unknown; features?: unknown };
  const features =
    value?.type === 'FeatureCollection' && Array.isArray(value.features)
      ? (value.features as Feature[])
      : value?.type === 'Feature'
        ? [value as Feature]
        : undefined;
  if (!features)
    throw new CommunityFileProblem(
      `${fileName}: expected a GeoJSON FeatureCollection of ${what}s, got ${value?.type === undefined ? 'JSON without a "type"' : `a ${String(value.type)}`}`,
    );
  if (features.length === 0)
    throw new CommunityFileProblem(
      `${fileName}: expected at least one ${what} feature, found none`,
    );
  return features;
}

/**
 * GeoJSON points as a table: its features' properties are the columns; positions WGS84
 * `[lon, lat]` as RFC 7946 requires. Features are named `[feature n]`.
 */
export function geojsonTable(
  text: string,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): CommunityTable {
  const features = geojsonFeatures(text, fileName, 'point');
  const { columns, rows } = pointRows(features, 'feature', fileName, rootPath, issues);
  return { fileName, format: 'GeoJSON', columns, rows, hasGeometry: true };
}

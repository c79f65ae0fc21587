import { kml } from '@tmcw/togeojson';
import { DOMParser } from '@xmldom/xmldom';
import type { IssueList } from '../issues.ts';
import type { CommunityTable } from './community-table.ts';
import { CommunityFileProblem } from './file-problem.ts';
import { pointRows } from './point-rows.ts';
import { decodeText } from './text-decoding.ts';
import { entriesEnding, listEntries, zipEntries } from './zip-entries.ts';

/**
 * Placemarks of a KML document as a table (@tmcw/togeojson over @xmldom/xmldom): each
 * placemark's name, description and extended data become columns, its point the position.
 * Placemarks are named `[placemark n]` in document order.
 */
export function kmlTable(
  text: string,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
  format = 'KML',
): CommunityTable {
  const problems: string[] = [];
  let doc;
  try {
    doc = new DOMParser({
      onError: (level, message) => {
        if (level !== 'warning') problems.push(message.split('\n')[0] as string);
      },
    }).parseFromString(text, 'text/xml');
  } catch (error) {
    problems.push((error as Error).message.split('\n')[0] as string);
  }
  if (!doc || problems.length > 0)
    throw new CommunityFileProblem(
      `${fileName}: expected KML (XML), but it does not parse: ${problems[0] ?? 'no document'}`,
    );
  const features = kml(doc).features;
  if (features.length === 0)
    throw new CommunityFileProblem(
      `${fileName}: expected ${format} with at least one Placemark (one point per community), found none`,
    );
  const { columns, rows } = pointRows(features, 'placemark', fileName, rootPath, issues);
  return { fileName, format, columns, rows, hasGeometry: true };
}

/** A KMZ (a zip holding a KML, doc.kml by convention, or the first .kml found). */
export function kmzTable(
  bytes: Uint8Array,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): CommunityTable {
  const entries = zipEntries(bytes, fileName);
  const names = entriesEnding(entries, '.kml');
  const name = names.find((n) => n.toLowerCase() === 'doc.kml') ?? names[0];
  if (name === undefined)
    throw new CommunityFileProblem(
      `${fileName}: expected a .kml file inside the KMZ, found ${listEntries(entries)}`,
    );
  return kmlTable(
    decodeText(entries.get(name) as Uint8Array, `${fileName}/${name}`),
    `${fileName}/${name}`,
    rootPath,
    issues,
    'KMZ',
  );
}

import { kml } from '@tmcw/togeojson';
import type { Feature } from 'geojson';
import { DOMParser } from '@xmldom/xmldom';
import type { IssueList } from '../issues.ts';
import type { CommunityTable } from './community-table.ts';
import { CommunityFileProblem } from './file-problem.ts';
import { pointRows } from './point-rows.ts';
import { decodeText } from './text-decoding.ts';
import { entriesEnding, listEntries, zipEntries } from './zip-entries.ts';

/**
 * The placemarks of a KML document as GeoJSON features (@tmcw/togeojson over @xmldom/xmldom):
 * each placemark's name, description and extended data become properties. A document that does
 * not parse, or holds no placemark, is a CommunityFileProblem naming the file.
 */
export function kmlFeatures(
  text: string,
  fileName: string,
  format: string,
  each: string,
): Feature[] {
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
  const features = kml(doc).features as Feature[];
  if (features.length === 0)
    throw new CommunityFileProblem(
      `${fileName}: expected ${format} with at least one Placemark (${each}), found none`,
    );
  return features;
}

/** The KML document inside a KMZ (doc.kml by convention, or the first .kml found), with its path for messages. */
export function kmzDocument(bytes: Uint8Array, fileName: string): { text: string; path: string } {
  const entries = zipEntries(bytes, fileName);
  const names = entriesEnding(entries, '.kml');
  const name = names.find((n) => n.toLowerCase() === 'doc.kml') ?? names[0];
  if (name === undefined)
    throw new CommunityFileProblem(
      `${fileName}: expected a .kml file inside the KMZ, found ${listEntries(entries)}`,
    );
  const path = `${fileName}/${name}`;
  return { text: decodeText(entries.get(name) as Uint8Array, path), path };
}

/**
 * Placemarks of a KML document as a table: their properties become columns, their point the
 * position. Placemarks are named `[placemark n]` in document order.
 */
export function kmlTable(
  text: string,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
  format = 'KML',
): CommunityTable {
  const features = kmlFeatures(text, fileName, format, 'one point per community');
  const { columns, rows } = pointRows(features, 'placemark', fileName, rootPath, issues);
  return { fileName, format, columns, rows, hasGeometry: true };
}

/** A KMZ (a zip holding a KML) as a table. */
export function kmzTable(
  bytes: Uint8Array,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): CommunityTable {
  const { text, path } = kmzDocument(bytes, fileName);
  return kmlTable(text, path, rootPath, issues, 'KMZ');
}

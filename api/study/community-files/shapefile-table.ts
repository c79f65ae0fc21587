import type { Feature } from 'geojson';
import proj4 from 'proj4';
import shp from 'shpjs';
import type { IssueList } from '../issues.ts';
import type { CommunityTable } from './community-table.ts';
import { CommunityFileProblem } from './file-problem.ts';
import { pointRows } from './point-rows.ts';
import { decodeText } from './text-decoding.ts';
import { entriesEnding, listEntries, zipEntries } from './zip-entries.ts';

/** Whether every position could be longitude and latitude: outside that the file is in a projected system. */
const looksGeographic = (features: readonly Feature[]) =>
  features.every(
    (f) =>
      f.geometry?.type !== 'Point' ||
      (Math.abs(f.geometry.coordinates[0] as number) <= 180 &&
        Math.abs(f.geometry.coordinates[1] as number) <= 90),
  );

/**
 * Features of a zipped shapefile (shpjs reads the .shp and .dbf; its .prj, checked here with
 * proj4 first, reprojects the positions to WGS84). One shapefile per zip. Without a .prj the
 * positions are taken as longitude and latitude, which they must then look like.
 */
export async function shapefileFeatures(
  bytes: Uint8Array,
  fileName: string,
): Promise<{ features: Feature[]; shpName: string }> {
  const entries = zipEntries(bytes, fileName);
  const shps = entriesEnding(entries, '.shp');
  if (shps.length === 0)
    throw new CommunityFileProblem(
      `${fileName}: expected a zipped shapefile with a .shp file (and its .dbf and .prj), found ${listEntries(entries)}`,
    );
  if (shps.length > 1)
    throw new CommunityFileProblem(
      `${fileName}: expected one shapefile in the zip, found ${shps.length} (${shps.join(', ')}); zip each layer on its own`,
    );
  const shpName = shps[0] as string;
  const base = shpName.slice(0, -4);
  const sibling = (ext: string) =>
    [...entries.keys()].find((n) => n.toLowerCase() === `${base.toLowerCase()}${ext}`);
  const dbfName = sibling('.dbf');
  if (dbfName === undefined)
    throw new CommunityFileProblem(
      `${fileName}: expected ${base}.dbf beside ${shpName} (the attribute table with the names), found ${listEntries(entries)}`,
    );
  const prjName = sibling('.prj');
  const cpgName = sibling('.cpg');
  let prj: string | undefined;
  if (prjName !== undefined) {
    prj = decodeText(entries.get(prjName) as Uint8Array, `${fileName}/${prjName}`).trim();
    try {
      proj4(prj);
    } catch (error) {
      throw new CommunityFileProblem(
        `${fileName}/${prjName}: expected a coordinate system in WKT that proj4 can read, but it cannot (${(error as Error).message}); export the layer in WGS84 (EPSG:4326)`,
      );
    }
  }
  let collection: { features: Feature[] };
  try {
    collection = (await shp({
      shp: entries.get(shpName) as Uint8Array,
      dbf: entries.get(dbfName) as Uint8Array,
      ...(prj !== undefined ? { prj } : {}),
      ...(cpgName !== undefined ? { cpg: entries.get(cpgName) as Uint8Array } : {}),
    })) as { features: Feature[] };
  } catch (error) {
    throw new CommunityFileProblem(
      `${fileName}/${shpName}: expected a shapefile, but it cannot be read (${(error as Error).message})`,
    );
  }
  if (prj === undefined && !looksGeographic(collection.features)) {
    throw new CommunityFileProblem(
      `${fileName}: expected ${base}.prj beside ${shpName}: the positions are not longitude and latitude, so the coordinate system must be given`,
    );
  }
  return { features: collection.features, shpName };
}

/** A zipped shapefile of points as a table; records are named `[feature n]`. */
export async function shapefileTable(
  bytes: Uint8Array,
  fileName: string,
  rootPath: readonly PropertyKey[],
  issues: IssueList,
): Promise<CommunityTable> {
  const { features } = await shapefileFeatures(bytes, fileName);
  if (features.length === 0)
    throw new CommunityFileProblem(`${fileName}: expected at least one point record, found none`);
  const { columns, rows } = pointRows(features, 'feature', fileName, rootPath, issues);
  return { fileName, format: 'shapefile', columns, rows, hasGeometry: true };
}

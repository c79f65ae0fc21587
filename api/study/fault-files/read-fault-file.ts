import type { Feature } from 'geojson';
import { CommunityFileProblem } from '../community-files/file-problem.ts';
import { geojsonFeatures } from '../community-files/geojson-table.ts';
import { kmlFeatures, kmzDocument } from '../community-files/kml-table.ts';
import { textKind } from '../community-files/read-community-file.ts';
import { shapefileFeatures } from '../community-files/shapefile-table.ts';
import { decodeText } from '../community-files/text-decoding.ts';
import { zipEntries } from '../community-files/zip-entries.ts';

export type FaultFileFormat = 'geojson' | 'kml' | 'kmz' | 'shapefile';

/** One fault of a file: its attributes and its trace, or why it has no usable trace. */
export interface FaultRecord {
  /** 1-based position in the file, as messages name it (`feature 3`). */
  readonly number: number;
  readonly attributes: Readonly<Record<string, unknown>>;
  /** The trace, WGS84 `[lon, lat]` (heights dropped); absent when `geometryProblem` says why. */
  readonly trace?: readonly (readonly [number, number])[];
  readonly geometryProblem?: string;
}

/** A fault file read into records, before any attribute is matched to a field. */
export interface FaultFile {
  readonly fileName: string;
  readonly format: FaultFileFormat;
  /** Attribute names in the order first met. */
  readonly attributes: readonly string[];
  readonly records: readonly FaultRecord[];
}

const isZip = (b: Uint8Array) => b[0] === 0x50 && b[1] === 0x4b;

/** The format of a fault file: by its extension, else by its first bytes. */
export function detectFaultFormat(fileName: string, bytes: Uint8Array): FaultFileFormat {
  const lower = fileName.toLowerCase();
  if (lower.endsWith('.kml')) return 'kml';
  if (lower.endsWith('.kmz')) return 'kmz';
  if (lower.endsWith('.geojson') || lower.endsWith('.json')) return 'geojson';
  if (lower.endsWith('.zip')) return 'shapefile';
  if (isZip(bytes))
    return [...zipEntries(bytes, fileName).keys()].some((n) => n.toLowerCase().endsWith('.kml'))
      ? 'kmz'
      : 'shapefile';
  const kind = textKind(bytes);
  if (kind !== undefined) return kind;
  throw new CommunityFileProblem(
    `${fileName}: expected a fault file in GeoJSON, KML, KMZ or a zipped shapefile, got something else`,
  );
}

const isPosition = (p: unknown): p is number[] =>
  Array.isArray(p) && p.length >= 2 && typeof p[0] === 'number' && typeof p[1] === 'number';

/**
 * The trace of one feature: a LineString, or a MultiLineString of one line (as shapefiles and
 * KML often store a single line). Several lines, or any other geometry, are not one fault trace.
 */
function traceOf(feature: Feature): Pick<FaultRecord, 'trace' | 'geometryProblem'> {
  const geometry = feature.geometry as { type?: unknown; coordinates?: unknown } | null;
  let line: unknown;
  if (geometry?.type === 'LineString') line = geometry.coordinates;
  else if (geometry?.type === 'MultiLineString' && Array.isArray(geometry.coordinates)) {
    if (geometry.coordinates.length !== 1)
      return {
        geometryProblem: `expected one line per fault, got a MultiLineString of ${geometry.coordinates.length} lines (split it into one feature per line)`,
      };
    line = geometry.coordinates[0];
  } else
    return {
      geometryProblem: `expected a fault trace (a LineString), got ${geometry === null || geometry === undefined ? 'no geometry' : `a ${String(geometry.type)}`}`,
    };
  if (!Array.isArray(line) || !line.every(isPosition))
    return { geometryProblem: 'expected a line of [longitude, latitude] positions' };
  return { trace: line.map((p) => [p[0] as number, p[1] as number] as const) };
}

/**
 * Reads a fault file (GeoJSON; KML or KMZ placemarks through @tmcw/togeojson; a zipped shapefile
 * through shpjs, reprojected from its .prj): the same readers as the communities files. A file
 * that cannot be read at all throws CommunityFileProblem naming it.
 */
export async function readFaultFile(bytes: Uint8Array, fileName: string): Promise<FaultFile> {
  const format = detectFaultFormat(fileName, bytes);
  let features: Feature[];
  switch (format) {
    case 'geojson':
      features = geojsonFeatures(decodeText(bytes, fileName), fileName, 'fault trace');
      break;
    case 'kml':
      features = kmlFeatures(decodeText(bytes, fileName), fileName, 'KML', 'one line per fault');
      break;
    case 'kmz': {
      const { text, path } = kmzDocument(bytes, fileName);
      features = kmlFeatures(text, path, 'KMZ', 'one line per fault');
      break;
    }
    case 'shapefile':
      features = (await shapefileFeatures(bytes, fileName)).features;
      if (features.length === 0)
        throw new CommunityFileProblem(
          `${fileName}: expected at least one fault record, found none`,
        );
  }
  const attributes: string[] = [];
  const records = features.map((feature, i): FaultRecord => {
    const props = (feature?.properties ?? {}) as Record<string, unknown>;
    for (const key of Object.keys(props)) if (!attributes.includes(key)) attributes.push(key);
    return { number: i + 1, attributes: props, ...traceOf(feature) };
  });
  return { fileName, format, attributes, records };
}

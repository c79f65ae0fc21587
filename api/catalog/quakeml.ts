import { XMLParser, XMLValidator } from 'fast-xml-parser';
import type { CatalogEvent } from '../engine/catalog/event.ts';
import { InvalidInput } from '../engine/errors.ts';
import { catalogLoad, type CatalogLoad, type RejectedRecord } from './catalog-load.ts';
import { eventFromFields } from './event-fields.ts';
import { acceptedEventType } from './event-type.ts';

/**
 * QuakeML 1.2 (an open standard, quakeml.org): q:quakeml/eventParameters/event, each with
 * origins (time/value, latitude/value, longitude/value, depth/value in metres) and magnitudes
 * (mag/value, type). An event's preferredOriginID and preferredMagnitudeID choose among them;
 * without one, the first is used (common practice). Namespace prefixes are ignored.
 */

type XmlNode = Record<string, unknown>;

const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '@_',
  removeNSPrefix: true,
  parseTagValue: false,
  parseAttributeValue: false,
  trimValues: true,
  isArray: (name) => name === 'event' || name === 'origin' || name === 'magnitude',
});

/** Element text, whether the parser gave a string or an object with attributes. */
function textOf(node: unknown): string | undefined {
  if (typeof node === 'string') return node.trim();
  if (node && typeof node === 'object' && '#text' in node)
    return String((node as XmlNode)['#text']).trim();
  return undefined;
}

const child = (node: unknown, name: string): unknown =>
  node && typeof node === 'object' ? (node as XmlNode)[name] : undefined;
const valueOf = (node: unknown, name: string): string | undefined =>
  textOf(child(child(node, name), 'value'));
const publicIdOf = (node: unknown): string | undefined => textOf(child(node, '@_publicID'));
const listOf = (node: unknown, name: string): unknown[] => {
  const v = child(node, name);
  return Array.isArray(v) ? v : [];
};

/**
 * Parses QuakeML 1.2 text. Bad events are rejected with their position and publicID; the rest
 * load. Text that is not well-formed XML, or has no eventParameters, throws InvalidInput.
 */
export function parseQuakeMl(text: string): CatalogLoad {
  const valid = XMLValidator.validate(text);
  if (valid !== true) {
    throw new InvalidInput([
      {
        path: `line ${valid.err.line}`,
        message: `expected well-formed QuakeML XML: ${valid.err.msg}`,
      },
    ]);
  }
  let root: XmlNode;
  try {
    root = parser.parse(text) as XmlNode;
  } catch (error) {
    // Well-formed XML the parser still refuses: external entities (never fetched), nesting beyond its limit.
    throw new InvalidInput([
      {
        path: 'quakeml',
        message: `expected QuakeML without external entities or extreme nesting: ${error instanceof Error ? error.message : String(error)}`,
      },
    ]);
  }
  const parameters = child(root.quakeml, 'eventParameters') ?? root.eventParameters;
  if (!parameters)
    throw new InvalidInput([
      { path: 'quakeml', message: 'expected a quakeml element holding eventParameters' },
    ]);
  const candidates: { event: CatalogEvent; where: RejectedRecord }[] = [];
  const rejected: RejectedRecord[] = [];
  listOf(parameters, 'event').forEach((node, i) => {
    const index = i + 1;
    const publicId = publicIdOf(node);
    const where = `event ${index}${publicId ? ` (${publicId})` : ''}`;
    const reasons: string[] = [];
    if (!publicId) reasons.push('publicID: missing');
    const type = textOf(child(node, 'type'));
    if (type !== undefined && !acceptedEventType(type))
      reasons.push(`type: "${type}" is not an earthquake`);
    const origin = preferred(node, 'origin', 'preferredOriginID', reasons);
    const magnitude = preferred(node, 'magnitude', 'preferredMagnitudeID', reasons);
    if (origin !== undefined && magnitude !== undefined) {
      const depthM = valueOf(origin, 'depth');
      const depthKm =
        depthM === undefined || depthM === '' || Number.isNaN(Number(depthM))
          ? depthM
          : String(Number(depthM) / 1000);
      const result = eventFromFields({
        id: publicId ?? '',
        time: valueOf(origin, 'time'),
        lon: valueOf(origin, 'longitude'),
        lat: valueOf(origin, 'latitude'),
        depthKm,
        magnitude: valueOf(magnitude, 'mag'),
        magnitudeType: textOf(child(magnitude, 'type')),
      });
      if ('reasons' in result)
        reasons.push(
          ...result.reasons.map((r) => r.replace(/^depthKm: /, 'depth (km, from metres): ')),
        );
      else if (reasons.length === 0)
        candidates.push({ event: result.event, where: { where, index, reasons: [] } });
    }
    if (reasons.length > 0)
      rejected.push({ where, index, ...(publicId ? { id: publicId } : {}), reasons });
  });
  return catalogLoad('quakeml', candidates, rejected, []);
}

/** The origin or magnitude an event prefers, or the first; a reason is added when none fits. */
function preferred(
  event: unknown,
  name: 'origin' | 'magnitude',
  preferredTag: string,
  reasons: string[],
): unknown {
  const all = listOf(event, name);
  const wanted = textOf(child(event, preferredTag));
  if (wanted) {
    const match = all.find((o) => publicIdOf(o) === wanted);
    if (match === undefined)
      reasons.push(`${preferredTag}: "${wanted}" matches no ${name} of this event`);
    return match;
  }
  if (all.length === 0) reasons.push(`${name}: missing`);
  return all[0];
}

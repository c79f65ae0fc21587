import { InvalidInput } from '../engine/errors.ts';
import type { CatalogEvent } from '../engine/catalog/event.ts';
import { catalogLoad, type CatalogLoad, type RejectedRecord } from './catalog-load.ts';
import { eventFromFields } from './event-fields.ts';
import { acceptedEventType } from './event-type.ts';

/**
 * The FDSN web-service event text format (an open standard): one header line beginning with
 * "#", then one event per line, fields separated by "|":
 * EventID|Time|Latitude|Longitude|Depth/km|Author|Catalog|Contributor|ContributorID|MagType|
 * Magnitude|MagAuthor|EventLocationName (some services append EventType). Times are UTC.
 * Columns are found by name, so their order does not matter; the location name is not kept.
 */
const REQUIRED = [
  'EventID',
  'Time',
  'Latitude',
  'Longitude',
  'Depth/km',
  'MagType',
  'Magnitude',
] as const;

/** Parses FDSN event text. Bad lines are rejected with their line number; the rest load. */
export function parseFdsnText(text: string): CatalogLoad {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n?|\n/);
  const headerIndex = lines.findIndex((l) => l.trim().startsWith('#'));
  if (headerIndex < 0)
    throw new InvalidInput([
      { path: 'line 1', message: `expected a header line beginning with "#EventID|Time|..."` },
    ]);
  const header = (lines[headerIndex] as string)
    .trim()
    .replace(/^#\s*/, '')
    .split('|')
    .map((h) => h.trim().toLowerCase());
  const missing = REQUIRED.filter((c) => !header.includes(c.toLowerCase()));
  if (missing.length > 0) {
    throw new InvalidInput([
      {
        path: `line ${headerIndex + 1}`,
        message: `expected the columns ${REQUIRED.join('|')}; missing ${missing.join(', ')}`,
      },
    ]);
  }
  const column = (name: string): number => header.indexOf(name.toLowerCase());
  const candidates: { event: CatalogEvent; where: RejectedRecord }[] = [];
  const rejected: RejectedRecord[] = [];
  lines.forEach((raw, i) => {
    const line = i + 1;
    if (i <= headerIndex || raw.trim() === '' || raw.trim().startsWith('#')) return;
    const where = `line ${line}`;
    const fields = raw.split('|');
    if (fields.length !== header.length) {
      rejected.push({
        where,
        line,
        reasons: [`expected ${header.length} fields separated by "|"; got ${fields.length}`],
      });
      return;
    }
    const field = (name: string): string | undefined =>
      column(name) >= 0 ? fields[column(name)]?.trim() : undefined;
    const id = field('EventID') ?? '';
    const reasons: string[] = [];
    if (id === '') reasons.push('EventID: missing');
    const eventType = field('EventType');
    if (eventType !== undefined && !acceptedEventType(eventType))
      reasons.push(`EventType: "${eventType}" is not an earthquake`);
    const result = eventFromFields({
      id,
      time: field('Time'),
      lon: field('Longitude'),
      lat: field('Latitude'),
      depthKm: field('Depth/km'),
      magnitude: field('Magnitude'),
      magnitudeType: field('MagType'),
    });
    if ('reasons' in result) reasons.push(...result.reasons);
    if (reasons.length > 0 || !('event' in result))
      rejected.push({ where, line, ...(id === '' ? {} : { id }), reasons });
    else candidates.push({ event: result.event, where: { where, line, reasons: [] } });
  });
  return catalogLoad('fdsn-text', candidates, rejected, []);
}

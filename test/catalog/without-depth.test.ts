import { describe, expect, it } from 'vitest';
import { CATALOG_FORMATS, type CatalogFormat } from '../../api/catalog/catalog-formats.ts';
import { describeCatalogLoad } from '../../api/catalog/catalog-load.ts';
import { parseCatalog } from '../../api/catalog/parse-catalog.ts';

/**
 * Events without a depth, in every catalog format: loaded (recurrence does without a depth),
 * counted in the load's summary and its description. Each text holds one event with a depth
 * and one without (an empty field, or no depth element in QuakeML).
 */
const TEXTS: Record<CatalogFormat, string> = {
  csv: [
    'time,lon,lat,depthKm,magnitude,magnitudeType,id',
    '2001-02-03T04:05:06Z,-150.1,-47.2,12.5,4.6,Mw,deep',
    '1850-06-01T00:00:00Z,-150.2,-47.3,,6.1,Mw,old',
  ].join('\n'),
  'fdsn-text': [
    '#EventID|Time|Latitude|Longitude|Depth/km|Author|Catalog|Contributor|ContributorID|MagType|Magnitude|MagAuthor|EventLocationName',
    'deep|2001-02-03T04:05:06|-47.2|-150.1|12.5|TR|T|TR|deep|Mw|4.6|TR|Open ocean',
    'old|1850-06-01T00:00:00|-47.3|-150.2||TR|T|TR|old|Mw|6.1|TR|Open ocean',
  ].join('\n'),
  quakeml: `<?xml version="1.0" encoding="UTF-8"?>
<q:quakeml xmlns:q="http://quakeml.org/xmlns/quakeml/1.2" xmlns="http://quakeml.org/xmlns/bed/1.2">
  <eventParameters publicID="smi:local/catalog">
    <event publicID="deep">
      <type>earthquake</type>
      <origin publicID="deep-o"><time><value>2001-02-03T04:05:06Z</value></time>
        <latitude><value>-47.2</value></latitude><longitude><value>-150.1</value></longitude>
        <depth><value>12500</value></depth></origin>
      <magnitude publicID="deep-m"><mag><value>4.6</value></mag><type>Mw</type></magnitude>
    </event>
    <event publicID="old">
      <type>null</type>
      <origin publicID="old-o"><time><value>1850-06-01T00:00:00Z</value></time>
        <latitude><value>-47.3</value></latitude><longitude><value>-150.2</value></longitude></origin>
      <magnitude publicID="old-m"><mag><value>6.1</value></mag><type>Mw</type></magnitude>
    </event>
  </eventParameters>
</q:quakeml>`,
};

describe('catalog events without a depth', () => {
  for (const { name } of CATALOG_FORMATS) {
    it(`are loaded and counted (${name})`, () => {
      const load = parseCatalog(TEXTS[name]);
      expect(load.format).toBe(name);
      expect(load.rejected).toEqual([]);
      expect(load.events.map((e) => [e.id, e.depthKm])).toEqual([
        ['deep', 12.5],
        ['old', null],
      ]);
      expect(load.summary.withoutDepth).toBe(1);
      expect(describeCatalogLoad(load)).toContain(
        '1 event has no depth: counted in recurrence, left out of the felt history',
      );
    });
  }

  it('a depth that is given must still be a number in range', () => {
    const load = parseCatalog(TEXTS.csv.replace(',,6.1,', ',deep,6.1,'));
    expect(load.rejected[0]?.reasons).toEqual([
      'depthKm: expected a number from -10 to 800 km; got "deep"',
    ]);
  });
});

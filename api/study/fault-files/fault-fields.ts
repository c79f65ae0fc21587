import { normaliseColumnName } from '../community-files/column-names.ts';

/** Tremora's fault properties that a fault file's attributes are matched to. */
export const FAULT_FIELDS = [
  'id',
  'name',
  'slipRateMmYr',
  'dip',
  'dipDirection',
  'rake',
  'upperDepthKm',
  'lowerDepthKm',
] as const;
export type FaultField = (typeof FAULT_FIELDS)[number];

/**
 * The attribute names recognised for each field, compared after `normaliseColumnName` with the
 * spaces taken out. They are the spellings regional fault databases commonly use (common
 * practice, not a standard); anything else is mapped by hand on the import page or with `--map`.
 */
export const FAULT_SPELLINGS: Readonly<Record<FaultField, readonly string[]>> = {
  id: ['id', 'fault id', 'faultid', 'fid', 'code', 'fault code', 'identifier', 'uid'],
  name: ['name', 'fault name', 'faultname', 'fault', 'section name', 'section'],
  slipRateMmYr: [
    'slip rate',
    'sliprate',
    'slip rate mm yr',
    'slip rate mm/yr',
    'slip',
    'slip mm',
    'slip mm yr',
    'net slip rate',
    'sr',
  ],
  dip: ['dip', 'dip deg', 'dip angle', 'average dip', 'avg dip', 'mean dip', 'dipangle'],
  dipDirection: ['dip direction', 'dipdirection', 'dip dir', 'dipdir', 'dip azimuth', 'dip azi'],
  rake: ['rake', 'rake deg', 'average rake', 'avg rake', 'mean rake'],
  upperDepthKm: [
    'upper depth',
    'upperdepth',
    'upper depth km',
    'upper seismogenic depth',
    'usd',
    'top depth',
    'depth top',
    'ztop',
    'min depth',
  ],
  lowerDepthKm: [
    'lower depth',
    'lowerdepth',
    'lower depth km',
    'lower seismogenic depth',
    'lsd',
    'bottom depth',
    'depth bottom',
    'zbot',
    'max depth',
    'seismogenic depth',
  ],
};

/** A mapping from Tremora's fields to the file's attribute names; a field left out is not in the file. */
export type FaultMapping = Partial<Record<FaultField, string>>;

const squeeze = (s: string) => normaliseColumnName(s).replace(/[ /]/g, '');

/** The field an attribute name spells, if it is one of the recognised spellings. */
export function recogniseFaultAttribute(attribute: string): FaultField | undefined {
  const n = squeeze(attribute);
  if (n === '') return undefined;
  return FAULT_FIELDS.find(
    (field) => squeeze(field) === n || FAULT_SPELLINGS[field].some((s) => squeeze(s) === n),
  );
}

/**
 * A first mapping for a file's attributes: each field gets the first attribute whose name is a
 * recognised spelling of it. Case, separators and units in brackets do not matter
 * (`SLIP_RATE (mm/yr)` and `slip-rate` are the slip rate).
 */
export function guessFaultMapping(attributes: readonly string[]): FaultMapping {
  const mapping: FaultMapping = {};
  for (const attribute of attributes) {
    const field = recogniseFaultAttribute(attribute);
    if (field !== undefined && mapping[field] === undefined) mapping[field] = attribute;
  }
  return mapping;
}

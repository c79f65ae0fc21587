import type { TableCell } from './community-table.ts';

/** Cell text, trimmed; null or blank is undefined. */
export function cellText(cell: TableCell | undefined): string | undefined {
  if (cell === null || cell === undefined) return undefined;
  const text = String(cell).trim();
  return text === '' ? undefined : text;
}

/**
 * A number from a cell: a point or a comma as the decimal mark (`12,5` and `12.5`), spaces as
 * digit-group separators (`1 250`). A comma followed by exactly three digits after one to three
 * digits (`1,250`) is read as a thousands separator only for counts (`integer`), where a decimal
 * makes no sense. Text that is not a number is returned as it is, so the schema names it.
 */
export function readNumber(
  cell: TableCell | undefined,
  integer = false,
): number | string | undefined {
  if (typeof cell === 'number') return cell;
  const text = cellText(cell);
  if (text === undefined) return undefined;
  let t = text.replace(/[\s\u00A0\u202F]/g, '');
  if (integer && /^\d{1,3}([,.]\d{3})+$/.test(t)) t = t.replace(/[,.]/g, '');
  else if (/^[+-]?\d*,\d+$/.test(t)) t = t.replace(',', '.');
  const n = Number(t);
  return t !== '' && Number.isFinite(n) ? n : text;
}

const HEMISPHERES = { lat: { N: 1, S: -1 }, lon: { E: 1, W: -1 } } as const;

export type Axis = keyof typeof HEMISPHERES;

/**
 * A latitude or longitude from a cell: decimal degrees (a comma decimal accepted), or degrees,
 * minutes and seconds such as `12°34'56.7"S`, `S 12 34 56.7`, `12:34.5 S` or `-12° 34.5'`.
 * A hemisphere letter sets the sign and must suit the axis (N/S for latitude, E/W for
 * longitude). Returns the degrees, or a message saying what was expected.
 */
export function readCoordinate(
  cell: TableCell | undefined,
  axis: Axis,
): number | { message: string } | undefined {
  if (typeof cell === 'number') return cell;
  const text = cellText(cell);
  if (text === undefined) return undefined;
  const plain = readNumber(text);
  if (typeof plain === 'number') return plain;
  const expected = `expected ${axis === 'lat' ? 'a latitude' : 'a longitude'} in decimal degrees or degrees, minutes and seconds (e.g. ${axis === 'lat' ? `12°34'56"S` : `139°12'30"W`}), got "${text}"`;
  let rest = text
    .toUpperCase()
    .replace(/[\u2032\u2019\u00B4`]/g, "'")
    .replace(/[\u2033\u201D]|''/g, '"');
  let hemisphere: string | undefined;
  const lead = /^([NSEW])\s*/.exec(rest);
  const trail = /\s*([NSEW])$/.exec(rest);
  if (lead) {
    hemisphere = lead[1];
    rest = rest.slice(lead[0].length);
  } else if (trail) {
    hemisphere = trail[1];
    rest = rest.slice(0, rest.length - trail[0].length);
  }
  const signs = HEMISPHERES[axis] as Record<string, number>;
  if (hemisphere !== undefined && signs[hemisphere] === undefined) {
    return {
      message: `${expected}; ${hemisphere} is not a hemisphere of ${axis === 'lat' ? 'latitude (N or S)' : 'longitude (E or W)'}`,
    };
  }
  const negative = rest.startsWith('-');
  if (negative || rest.startsWith('+')) rest = rest.slice(1);
  const parts = rest
    .replace(/[°º˚:'"]/g, ' ')
    .trim()
    .split(/\s+/)
    .map((p) => readNumber(p));
  if (parts.length === 0 || parts.length > 3 || parts.some((p) => typeof p !== 'number' || p < 0))
    return { message: expected };
  const [degrees, minutes = 0, seconds = 0] = parts as number[];
  if (minutes >= 60 || seconds >= 60)
    return { message: `${expected}; minutes and seconds must be below 60` };
  if (
    (parts.length > 1 && !Number.isInteger(degrees)) ||
    (parts.length > 2 && !Number.isInteger(minutes))
  )
    return { message: `${expected}; only the last part may have decimals` };
  if (negative && hemisphere !== undefined)
    return { message: `${expected}; give either a minus sign or a hemisphere letter, not both` };
  const value = (degrees as number) + minutes / 60 + seconds / 3600;
  return (negative ? -1 : (signs[hemisphere ?? ''] ?? 1)) * value;
}

const TRUE_WORDS = new Set(['true', 'yes', 'y', '1', 'x']);
const FALSE_WORDS = new Set(['false', 'no', 'n', '0']);

/** Yes or no from a cell (`yes`, `y`, `true`, `1`, `x`; `no`, `n`, `false`, `0`); other text returned as it is. */
export function readYesNo(cell: TableCell | undefined): boolean | string | undefined {
  if (typeof cell === 'boolean') return cell;
  if (cell === 1 || cell === 0) return cell === 1;
  const text = cellText(cell);
  if (text === undefined) return undefined;
  const word = text.toLowerCase();
  if (TRUE_WORDS.has(word)) return true;
  if (FALSE_WORDS.has(word)) return false;
  return text;
}

/**
 * An id made from a name, for a file without ids: lower case, accents dropped, anything other
 * than letters and digits turned into single dashes, cut to the 64 characters an id may have.
 */
export function idFromName(name: string): string {
  const slug = name
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 56);
  return slug === '' ? 'community' : slug;
}

/**
 * ISO 8601 date-times as catalogs write them: "2021-03-04T05:06:07.89Z", with a space for the
 * "T", with or without fractional seconds, a "Z" or a ±hh:mm offset; no zone means UTC (the FDSN
 * event formats give UTC). A date alone is midnight UTC (some historical catalogs give no time).
 * Date.parse is not used: it reads zone-less times as local time.
 */
const ISO_PATTERN =
  /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d+))?)?)?\s*(Z|[+-]\d{2}(?::?\d{2})?)?$/i;

export type ParsedTime =
  { readonly ok: true; readonly timeMs: number } | { readonly ok: false; readonly message: string };

/** UTC epoch milliseconds from an ISO 8601 text, or what was wrong with it. */
export function parseIsoTimeMs(text: string): ParsedTime {
  const match = ISO_PATTERN.exec(text.trim());
  if (!match)
    return {
      ok: false,
      message: `expected an ISO 8601 time such as 2021-03-04T05:06:07Z; got "${text}"`,
    };
  const [, y, mo, d, h = '0', mi = '0', s = '0', fraction = '', zone = 'Z'] = match;
  const year = Number(y);
  const month = Number(mo);
  const day = Number(d);
  const hour = Number(h);
  const minute = Number(mi);
  const second = Number(s);
  // Date.UTC reads years 0 to 99 as 1900 to 1999; setUTCFullYear takes the year as written,
  // which historical catalogs need (ECMA-262, sections 21.4.3.4 MakeDay and 21.4.4.25).
  const check = new Date(0);
  check.setUTCFullYear(year, month - 1, day);
  const dayMs = check.getTime();
  if (month < 1 || month > 12 || check.getUTCDate() !== day || check.getUTCMonth() !== month - 1) {
    return { ok: false, message: `expected a real calendar date; got "${text}"` };
  }
  // 60 s is allowed: a leap second, read as the first instant of the next minute.
  if (hour > 23 || minute > 59 || second > 60)
    return { ok: false, message: `expected a time of day within 00:00:00–23:59:60; got "${text}"` };
  const fractionMs = fraction === '' ? 0 : Math.round(Number(`0.${fraction}`) * 1000);
  let offsetMin = 0;
  if (zone.toUpperCase() !== 'Z') {
    const sign = zone.startsWith('-') ? -1 : 1;
    const digits = zone.slice(1).replace(':', '');
    const oh = Number(digits.slice(0, 2));
    const om = Number(digits.slice(2) || '0');
    if (oh > 14 || om > 59)
      return { ok: false, message: `expected a UTC offset within ±14:00; got "${zone}"` };
    offsetMin = sign * (oh * 60 + om);
  }
  return {
    ok: true,
    timeMs: dayMs + ((hour * 60 + minute - offsetMin) * 60 + second) * 1000 + fractionMs,
  };
}

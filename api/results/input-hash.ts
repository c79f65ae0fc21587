import { createHash } from 'node:crypto';
import type { Study } from '../engine/model.ts';

/**
 * JSON with object keys sorted (by UTF-16 code units, as Array.prototype.sort does) at every
 * depth and no whitespace: one text for one value, whatever order its keys were built in.
 * Numbers, strings and array order are as JSON.stringify gives them (the number form of
 * ECMAScript, also used by RFC 8785); keys whose value is undefined are left out, as in JSON.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  if (Array.isArray(value))
    return `[${value.map((v) => (v === undefined ? 'null' : canonicalJson(v))).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined && typeof v !== 'function')
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

/** SHA-256 (FIPS 180-4) of a text's UTF-8 bytes, lower-case hex. */
export const sha256Hex = (text: string): string =>
  createHash('sha256').update(text, 'utf8').digest('hex');

/**
 * The provenance hash of a run's inputs: SHA-256 of the canonical JSON of the validated study
 * (defaults filled in, so two documents that mean the same study hash alike).
 */
export const inputHash = (study: Study): string => sha256Hex(canonicalJson(study));

import { parseArgs } from 'node:util';
import { UsageError } from './output.ts';

/** A verb's options as read: text, on/off, and options that may be given more than once. */
export type VerbValues<S extends string, B extends string, L extends string> = {
  readonly [K in S]?: string;
} & { readonly [K in B]?: boolean } & { readonly [K in L]?: string[] };

/**
 * A verb's arguments read strictly (node:util parseArgs): an option not named here is a usage
 * error, as is a file name for a verb that takes none (`positionals: false`).
 */
export function verbArgs<
  const S extends string = never,
  const B extends string = never,
  const L extends string = never,
>(
  args: readonly string[],
  options: {
    readonly strings?: readonly S[];
    readonly booleans?: readonly B[];
    readonly lists?: readonly L[];
    readonly positionals?: boolean;
  },
): { values: VerbValues<S, B, L>; positionals: string[] } {
  const config: Record<string, { type: 'string' | 'boolean'; multiple?: boolean }> = {};
  for (const name of options.strings ?? []) config[name] = { type: 'string' };
  for (const name of options.booleans ?? []) config[name] = { type: 'boolean' };
  for (const name of options.lists ?? []) config[name] = { type: 'string', multiple: true };
  const parsed = parseArgs({
    args: [...args],
    options: config,
    allowPositionals: options.positionals ?? true,
    strict: true,
  });
  return { values: parsed.values as VerbValues<S, B, L>, positionals: parsed.positionals };
}

/** A numeric option: absent → undefined; present but not a finite number → a usage error naming it. */
export function numberOption(values: Record<string, unknown>, name: string): number | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  const n = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : NaN;
  if (!Number.isFinite(n))
    throw new UsageError(`--${name}: expected a number, got "${String(raw)}"`);
  return n;
}

export function requiredNumber(values: Record<string, unknown>, name: string): number {
  const n = numberOption(values, name);
  if (n === undefined) throw new UsageError(`--${name} is required`);
  return n;
}

export function choiceOption<const T extends readonly string[]>(
  values: Record<string, unknown>,
  name: string,
  choices: T,
): T[number] | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  if (typeof raw !== 'string' || !choices.includes(raw))
    throw new UsageError(`--${name}: expected one of ${choices.join(', ')}, got "${String(raw)}"`);
  return raw as T[number];
}

/** Significant figures for people: 0.1234 → "0.123", 12.34 → "12.3". */
export const sig = (x: number, digits = 3): string =>
  x === 0 ? '0' : Number(x.toPrecision(digits)).toString();

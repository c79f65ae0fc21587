import { UsageError } from './output.ts';

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

import type { InputIssue } from '../../engine/errors.ts';
import { cellText, idFromName, readNumber } from '../community-files/cell-values.ts';
import { IssueList } from '../issues.ts';
import { readSource } from '../source-schema.ts';
import type { FaultDefaults } from './fault-defaults.ts';
import type { FaultField, FaultMapping } from './fault-fields.ts';
import type { FaultFile, FaultRecord } from './read-fault-file.ts';

/** One missing or out-of-range value of one fault of the file. */
export interface FaultProblem {
  /** 1-based position of the feature in the file. */
  readonly feature: number;
  /** The fault's name as it will be saved. */
  readonly name: string;
  /** Tremora's field: a FaultField, `trace`, `mMax`, `mMin`, `bValue` or `source`. */
  readonly field: string;
  /** Where the value came from: the file's attribute, or `default`. */
  readonly from?: string;
  readonly message: string;
}

/** The file's faults as source features to add to a study, with every problem found. */
export interface FaultSources {
  readonly features: readonly Record<string, unknown>[];
  readonly problems: readonly FaultProblem[];
}

/** Fields a fault cannot go without: given by the file or by a default. */
const REQUIRED: readonly FaultField[] = ['slipRateMmYr', 'dip', 'rake', 'lowerDepthKm'];
const NUMBERS = ['slipRateMmYr', 'dip', 'dipDirection', 'rake', 'upperDepthKm', 'lowerDepthKm'];

/** `properties.recurrence.slipRateMmYr` -> slipRateMmYr, `geometry.coordinates[2]` -> trace. */
export function fieldOfPath(path: string): string {
  if (path.startsWith('geometry')) return 'trace';
  const match = /^properties\.(?:recurrence\.)?([A-Za-z]+)/.exec(path);
  const name = match?.[1] ?? 'source';
  return name === 'mechanism' ? 'rake' : name;
}

function uniqueId(base: string, taken: Set<string>): string {
  let id = base;
  for (let n = 2; taken.has(id); n += 1) id = `${base.slice(0, 60)}-${n}`;
  taken.add(id);
  return id;
}

/**
 * The faults of a file as Tremora's fault sources: each attribute read through `mapping`, a
 * default where the file has no value, a moment-balanced recurrence from the slip rate (the
 * defaults' magnitude range and b-value). Each feature then goes through the source schema
 * (readSource), so a value out of range is named as it would be in a study; a value neither the
 * file nor a default gives is listed as missing. Ids come from the file, else from the name,
 * made unique against `takenIds` (the study's sources).
 */
export function faultSources(
  file: FaultFile,
  mapping: FaultMapping,
  defaults: FaultDefaults,
  takenIds: ReadonlySet<string>,
): FaultSources {
  const taken = new Set(takenIds);
  const problems: FaultProblem[] = [];
  const features = file.records.map((record) => {
    const { feature, problems: own } = faultSource(record, mapping, defaults, taken);
    problems.push(...own);
    return feature;
  });
  return { features, problems };
}

function faultSource(
  record: FaultRecord,
  mapping: FaultMapping,
  defaults: FaultDefaults,
  taken: Set<string>,
): { feature: Record<string, unknown>; problems: FaultProblem[] } {
  const cell = (field: FaultField) => {
    const column = mapping[field];
    const value = column === undefined ? undefined : record.attributes[column];
    return typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean'
      ? value
      : value === null || value === undefined
        ? undefined
        : String(value);
  };
  const givenId = cellText(cell('id'));
  const name = cellText(cell('name')) ?? givenId ?? `Fault ${record.number}`;
  const id = givenId ?? uniqueId(idFromName(name), taken);
  if (givenId !== undefined) taken.add(givenId);
  const problems: FaultProblem[] = [];
  const from: Record<string, string> = {};
  const props: Record<string, unknown> = { id, name, setting: defaults.setting };
  const recurrence: Record<string, unknown> = {
    type: 'moment-balanced',
    bValue: defaults.bValue,
    mMin: defaults.mMin,
    mMax: defaults.mMax,
  };
  for (const field of NUMBERS as FaultField[]) {
    const fromFile = readNumber(cell(field));
    const fallback = defaults[field as keyof FaultDefaults] as number | undefined;
    const value = fromFile ?? fallback;
    if (value === undefined) {
      if (REQUIRED.includes(field))
        problems.push({
          feature: record.number,
          name,
          field,
          message:
            mapping[field] === undefined
              ? 'missing: no attribute of the file is mapped to it and there is no default'
              : `missing: "${mapping[field]}" is empty and there is no default`,
        });
      continue;
    }
    from[field] = fromFile === undefined ? 'default' : (mapping[field] as string);
    if (field === 'slipRateMmYr') recurrence.slipRateMmYr = value;
    else props[field] = value;
  }
  props.recurrence = recurrence;
  const feature = {
    type: 'Feature',
    geometry: { type: 'LineString', coordinates: record.trace ?? [] },
    properties: props,
  };
  if (record.geometryProblem !== undefined)
    problems.push({
      feature: record.number,
      name,
      field: 'trace',
      message: record.geometryProblem,
    });
  const issues = new IssueList();
  readSource(feature, issues, []);
  const listed = new Set(problems.map((p) => p.field));
  for (const issue of issues.issues as InputIssue[]) {
    const field = fieldOfPath(issue.path);
    if (listed.has(field)) continue;
    problems.push({
      feature: record.number,
      name,
      field,
      ...(from[field] !== undefined ? { from: from[field] } : {}),
      message: issue.message,
    });
  }
  return { feature, problems };
}

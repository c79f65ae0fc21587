import type { InputIssue } from '../../api/engine/errors.ts';
import { CommunityFileProblem } from '../../api/study/community-files/file-problem.ts';
import { studySourceFeatures } from '../../api/study/fault-files/add-faults.ts';
import {
  readFaultDefaults,
  type DefaultsText,
  type FaultDefaults,
} from '../../api/study/fault-files/fault-defaults.ts';
import { type FaultMapping } from '../../api/study/fault-files/fault-fields.ts';
import { faultSources, type FaultProblem } from '../../api/study/fault-files/fault-sources.ts';
import { readFaultFile, type FaultFile } from '../../api/study/fault-files/read-fault-file.ts';

/** A fault file as the import page shows it before anything is saved. */
export interface FaultImportPreview {
  readonly file: FaultFile;
  readonly mapping: FaultMapping;
  readonly defaults: DefaultsText;
  /** The defaults' own problems, by field (`defaults.dip`). */
  readonly defaultIssues: readonly InputIssue[];
  readonly problems: readonly FaultProblem[];
  /** The faults as source features, when the defaults could be read. */
  readonly features: readonly Record<string, unknown>[];
}

/** Reads an uploaded fault file; a file that cannot be read is one issue naming it. */
export async function readFaultUpload(
  bytes: Uint8Array,
  fileName: string,
): Promise<{ ok: true; file: FaultFile } | { ok: false; issue: InputIssue }> {
  try {
    return { ok: true, file: await readFaultFile(bytes, fileName) };
  } catch (error) {
    if (!(error instanceof CommunityFileProblem)) throw error;
    return { ok: false, issue: { path: 'file', message: error.message } };
  }
}

/**
 * The faults of `file` under `mapping` and `defaults`, with every problem, against the study's
 * own sources (`raw`): nothing here touches the study.
 */
export function previewFaults(
  file: FaultFile,
  mapping: FaultMapping,
  defaults: DefaultsText,
  raw: Readonly<Record<string, unknown>>,
): FaultImportPreview {
  // Only attributes the file has; a stale choice carried in the form is dropped.
  const kept = Object.fromEntries(
    Object.entries(mapping).filter(([, a]) => a !== undefined && file.attributes.includes(a)),
  ) as FaultMapping;
  const read = readFaultDefaults(defaults);
  if (!read.ok)
    return {
      file,
      mapping: kept,
      defaults,
      defaultIssues: read.issues,
      problems: [],
      features: [],
    };
  const ids = new Set(
    studySourceFeatures(raw).map((f) =>
      String((f as { properties?: { id?: unknown } }).properties?.id),
    ),
  );
  const { features, problems } = faultSources(file, kept, read.defaults as FaultDefaults, ids);
  return { file, mapping: kept, defaults, defaultIssues: [], problems, features };
}

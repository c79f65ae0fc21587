import type { InputIssue } from '../../engine/errors.ts';
import { fieldOfPath, type FaultProblem } from './fault-sources.ts';

/** The study's source features (none in a draft). */
export function studySourceFeatures(raw: Readonly<Record<string, unknown>>): unknown[] {
  const features = (raw.sources as { features?: unknown } | undefined)?.features;
  return Array.isArray(features) ? [...features] : [];
}

/**
 * The study document with `features` added after its own sources, which are kept as they are:
 * an import never replaces what the study holds.
 */
export function withFaults(
  raw: Readonly<Record<string, unknown>>,
  features: readonly Record<string, unknown>[],
): Record<string, unknown> {
  return {
    ...raw,
    sources: { type: 'FeatureCollection', features: [...studySourceFeatures(raw), ...features] },
  };
}

/**
 * The study's issues once the faults are added, as problems of the imported features where they
 * concern one (`sources.features[k]` with k past the study's own `ownCount` sources); the others
 * are the study's and come back as they are.
 */
export function studyIssuesByFault(
  issues: readonly InputIssue[],
  ownCount: number,
  features: readonly Record<string, unknown>[],
): { problems: FaultProblem[]; others: InputIssue[] } {
  const problems: FaultProblem[] = [];
  const others: InputIssue[] = [];
  for (const issue of issues) {
    const match = /^sources\.features\[(\d+)\]\.?(.*)$/.exec(issue.path);
    const index = match ? Number(match[1]) - ownCount : -1;
    const feature = features[index];
    if (!match || !feature) {
      others.push(issue);
      continue;
    }
    const name = String((feature.properties as { name?: unknown }).name);
    problems.push({
      feature: index + 1,
      name,
      field: fieldOfPath(match[2] as string),
      message: issue.message,
    });
  }
  return { problems, others };
}

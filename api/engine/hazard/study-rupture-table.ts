import { frameForStudy, type LocalFrame } from '../geometry/projection.ts';
import type { Study } from '../model.ts';
import { communitySites, visitSourceRuptures } from '../ruptures/discretise.ts';
import type { PlacedRupture } from '../ruptures/placement.ts';
import type { RuptureTable } from './rupture-table.ts';
import { RuptureTableBuilder } from './rupture-table-builder.ts';

/** A study's local frame and its ruptures' table. */
export interface StudyRuptureTable {
  readonly frame: LocalFrame;
  readonly table: RuptureTable;
}

/** Sources first .. end − 1 of a study, by index: a part of its table (see joinRuptureTables). */
export interface SourceRange {
  readonly first: number;
  readonly end: number;
}

/**
 * The fast path's rupture table straight from the study's sources: the ruptures of
 * discretiseStudy (ruptures/discretise.ts), from the same walk (visitSourceRuptures) in the same
 * order with the same numbers, written into the table's columns as they are placed, without a
 * Rupture object for each or a list of them. ruptureTable(discretiseStudy(study).ruptures) is
 * the same table (test/engine/hazard/study-rupture-table.test.ts). With `sources`, only those
 * sources' ruptures: each source is walked on its own, so the parts of a study's sources, laid
 * out apart and joined in order (joinRuptureTables), give the whole table.
 */
export function studyRuptureTable(
  study: Study,
  sources: SourceRange = { first: 0, end: study.sources.length },
): StudyRuptureTable {
  const frame = frameForStudy(study);
  const builder = new RuptureTableBuilder();
  // As discretise.ts's toRupture: the bin's rate times the rupture's share.
  const add = (placed: PlacedRupture, binRate: number): void =>
    builder.add(placed, binRate * placed.share);
  const sites = communitySites(study, frame);
  for (let i = sources.first; i < sources.end; i++)
    visitSourceRuptures(study.sources[i]!, i, frame, study.settings, add, sites, study.sources);
  // One entry per source, as the sources' walk numbers them ('' for a source without ruptures).
  while (builder.sourceIds.length < study.sources.length) builder.sourceIds.push('');
  return { frame, table: builder.table() };
}

/**
 * The study's local frame and rupture table: `table` when the caller has it already (a table
 * laid out once and shared between threads), else studyRuptureTable's.
 */
export const studyFrameAndTable = (study: Study, table?: RuptureTable): StudyRuptureTable =>
  table ? { frame: frameForStudy(study), table } : studyRuptureTable(study);

import Papa from 'papaparse';
import type { Study } from '../engine/model.ts';
import { measureUnit, parseMeasure } from '../engine/motion/measure.ts';
import { SCREENING_BANDS } from '../engine/intensity/screening-band.ts';
import type { CommunityResult, StudyResult } from '../engine/results.ts';
import { hingeAlternativesText, hingeSubject } from './band-robustness-words.ts';

const INTENSITIES = ['VI', 'VII', 'VIII'] as const;

/** Column names: `PGA_475yr_g`, `PGV_475yr_cm/s`, `MMI_475yr`, `chance_MMI_VII_50yr`. */
function columns(study: Study): string[] {
  const { measures, returnPeriodsYears, horizonsYears } = study.settings;
  const out = ['communityId', 'name', 'lon', 'lat', 'vs30', 'band', 'bandLabel'];
  for (const years of returnPeriodsYears) {
    for (const m of measures) out.push(`${m}_${years}yr_${measureUnit(parseMeasure(m))}`);
    out.push(`MMI_${years}yr`);
  }
  for (const years of horizonsYears)
    for (const roman of INTENSITIES) out.push(`chance_MMI_${roman}_${years}yr`);
  out.push('nearestFault', 'nearestFault_km');
  for (const band of SCREENING_BANDS) out.push(`bandShare_${band.id}`);
  out.push('bandHinge', 'bandHinge_mmiShift', 'bandHinge_alternatives', 'warnings');
  return out;
}

function row(study: Study, community: CommunityResult): unknown[] {
  const site = study.communities.find((c) => c.id === community.communityId);
  const { measures, returnPeriodsYears, horizonsYears } = study.settings;
  const cells: unknown[] = [
    community.communityId,
    community.name,
    site?.lon ?? '',
    site?.lat ?? '',
    site?.vs30 ?? '',
    community.band.id,
    community.band.label,
  ];
  for (const years of returnPeriodsYears) {
    const key = String(years);
    for (const m of measures) cells.push(community.atReturnPeriod[key]?.[m] ?? '');
    cells.push(community.intensity.atReturnPeriod[key]?.mmi ?? '');
  }
  for (const years of horizonsYears) {
    for (const roman of INTENSITIES)
      cells.push(community.intensity.chanceOfReaching[String(years)]?.[roman] ?? '');
  }
  const nearest = community.nearestFaults[0];
  cells.push(nearest?.sourceId ?? '', nearest?.distanceKm ?? '');
  const robustness = community.bandRobustness;
  for (const band of SCREENING_BANDS) cells.push(robustness?.bandShares[band.id] ?? '');
  const hinge = robustness?.hinges[0];
  cells.push(
    hinge ? hingeSubject(hinge) : '',
    hinge?.mmiShift ?? '',
    hinge ? hingeAlternativesText(hinge) : '',
    community.warnings.join(' | '),
  );
  return cells;
}

/**
 * A cell that a spreadsheet could take for a formula. papaparse's own pattern for
 * `escapeFormulae: true` is /^[=+\-@\t\r].*$/, which misses a cell with a line break after
 * its first line ("=HYPERLINK(...)\nVillage"): `.` stops at the break and `$` needs the end.
 */
export const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A run's results as CSV, one row per community: the levels at each return period (g; PGV
 * cm/s), the intensity there, the chance of reaching MMI VI–VIII in each horizon, the nearest
 * fault, the share of the logic tree's weight in each band and the choice that moves it most. Empty cells where the value is unknown (a level beyond the computed curve). Text
 * cells starting with = + - @, tab or carriage return get a leading ' so a spreadsheet does not
 * run them as formulas (OWASP, "CSV Injection"; from memory).
 */
export function runCsv(study: Study, result: StudyResult): string {
  return Papa.unparse(
    { fields: columns(study), data: result.communities.map((c) => row(study, c)) },
    { newline: '\r\n', escapeFormulae: FORMULA_START },
  );
}

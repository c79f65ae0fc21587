import { modelCatalog } from '../engine/motion/registry.ts';
import { runScenario, type ScenarioRequest } from '../engine/scenario/index.ts';
import type { ScenarioPosition } from '../engine/scenario/index.ts';
import { numberOption, requiredNumber, sig, verbArgs } from './args.ts';
import { loadStudyForVerb } from './load.ts';
import { EXIT_OK, type Io, UsageError } from './output.ts';

export const SCENARIO_USAGE = `tremora scenario STUDY --source ID --magnitude M [options] [--json]

Deterministic shaking of one earthquake on one source: median and 84th-percentile PGA, PGV, SA
and MMI at every community.
  --source ID         the source's id in the study
  --magnitude M       moment magnitude
  --near COMMUNITY    put the rupture where it is closest to this community (for every community)
  --middle            put the rupture nearest the middle of the source (for every community)
  --along KM --down-dip KM   a fault rupture starting this far along the trace and down dip
  --lon DEG --lat DEG        the epicentre of a zone or point source's rupture
  --grid KM           also compute a map grid at this spacing (median PGA and MMI, Vs30 760)
Without a position, each community gets the rupture position closest to it (a worst case for
each, not one earthquake); with --grid the map and the table show one earthquake, by default
in the middle of the source. Rrup is the shortest distance to the rupture surface (which may
lie deep below). Screening estimates only, not design values.`;

export async function scenarioVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, {
    strings: ['source', 'magnitude', 'near', 'along', 'down-dip', 'lon', 'lat', 'grid'],
    booleans: ['middle', 'json'],
  });
  if (positionals.length !== 1) throw new UsageError('expected exactly one STUDY file');
  if (!values.source) throw new UsageError('--source is required');
  const study = await loadStudyForVerb(positionals[0], io, values.json);
  const along = numberOption(values, 'along');
  const downDip = numberOption(values, 'down-dip');
  const lon = numberOption(values, 'lon');
  const lat = numberOption(values, 'lat');
  let position: ScenarioPosition | undefined;
  if (values.near) position = { communityId: values.near };
  else if (values.middle) position = 'middle';
  else if (along !== undefined || downDip !== undefined)
    position = { alongStrikeKm: along ?? 0, downDipKm: downDip ?? 0 };
  else if (lon !== undefined || lat !== undefined) {
    if (lon === undefined || lat === undefined) throw new UsageError('--lon and --lat go together');
    position = { lon, lat };
  }
  const grid = numberOption(values, 'grid');
  const request: ScenarioRequest = {
    sourceId: values.source,
    magnitude: requiredNumber(values, 'magnitude'),
    ...(position === undefined ? {} : { position }),
    ...(grid !== undefined ? { gridSpacingKm: grid } : {}),
  };
  const result = runScenario(study, modelCatalog, request);
  if (values.json) {
    io.out(JSON.stringify(result, null, 2));
    return EXIT_OK;
  }
  io.out(
    `Scenario: M ${result.magnitude} on ${result.sourceName} (${result.models.map((m) => `${m.model} ${m.weight}`).join(', ')})`,
  );
  io.out(`Rupture position: ${result.position}`);
  const measures = Object.keys(result.communities[0]?.motions ?? {});
  io.out(
    `\n${'community'.padEnd(22)}${'Rrup km'.padStart(9)}  ${measures.map((m) => `${m} median/84%`.padStart(22)).join('')}  MMI median/84%`,
  );
  for (const c of result.communities) {
    const cells = measures.map((m) => {
      const v = c.motions[m];
      return v ? `${sig(v.median, 2)}/${sig(v.p84, 2)} ${v.unit}`.padStart(22) : ''.padStart(22);
    });
    io.out(
      `${c.name.padEnd(22)}${sig(c.rrupKm).padStart(9)}  ${cells.join('')}  ${c.mmi.romanMedian}/${c.mmi.romanP84}`,
    );
  }
  for (const w of result.warnings) io.err(`note: ${w}`);
  io.out(
    '\nScreening estimates only, not design values: building codes and licensed engineers decide.',
  );
  return EXIT_OK;
}

import { compassPoint } from '../engine/catalog/felt-history.ts';
import { InvalidInput } from '../engine/errors.ts';
import {
  DEFAULT_HIGH_GROUND_M,
  SLOW_WALK_MS,
  tsunamiScreening,
  type TsunamiCommunity,
} from '../engine/tsunami/index.ts';
import { readTerrainFile, terrainBesideStudy } from '../terrain/index.ts';
import { numberOption, sig, verbArgs } from './args.ts';
import { loadStudyForVerb } from './load.ts';
import { EXIT_BAD_INPUT, EXIT_OK, type Io, UsageError } from './output.ts';

export const TSUNAMI_USAGE = `tremora tsunami STUDY [--source ID]... [--high-ground M] [--json]

Tsunami time-to-act for the study's coastal communities: the earliest first arrival (minutes,
rounded down, as a range) from the rupture area of each interface source to the coast nearest
each, over the study's terrain grid ("terrain"), and the nearest ground above a height.
  --source ID        start from this interface source only (repeat for several; all by default)
  --high-ground M    height counted as high ground, m above sea level (default ${DEFAULT_HIGH_GROUND_M})
A rough screening estimate, not a warning: strong or long shaking, the sea drawing back or a
roar from the sea mean go to high ground at once; official warnings and local evacuation plans
come first, and a tsunami from an undersea landslide can arrive sooner.`;

const CAUTION =
  'Rough screening estimates, not a warning. After strong or long shaking go to high ground at once; follow official warnings and local evacuation plans. A tsunami from a landslide can arrive sooner.';

export async function tsunamiVerb(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals } = verbArgs(args, {
    strings: ['high-ground'],
    booleans: ['json'],
    lists: ['source'],
  });
  const path = positionals[0];
  if (positionals.length !== 1 || path === undefined)
    throw new UsageError('expected exactly one STUDY file');
  const study = await loadStudyForVerb(path, io, values.json);
  if (study.terrain === undefined) {
    throw new InvalidInput([
      {
        path: 'terrain',
        message: `${path} names no terrain grid; expected "terrain": the file name of a GeoTIFF or ESRI ASCII elevation grid beside the study`,
      },
    ]);
  }
  const grid = await readTerrainFile(terrainBesideStudy(path, study.terrain));
  const heightM = numberOption(values, 'high-ground');
  const result = tsunamiScreening(study, grid, {
    ...(values.source ? { sourceIds: values.source } : {}),
    ...(heightM !== undefined ? { highGroundM: heightM } : {}),
  });
  const problems = result.communities.flatMap((c) => c.problems);
  if (values.json) {
    io.out(JSON.stringify({ ...result, walkingPaceMS: SLOW_WALK_MS, caution: CAUTION }, null, 2));
  } else {
    io.out(
      `Tsunami time-to-act: ${study.name}; terrain ${result.terrain.label}, solved on ${sig(result.terrain.spacingKm, 2)} km cells`,
    );
    io.out(
      `Sources: ${result.sources.map((s) => s.name).join(', ')}; high ground: ${result.highGroundM} m and above`,
    );
    io.out(`\n${'community'.padEnd(22)}${'first arrival'.padStart(16)}  ${'nearest high ground'}`);
    for (const c of result.communities)
      io.out(`${c.name.padEnd(22)}${arrivalText(c).padStart(16)}  ${highGroundText(c)}`);
    io.out(
      `\nWalking times at ${SLOW_WALK_MS} m/s in a straight line; real paths are longer.\n${CAUTION}`,
    );
  }
  if (problems.length > 0) {
    io.err(
      `tremora tsunami: ${problems.length} problem${problems.length === 1 ? '' : 's'}:\n${problems.map((p) => `  ${p}`).join('\n')}`,
    );
    return EXIT_BAD_INPUT;
  }
  return EXIT_OK;
}

const arrivalText = (c: TsunamiCommunity) =>
  c.firstArrivalMinutes === null
    ? 'no estimate'
    : `${c.firstArrivalMinutes}–${c.latestMinutes} min`;

function highGroundText(c: TsunamiCommunity): string {
  const g = c.highGround;
  if (!g) return '';
  if (g.kind === 'already-above')
    return `already at ${sig(g.elevationM, 3)} m (above ${g.heightM} m)`;
  if (g.kind === 'none') return `none above ${g.heightM} m within ${g.searchKm} km`;
  return `${sig(g.distanceKm, 2)} km ${compassPoint(g.bearingDeg)}, about ${g.walkingMinutes} min on foot`;
}

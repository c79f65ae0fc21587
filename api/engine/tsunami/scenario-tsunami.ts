import { InvalidInput } from '../errors.ts';
import { frameForStudy } from '../geometry/projection.ts';
import type { Study } from '../model.ts';
import { prepareSource } from '../ruptures/placement.ts';
import type { ScenarioRequest } from '../scenario/scenario.ts';
import {
  candidateRuptures,
  closestRupture,
  faultRuptureAt,
  type ScenarioRupture,
} from '../scenario/scenario-rupture.ts';
import type { ElevationGrid } from '../terrain/elevation-grid.ts';
import { DEFAULT_HIGH_GROUND_M } from './high-ground.ts';
import { ruptureArea } from './source-area.ts';
import {
  arrivalsFromAreas,
  solveGrids,
  type TsunamiCommunity,
  type TsunamiResult,
} from './tsunami-screening.ts';

/**
 * Tsunami first arrivals for one scenario earthquake on an interface source, placed as the
 * scenario places it (scenario-rupture.ts): with the default `closest`, each coastal community
 * gets the rupture position closest to it, as its shaking does; a fixed position serves all.
 * One solve per distinct rupture.
 */
export function scenarioTsunami(
  study: Study,
  grid: ElevationGrid,
  request: Pick<ScenarioRequest, 'sourceId' | 'magnitude' | 'position'>,
  highGroundM = DEFAULT_HIGH_GROUND_M,
): TsunamiResult {
  const sourceIndex = study.sources.findIndex((s) => s.id === request.sourceId);
  const source = study.sources[sourceIndex];
  if (!source || source.setting !== 'interface') {
    throw new InvalidInput([
      {
        path: 'sourceId',
        message: `a tsunami estimate needs an interface source; "${request.sourceId}" is ${source ? `a ${source.setting} source` : 'not a source of the study'}`,
      },
    ]);
  }
  const frame = frameForStudy(study);
  const prepared = prepareSource(source, sourceIndex, frame, study.settings, [], study.sources);
  const candidates = candidateRuptures(prepared, request.magnitude);
  const position = request.position ?? 'closest';
  let fixed: ScenarioRupture | undefined;
  if (typeof position === 'object' && 'communityId' in position) {
    const community = study.communities.find((c) => c.id === position.communityId);
    if (!community)
      throw new InvalidInput([
        { path: 'position.communityId', message: `unknown community "${position.communityId}"` },
      ]);
    fixed = closestRupture(candidates, frame.toLocal([community.lon, community.lat]));
  } else if (typeof position === 'object' && 'alongStrikeKm' in position) {
    if (prepared.kind !== 'fault')
      throw new InvalidInput([
        { path: 'position', message: 'an along-strike position needs a fault source' },
      ]);
    fixed = faultRuptureAt(prepared, request.magnitude, position.alongStrikeKm, position.downDipKm);
  } else if (typeof position === 'object') {
    throw new InvalidInput([
      {
        path: 'position',
        message:
          'a lon/lat epicentre is a point rupture with no area for a tsunami to start from; expected a fault rupture position',
      },
    ]);
  }
  const coastal = study.communities.filter((c) => c.coastal);
  const groups = new Map<ScenarioRupture, typeof coastal>();
  for (const community of coastal) {
    const rupture =
      fixed ?? closestRupture(candidates, frame.toLocal([community.lon, community.lat]));
    groups.set(rupture, [...(groups.get(rupture) ?? []), community]);
  }
  const grids = solveGrids(grid, frame);
  const byId = new Map<string, TsunamiCommunity>();
  let first: TsunamiResult | undefined;
  for (const [rupture, communities] of groups) {
    const result = arrivalsFromAreas(
      { ...study, communities },
      grid,
      frame,
      [ruptureArea(source.id, source.name, rupture.surface)],
      highGroundM,
      grids,
    );
    first ??= result;
    for (const c of result.communities) byId.set(c.id, c);
  }
  return {
    terrain: first?.terrain ?? {
      label: grid.label,
      spacingKm: grids.fine.spacingKm,
      coarseSpacingKm: grids.coarse.spacingKm,
      columns: grids.fine.columns,
      rows: grids.fine.rows,
    },
    sources: [{ sourceId: source.id, name: source.name }],
    highGroundM,
    communities: coastal
      .map((c) => byId.get(c.id))
      .filter((c): c is TsunamiCommunity => c !== undefined),
  };
}

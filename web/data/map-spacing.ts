import { frameForStudy } from '../../api/engine/geometry/projection.ts';
import { mapGrid } from '../../api/engine/map/map-grid.ts';
import type { Study } from '../../api/engine/model.ts';

/**
 * Grid cells across the longer side of the study area that the suggested spacing aims at:
 * enough for the pattern of the sources to show on the overview map (about 30 px a cell at its
 * 760 px width), few enough that a study the size of the demo (about 300 × 380 km, 68 000
 * ruptures) maps in seconds and stays well inside the default work budget (500 points of its
 * 1,000 or so).
 */
export const SUGGESTED_CELLS_ACROSS = 24;

export interface SuggestedSpacing {
  readonly spacingKm: number;
  /** The longer side of the study area, whole km rounded up. */
  readonly spanKm: number;
  readonly cellsAcross: number;
}

/**
 * The grid spacing the overview's form suggests: the longer side of the study area (the box
 * the map covers, map-grid.ts studyBounds, measured in the study's local frame) divided by
 * SUGGESTED_CELLS_ACROSS and rounded up to a whole km, 1 km at the finest.
 */
export function suggestedMapSpacing(
  study: Pick<Study, 'communities' | 'sources' | 'outline'>,
): SuggestedSpacing {
  // At 1 km the grid's columns and rows less one are the box's sides in whole km, rounded up.
  const unit = mapGrid(study, frameForStudy(study), { spacingKm: 1, maxPoints: Infinity });
  const spanKm = Math.max(unit.columns, unit.rows) - 1;
  return {
    spacingKm: Math.max(1, Math.ceil(spanKm / SUGGESTED_CELLS_ACROSS)),
    spanKm,
    cellsAcross: SUGGESTED_CELLS_ACROSS,
  };
}

import type { CellUse } from '../geometry/cell-refinement.ts';
import type { RuptureContext } from '../motion/types.ts';

/**
 * A point in the study's local frame: x east, y north, z positive down, all km.
 * The frame is the azimuthal equidistant projection of geometry/projection.ts.
 */
export interface PointKm {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

/**
 * One planar quadrilateral of a rupture surface. Corners in order: top edge start, top edge
 * end (along strike), bottom edge end, bottom edge start. The hanging wall lies to the right
 * of the top edge when walking from its start to its end (right-hand rule).
 */
export interface RupturePlane {
  readonly corners: readonly [PointKm, PointKm, PointKm, PointKm];
}

export type RuptureSurface =
  | {
      readonly kind: 'planes';
      readonly planes: readonly RupturePlane[];
      readonly hypocentre: PointKm;
      /**
       * How many leading planes make the rupture's top row, whose top edges are its top trace
       * (for GC2); all of them when absent (a planar fault's planes each span the rupture's width).
       */
      readonly tracePlanes?: number;
    }
  | { readonly kind: 'point'; readonly hypocentre: PointKm };

/**
 * One earthquake scenario of a source: a magnitude, where it breaks, and how often per year.
 * Every source is discretised once per study into these (ruptures/discretise.ts).
 */
export interface Rupture {
  readonly sourceIndex: number;
  readonly sourceId: string;
  readonly annualRate: number;
  readonly context: RuptureContext;
  readonly surface: RuptureSurface;
  /** Set on the ruptures of a refined zone cell: which sites use them (geometry/cell-refinement.ts). */
  readonly cellUse?: CellUse;
}

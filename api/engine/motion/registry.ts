import { aga16, aga16Lower, aga16Upper } from './aga16.ts';
import { ask14 } from './ask14.ts';
import { bssa14 } from './bssa14.ts';
import { createModelCatalog, type ModelCatalog } from './catalog.ts';
import { cb14 } from './cb14.ts';
import { cornell79 } from './cornell79.ts';
import { cy14 } from './cy14.ts';
import { zhao06, zhao06Msq } from './zhao06.ts';

/**
 * The ground-motion models a study may name, and the branches a tectonic setting gets when a
 * study names none (README, "Ground-motion logic tree"):
 *   crustal    the four NGA-West2 models, 0.25 each: no regional test here favours one of them,
 *              and equal weights are the usual starting point for this set (common practice);
 *   interface  AGA16 0.6, split over its ΔC1 branches lower 0.2, central 0.6, upper 0.2
 *              (0.12, 0.36, 0.12; common practice for a three-point epistemic branch), and
 *              Zhao06 0.4 (common practice: the more recent, more widely calibrated model leads);
 *   intraslab  AGA16 0.6 and Zhao06 0.4 (AGA16's ΔC1 branches are the same for intraslab events).
 * Cornell79 is kept for textbook checks of the hazard integral, not for screening.
 */
export const modelCatalog: ModelCatalog = createModelCatalog(
  [bssa14, cb14, ask14, cy14, aga16, aga16Lower, aga16Upper, zhao06, zhao06Msq, cornell79],
  {
    crustal: [
      { model: 'BSSA14', weight: 0.25 },
      { model: 'CB14', weight: 0.25 },
      { model: 'ASK14', weight: 0.25 },
      { model: 'CY14', weight: 0.25 },
    ],
    interface: [
      { model: 'AGA16-lower', weight: 0.12 },
      { model: 'AGA16', weight: 0.36 },
      { model: 'AGA16-upper', weight: 0.12 },
      { model: 'Zhao06', weight: 0.4 },
    ],
    intraslab: [
      { model: 'AGA16', weight: 0.6 },
      { model: 'Zhao06', weight: 0.4 },
    ],
  },
);

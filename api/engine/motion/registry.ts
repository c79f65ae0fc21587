import { aga16 } from './aga16.ts';
import { ask14 } from './ask14.ts';
import { bssa14 } from './bssa14.ts';
import { createModelCatalog, type ModelCatalog } from './catalog.ts';
import { cb14 } from './cb14.ts';
import { cornell79 } from './cornell79.ts';
import { cy14 } from './cy14.ts';

/**
 * The ground-motion models a study may name, and the branches a tectonic setting gets when a
 * study names none: for crustal earthquakes the two NGA-West2 models with equal weight, for
 * subduction earthquakes AGA16 (the only subduction model here). Cornell79 is kept for textbook
 * checks of the hazard integral, not for screening.
 */
export const modelCatalog: ModelCatalog = createModelCatalog([bssa14, cb14, ask14, cy14, aga16, cornell79], {
  crustal: [
    { model: 'BSSA14', weight: 0.5 },
    { model: 'CB14', weight: 0.5 },
  ],
  interface: [{ model: 'AGA16', weight: 1 }],
  intraslab: [{ model: 'AGA16', weight: 1 }],
});

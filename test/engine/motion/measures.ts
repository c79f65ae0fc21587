import type { Measure } from '../../../api/engine/motion/measure.ts';

/** The measures the model tests ask for (measure.ts): PGA and SA in g, PGV in cm/s. */
export const PGA: Measure = { kind: 'PGA' };
export const PGV: Measure = { kind: 'PGV' };
export const sa = (periodS: number): Measure => ({ kind: 'SA', periodS });

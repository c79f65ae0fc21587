import { describe, it } from 'vitest';
import { ask14 } from '../../../api/engine/motion/ask14.ts';
import { cy14 } from '../../../api/engine/motion/cy14.ts';
import type { SiteContext } from '../../../api/engine/motion/types.ts';
import type { Measure } from '../../../api/engine/motion/measure.ts';
import {
  checkPreparedAcrossSites,
  checkPreparedMeasures,
  checkPreparedModel,
  checkSiteOrder,
} from './prepared-checks.ts';
import { expectFastPathMatchesVector, readVectors } from './reference-vectors.ts';
import { sa } from './measures.ts';

// ASK14 and CY14 through the fast path (split-prepare.ts over the models' own rupture terms and
// pair predictions): the same numbers as predict(), and the reference vectors of Abrahamson,
// Silva & Kamai (2014) and Chiou & Youngs (2014) (pygmm 0.8.0; vectors/README.md) within 1e-4.
const MEASURES: Measure[] = [{ kind: 'PGA' }, { kind: 'PGV' }, sa(0.2), sa(1), sa(0.12), sa(2.5)];

describe('ASK14 and CY14 fast path', () => {
  for (const [model, file, source] of [
    [ask14, 'ask14.json', 'Abrahamson, Silva & Kamai (2014), reference vectors (pygmm 0.8.0)'],
    [cy14, 'cy14.json', 'Chiou & Youngs (2014), reference vectors (pygmm 0.8.0)'],
  ] as const) {
    it(`${model.name}: gives predict()'s ln median, σ and applicability within 1e-12`, () => {
      checkPreparedModel(model, MEASURES, ['crustal', 'crustal', 'interface'], 40);
      checkPreparedMeasures(model, MEASURES, ['crustal'], 20);
    });
    it(`${model.name}: one prepared model at sites of one Vs30 after another gives predict()'s numbers within 1e-12`, () => {
      checkPreparedAcrossSites(model, MEASURES, 'crustal');
    });
    it(`${model.name}: every reference vector within 1e-4 through the fast path`, () => {
      for (const c of readVectors(file).cases) expectFastPathMatchesVector(model, c, source);
    });
  }
});

describe('ASK14 and CY14 site parts', () => {
  // Vs30 250 and 760 m/s, each measured, then Z1 given at 250 m/s with Vs30 measured and not.
  const Z1_SITES: readonly SiteContext[] = [
    { vs30: 250, vs30Measured: true },
    { vs30: 760, vs30Measured: true },
    { vs30: 250, vs30Measured: true, z1Km: 0.05 },
    { vs30: 250, vs30Measured: false, z1Km: 0.6 },
  ];

  it('ASK14 gives each site the same numbers whatever site came before (site parts kept per row are renewed when Vs30 or Z1 changes)', () => {
    // Below and above Vlin (nonlinear site term and slope, linear), above V1, Z1 given and not.
    checkSiteOrder(ask14, [...Z1_SITES, { vs30: 1400, vs30Measured: true }]);
  });
  it('CY14 gives each site the same numbers whatever site came before (site parts renewed when Vs30 or Z1 changes)', () => {
    // Below and above the reference 1130 m/s (linear term, nonlinear strength), Z1 given and not.
    checkSiteOrder(cy14, [...Z1_SITES, { vs30: 1300, vs30Measured: true }]);
  });
});

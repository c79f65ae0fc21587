import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Study } from '../../../api/engine/model.ts';
import { createModelCatalog } from '../../../api/engine/motion/catalog.ts';
import { cornell79 } from '../../../api/engine/motion/cornell79.ts';
import { modelCatalog } from '../../../api/engine/motion/registry.ts';
import type { GroundMotionModel } from '../../../api/engine/motion/types.ts';
import { screenStudy } from '../../../api/engine/screen-study.ts';
import { referenceScreening } from '../../helpers/reference-hazard/reference-screening.ts';
import { expectScreeningMatches } from '../fast-path-checks.ts';
import { allKindsStudy } from '../fixtures/all-kinds-study.ts';
import { FRAME, pointKm } from '../geometry/km-fixtures.ts';

// The engine's screening (fast-site-hazard.ts and the models' hooks) against the plain sum of
// test/helpers/reference-hazard/, whole screenings compared field by field (fast-path-checks.ts).
describe('the screening against the plain reference sum', () => {
  it('every source kind and model (BSSA14, CB14, AGA16, PGV from SA), soft to rock sites, two return periods', () => {
    const study = allKindsStudy();
    expectScreeningMatches(screenStudy(study), referenceScreening(study));
  });

  it('at truncation 0 (median only), 2σ and untruncated, the three ways the exceedance is summed', () => {
    const base = allKindsStudy({ measures: ['PGA'] });
    const small: Study = {
      ...base,
      communities: base.communities.slice(0, 2),
      sources: base.sources.filter((s) => s.id !== 'background'),
    };
    for (const truncationSigma of [0, 2, Infinity]) {
      const study: Study = { ...small, settings: { ...small.settings, truncationSigma } };
      expectScreeningMatches(screenStudy(study), referenceScreening(study));
    }
  });

  it('a model without the precomputation hook is evaluated pair by pair, with the reference numbers', () => {
    const { prepare: _, ...rest } = cornell79;
    const plain: GroundMotionModel = { ...rest, name: 'Plain79' };
    const models = createModelCatalog(
      [...modelCatalog.names.map((n) => modelCatalog.get(n)), plain],
      modelCatalog.defaultBranches,
    );
    const base = allKindsStudy({ measures: ['PGA'] });
    const study: Study = {
      ...base,
      groundMotion: {
        ...base.groundMotion,
        crustal: [
          { model: 'Plain79', weight: 0.5 },
          { model: 'Cornell79', weight: 0.5 },
        ],
      },
    };
    expectScreeningMatches(screenStudy(study, { models }), referenceScreening(study, { models }));
  });

  it('property: random point sources and sites agree (fast-check)', () => {
    const sourceArb = fc.record({
      x: fc.double({ min: -150, max: 150, noNaN: true }),
      y: fc.double({ min: -150, max: 150, noNaN: true }),
      depthKm: fc.double({ min: 2, max: 25, noNaN: true }),
      mMin: fc.constantFrom(4.5, 5, 5.5),
      span: fc.constantFrom(0.5, 1, 2),
      rate: fc.double({ min: 1e-4, max: 0.1, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(sourceArb, { minLength: 1, maxLength: 4 }),
        fc.constantFrom(180, 300, 450, 760, 1200),
        (specs, vs30) => {
          const base = allKindsStudy({ measures: ['PGA', 'SA(1.0)'] });
          const sources = specs.map((s, i) => ({
            ...pointKm(
              s.x,
              s.y,
              {
                type: 'gutenberg-richter',
                bValue: 1,
                mMin: s.mMin,
                mMax: s.mMin + s.span,
                rate: s.rate,
              },
              s.depthKm,
            ),
            id: `p${i}`,
            name: `P${i}`,
          }));
          const [lon, lat] = FRAME.toLonLat({ x: 0, y: 0 });
          const study: Study = {
            ...base,
            sources,
            communities: [
              { id: 'site', name: 'Site', lon, lat, vs30, vs30Basis: 'measured', coastal: false },
            ],
          };
          expectScreeningMatches(screenStudy(study), referenceScreening(study));
        },
      ),
      { numRuns: 25, seed: 11 },
    );
  });

  it('the same study screens to the same numbers twice', () => {
    const study = allKindsStudy({ measures: ['PGA'] });
    expect(screenStudy(study)).toEqual(screenStudy(study));
  });
});

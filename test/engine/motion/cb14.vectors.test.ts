import { describe } from 'vitest';
import { cb14 } from '../../../api/engine/motion/cb14.ts';
import { expectModelMatchesVector, itEachVectorCase, readVectors } from './reference-vectors.ts';

// Independent test vectors of Campbell & Bozorgnia (2014), computed by pygmm 0.8.0 from the
// published Tables 1 and 2 plus the paper's PSA ≥ PGA rule below 0.25 s (vectors/README.md):
// California/global region, Z2.5 at the California default, the hanging-wall taper evaluated
// as published where R2 ≤ R1 (cases marked hangingWallR2LeR1).
const vectors = readVectors('cb14.json');
const SOURCE = 'Campbell & Bozorgnia (2014), reference vectors (pygmm 0.8.0)';

describe('CB14 against the reference vectors', () => {
  itEachVectorCase(vectors, (c) => {
    expectModelMatchesVector(cb14, c, SOURCE);
  });
});

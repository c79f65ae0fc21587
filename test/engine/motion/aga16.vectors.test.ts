import { describe, it } from 'vitest';
import { aga16 } from '../../../api/engine/motion/aga16.ts';
import { expectFastPathMatchesVector, expectMatchesVector, readVectors, vectorInput, vectorMeasure } from './reference-vectors.ts';

// Independent test vectors of Abrahamson, Gregor & Addo (2016), computed by pygmm 0.8.0 from the
// published Table 3 and constants (vectors/README.md): forearc sites, interface R = Rrup,
// intraslab R = Rhypo, PGA1000 at Vs30 = 1000 m/s, σ = √(φ² + τ²) = 0.73817.
const vectors = readVectors('aga16.json');
const SOURCE = 'Abrahamson, Gregor & Addo (2016), reference vectors (pygmm 0.8.0)';
// Intraslab cases carry the branch name "intraslab" (ΔC1 = −0.3, no branches): the central model.
const central = vectors.cases.filter((c) => c.deltaC1Branch === 'central' || c.deltaC1Branch === 'intraslab');

describe('AGA16 against the reference vectors', () => {
  it.each(central.map((c) => [c.id, c] as const))('%s (central ΔC1 or intraslab): ln median, τ, φ, σ within 1e-4', (_, c) => {
    expectMatchesVector(aga16.predict(vectorInput(c), vectorMeasure(c)), c, SOURCE);
    expectFastPathMatchesVector(aga16, c, SOURCE);
  });
});

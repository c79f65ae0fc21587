import { describe, it } from 'vitest';
import { aga16, aga16Lower, aga16Upper } from '../../../api/engine/motion/aga16.ts';
import { expectModelMatchesVector, readVectors } from './reference-vectors.ts';

// Independent test vectors of Abrahamson, Gregor & Addo (2016), computed by pygmm 0.8.0 from the
// published Table 3 and constants (vectors/README.md): forearc sites, interface R = Rrup,
// intraslab R = Rhypo, PGA1000 at Vs30 = 1000 m/s, σ = √(φ² + τ²) = 0.73817. The lower and
// upper ΔC1 branches rest on a single public record of the paper's ΔC1 table (provisional, as
// the reference README says); intraslab cases carry the branch name "intraslab" (ΔC1 = −0.3).
const vectors = readVectors('aga16.json');
const SOURCE = 'Abrahamson, Gregor & Addo (2016), reference vectors (pygmm 0.8.0)';
const MODEL_OF = {
  central: aga16,
  intraslab: aga16,
  lower: aga16Lower,
  upper: aga16Upper,
} as const;

describe('AGA16 and its ΔC1 branches against the reference vectors', () => {
  it.each(vectors.cases.map((c) => [c.id, c.deltaC1Branch as keyof typeof MODEL_OF, c] as const))(
    '%s (%s ΔC1): ln median, τ, φ, σ within 1e-4',
    (_, branch, c) => {
      const model = MODEL_OF[branch];
      expectModelMatchesVector(model, c, `${SOURCE}, ${model.name}`);
    },
  );
});

import { describe, expect } from 'vitest';
import { zhao06, zhao06Msq, zhao06SiteClass } from '../../../api/engine/motion/zhao06.ts';
import { expectModelMatchesVector, itEachVectorCase, readVectors } from './reference-vectors.ts';

// Independent test vectors of Zhao et al. (2006): an independent transcription of the paper's
// equations with the published coefficients, checked against a port of a public record to
// 5e-10 (vectors/README.md). Crustal, interface and intraslab events, all five site classes,
// each with and without the magnitude-squared term; y converted to g with 980.665 cm/s².
const vectors = readVectors('zhao06.json');
const SOURCE = 'Zhao et al. (2006), reference vectors (independent transcription)';

describe('Zhao06 against the reference vectors', () => {
  itEachVectorCase(vectors, (c) => {
    const model = c.magnitudeSquaredTerm ? zhao06Msq : zhao06;
    expect(zhao06SiteClass(c.vs30), `${SOURCE}, case ${c.id}: site class`).toBe(c.siteClass);
    expectModelMatchesVector(model, c, `${SOURCE}, ${model.name}`);
  });
});

import fc from 'fast-check';

/**
 * Property tests draw from one fixed seed, so a run on a clean clone draws the same cases as the
 * run before it and a failure can be replayed. Set TREMORA_PROPERTY_SEED to another integer to
 * explore further cases, or to `random` for a fresh seed each run (fast-check prints it on failure).
 */
const requested = process.env.TREMORA_PROPERTY_SEED;
if (requested !== 'random') {
  const seed =
    requested === undefined || requested === '' ? 20_261_202 : Number.parseInt(requested, 10);
  if (!Number.isInteger(seed)) {
    throw new Error(`TREMORA_PROPERTY_SEED: expected an integer or "random", got "${requested}"`);
  }
  fc.configureGlobal({ seed });
}

/**
 * Most catalog events × communities one felt history computes, on the request thread (no worker
 * task exists for it yet). A pair took about 70 µs with the demo's models on one core (measured
 * once, not asserted), so this caps a request at a few seconds; the demo is 540 × 11 = 5940.
 */
export const FELT_PAIR_BUDGET = 50_000;

/** Most events one stateless fit declusters, on the request thread: 50 000 took about 1 s (measured once). */
export const FIT_EVENT_BUDGET = 50_000;

/**
 * The bins of a magnitude–distance–epsilon deaggregation (choices stated here, in one place).
 *
 * - Magnitude: 0.5 wide, edges on multiples of 0.5 (5.0–5.5, 5.5–6.0, ...). A magnitude on an
 *   edge goes to the bin above; 1e-9 absorbs the rounding of bin centres such as 5 + 15 × 0.1.
 * - Distance: Rrup (closest distance to the rupture, the one every setting shares), edges
 *   0, 10, 20, 40, 60, 100, 150, 200, 300, 500, 1000 km, then every 500 km beyond.
 * - Epsilon: edges −2, −1, 0, 1, 2; the two outer bins are open-ended and reported with the
 *   smallest whole numbers that hold every ε in them (at least −3 and 3).
 */
export const MAGNITUDE_BIN_WIDTH = 0.5;
export const DISTANCE_EDGES_KM: readonly number[] = [
  0, 10, 20, 40, 60, 100, 150, 200, 300, 500, 1000,
];
const DISTANCE_STEP_BEYOND_KM = 500;
export const EPSILON_EDGES: readonly number[] = [-2, -1, 0, 1, 2];

const EDGE_SLACK = 1e-9;

export function magnitudeBin(magnitude: number): number {
  return Math.floor(magnitude / MAGNITUDE_BIN_WIDTH + EDGE_SLACK);
}

export function magnitudeBinRange(bin: number): [number, number] {
  return [bin * MAGNITUDE_BIN_WIDTH, (bin + 1) * MAGNITUDE_BIN_WIDTH];
}

const lastEdgeKm = DISTANCE_EDGES_KM[DISTANCE_EDGES_KM.length - 1] as number;

export function distanceBin(distanceKm: number): number {
  if (distanceKm >= lastEdgeKm) {
    return (
      DISTANCE_EDGES_KM.length - 1 + Math.floor((distanceKm - lastEdgeKm) / DISTANCE_STEP_BEYOND_KM)
    );
  }
  let bin = 0;
  while (distanceKm >= (DISTANCE_EDGES_KM[bin + 1] as number)) bin++;
  return bin;
}

export function distanceBinRange(bin: number): [number, number] {
  const edge = (i: number): number =>
    i < DISTANCE_EDGES_KM.length
      ? (DISTANCE_EDGES_KM[i] as number)
      : lastEdgeKm + (i - DISTANCE_EDGES_KM.length + 1) * DISTANCE_STEP_BEYOND_KM;
  return [edge(bin), edge(bin + 1)];
}

/** 0 for ε < −2, ..., EPSILON_EDGES.length for ε >= 2. */
export function epsilonBin(epsilon: number): number {
  let bin = 0;
  while (bin < EPSILON_EDGES.length && epsilon >= (EPSILON_EDGES[bin] as number)) bin++;
  return bin;
}

/** The bin's edges; the outer bins closed with the observed extremes, rounded outwards. */
export function epsilonBinRange(
  bin: number,
  minEpsilon: number,
  maxEpsilon: number,
): [number, number] {
  const lower =
    bin === 0 ? Math.min(-3, Math.floor(minEpsilon)) : (EPSILON_EDGES[bin - 1] as number);
  const upper =
    bin === EPSILON_EDGES.length
      ? Math.max(3, Math.ceil(maxEpsilon))
      : (EPSILON_EDGES[bin] as number);
  return [lower, upper];
}

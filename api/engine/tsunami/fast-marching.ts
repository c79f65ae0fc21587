/**
 * First-arrival times on a square grid by the fast marching method: the viscosity solution of
 * the eikonal equation |∇T| = s(x, y), s the slowness (1 / speed), built outward from the
 * source in order of increasing time with a binary heap (Sethian 1996, "A fast marching level
 * set method for monotonically advancing fronts", PNAS 93(4):1591–1595). The update uses the
 * second-order one-sided differences where the two upwind neighbours along an axis are both
 * accepted and in order, and first-order ones otherwise (Sethian 1999, "Level Set Methods and
 * Fast Marching Methods", 2nd ed., Cambridge, section 8.3, from memory). Cells with infinite or
 * NaN slowness are never entered: they block the front (land, for a tsunami).
 */

export interface FastMarchingGrid {
  readonly columns: number;
  readonly rows: number;
  /** Side of a square cell, km. */
  readonly spacingKm: number;
  /** Slowness of each cell, s/km, row-major; Infinity (or NaN) blocks the cell. */
  readonly slownessSPerKm: Float64Array;
}

/** A cell whose time is known before marching: the source. */
export interface StartCell {
  readonly index: number;
  readonly timeS: number;
}

const FAR = 0;
const TRIAL = 1;
const ACCEPTED = 2;

/**
 * Travel time to every cell from the start cells, s; Infinity where the front never arrives.
 * Start cells on blocked cells are ignored.
 */
export function fastMarching(grid: FastMarchingGrid, start: readonly StartCell[]): Float64Array {
  const { columns, rows, spacingKm: h, slownessSPerKm: slowness } = grid;
  const count = columns * rows;
  const time = new Float64Array(count).fill(Infinity);
  const state = new Uint8Array(count);
  const heap = new TimeHeap(count, time);
  const open = (i: number) => {
    const s = slowness[i] as number;
    return s < Infinity && !Number.isNaN(s);
  };

  for (const { index, timeS } of start) {
    if (index < 0 || index >= count || !open(index) || !(timeS < (time[index] as number))) continue;
    time[index] = timeS;
    if (state[index] === TRIAL) heap.decreased(index);
    else {
      state[index] = TRIAL;
      heap.push(index);
    }
  }

  // Time of cell i from its accepted neighbours along one axis (dx = ±1 or ±columns).
  const axis = (i: number, step: number, first: boolean, secondOk: boolean): { t1: number; t2: number } => {
    const n1 = i + step;
    if (!first || state[n1] !== ACCEPTED) return { t1: Infinity, t2: Infinity };
    const t1 = time[n1] as number;
    const n2 = n1 + step;
    const t2 = secondOk && state[n2] === ACCEPTED ? (time[n2] as number) : Infinity;
    return { t1, t2 };
  };

  const update = (i: number) => {
    const c = i % columns;
    const r = (i - c) / columns;
    const west = axis(i, -1, c > 0, c > 1);
    const east = axis(i, 1, c < columns - 1, c < columns - 2);
    const north = axis(i, -columns, r > 0, r > 1);
    const south = axis(i, columns, r < rows - 1, r < rows - 2);
    const t = solveUpdate(pick(west, east), pick(north, south), (slowness[i] as number) * h);
    if (t < (time[i] as number)) {
      time[i] = t;
      if (state[i] === TRIAL) heap.decreased(i);
      else {
        state[i] = TRIAL;
        heap.push(i);
      }
    }
  };

  while (heap.size > 0) {
    const i = heap.pop();
    state[i] = ACCEPTED;
    const c = i % columns;
    if (c > 0) visit(i - 1);
    if (c < columns - 1) visit(i + 1);
    if (i >= columns) visit(i - columns);
    if (i + columns < count) visit(i + columns);
  }
  return time;

  function visit(n: number) {
    if (state[n] !== ACCEPTED && open(n)) update(n);
  }
}

/** The upwind side of one axis: the smaller first neighbour, with its second when usable. */
function pick(a: { t1: number; t2: number }, b: { t1: number; t2: number }): { t1: number; t2: number } {
  return a.t1 <= b.t1 ? a : b;
}

/**
 * Solves Σ_axes a_k (T − τ_k)² = (s h)² for the larger root, where per axis a_k = 1 and τ_k = t1
 * (first order) or a_k = 9/4 and τ_k = (4 t1 − t2) / 3 (second order, when t2 ≤ t1). When two
 * axes give no real root no smaller than both τ, the one-axis answer of the earlier axis is
 * taken (the front passes along that axis only).
 */
function solveUpdate(x: { t1: number; t2: number }, y: { t1: number; t2: number }, sh: number): number {
  const terms: { a: number; tau: number }[] = [];
  for (const side of [x, y]) {
    if (side.t1 === Infinity) continue;
    if (side.t2 <= side.t1) terms.push({ a: 9 / 4, tau: (4 * side.t1 - side.t2) / 3 });
    else terms.push({ a: 1, tau: side.t1 });
  }
  if (terms.length === 0) return Infinity;
  terms.sort((p, q) => p.tau - q.tau);
  const one = (k: { a: number; tau: number }) => k.tau + sh / Math.sqrt(k.a);
  const first = terms[0] as { a: number; tau: number };
  const second = terms[1];
  if (second === undefined) return one(first);
  const sumA = first.a + second.a;
  const sumAT = first.a * first.tau + second.a * second.tau;
  const sumAT2 = first.a * first.tau * first.tau + second.a * second.tau * second.tau;
  const disc = sumAT * sumAT - sumA * (sumAT2 - sh * sh);
  if (disc < 0) return one(first);
  const t = (sumAT + Math.sqrt(disc)) / sumA;
  return t >= second.tau ? t : one(first);
}

/** A binary min-heap of cell indices keyed by `time`, with decrease-key through a position map. */
class TimeHeap {
  private readonly cells: Int32Array;
  private readonly position: Int32Array;
  size = 0;

  constructor(capacity: number, private readonly time: Float64Array) {
    this.cells = new Int32Array(capacity);
    this.position = new Int32Array(capacity).fill(-1);
  }

  push(cell: number): void {
    this.cells[this.size] = cell;
    this.position[cell] = this.size;
    this.size += 1;
    this.up(this.size - 1);
  }

  pop(): number {
    const top = this.cells[0] as number;
    this.size -= 1;
    if (this.size > 0) {
      this.place(this.cells[this.size] as number, 0);
      this.down(0);
    }
    this.position[top] = -1;
    return top;
  }

  decreased(cell: number): void {
    this.up(this.position[cell] as number);
  }

  private key(at: number): number {
    return this.time[this.cells[at] as number] as number;
  }

  private place(cell: number, at: number): void {
    this.cells[at] = cell;
    this.position[cell] = at;
  }

  private up(at: number): void {
    const cell = this.cells[at] as number;
    const key = this.time[cell] as number;
    while (at > 0) {
      const parent = (at - 1) >> 1;
      if (this.key(parent) <= key) break;
      this.place(this.cells[parent] as number, at);
      at = parent;
    }
    this.place(cell, at);
  }

  private down(at: number): void {
    const cell = this.cells[at] as number;
    const key = this.time[cell] as number;
    for (;;) {
      const left = 2 * at + 1;
      if (left >= this.size) break;
      const right = left + 1;
      const child = right < this.size && this.key(right) < this.key(left) ? right : left;
      if (this.key(child) >= key) break;
      this.place(this.cells[child] as number, at);
      at = child;
    }
    this.place(cell, at);
  }
}

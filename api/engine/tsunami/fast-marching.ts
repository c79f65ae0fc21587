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

// State 0 is far (not reached yet): the state array starts at 0.
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

  // The upwind neighbours of cell i along one axis (step ±1 or ±columns): the accepted first
  // neighbour with the smaller time, and the next one beyond it when accepted too (else Infinity).
  let t1 = Infinity,
    t2 = Infinity;
  const axis = (
    i: number,
    step: number,
    lowOk: boolean,
    lowOk2: boolean,
    highOk: boolean,
    highOk2: boolean,
  ) => {
    t1 = Infinity;
    t2 = Infinity;
    if (lowOk && state[i - step] === ACCEPTED) {
      t1 = time[i - step] as number;
      if (lowOk2 && state[i - 2 * step] === ACCEPTED) t2 = time[i - 2 * step] as number;
    }
    if (highOk && state[i + step] === ACCEPTED && (time[i + step] as number) < t1) {
      t1 = time[i + step] as number;
      t2 = highOk2 && state[i + 2 * step] === ACCEPTED ? (time[i + 2 * step] as number) : Infinity;
    }
  };

  const update = (i: number) => {
    const c = i % columns;
    const r = (i - c) / columns;
    axis(i, 1, c > 0, c > 1, c < columns - 1, c < columns - 2);
    const x1 = t1,
      x2 = t2;
    axis(i, columns, r > 0, r > 1, r < rows - 1, r < rows - 2);
    const t = solveUpdate(x1, x2, t1, t2, (slowness[i] as number) * h);
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

/**
 * Solves Σ_axes a_k (T − τ_k)² = (s h)² for the larger root, where per axis a_k = 1 and τ_k = t1
 * (first order) or a_k = 9/4 and τ_k = (4 t1 − t2) / 3 (second order, when t2 ≤ t1). When two
 * axes give no real root no smaller than both τ, the one-axis answer of the nearer axis is
 * taken (the front passes along that axis only).
 */
function solveUpdate(x1: number, x2: number, y1: number, y2: number, sh: number): number {
  if (x1 === Infinity && y1 === Infinity) return Infinity;
  const ax = x2 <= x1 ? 9 / 4 : 1,
    tx = x2 <= x1 ? (4 * x1 - x2) / 3 : x1;
  const ay = y2 <= y1 ? 9 / 4 : 1,
    ty = y2 <= y1 ? (4 * y1 - y2) / 3 : y1;
  if (y1 === Infinity) return tx + sh / Math.sqrt(ax);
  if (x1 === Infinity) return ty + sh / Math.sqrt(ay);
  const oneAxis = tx <= ty ? tx + sh / Math.sqrt(ax) : ty + sh / Math.sqrt(ay);
  const sumA = ax + ay;
  const sumAT = ax * tx + ay * ty;
  const disc = sumAT * sumAT - sumA * (ax * tx * tx + ay * ty * ty - sh * sh);
  if (disc < 0) return oneAxis;
  const t = (sumAT + Math.sqrt(disc)) / sumA;
  return t >= Math.max(tx, ty) ? t : oneAxis;
}

/** A binary min-heap of cell indices keyed by `time`, with decrease-key through a position map. */
class TimeHeap {
  private readonly cells: Int32Array;
  private readonly position: Int32Array;
  size = 0;

  constructor(
    capacity: number,
    private readonly time: Float64Array,
  ) {
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

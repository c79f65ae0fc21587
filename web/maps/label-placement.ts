/**
 * Map labels placed greedily so they do not overlap each other or the markers: for each label
 * in turn (the caller's order: most important first), the first of right, left, above, below
 * its point (then of its alternative points) whose box is clear of those already placed and
 * inside the map; if none is clear, the one overlapping least. Text width is estimated at 0.6 em per character (common practice
 * for sans-serif text where nothing is measured on the server).
 */
export interface LabelRequest {
  readonly x: number;
  readonly y: number;
  /** Other points the label may sit beside (along a fault trace), tried after (x, y). */
  readonly alternatives?: readonly (readonly [number, number])[];
  readonly text: string;
  readonly fontSize: number;
  /** Half the size of the marker the label belongs to, px. */
  readonly clearance: number;
}

export interface PlacedLabel {
  readonly x: number;
  readonly y: number;
  readonly anchor: 'start' | 'end' | 'middle';
}

interface Box {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

const EM_PER_CHARACTER = 0.6;

const overlap = (a: Box, b: Box): number =>
  Math.max(0, Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0)) *
  Math.max(0, Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0));

/** Label positions (text anchor points) for `labels` on a map `width` × `height` px. */
export function placeLabels(
  labels: readonly LabelRequest[],
  width: number,
  height: number,
  obstacles: readonly Box[] = [],
): PlacedLabel[] {
  const taken: Box[] = [...obstacles];
  for (const l of labels)
    taken.push({
      x0: l.x - l.clearance,
      y0: l.y - l.clearance,
      x1: l.x + l.clearance,
      y1: l.y + l.clearance,
    });
  return labels.map((l) => {
    const w = l.text.length * l.fontSize * EM_PER_CHARACTER;
    const h = l.fontSize;
    const gap = l.clearance + 3;
    const candidates: { placed: PlacedLabel; box: Box }[] = [];
    for (const [px, py] of [[l.x, l.y] as const, ...(l.alternatives ?? [])]) {
      candidates.push(
        {
          placed: { x: px + gap, y: py + h * 0.35, anchor: 'start' },
          box: { x0: px + gap, y0: py - h * 0.65, x1: px + gap + w, y1: py + h * 0.35 },
        },
        {
          placed: { x: px - gap, y: py + h * 0.35, anchor: 'end' },
          box: { x0: px - gap - w, y0: py - h * 0.65, x1: px - gap, y1: py + h * 0.35 },
        },
        {
          placed: { x: px, y: py - gap - 2, anchor: 'middle' },
          box: { x0: px - w / 2, y0: py - gap - 2 - h, x1: px + w / 2, y1: py - gap - 2 },
        },
        {
          placed: { x: px, y: py + gap + h, anchor: 'middle' },
          box: { x0: px - w / 2, y0: py + gap, x1: px + w / 2, y1: py + gap + h },
        },
      );
    }
    const own: Box = {
      x0: l.x - l.clearance,
      y0: l.y - l.clearance,
      x1: l.x + l.clearance,
      y1: l.y + l.clearance,
    };
    let best = candidates[0] as (typeof candidates)[number];
    let bestCost = Infinity;
    for (const c of candidates) {
      const outside =
        c.box.x0 < 0 || c.box.x1 > width || c.box.y0 < 0 || c.box.y1 > height ? w * h : 0;
      const cost =
        outside +
        taken.reduce(
          (sum, t) =>
            t === own || (t.x0 === own.x0 && t.y0 === own.y0) ? sum : sum + overlap(c.box, t),
          0,
        );
      if (cost < bestCost) {
        best = c;
        bestCost = cost;
      }
      if (cost === 0) break;
    }
    taken.push(best.box);
    return best.placed;
  });
}

/**
 * Whether lines or rings cross or touch themselves or each other: the test turf's kinks makes
 * (segment against segment, touching ends included; neighbouring segments of one line, and the
 * first and last of a closed one, are not compared; parallel segments never count), but with
 * the segments swept in order of their west end so that only those whose boxes overlap are
 * compared (the sweep of Shamos & Hoey 1976, without their ordered status). turf compares every
 * pair: about a second, on the service's own thread, for a trace of 5,000 vertices zig-zagging
 * along one line; this compares each segment with the few beside it. Pairs whose boxes miss
 * each other only by rounding would be missed, where turf might find a touch.
 */
type Position = readonly number[];

interface Segment {
  readonly line: number;
  readonly index: number;
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
  readonly west: number;
  readonly east: number;
  readonly south: number;
  readonly north: number;
}

/**
 * Whether segments a and b meet (turf kinks' lineIntersects: the parameters of the crossing on
 * both segments within [0, 1] inclusive; parallel segments, denominator 0, never meet).
 */
function meet(a: Segment, b: Segment): boolean {
  const denominator = (b.y1 - b.y0) * (a.x1 - a.x0) - (b.x1 - b.x0) * (a.y1 - a.y0);
  if (denominator === 0) return false;
  const dy = a.y0 - b.y0;
  const dx = a.x0 - b.x0;
  const along = ((b.x1 - b.x0) * dy - (b.y1 - b.y0) * dx) / denominator;
  const across = ((a.x1 - a.x0) * dy - (a.y1 - a.y0) * dx) / denominator;
  return along >= 0 && along <= 1 && across >= 0 && across <= 1;
}

/** `lines`: lon/lat positions of each line or ring (a ring repeats its first position last). */
export function crossesItself(lines: readonly (readonly Position[])[]): boolean {
  const segments: Segment[] = [];
  const closed = lines.map((line) => {
    const first = line[0];
    const last = line[line.length - 1];
    return (
      first !== undefined && last !== undefined && first[0] === last[0] && first[1] === last[1]
    );
  });
  lines.forEach((line, l) => {
    for (let i = 0; i + 1 < line.length; i++) {
      const [x0, y0] = line[i] as [number, number];
      const [x1, y1] = line[i + 1] as [number, number];
      segments.push({
        line: l,
        index: i,
        x0,
        y0,
        x1,
        y1,
        west: Math.min(x0, x1),
        east: Math.max(x0, x1),
        south: Math.min(y0, y1),
        north: Math.max(y0, y1),
      });
    }
  });
  const compared = (a: Segment, b: Segment): boolean => {
    if (a.line !== b.line) return true;
    const gap = Math.abs(a.index - b.index);
    const lastIndex = (lines[a.line]?.length ?? 0) - 2;
    return gap > 1 && !(closed[a.line] && gap === lastIndex);
  };
  segments.sort((a, b) => a.west - b.west);
  let active: Segment[] = [];
  for (const segment of segments) {
    active = active.filter((other) => other.east >= segment.west);
    for (const other of active) {
      if (other.north < segment.south || other.south > segment.north) continue;
      if (!compared(segment, other)) continue;
      // Within one line turf takes the earlier segment first; across lines it tries both orders.
      const [first, second] = other.index <= segment.index ? [other, segment] : [segment, other];
      if (meet(first, second) || (segment.line !== other.line && meet(second, first))) return true;
    }
    active.push(segment);
  }
  return false;
}

/**
 * Where to write the names of points on a chart so that no two names overlap: a greedy
 * placement (common practice in map and chart labelling; cf. Christensen, Marks and Shieber,
 * "An empirical study of algorithms for point-feature label placement", ACM Transactions on
 * Graphics 14(3), 1995, from memory: the simplest method it compares). Each label, in the order given (the
 * caller puts the most important first), takes the first of eight spots around its point that
 * stays inside the plot, overlaps no label already placed, covers no point, and lies nearer its
 * own point than any other point (so a reader can tell whose name it is); among those, a spot
 * touching fewer areas to avoid wins. A label with no such spot is left out, and the caller lists
 * it beside the chart so that no run goes unnamed.
 * Cost O(n^2 * 8) for n labels and points: a chart has at most a few hundred runs.
 * Pure geometry in CSS pixels; no DOM.
 */

/** A rectangle: left, top, width, height (y grows downwards, as on a screen). */
export type Box = { readonly x: number; readonly y: number; readonly w: number; readonly h: number };

export type LabelRequest = {
  readonly id: string;
  /** The point's centre. */
  readonly x: number;
  readonly y: number;
  /** The label's size. */
  readonly w: number;
  readonly h: number;
};

export type LabelLayout = {
  /** Placed labels with their boxes, in the order asked. */
  readonly placed: readonly { readonly id: string; readonly box: Box }[];
  /** The ids that found no free spot, in the order asked. */
  readonly left: readonly string[];
};

export type PlaceOptions = {
  /** The area labels must stay inside (the plot). */
  readonly bounds: Box;
  /** Distance from the point's centre to the label's nearest edge (clear of its ring). */
  readonly gap: number;
  /** Areas a label must never cover (the points, and the rings of marked points). */
  readonly keepClear?: readonly Box[];
  /** Every point's centre: a label may not lie nearer to another point than to its own. */
  readonly points?: readonly { readonly x: number; readonly y: number }[];
  /** Areas a label should avoid covering when it can (plain points). */
  readonly avoid?: readonly Box[];
};

/** Two boxes overlap when they share area; boxes that only touch along an edge do not, nor does an empty box. */
export function overlaps(a: Box, b: Box): boolean {
  if (!(a.w > 0 && a.h > 0 && b.w > 0 && b.h > 0)) return false;
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/** Distance from a point to the nearest point of a box (0 inside it). */
export function distanceToBox(x: number, y: number, b: Box): number {
  const dx = Math.max(b.x - x, 0, x - (b.x + b.w));
  const dy = Math.max(b.y - y, 0, y - (b.y + b.h));
  return Math.hypot(dx, dy);
}

function inside(a: Box, b: Box): boolean {
  return a.x >= b.x && a.y >= b.y && a.x + a.w <= b.x + b.w && a.y + a.h <= b.y + b.h;
}

/** The eight spots around a point, in the order of preference: right, left, then the corners, then above and below. */
function spots(r: LabelRequest, gap: number): Box[] {
  const { x, y, w, h } = r;
  const mid = y - h / 2;
  const d = gap * Math.SQRT1_2;
  return [
    { x: x + gap, y: mid, w, h },
    { x: x - gap - w, y: mid, w, h },
    { x: x + d, y: y - d - h, w, h },
    { x: x + d, y: y + d, w, h },
    { x: x - d - w, y: y - d - h, w, h },
    { x: x - d - w, y: y + d, w, h },
    { x: x - w / 2, y: y - gap - h, w, h },
    { x: x - w / 2, y: y + gap, w, h },
  ];
}

/**
 * Places the labels (see the module comment). Never throws; labels with a non-finite position
 * or size are left out.
 * Example: two labels 40x16 at the same point (100, 100) with gap 10 in a 300x200 plot: the
 * first goes right of it ({ x: 110, y: 92 }), the second left ({ x: 50, y: 92 }), none left out.
 */
export function placeLabels(requests: readonly LabelRequest[], options: PlaceOptions): LabelLayout {
  const { bounds, gap, keepClear = [], avoid = [], points = [] } = options;
  const placed: { id: string; box: Box }[] = [];
  const left: string[] = [];
  for (const r of requests) {
    if (![r.x, r.y, r.w, r.h].every(Number.isFinite) || r.w < 0 || r.h < 0) {
      left.push(r.id);
      continue;
    }
    let best: Box | null = null;
    let bestCost = Infinity;
    for (const s of spots(r, gap)) {
      if (!inside(s, bounds)) continue;
      if (placed.some((p) => overlaps(p.box, s)) || keepClear.some((k) => overlaps(k, s))) continue;
      const own = distanceToBox(r.x, r.y, s);
      if (points.some((q) => distanceToBox(q.x, q.y, s) < own)) continue;
      const cost = avoid.reduce((c, a) => c + (overlaps(a, s) ? 1 : 0), 0);
      if (cost < bestCost) (best = s), (bestCost = cost);
      if (cost === 0) break;
    }
    if (best) placed.push({ id: r.id, box: best });
    else left.push(r.id);
  }
  return { placed, left };
}

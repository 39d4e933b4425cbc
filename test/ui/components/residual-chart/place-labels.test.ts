import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { distanceToBox, overlaps, placeLabels, type Box } from '../../../../src/ui/components/residual-chart/place-labels.ts';

// Geometry checks of our own (no published figures): the promises of the placement are that no
// two placed labels overlap, each stays in the plot and clear of the rings, and every label is
// either placed or reported as left out, once.
const plot: Box = { x: 0, y: 0, w: 300, h: 200 };
const ring = (x: number, y: number): Box => ({ x: x - 11, y: y - 11, w: 22, h: 22 });

describe('overlaps', () => {
  it('boxes sharing area overlap; boxes touching along an edge do not', () => {
    expect(overlaps({ x: 0, y: 0, w: 10, h: 10 }, { x: 5, y: 5, w: 10, h: 10 })).toBe(true);
    expect(overlaps({ x: 0, y: 0, w: 10, h: 10 }, { x: 10, y: 0, w: 10, h: 10 })).toBe(false);
    expect(overlaps({ x: 0, y: 0, w: 10, h: 10 }, { x: 2, y: 2, w: 2, h: 2 })).toBe(true);
  });
  it('degenerate: an empty box overlaps nothing', () => {
    expect(overlaps({ x: 5, y: 5, w: 0, h: 0 }, { x: 0, y: 0, w: 10, h: 10 })).toBe(false);
  });
});

describe('placeLabels', () => {
  it('two labels on one point go right, then left of it (the module\'s example)', () => {
    const r = placeLabels(
      [
        { id: 'a', x: 100, y: 100, w: 40, h: 16 },
        { id: 'b', x: 100, y: 100, w: 40, h: 16 },
      ],
      { bounds: plot, gap: 10 },
    );
    expect(r.placed).toEqual([
      { id: 'a', box: { x: 110, y: 92, w: 40, h: 16 } },
      { id: 'b', box: { x: 50, y: 92, w: 40, h: 16 } },
    ]);
    expect(r.left).toEqual([]);
  });

  it('a point at the right edge gets its label on the left, inside the plot', () => {
    const r = placeLabels([{ id: 'a', x: 295, y: 100, w: 40, h: 16 }], { bounds: plot, gap: 10 });
    expect(r.placed[0].box.x + r.placed[0].box.w).toBeLessThanOrEqual(300);
  });

  it('nine labels on one point: the first take the free spots (at most eight), the rest are left out, in order', () => {
    const many = Array.from({ length: 9 }, (_, i) => ({ id: `run ${i + 1}`, x: 150, y: 100, w: 20, h: 12 }));
    const r = placeLabels(many, { bounds: plot, gap: 12 });
    const k = r.placed.length;
    expect(k).toBeGreaterThanOrEqual(2);
    expect(k).toBeLessThanOrEqual(8);
    expect(r.placed.map((p) => p.id)).toEqual(many.slice(0, k).map((m) => m.id));
    expect(r.left).toEqual(many.slice(k).map((m) => m.id));
  });

  it('a plain point is avoided when another spot is free, and a ring is never covered', () => {
    const plain = { x: 115, y: 95, w: 10, h: 10 };
    const r = placeLabels([{ id: 'a', x: 100, y: 100, w: 30, h: 14 }], { bounds: plot, gap: 10, avoid: [plain], keepClear: [ring(60, 100)] });
    expect(overlaps(r.placed[0].box, plain)).toBe(false);
    expect(overlaps(r.placed[0].box, ring(60, 100))).toBe(false);
  });

  it('a label is never nearer another point than its own: a neighbour on the right sends it left', () => {
    const r = placeLabels([{ id: 'a', x: 100, y: 100, w: 30, h: 14 }], { bounds: plot, gap: 10, points: [{ x: 100, y: 100 }, { x: 140, y: 100 }] });
    // Right of it (110..140) would touch the neighbour at 140; left (60..90) is 10 from its own point and 50 from the other.
    expect(r.placed[0].box).toEqual({ x: 60, y: 93, w: 30, h: 14 });
  });

  it('distanceToBox: zero inside, straight across a side, diagonal past a corner', () => {
    const b = { x: 10, y: 10, w: 10, h: 10 };
    expect(distanceToBox(15, 15, b)).toBe(0);
    expect(distanceToBox(5, 15, b)).toBe(5);
    expect(distanceToBox(23, 24, b)).toBe(5); // 3-4-5 triangle past the corner (20, 20)
  });

  it('degenerate: no labels, a label wider than the plot, and a label at a non-finite point', () => {
    expect(placeLabels([], { bounds: plot, gap: 10 })).toEqual({ placed: [], left: [] });
    expect(placeLabels([{ id: 'w', x: 150, y: 100, w: 400, h: 10 }], { bounds: plot, gap: 10 }).left).toEqual(['w']);
    expect(placeLabels([{ id: 'n', x: Number.NaN, y: 100, w: 10, h: 10 }], { bounds: plot, gap: 10 }).left).toEqual(['n']);
  });

  it('property: placed labels never overlap, stay in the plot, keep clear of rings, lie nearest their own point, and every label is accounted for once', () => {
    const request = fc.record({ x: fc.double({ min: 0, max: 300, noNaN: true }), y: fc.double({ min: 0, max: 200, noNaN: true }), w: fc.integer({ min: 8, max: 80 }), h: fc.integer({ min: 8, max: 24 }) });
    fc.assert(
      fc.property(fc.array(request, { maxLength: 40 }), fc.integer({ min: 0, max: 20 }), fc.array(fc.tuple(fc.integer({ min: 0, max: 300 }), fc.integer({ min: 0, max: 200 })), { maxLength: 10 }), fc.boolean(), (rs, gap, rings, nearest) => {
        const labels = rs.map((r, i) => ({ id: String(i), ...r }));
        const keepClear = rings.map(([x, y]) => ring(x, y));
        const points = nearest ? labels.map((l) => ({ x: l.x, y: l.y })) : undefined;
        const { placed, left } = placeLabels(labels, { bounds: plot, gap, keepClear, points });
        for (let i = 0; i < placed.length; i++) {
          const b = placed[i].box;
          expect(b.x >= 0 && b.y >= 0 && b.x + b.w <= 300 && b.y + b.h <= 200).toBe(true);
          for (const k of keepClear) expect(overlaps(b, k)).toBe(false);
          if (points) {
            const own = labels[Number(placed[i].id)];
            for (const q of points) expect(distanceToBox(q.x, q.y, b)).toBeGreaterThanOrEqual(distanceToBox(own.x, own.y, b));
          }
          for (let j = i + 1; j < placed.length; j++) expect(overlaps(b, placed[j].box)).toBe(false);
        }
        const ids = [...placed.map((p) => p.id), ...left].sort();
        expect(ids).toEqual(labels.map((l) => l.id).sort());
      }),
    );
  });
});

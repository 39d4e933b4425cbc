/**
 * Draws a contour chart on a canvas: the lines of equal fitted response that d3-contour traces
 * over the grid by marching squares, each labeled with its level, the design points and the
 * stationary point, and the axes in real units. d3-contour returns filled bands (the region at
 * or above each level), whose outlines run along the grid's border too; those border stretches
 * are not lines of equal response, so they are left out.
 */
import type { ContourMultiPolygon } from 'd3-contour';
import type { ContourGrid } from '../../../core/optimum/contour-grid.ts';

export interface ContourPicture {
  readonly grid: ContourGrid;
  readonly bands: readonly ContourMultiPolygon[];
  /** Tick positions along each axis (coded) with their labels in real units. */
  readonly xTicks: readonly { readonly at: number; readonly label: string }[];
  readonly yTicks: readonly { readonly at: number; readonly label: string }[];
  readonly xName: string;
  readonly yName: string;
  /** Design points projected on the two axes, coded. */
  readonly points: readonly (readonly [number, number])[];
  readonly stationary: readonly [number, number] | null;
  readonly levelText: (v: number) => string;
}

const INK = '#14202e';
const LINE = '#1d5fa8';
const MARK = '#b4501a'; // the tokens' --down; a canvas takes colors as values, not custom properties
const RULE = '#c9d0d8';
const FONT = '15px system-ui, sans-serif';

type Pt = readonly [number, number];

/** The stretches of a ring that are not on the grid's border, as lists of grid points. */
function interiorRuns(ring: readonly Pt[], n: number): Pt[][] {
  const onEdge = (a: Pt, b: Pt) => (a[0] === b[0] && (a[0] === 0 || a[0] === n)) || (a[1] === b[1] && (a[1] === 0 || a[1] === n));
  const runs: Pt[][] = [];
  let cur: Pt[] = [];
  for (let i = 1; i < ring.length; i++) {
    if (onEdge(ring[i - 1], ring[i])) {
      if (cur.length > 1) runs.push(cur);
      cur = [];
      continue;
    }
    if (cur.length === 0) cur.push(ring[i - 1]);
    cur.push(ring[i]);
  }
  if (cur.length > 1) runs.push(cur);
  return runs;
}

/** Draws the picture into the canvas at the canvas's CSS width (square plot), for the device's pixel ratio. */
export function drawContours(canvas: HTMLCanvasElement, pic: ContourPicture): void {
  const css = Math.max(260, canvas.parentElement?.clientWidth ?? 320);
  const ratio = window.devicePixelRatio || 1;
  const left = 64;
  const bottom = 56;
  const top = 12;
  const right = 26;
  const size = css - left - right;
  const height = top + size + bottom;
  canvas.style.width = `${css}px`;
  canvas.style.height = `${height}px`;
  canvas.width = Math.round(css * ratio);
  canvas.height = Math.round(height * ratio);
  const g = canvas.getContext('2d');
  if (!g) throw new Error('This browser cannot draw on a canvas');
  g.setTransform(ratio, 0, 0, ratio, 0, 0);
  g.clearRect(0, 0, css, height);
  const { xs, ys } = pic.grid;
  const n = xs.length;
  const x0 = xs[0];
  const x1 = xs[n - 1];
  const y0 = ys[0];
  const y1 = ys[n - 1];
  const px = (x: number) => left + ((x - x0) / (x1 - x0)) * size;
  const py = (y: number) => top + size - ((y - y0) / (y1 - y0)) * size;
  // d3-contour puts value i at grid coordinate i + 0.5.
  const gx = (c: number) => x0 + ((c - 0.5) / (n - 1)) * (x1 - x0);
  const gy = (c: number) => y0 + ((c - 0.5) / (n - 1)) * (y1 - y0);

  g.font = FONT;
  g.strokeStyle = RULE;
  g.lineWidth = 1;
  g.strokeRect(left, top, size, size);
  g.fillStyle = INK;
  g.textAlign = 'center';
  g.textBaseline = 'top';
  for (const t of pic.xTicks) {
    g.beginPath();
    g.moveTo(px(t.at), top + size);
    g.lineTo(px(t.at), top + size + 5);
    g.stroke();
    g.fillText(t.label, px(t.at), top + size + 7);
  }
  g.fillText(pic.xName, left + size / 2, top + size + 30);
  g.textAlign = 'right';
  g.textBaseline = 'middle';
  for (const t of pic.yTicks) {
    g.beginPath();
    g.moveTo(left - 5, py(t.at));
    g.lineTo(left, py(t.at));
    g.stroke();
    g.fillText(t.label, left - 7, py(t.at));
  }
  g.save();
  g.translate(14, top + size / 2);
  g.rotate(-Math.PI / 2);
  g.textAlign = 'center';
  g.fillText(pic.yName, 0, 0);
  g.restore();

  g.save();
  g.beginPath();
  g.rect(left, top, size, size);
  g.clip();
  const labels: { x: number; y: number; text: string }[] = [];
  g.strokeStyle = LINE;
  g.lineWidth = 2.5;
  for (const band of pic.bands) {
    let longest: Pt[] = [];
    for (const polygon of band.coordinates) {
      for (const ring of polygon) {
        for (const run of interiorRuns(ring as unknown as Pt[], n)) {
          g.beginPath();
          run.forEach(([a, b], i) => (i === 0 ? g.moveTo(px(gx(a)), py(gy(b))) : g.lineTo(px(gx(a)), py(gy(b)))));
          g.stroke();
          if (run.length > longest.length) longest = run;
        }
      }
    }
    if (longest.length > 2) {
      // The point of the line farthest inside the plot, so the label is not cut by the frame.
      let best = { x: 0, y: 0, room: -Infinity };
      for (const [a, b] of longest) {
        const x = px(gx(a));
        const y = py(gy(b));
        const room = Math.min(x - left, left + size - x, y - top, top + size - y);
        if (room > best.room) best = { x, y, room };
      }
      if (best.room > 10) labels.push({ x: best.x, y: best.y, text: pic.levelText(band.value) });
    }
  }
  // Labels on a light patch so the line under them does not cut the digits.
  g.font = `bold ${FONT}`;
  g.textAlign = 'center';
  g.textBaseline = 'middle';
  for (const l of labels) {
    const w = g.measureText(l.text).width + 8;
    g.fillStyle = 'rgba(255,255,255,0.9)';
    g.fillRect(l.x - w / 2, l.y - 10, w, 20);
    g.fillStyle = LINE;
    g.fillText(l.text, l.x, l.y);
  }
  g.restore();
  // Marks after the clip, so design points on the corners show whole.
  g.fillStyle = INK;
  for (const [a, b] of pic.points) {
    g.beginPath();
    g.arc(px(a), py(b), 5, 0, 2 * Math.PI);
    g.fill();
  }
  if (pic.stationary) {
    const [a, b] = pic.stationary;
    g.strokeStyle = MARK;
    g.lineWidth = 3.5;
    const r = 9;
    g.beginPath();
    g.moveTo(px(a) - r, py(b) - r);
    g.lineTo(px(a) + r, py(b) + r);
    g.moveTo(px(a) + r, py(b) - r);
    g.lineTo(px(a) - r, py(b) + r);
    g.stroke();
  }
}

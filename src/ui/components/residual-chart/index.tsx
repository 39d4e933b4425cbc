/**
 * A residual chart: each run's residual (observed minus fitted value) against something else,
 * the fitted value or the run's place in the run order, with a line at zero. Every point is named
 * by its run beside it, placed so that no two names overlap (place-labels.ts); the runs whose
 * name found no room are listed under the chart, so no run goes unnamed. Runs the caller marks
 * are ringed, named first and in bold; the caller says so in words as well, since a ring alone
 * is easy to miss. A table of the same numbers, folded away under the chart, serves a screen
 * reader. Drawn with uPlot, loaded only when the chart is first shown; the names are elements
 * over the plot (their boxes are the ones the placement chose).
 */
import { useSignal } from '@preact/signals';
import type UPlotType from 'uplot';
import { useUplot } from '../../lib/use-uplot.ts';
import { num } from '../../lib/format.ts';
import { placeLabels, type Box, type LabelRequest } from './place-labels.ts';
import './style.css';

export type ResidualChartProps = {
  /** One per run, in the order of the table. x is the value across the chart. */
  readonly points: readonly {
    readonly label: string;
    readonly x: number;
    readonly residual: number;
    /** x and the residual as shown in the table. */
    readonly xShown: string;
    readonly residualShown: string;
    readonly marked: boolean;
  }[];
  /** What the chart shows, for the screen reader ("Residual against fitted value"). */
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  /** Heading of the table's x column. */
  readonly xColumn: string;
  /** One line on what to look for. */
  readonly caption: string;
  /** When x is the place in the run order (1, 2, ...): ticks at whole places, labeled with the run. */
  readonly order?: boolean;
};

const INK = '#14202e';
const DOT = '#1d5fa8';
const MARK = '#b4501a';
/** Tick labels with a true minus sign, as everywhere else in the app. */
const tickText = (_u: unknown, splits: number[]) => splits.map((v) => num(v));
/** The run names' font and line height (CSS px); style.css sets the same on .run-label. */
const LABEL_FONT = 'bold 14px system-ui, sans-serif';
const LABEL_HEIGHT = 18;
/** Radii in CSS px: a point's dot (size 12), a mark's ring (11, drawn 3 wide), and a name's distance from the centre. */
const DOT_R = 7;
const RING_R = 13;
const LABEL_GAP = 14;

type Point = ResidualChartProps['points'][number];

/**
 * Names the points over the plot without overlaps, never over a point and never nearer another
 * point than its own: marked runs first, then the rest by the size of their residual. Returns
 * the points left unnamed, in that order.
 */
function nameRuns(u: UPlotType, sorted: readonly Point[]): Point[] {
  const over = u.over;
  for (const old of over.querySelectorAll('.run-label')) old.remove();
  const at = sorted.map((p) => ({ p, x: u.valToPos(p.x, 'x'), y: u.valToPos(p.residual, 'y') }));
  const order = [...at].sort((a, b) => Number(b.p.marked) - Number(a.p.marked) || Math.abs(b.p.residual) - Math.abs(a.p.residual));
  const ctx = u.ctx;
  ctx.save();
  ctx.font = LABEL_FONT;
  const requests: LabelRequest[] = order.map(({ p, x, y }, i) => ({ id: String(i), x, y, w: Math.ceil(ctx.measureText(p.label).width) + 2, h: LABEL_HEIGHT }));
  ctx.restore();
  const circle = (x: number, y: number, r: number): Box => ({ x: x - r, y: y - r, w: 2 * r, h: 2 * r });
  const bounds: Box = { x: 0, y: 0, w: over.clientWidth, h: over.clientHeight };
  const layout = placeLabels(requests, {
    bounds,
    gap: LABEL_GAP,
    keepClear: at.map((a) => circle(a.x, a.y, a.p.marked ? RING_R : DOT_R)),
    points: at,
  });
  for (const { id, box } of layout.placed) {
    const { p } = order[Number(id)];
    const el = document.createElement('span');
    el.className = p.marked ? 'run-label marked' : 'run-label';
    el.textContent = p.label;
    el.style.left = `${box.x}px`;
    el.style.top = `${box.y}px`;
    over.append(el);
  }
  return layout.left.map((id) => order[Number(id)].p);
}

export function ResidualChart({ points, title, xLabel, yLabel, xColumn, caption, order }: ResidualChartProps) {
  const key = JSON.stringify([points, xLabel, yLabel, order]);
  // The runs whose names found no room on the chart, listed under it.
  const unnamed = useSignal<readonly Point[]>([]);
  const { box, state } = useUplot((UPlot, el) => {
    const font = '16px system-ui, sans-serif';
    // uPlot wants x ascending: sort a copy, keeping each point's label and mark.
    const sorted = [...points].sort((a, b) => a.x - b.x);
    const xs = sorted.map((p) => p.x);
    const ys = sorted.map((p) => p.residual);
    const m = Math.max(...ys.map(Math.abs)) * 1.25 || 1;
    const xmin = Math.min(...xs);
    const xmax = Math.max(...xs);
    const xpad = (xmax - xmin) * 0.08 || 1;
    const labels = new Map(points.map((p) => [p.x, p.label]));
    // Every step-th run is named on the axis: at most 10, and no closer than the widest name
    // needs at 16 px (about 10 px a digit plus a gap): at 360 px "10" and "11" ran together.
    const plotWidth = Math.max(260, el.clientWidth) - 80;
    const widest = Math.max(...points.map((p) => p.label.length)) * 10 + 12;
    const step = Math.max(1, Math.ceil(points.length / 10), Math.ceil((points.length * widest) / plotWidth));
    return new UPlot(
      {
        width: Math.max(260, el.clientWidth),
        height: 280,
        legend: { show: false },
        cursor: { show: false },
        scales: {
          x: { time: false, range: order ? () => [0.4, points.length + 0.6] : () => [xmin - xpad, xmax + xpad] },
          y: { range: () => [-m, m] },
        },
        axes: [
          order
            ? {
                label: xLabel,
                font,
                labelFont: font,
                stroke: INK,
                grid: { show: false },
                splits: () => xs.filter((_x, i) => i % step === 0),
                values: (_u: unknown, splits: number[]) => splits.map((s) => labels.get(s) ?? ''),
              }
            : { label: xLabel, font, labelFont: font, stroke: INK, grid: { stroke: '#dfe3e8' }, space: 55, values: tickText },
          { label: yLabel, font, labelFont: font, stroke: INK, grid: { stroke: '#dfe3e8' }, size: 60, values: tickText },
        ],
        series: [{}, { stroke: DOT, width: 0, paths: () => null, points: { show: true, size: 12, fill: DOT, stroke: DOT } }],
        hooks: {
          drawAxes: [
            (u) => {
              // The zero line, under the points.
              const ctx = u.ctx;
              const y = Math.round(u.valToPos(0, 'y', true));
              ctx.save();
              ctx.strokeStyle = INK;
              ctx.lineWidth = 2 * devicePixelRatio;
              ctx.beginPath();
              ctx.moveTo(u.bbox.left, y);
              ctx.lineTo(u.bbox.left + u.bbox.width, y);
              ctx.stroke();
              ctx.restore();
            },
          ],
          draw: [
            (u) => {
              // Marked runs: a ring (their names come with the others').
              const ctx = u.ctx;
              ctx.save();
              ctx.strokeStyle = MARK;
              ctx.lineWidth = 3 * devicePixelRatio;
              sorted.forEach((p, i) => {
                if (!p.marked) return;
                ctx.beginPath();
                ctx.arc(u.valToPos(xs[i], 'x', true), u.valToPos(ys[i], 'y', true), 11 * devicePixelRatio, 0, 2 * Math.PI);
                ctx.stroke();
              });
              ctx.restore();
              unnamed.value = nameRuns(u, sorted);
            },
          ],
        },
      },
      [xs, ys],
      el,
    );
  }, [key]);
  return (
    <figure class="chart residual-chart">
      <div ref={box} class="chart-box" role="img" aria-label={`${title}, ${points.length} runs`} />
      {state.value === 'loading' && <p class="quiet">Drawing the chart…</p>}
      {state.value === 'failed' && <p class="quiet">The chart could not be drawn here; the table below has the same values.</p>}
      {state.value === 'ready' && (
        <p class="run-names">
          Each point is named by its run.
          {unnamed.value.length > 0 && (
            <>
              {' '}
              No room on the chart for {unnamed.value.length === 1 ? 'run' : 'runs (largest residual first)'}{' '}
              <span data-testid="unnamed-runs">{unnamed.value.map((p) => `${p.label} (${p.residualShown})`).join(', ')}</span>.
            </>
          )}
        </p>
      )}
      <figcaption>{caption}</figcaption>
      <details class="residual-numbers">
        <summary>The numbers behind this chart</summary>
        <table class="residual-table" aria-label={title}>
          <thead>
            <tr>
              <th scope="col">Run</th>
              <th scope="col">{xColumn}</th>
              <th scope="col">Residual</th>
            </tr>
          </thead>
          <tbody>
            {points.map((p) => (
              <tr key={p.label} class={p.marked ? 'marked' : undefined}>
                <th scope="row">
                  {p.label}
                  {p.marked ? ' (stands out)' : ''}
                </th>
                <td>{p.xShown}</td>
                <td>{p.residualShown}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </figure>
  );
}

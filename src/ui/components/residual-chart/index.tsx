/**
 * A residual chart: each run's residual (observed minus fitted value) against something else,
 * the fitted value or the run's place in the run order, with a line at zero. Runs the caller
 * marks are ringed and named on the chart; the caller says so in words as well, since a ring
 * alone is easy to miss. A table of the same numbers, folded away under the chart, serves a
 * screen reader. Drawn with uPlot, loaded only when the chart is first shown.
 */
import { useUplot } from '../../lib/use-uplot.ts';
import { num } from '../../lib/format.ts';
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

export function ResidualChart({ points, title, xLabel, yLabel, xColumn, caption, order }: ResidualChartProps) {
  const key = JSON.stringify([points, xLabel, yLabel, order]);
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
    const step = Math.max(1, Math.ceil(points.length / 10));
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
              // Marked runs: a ring and the run's name beside it.
              const ctx = u.ctx;
              ctx.save();
              ctx.strokeStyle = MARK;
              ctx.fillStyle = MARK;
              ctx.lineWidth = 3 * devicePixelRatio;
              ctx.font = `bold ${Math.round(15 * devicePixelRatio)}px system-ui, sans-serif`;
              const mid = u.bbox.left + u.bbox.width * 0.6;
              sorted.forEach((p, i) => {
                if (!p.marked) return;
                const x = u.valToPos(xs[i], 'x', true);
                const y = u.valToPos(ys[i], 'y', true);
                ctx.beginPath();
                ctx.arc(x, y, 11 * devicePixelRatio, 0, 2 * Math.PI);
                ctx.stroke();
                const right = x < mid;
                ctx.textAlign = right ? 'left' : 'right';
                ctx.fillText(`Run ${p.label}`, x + (right ? 15 : -15) * devicePixelRatio, y + 5 * devicePixelRatio);
              });
              ctx.restore();
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

/**
 * Observed against predicted along a path of steepest ascent or descent: the model's prediction
 * at each step (a dashed line with hollow squares) and the logged runs (a solid line with filled
 * dots), so the person sees where the response stops following the model and stops improving.
 * Told apart by line and mark, not by colour alone. Steps not logged yet leave a gap. Drawn with
 * uPlot, loaded only when the chart is first shown; the screen keeps its table for those who
 * cannot see the chart.
 */
import { useUplot } from '../../lib/use-uplot.ts';
import { num } from '../../lib/format.ts';
import './style.css';

export type PathChartProps = {
  /** One per path run, in step order. */
  readonly points: readonly { readonly step: number; readonly predicted: number; readonly observed: number | null }[];
  /** The response's name and unit, for the axis. */
  readonly response: string;
  /** What the chart shows, for the screen reader. */
  readonly title: string;
};

const INK = '#14202e';
// The same colours as --up and --down in tokens.css (uPlot draws on a canvas, which reads no CSS variables).
const OBSERVED = '#1d5fa8';
const PREDICTED = '#b4501a';
const tickText = (_u: unknown, splits: number[]) => splits.map((v) => num(v));

export function PathChart({ points, response, title }: PathChartProps) {
  const key = JSON.stringify([points, response]);
  const { box, state } = useUplot((UPlot, el) => {
    const font = '16px system-ui, sans-serif';
    const xs = points.map((p) => p.step);
    const pred = points.map((p) => p.predicted);
    const obs = points.map((p) => p.observed);
    const all = [...pred, ...obs.filter((v): v is number => v !== null)];
    const lo = Math.min(...all);
    const hi = Math.max(...all);
    const pad = (hi - lo) * 0.12 || Math.abs(hi) * 0.05 || 1;
    const dpr = devicePixelRatio;
    return new UPlot(
      {
        width: Math.max(260, el.clientWidth),
        height: 280,
        legend: { show: false },
        cursor: { show: false },
        scales: { x: { time: false, range: () => [0.6, xs.length + 0.4] }, y: { range: () => [lo - pad, hi + pad] } },
        axes: [
          { label: 'Step along the path', font, labelFont: font, stroke: INK, grid: { show: false }, splits: () => xs, values: (_u: unknown, s: number[]) => s.map(String) },
          { label: response, font, labelFont: font, stroke: INK, grid: { stroke: '#dfe3e8' }, size: 64, values: tickText },
        ],
        series: [
          {},
          { label: 'Predicted', stroke: PREDICTED, width: 2, dash: [10, 6], points: { show: true, size: 12, fill: '#ffffff', stroke: PREDICTED, width: 2 } },
          { label: 'Observed', stroke: OBSERVED, width: 3, spanGaps: false, points: { show: true, size: 12, fill: OBSERVED, stroke: OBSERVED } },
        ],
        hooks: {
          draw: [
            (u) => {
              // Predicted points as hollow squares, so the two series differ in shape as well as line.
              const ctx = u.ctx;
              ctx.save();
              ctx.strokeStyle = PREDICTED;
              ctx.fillStyle = '#ffffff';
              ctx.lineWidth = 2 * dpr;
              const h = 6 * dpr;
              xs.forEach((x, i) => {
                const cx = u.valToPos(x, 'x', true);
                const cy = u.valToPos(pred[i], 'y', true);
                ctx.fillRect(cx - h, cy - h, 2 * h, 2 * h);
                ctx.strokeRect(cx - h, cy - h, 2 * h, 2 * h);
              });
              ctx.restore();
            },
          ],
        },
      },
      [xs, pred, obs],
      el,
    );
  }, [key]);
  const logged = points.filter((p) => p.observed !== null).length;
  return (
    <figure class="chart path-chart">
      <div ref={box} class="chart-box" role="img" aria-label={`${title}: ${points.length} steps, ${logged} logged`} />
      {state.value === 'loading' && <p class="quiet">Drawing the chart…</p>}
      {state.value === 'failed' && <p class="quiet">The chart could not be drawn here; the table below has the same values.</p>}
      <figcaption>
        <span class="path-key">
          <span class="key-line key-observed" aria-hidden="true" /> Observed (solid line, dots)
        </span>
        <span class="path-key">
          <span class="key-line key-predicted" aria-hidden="true" /> Predicted (dashed line, squares)
        </span>
        <span class="path-key-note">Where the dots stop rising with the squares (or fall back), the response has stopped improving along the path.</span>
      </figcaption>
    </figure>
  );
}

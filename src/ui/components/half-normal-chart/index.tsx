/**
 * The half-normal plot of the effects: each effect's size against its half-normal quantile.
 * Effects that only reflect noise fall on a line through the origin; the ones that matter sit
 * off to the right of it. Drawn with uPlot, loaded only when this chart is first shown so that
 * it stays out of the first screen's download.
 */
import { useUplot } from '../../lib/use-uplot.ts';
import type { EffectPoint } from '../../../core/fit/analysis.ts';

export type HalfNormalChartProps = {
  readonly points: readonly EffectPoint[];
  /** The response's name and unit, for the axis label. */
  readonly axisLabel: string;
};

export function HalfNormalChart({ points, axisLabel }: HalfNormalChartProps) {
  const { box, state } = useUplot((UPlot, el) => {
    const sorted = [...points].sort((a, b) => Math.abs(a.effect) - Math.abs(b.effect));
    const xs = sorted.map((p) => Math.abs(p.effect));
    const ys = sorted.map((p) => p.quantile);
    const ink = '#14202e';
    const font = '16px system-ui, sans-serif';
    return new UPlot(
      {
        width: Math.max(260, el.clientWidth),
        height: 280,
        legend: { show: false },
        cursor: { show: false },
        scales: { x: { time: false, range: (_u, _min, max) => [0, max * 1.15 || 1] }, y: { range: (_u, _min, max) => [0, max * 1.1 || 1] } },
        axes: [
          { label: axisLabel, font, labelFont: font, stroke: ink, grid: { stroke: '#dfe3e8' } },
          { label: 'Half-normal quantile', font, labelFont: font, stroke: ink, grid: { stroke: '#dfe3e8' }, size: 50 },
        ],
        series: [{}, { stroke: '#1d5fa8', width: 0, paths: () => null, points: { show: true, size: 12, fill: '#1d5fa8', stroke: '#1d5fa8' } }],
        hooks: {
          draw: [
            (u) => {
              // Each point's letters beside it.
              const ctx = u.ctx;
              ctx.save();
              ctx.fillStyle = ink;
              ctx.font = `${Math.round(15 * devicePixelRatio)}px system-ui, sans-serif`;
              const mid = u.bbox.left + u.bbox.width * 0.6;
              sorted.forEach((p, i) => {
                const x = u.valToPos(xs[i], 'x', true);
                const y = u.valToPos(ys[i], 'y', true);
                // Right of the point near the axis, left of it near the right edge, so no label is cut off.
                const right = x < mid;
                ctx.textAlign = right ? 'left' : 'right';
                ctx.fillText(p.letters, x + (right ? 10 : -10) * devicePixelRatio, y + 5 * devicePixelRatio);
              });
              ctx.restore();
            },
          ],
        },
      },
      [xs, ys],
      el,
    );
  }, [points, axisLabel]);
  return (
    <figure class="chart">
      <div ref={box} class="chart-box" role="img" aria-label={`Half-normal plot of ${points.length} effects`} />
      {state.value === 'loading' && <p class="quiet">Drawing the chart…</p>}
      {state.value === 'failed' && <p class="quiet">The chart could not be drawn here; the list above has the same effects.</p>}
      <figcaption class="quiet">Effects near a straight line from the origin look like noise; those far to the right of it stand out.</figcaption>
    </figure>
  );
}

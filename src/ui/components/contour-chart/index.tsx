/**
 * The contour chart of two factors: lines of equal fitted response, labeled, with the design
 * points and the stationary point marked, drawn on a canvas. d3-contour (the lines) is loaded
 * only when the chart is first shown, so it stays out of the first screen's download. The table
 * below carries the same grid's numbers for those who cannot see the chart.
 */
import { useSignal } from '@preact/signals';
import { useEffect, useRef } from 'preact/hooks';
import type { ContourGrid } from '../../../core/optimum/contour-grid.ts';
import { num } from '../../lib/format.ts';
import { drawContours } from './draw-contours.ts';
import '../../lib/chart.css';
import './style.css';

export type ContourChartProps = {
  readonly grid: ContourGrid;
  readonly levels: readonly number[];
  readonly xName: string;
  readonly yName: string;
  /** Real setting text at a coded value of each axis. */
  readonly xLabel: (coded: number) => string;
  readonly yLabel: (coded: number) => string;
  readonly responseLabel: string;
  readonly points: readonly (readonly [number, number])[];
  readonly stationary: readonly [number, number] | null;
  /** Where the other factors are held, as a sentence (or empty). */
  readonly othersNote: string;
};

/** Every tenth lattice point (five for the usual 41), for the table and the ticks. */
function tableIndexes(n: number): number[] {
  const step = Math.max(1, Math.round((n - 1) / 4));
  const out: number[] = [];
  for (let i = 0; i < n; i += step) out.push(i);
  if (out[out.length - 1] !== n - 1) out.push(n - 1);
  return out;
}

export function ContourChart({ grid, levels, xName, yName, xLabel, yLabel, responseLabel, points, stationary, othersNote }: ContourChartProps) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const state = useSignal<'loading' | 'ready' | 'failed'>('loading');
  const idx = tableIndexes(grid.xs.length);
  const key = JSON.stringify([Array.from(grid.values), levels, points, stationary, xName, yName]);
  useEffect(() => {
    let canceled = false;
    import('d3-contour').then(
      ({ contours }) => {
        const el = canvas.current;
        if (canceled || !el) return;
        const n = grid.xs.length;
        const bands = contours().size([n, n]).thresholds([...levels])(Array.from(grid.values));
        try {
          drawContours(el, {
            grid,
            bands,
            xTicks: idx.filter((_, k) => k % 2 === 0).map((i) => ({ at: grid.xs[i], label: xLabel(grid.xs[i]) })),
            yTicks: idx.filter((_, k) => k % 2 === 0).map((j) => ({ at: grid.ys[j], label: yLabel(grid.ys[j]) })),
            xName,
            yName,
            points,
            stationary,
            levelText: (v) => num(v),
          });
          state.value = 'ready';
        } catch {
          state.value = 'failed';
        }
      },
      () => {
        if (!canceled) state.value = 'failed';
      },
    );
    return () => {
      canceled = true;
    };
  }, [key]);
  const n = grid.xs.length;
  const label = `Contour chart of ${responseLabel} over ${xName} (across) and ${yName} (up): lines at ${levels.map((v) => num(v)).join(', ')}; ${points.length} design points${stationary ? ' and the stationary point' : ''} marked. The table below has the values.`;
  return (
    <figure class="chart contour-chart">
      <div class="chart-box contour-box">
        <canvas ref={canvas} role="img" aria-label={label} data-testid="contour-canvas" data-state={state.value} />
      </div>
      {state.value === 'loading' && <p class="quiet">Drawing the chart…</p>}
      {state.value === 'failed' && <p class="quiet">The chart could not be drawn here; the table below has the same values.</p>}
      <figcaption>
        <span class="key-dot" aria-hidden="true">●</span> design point{stationary ? (
          <>
            {' '}
            <span class="key-cross" aria-hidden="true">✕</span> stationary point
          </>
        ) : null}
        . Lines join settings with the same predicted {responseLabel}.{othersNote ? ` ${othersNote}` : ''}
      </figcaption>
      {/* Focusable so a keyboard can scroll the table when it is wider than the screen (axe: scrollable-region-focusable). */}
      <div class="contour-table-wrap" tabIndex={0} role="region" aria-label={`Predicted ${responseLabel}: ${yName} down, ${xName} across`}>
        <table class="chart-table contour-table" data-testid="contour-table">
          <caption>
            Predicted {responseLabel}: {yName} down, {xName} across
          </caption>
          <thead>
            <tr>
              <th scope="col">
                <span class="visually-hidden">{yName} \ {xName}</span>
              </th>
              {idx.map((i) => (
                <th scope="col" key={i}>
                  {xLabel(grid.xs[i])}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {[...idx].reverse().map((j) => (
              <tr key={j}>
                <th scope="row">{yLabel(grid.ys[j])}</th>
                {idx.map((i) => {
                  const v = grid.values[i + j * n];
                  return <td key={i}>{Number.isNaN(v) ? '–' : num(v)}</td>;
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p class="quiet" data-testid="contour-levels">
        Lines drawn at {levels.length === 0 ? 'no level (the predicted response is the same everywhere here)' : levels.map((v) => num(v)).join(', ')}.
      </p>
    </figure>
  );
}

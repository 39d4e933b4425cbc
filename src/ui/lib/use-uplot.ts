/**
 * Draws a uPlot chart into a box, loading uPlot only when the first chart is shown (so it stays
 * out of the first screen's download), redrawing when `deps` change or the box changes width,
 * and destroying the chart when the component goes away. The one place the charts share this lifecycle.
 */
import { useSignal, type ReadonlySignal } from '@preact/signals';
import { useEffect, useRef } from 'preact/hooks';
import type { RefObject } from 'preact';
import type UPlotType from 'uplot';
import './chart.css';

export type ChartState = 'loading' | 'ready' | 'failed';

export function useUplot(
  draw: (UPlot: typeof UPlotType, el: HTMLDivElement) => UPlotType,
  deps: readonly unknown[],
): { box: RefObject<HTMLDivElement | null>; state: ReadonlySignal<ChartState> } {
  const box = useRef<HTMLDivElement>(null);
  const state = useSignal<ChartState>('loading');
  useEffect(() => {
    let chart: UPlotType | null = null;
    let canceled = false;
    let watch: ResizeObserver | null = null;
    import('uplot').then(
      ({ default: UPlot }) => {
        const el = box.current;
        if (canceled || !el) return;
        chart = draw(UPlot, el);
        state.value = 'ready';
        // A chart is drawn for its box's width: when the box changes width (a phone turned
        // sideways, a window resized) it is drawn again, so nothing is clipped or left narrow.
        let width = el.clientWidth;
        if (typeof ResizeObserver === 'function') {
          watch = new ResizeObserver(() => {
            const now = el.clientWidth;
            if (canceled || Math.abs(now - width) < 2) return;
            width = now;
            chart?.destroy();
            chart = draw(UPlot, el);
          });
          watch.observe(el);
        }
      },
      () => {
        if (!canceled) state.value = 'failed';
      },
    );
    return () => {
      canceled = true;
      watch?.disconnect();
      chart?.destroy();
    };
  }, deps);
  return { box, state };
}

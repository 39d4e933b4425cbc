/**
 * Draws a uPlot chart into a box, loading uPlot only when the first chart is shown (so it stays
 * out of the first screen's download), redrawing when `deps` change and destroying the chart
 * when the component goes away. The one place the charts share this lifecycle.
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
    import('uplot').then(
      ({ default: UPlot }) => {
        const el = box.current;
        if (canceled || !el) return;
        chart = draw(UPlot, el);
        state.value = 'ready';
      },
      () => {
        if (!canceled) state.value = 'failed';
      },
    );
    return () => {
      canceled = true;
      chart?.destroy();
    };
  }, deps);
  return { box, state };
}

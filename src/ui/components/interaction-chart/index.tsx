/**
 * The interaction chart of two factors: the response the fitted model predicts with the first
 * factor at its low and its high setting (across), one line with the second factor low and one
 * with it high. Parallel lines: the effect of the first factor does not depend on the second;
 * lines that are not parallel: it does. The lines differ in dash and point shape as well as in
 * color, and the table below the chart carries the same four values for a screen reader. Drawn
 * with uPlot, loaded only when the chart is first shown.
 */
import { useUplot } from '../../lib/use-uplot.ts';
import { num } from '../../lib/format.ts';
import './style.css';

export type InteractionChartProps = {
  /** Name of the factor across the chart. */
  readonly acrossName: string;
  /** Its low and high settings as text (real units or level labels). */
  readonly acrossLabels: readonly [string, string];
  /** Name of the factor that is held at each of its settings, one line each. */
  readonly heldName: string;
  /** Two lines: the held factor's setting as text, and the predicted response at low and high of the factor across. */
  readonly lines: readonly { readonly label: string; readonly values: readonly [number, number] }[];
  /** The response's name and unit, for the axis label and the table. */
  readonly responseLabel: string;
  /** Where the other factors are held, as a sentence (or empty). */
  readonly othersNote: string;
};

const INK = '#14202e';
const STYLES = [
  { stroke: '#1d5fa8', dash: [] as number[], fill: '#1d5fa8', words: 'solid line, filled dots' },
  { stroke: '#b4501a', dash: [10, 6], fill: '#ffffff', words: 'dashed line, open dots' },
];

export function InteractionChart({ acrossName, acrossLabels, heldName, lines, responseLabel, othersNote }: InteractionChartProps) {
  const key = JSON.stringify([acrossName, acrossLabels, heldName, lines, responseLabel]);
  const { box, state } = useUplot((UPlot, el) => {
    const font = '16px system-ui, sans-serif';
    const all = lines.flatMap((l) => l.values);
    const lo = Math.min(...all);
    const hi = Math.max(...all);
    const pad = (hi - lo) * 0.15 || Math.abs(hi) * 0.05 || 1;
    return new UPlot(
      {
        width: Math.max(260, el.clientWidth),
        height: 280,
        legend: { show: false },
        cursor: { show: false },
        scales: { x: { time: false, range: () => [-0.22, 1.22] }, y: { range: () => [lo - pad, hi + pad] } },
        axes: [
          {
            label: acrossName,
            font,
            labelFont: font,
            stroke: INK,
            grid: { show: false },
            splits: () => [0, 1],
            values: () => [...acrossLabels],
          },
          { label: responseLabel, font, labelFont: font, stroke: INK, grid: { stroke: '#dfe3e8' }, size: 56 },
        ],
        series: [
          {},
          ...lines.map((_l, i) => {
            const s = STYLES[i % STYLES.length];
            return { stroke: s.stroke, width: 3, dash: s.dash, points: { show: true, size: 14, width: 3, fill: s.fill, stroke: s.stroke } };
          }),
        ],
      },
      [[0, 1], ...lines.map((l) => [...l.values])],
      el,
    );
  }, [key]);
  const label = `Interaction chart of ${acrossName} and ${heldName}: ${responseLabel} predicted at ${acrossName} ${acrossLabels[0]} and ${acrossLabels[1]}, one line for each setting of ${heldName}`;
  return (
    <figure class="chart interaction-chart">
      <div ref={box} class="chart-box" role="img" aria-label={label} />
      {state.value === 'loading' && <p class="quiet">Drawing the chart…</p>}
      {state.value === 'failed' && <p class="quiet">The chart could not be drawn here; the table below has the same values.</p>}
      <figcaption>
        Lines that are not parallel mean the effect of {acrossName} depends on {heldName}.{othersNote ? ` ${othersNote}` : ''}
      </figcaption>
      <table class="chart-table" aria-label={`Predicted ${responseLabel}`}>
        <caption class="quiet">Predicted {responseLabel}</caption>
        <thead>
          <tr>
            <td />
            <th scope="colgroup" colSpan={2} class="across-name">
              {acrossName}
            </th>
          </tr>
          <tr>
            <th scope="col">{heldName}</th>
            {acrossLabels.map((a) => (
              <th scope="col" key={a}>
                <span class="visually-hidden">{acrossName} </span>
                {a}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {lines.map((l, i) => {
            const s = STYLES[i % STYLES.length];
            return (
              <tr key={l.label}>
                <th scope="row">
                  <svg class="line-key" width="36" height="14" viewBox="0 0 36 14" aria-hidden="true">
                    <line x1="2" y1="7" x2="34" y2="7" stroke={s.stroke} stroke-width="3" stroke-dasharray={s.dash.length ? '7 4' : undefined} />
                    <circle cx="18" cy="7" r="5" fill={s.fill} stroke={s.stroke} stroke-width="2.5" />
                  </svg>
                  {l.label}
                  <span class="visually-hidden"> ({s.words})</span>
                </th>
                {l.values.map((v, k) => (
                  <td key={k}>{num(v)}</td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </figure>
  );
}

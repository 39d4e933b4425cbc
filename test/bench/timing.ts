/** Median timing for benchmarks: repeats batches of calls and reports the median time per call. */
export function medianMs(fn: () => unknown, { batch = 1, rounds = 31, warmup = 5 } = {}): number {
  for (let i = 0; i < warmup * batch; i++) fn();
  const times: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) fn();
    times.push((performance.now() - t0) / batch);
  }
  times.sort((a, b) => a - b);
  return times[times.length >> 1];
}

export function fmtMs(ms: number): string {
  return ms >= 1 ? `${ms.toFixed(2)} ms` : ms >= 0.001 ? `${(ms * 1000).toFixed(1)} us` : `${(ms * 1e6).toFixed(0)} ns`;
}

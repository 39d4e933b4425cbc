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

/**
 * The same median, of the process's CPU time (user + system, all its threads) per call: on a
 * shared machine the wall clock also counts the time the process waits for a processor, which
 * the CPU time leaves out, so ratios of CPU times move less from run to run.
 */
export function medianCpuMs(fn: () => unknown, { batch = 1, rounds = 31, warmup = 5 } = {}): number {
  for (let i = 0; i < warmup * batch; i++) fn();
  const times: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const c0 = process.cpuUsage();
    for (let i = 0; i < batch; i++) fn();
    const c = process.cpuUsage(c0);
    times.push((c.user + c.system) / 1000 / batch);
  }
  times.sort((a, b) => a - b);
  return times[times.length >> 1];
}

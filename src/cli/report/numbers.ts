/** Number formatting for the plain-text reports: 4 significant digits, null as a dash. */
export function num(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined) return '-';
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e6 || a < 1e-4) return x.toExponential(digits - 1);
  return Number(x.toPrecision(digits)).toString();
}

/** p-values: "<0.0001" below that, else 4 decimals. */
export function pval(p: number | null | undefined): string {
  if (p === null || p === undefined) return '-';
  return p < 1e-4 ? '<0.0001' : p.toFixed(4);
}

/** Left-aligned first column, right-aligned others. */
export function table(header: string[], rows: string[][]): string {
  const w = header.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (r: string[]) => r.map((cell, c) => (c === 0 ? cell.padEnd(w[c]) : cell.padStart(w[c]))).join('  ').trimEnd();
  return [line(header), ...rows.map(line)].join('\n');
}

/**
 * Where a JSON text first opens a list or object deeper than a given level, found by a scan of
 * its brackets (outside strings) before it is parsed or walked, so a file nested thousands deep
 * is refused with its position instead of exhausting a walker's stack. The scan only counts
 * brackets; the grammar is JSON.parse's business. Method: common practice (bounded depth for
 * untrusted JSON). Cost: one pass over the text, nothing allocated.
 * Example: jsonNestingOffset('[[[1]]]', 2) -> 2 (the third "[").
 */
export function jsonNestingOffset(text: string, maxDepth: number): number {
  let depth = 0;
  const n = text.length;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x22) {
      // Skip the string, escapes included; an unterminated one ends the scan.
      for (i++; i < n; i++) {
        const d = text.charCodeAt(i);
        if (d === 0x5c) i++;
        else if (d === 0x22) break;
      }
    } else if (c === 0x5b || c === 0x7b) {
      if (++depth > maxDepth) return i;
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return -1;
}

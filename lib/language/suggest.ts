/**
 * "Did you mean": nearest names by edit distance (optimal string alignment: insertions, deletions,
 * substitutions and swaps of neighbours each cost 1), case differences counting half.
 */

export function editDistance(a: string, b: string): number {
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) => [i, ...new Array<number>(b.length).fill(0)]);
  for (let j = 1; j <= b.length; j++) d[0]![j] = j;
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const ca = a[i - 1]!;
      const cb = b[j - 1]!;
      const sub = ca === cb ? 0 : ca.toLowerCase() === cb.toLowerCase() ? 0.5 : 1;
      let best = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + sub);
      if (i > 1 && j > 1 && ca === b[j - 2] && a[i - 2] === cb) best = Math.min(best, d[i - 2]![j - 2]! + 1);
      d[i]![j] = best;
    }
  }
  return d[a.length]![b.length]!;
}

/** Up to `limit` candidates close to `name` (distance at most 1 for short names, 2 for longer). */
export function suggestNames(name: string, candidates: Iterable<string>, limit = 3): string[] {
  const maxDistance = name.length <= 3 ? 1 : 2;
  const scored: { c: string; d: number }[] = [];
  const seen = new Set<string>();
  for (const c of candidates) {
    if (seen.has(c) || c === name) continue;
    seen.add(c);
    if (Math.abs(c.length - name.length) > maxDistance) continue;
    const d = editDistance(name, c);
    if (d <= maxDistance) scored.push({ c, d });
  }
  scored.sort((x, y) => x.d - y.d || x.c.localeCompare(y.c));
  return scored.slice(0, limit).map((s) => s.c);
}

// Lengths of the simple cycles through each vertex, up to a bound. A group atom on a k-cycle can
// only map onto a molecule atom on a k-cycle (an injective map sends a cycle to a cycle), which
// lets the matcher skip most ring and polycyclic groups without a search.

/** Longest cycle any group can hold (ring and polycyclic groups have at most 12 atoms). */
export const MAX_GROUP_CYCLE = 12;

/** Per vertex, the set of simple-cycle lengths ≤ maxLength through it; undefined if the search is too large. */
export function cycleLengths(neighbours: readonly (readonly number[])[], candidates: readonly number[], maxLength: number, stepLimit = 200_000): Set<number>[] | undefined {
  const n = neighbours.length;
  const lengths = neighbours.map(() => new Set<number>());
  const onPath = new Uint8Array(n);
  const path: number[] = [];
  const allowed = new Uint8Array(n);
  for (const v of candidates) allowed[v] = 1;
  let steps = 0;
  let start = 0;
  const dfs = (v: number): boolean => {
    if ((steps += 1) > stepLimit) return false;
    for (const w of neighbours[v]!) {
      if (w === start && path.length >= 3) {
        for (const p of path) lengths[p]!.add(path.length);
        continue;
      }
      if (w <= start || !allowed[w] || onPath[w] || path.length >= maxLength) continue;
      onPath[w] = 1;
      path.push(w);
      const ok = dfs(w);
      path.pop();
      onPath[w] = 0;
      if (!ok) return false;
    }
    return true;
  };
  for (const s of [...candidates].sort((a, b) => a - b)) {
    start = s;
    onPath[s] = 1;
    path.push(s);
    const ok = dfs(s);
    path.pop();
    onPath[s] = 0;
    if (!ok) return undefined;
  }
  return lengths;
}

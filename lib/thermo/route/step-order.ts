// Kahn's topological order over step indices, ties broken by input order (the smallest ready index first). Pure and
// tiny, so the engine's route graph and the board's step numbers share one rule.

/** Indices in order; steps caught in a cycle are left out (the caller decides what that means). */
export function kahnOrder(succs: readonly (readonly number[])[], indegree: readonly number[]): number[] {
  const remaining = [...indegree];
  const ready: number[] = [];
  remaining.forEach((d, i) => d === 0 && ready.push(i));
  const order: number[] = [];
  while (ready.length > 0) {
    const next = ready.shift()!;
    order.push(next);
    for (const s of succs[next]!) {
      remaining[s]! -= 1;
      if (remaining[s] === 0) insertSorted(ready, s);
    }
  }
  return order;
}

function insertSorted(list: number[], value: number): void {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (list[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  list.splice(lo, 0, value);
}

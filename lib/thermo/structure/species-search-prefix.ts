// Names sorted once, so "every name starting with this text" is a binary search and a short walk, not a scan.
export interface NamedId {
  /** normalised name */
  text: string;
  id: number;
}

export class SortedNames {
  private readonly sorted: NamedId[];

  constructor(names: readonly NamedId[]) {
    this.sorted = [...names].sort((a, b) => (a.text < b.text ? -1 : a.text > b.text ? 1 : a.id - b.id));
  }

  /** Up to `limit` names starting with `prefix` (already normalised), one per id, in name order. */
  prefix(prefix: string, limit: number): NamedId[] {
    if (!prefix) return [];
    let lo = 0;
    let hi = this.sorted.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.sorted[mid]!.text < prefix) lo = mid + 1;
      else hi = mid;
    }
    const out: NamedId[] = [];
    const seen = new Set<number>();
    for (let i = lo; i < this.sorted.length && out.length < limit; i++) {
      const n = this.sorted[i]!;
      if (!n.text.startsWith(prefix)) break;
      if (seen.has(n.id)) continue;
      seen.add(n.id);
      out.push(n);
    }
    return out;
  }
}

// A group graph compiled for matching: allowed molecule types per atom (each listed type and its
// specific cases), allowed u/p/c, optional ring membership, and bond-order bit masks.
import type { AtomTypeTable } from './atom-types';
import type { BondCode, GraphGroupJson } from './group-json';
import { cycleLengths, MAX_GROUP_CYCLE } from './cycle-lengths';
import type { BondOrder } from './mol-graph';

export interface GroupAtom {
  accepted: ReadonlySet<string>;
  u: readonly number[];
  p: readonly number[];
  c: readonly number[];
  inRing?: boolean;
  label?: string;
  /** listed types, kept for descriptions and ring checks */
  types: readonly string[];
}

/** What a labelled atom needs among its molecule neighbours: per element, and heavy atoms in all. */
export interface NeighbourNeeds {
  byElement: [string, number][];
  heavy: number;
  /** lengths of the group's simple cycles through this atom */
  cycles: number[];
}

export interface GroupGraph {
  atoms: GroupAtom[];
  /** per labelled atom: a quick necessary condition checked before the search */
  needs: Map<number, NeighbourNeeds>;
  /** per atom: neighbours with the bit mask of allowed orders */
  adj: { to: number; mask: number }[][];
  labels: Map<string, number>;
}

const CODE_BITS: Record<BondCode, number> = { S: 1, D: 2, T: 4, B: 8 };

export function orderBit(order: BondOrder): number {
  return order === 1 ? 1 : order === 2 ? 2 : order === 3 ? 4 : 8;
}

export function compileGroup(json: GraphGroupJson, table: AtomTypeTable): GroupGraph {
  const index = new Map<number, number>();
  const atoms: GroupAtom[] = json.atoms.map((a, i) => {
    index.set(a.id, i);
    return {
      accepted: table.accepted(a.types),
      u: a.u,
      p: a.p,
      c: a.c,
      types: a.types,
      ...(a.inRing === undefined ? {} : { inRing: a.inRing }),
      ...(a.label === undefined ? {} : { label: a.label }),
    };
  });
  const adj: { to: number; mask: number }[][] = atoms.map(() => []);
  for (const b of json.bonds) {
    const x = index.get(b.a)!;
    const y = index.get(b.b)!;
    const mask = b.orders.reduce((m, o) => m | CODE_BITS[o], 0);
    adj[x]!.push({ to: y, mask });
    adj[y]!.push({ to: x, mask });
  }
  const labels = new Map<string, number>();
  const needs = new Map<number, NeighbourNeeds>();
  const groupCycles = cycleLengths(
    adj.map((ns) => ns.map((e) => e.to)),
    atoms.map((_, i) => i),
    MAX_GROUP_CYCLE,
  );
  atoms.forEach((a, i) => {
    if (!a.label) return;
    labels.set(a.label, i);
    const byElement = new Map<string, number>();
    let heavy = 0;
    for (const { to } of adj[i]!) {
      const elements = new Set([...atoms[to]!.accepted].map((t) => table.elementOf(t)).filter((e): e is string => e !== undefined));
      if (elements.size === 1) {
        const e = [...elements][0]!;
        byElement.set(e, (byElement.get(e) ?? 0) + 1);
        if (e !== 'H') heavy += 1;
      } else if (!elements.has('H')) heavy += 1;
    }
    needs.set(i, { byElement: [...byElement], heavy, cycles: groupCycles ? [...groupCycles[i]!] : [] });
  });
  return { atoms, adj, labels, needs };
}

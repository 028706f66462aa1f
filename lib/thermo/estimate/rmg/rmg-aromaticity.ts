// RMG's aromaticity: only 6-membered all-carbon SSSR rings that RDKit calls fully aromatic get
// benzene (B) bonds; every other ring keeps a Kekulé structure. Where RDKit's Kekulé form puts a
// double bond on a benzene-ring atom outside that ring (fused azines), the double bonds of the
// remaining aromatic system are re-placed so the benzene atoms carry none.
import type { MolGraph } from './mol-graph';

const bondKey = (a: number, b: number): string => (a < b ? `${a}-${b}` : `${b}-${a}`);

function ringBonds(ring: readonly number[]): [number, number][] {
  return ring.map((a, i) => [a, ring[(i + 1) % ring.length]!]);
}

/** Marks the RMG-aromatic rings of `graph` with B bonds; `rdkitAromatic` holds RDKit's aromatic bonds. */
export function applyRmgAromaticity(graph: MolGraph, rdkitAromatic: ReadonlySet<string>): void {
  const rings = graph.rings;
  // rings sharing more than two atoms with another SSSR ring (bridged systems) are not candidates
  const candidates = rings.filter((ring, i) => {
    const set = new Set(ring);
    return !rings.some((other, j) => j !== i && other.filter((a) => set.has(a)).length > 2);
  });
  const benzene = candidates.filter(
    (ring) =>
      ring.length === 6 &&
      ring.every((a) => graph.atom(a).element === 'C') &&
      ringBonds(ring).every(([a, b]) => rdkitAromatic.has(bondKey(a, b))),
  );
  if (benzene.length === 0) return;
  const bAtoms = new Set<number>();
  const bBonds = new Set<string>();
  for (const ring of benzene) {
    for (const a of ring) bAtoms.add(a);
    for (const [a, b] of ringBonds(ring)) bBonds.add(bondKey(a, b));
  }
  // Which non-benzene atoms of the aromatic system had a double bond in RDKit's Kekulé form.
  const needs = new Set<number>();
  const rest: [number, number][] = [];
  let conflict = false;
  for (const k of rdkitAromatic) {
    if (bBonds.has(k)) continue;
    const [a, b] = k.split('-').map(Number) as [number, number];
    rest.push([a, b]);
    if (graph.order(a, b) === 2) {
      if (bAtoms.has(a) || bAtoms.has(b)) conflict = true;
      for (const x of [a, b]) if (!bAtoms.has(x)) needs.add(x);
    }
  }
  for (const k of bBonds) {
    const [a, b] = k.split('-').map(Number) as [number, number];
    graph.setOrder(a, b, 1.5);
  }
  if (!conflict) return;
  const matching = perfectMatching([...needs].sort((x, y) => x - y), rest.filter(([a, b]) => needs.has(a) && needs.has(b)));
  if (!matching) return; // keep RDKit's form; the atom types will show the odd structure
  for (const [a, b] of rest) graph.setOrder(a, b, 1);
  for (const [a, b] of matching) graph.setOrder(a, b, 2);
}

/** A perfect matching of `vertices` over `edges` by backtracking (aromatic systems are small). */
function perfectMatching(vertices: number[], edges: [number, number][]): [number, number][] | undefined {
  const adj = new Map<number, number[]>(vertices.map((v) => [v, []]));
  for (const [a, b] of edges) {
    adj.get(a)!.push(b);
    adj.get(b)!.push(a);
  }
  const matched = new Set<number>();
  const chosen: [number, number][] = [];
  const search = (): boolean => {
    const v = vertices.find((x) => !matched.has(x));
    if (v === undefined) return true;
    matched.add(v);
    for (const w of adj.get(v)!) {
      if (matched.has(w)) continue;
      matched.add(w);
      chosen.push([v, w]);
      if (search()) return true;
      chosen.pop();
      matched.delete(w);
    }
    matched.delete(v);
    return false;
  };
  return search() ? chosen : undefined;
}

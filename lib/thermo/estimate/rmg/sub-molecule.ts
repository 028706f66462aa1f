// Ring sub-molecules for the ring heuristics: only ring atoms and chosen bonds, aromatic bonds
// made single where the ring is not aromatic, free valences filled with H, retyped.
import type { AtomTypeTable } from './atom-types';
import type { MolGraph } from './mol-graph';

export interface SubMolecule {
  graph: MolGraph;
  /** the ring atoms in the sub-molecule (the added H come after them) */
  heavy: number[];
}

export function isAromaticRing(graph: MolGraph, ring: readonly number[]): boolean {
  return ring.every((a, i) => graph.order(a, ring[(i + 1) % ring.length]!) === 1.5);
}

/** Copy of `atoms` with the bonds among them that `keep` accepts (all by default). */
export function ringCopy(mol: MolGraph, atoms: readonly number[], keep?: (a: number, b: number) => boolean): SubMolecule {
  const { graph, map } = mol.subgraph(atoms, keep);
  return { graph, heavy: atoms.map((a) => map.get(a)!) };
}

/** Fills free valences with H and perceives rings and atom types. */
export function finish(sub: SubMolecule, table: AtomTypeTable): SubMolecule {
  sub.graph.saturate();
  sub.graph.perceiveRings();
  sub.graph.assignTypes(table);
  return sub;
}

/** Sets every B bond of the copy to single (for a ring that is not aromatic on its own). */
export function dearomatise(sub: SubMolecule): void {
  const g = sub.graph;
  for (const a of sub.heavy) for (const b of g.neighbours[a]!) if (a < b && g.order(a, b) === 1.5) g.setOrder(a, b, 1);
}

/**
 * The saturated form: every non-B multiple bond among the ring atoms single, H refilled.
 * `already` is true when nothing had to change.
 */
export function saturatedCopy(sub: SubMolecule, table: AtomTypeTable): { sub: SubMolecule; already: boolean } {
  let already = true;
  const copy = ringCopy(sub.graph, sub.heavy);
  const g = copy.graph;
  for (const a of copy.heavy) {
    for (const b of g.neighbours[a]!) {
      const o = g.order(a, b)!;
      if (a < b && o !== 1 && o !== 1.5) {
        already = false;
        g.setOrder(a, b, 1);
      }
    }
  }
  return { sub: finish(copy, table), already };
}

/** A single ring of `graph` as its own sub-molecule, prepared the way the ring tree expects. */
export function singleRing(graph: MolGraph, ring: readonly number[], table: AtomTypeTable): SubMolecule {
  const aromatic = isAromaticRing(graph, ring);
  const copy = ringCopy(graph, ring);
  if (!aromatic) dearomatise(copy);
  return finish(copy, table);
}

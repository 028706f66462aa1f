// Ring terms: one ring-tree correction per isolated ring; for fused, bridged or spiro clusters the
// polycyclic tree, with the bicyclic heuristic for generic nodes and the ring-pair heuristic for
// clusters the tree does not hold (the method described in rmg-groups/README.md, section 6).
import { ThermoError } from '../../errors';
import type { AtomTypeTable } from './atom-types';
import type { Contribution } from './contribution';
import type { GroupTree } from './group-tree';
import type { MolGraph } from './mol-graph';
import { lookupRing, ringContribution } from './ring-lookup';
import { finish, isAromaticRing, ringCopy, saturatedCopy, singleRing, type SubMolecule } from './sub-molecule';
import type { ThermoValues } from './thermo-values';

type Tree = GroupTree<ThermoValues>;

export interface RingTrees {
  ring: Tree;
  polycyclic: Tree;
  table: AtomTypeTable;
}

export interface RingResult {
  contributions: Contribution[];
  notes: string[];
}

/** SSSR rings merged into clusters of rings that share atoms. */
export function ringClusters(rings: readonly number[][]): number[][][] {
  const clusters: { atoms: Set<number>; rings: number[][] }[] = [];
  for (const ring of rings) {
    const touching = clusters.filter((c) => ring.some((a) => c.atoms.has(a)));
    const merged = { atoms: new Set(ring), rings: [ring] };
    for (const c of touching) {
      c.atoms.forEach((a) => merged.atoms.add(a));
      merged.rings.push(...c.rings);
      clusters.splice(clusters.indexOf(c), 1);
    }
    clusters.push(merged);
  }
  return clusters.map((c) => c.rings);
}

function lookupOrThrow(tree: Tree, graph: MolGraph, atoms: readonly number[]) {
  const found = lookupRing(tree, graph, atoms);
  if (!found) throw new ThermoError('UNSUPPORTED_STRUCTURE', `No ${tree.name} entry matches a ring of ${atoms.length} atoms.`, { field: 'smiles' });
  return found;
}

/** Saturated bicyclic, minus its two saturated rings, plus its two actual rings. */
function bicyclicHeuristic(trees: RingTrees, pair: SubMolecule, centres: number[]): Contribution[] {
  const sat = saturatedCopy(pair, trees.table);
  const satFound = lookupOrThrow(trees.polycyclic, sat.sub.graph, sat.sub.heavy);
  const out = [ringContribution('polycyclic', satFound, 1, centres, 'bicyclic heuristic')];
  if (sat.already) return out;
  for (const ring of pair.graph.rings) {
    const single = singleRing(pair.graph, ring, trees.table);
    const actual = lookupOrThrow(trees.ring, single.graph, single.heavy);
    out.push(ringContribution('ring', actual, 1, centres, 'bicyclic heuristic'));
    const satRing = saturatedCopy(single, trees.table);
    const saturated = satRing.already ? actual : lookupOrThrow(trees.ring, satRing.sub.graph, satRing.sub.heavy);
    out.push(ringContribution('ring', saturated, -1, centres, 'bicyclic heuristic'));
  }
  return out;
}

function ringPairHeuristic(trees: RingTrees, mol: MolGraph, rings: number[][], centres: number[]): Contribution[] {
  const out: Contribution[] = [];
  const occurrences = rings.map(() => 0);
  for (let i = 0; i < rings.length; i += 1) {
    for (let j = i + 1; j < rings.length; j += 1) {
      const ri = new Set(rings[i]);
      const rj = new Set(rings[j]);
      if (!rings[j]!.some((a) => ri.has(a))) continue;
      occurrences[i]! += 1;
      occurrences[j]! += 1;
      const atoms = [...new Set([...rings[i]!, ...rings[j]!])].sort((x, y) => x - y);
      const inOne = (a: number, b: number): boolean => (ri.has(a) && ri.has(b)) || (rj.has(a) && rj.has(b));
      const pair = ringCopy(mol, atoms, inOne);
      const ai = isAromaticRing(mol, rings[i]!);
      const aj = isAromaticRing(mol, rings[j]!);
      if (!ai || !aj) {
        const aromatic = ai ? ri : aj ? rj : undefined;
        atoms.forEach((a, x) => {
          atoms.forEach((b, y) => {
            if (a >= b || pair.graph.order(x, y) !== 1.5) return;
            const shared = aromatic !== undefined && aromatic.has(a) && aromatic.has(b);
            if (!shared) pair.graph.setOrder(x, y, 1);
          });
        });
      }
      finish(pair, trees.table);
      const found = lookupOrThrow(trees.polycyclic, pair.graph, pair.heavy);
      if (found.node.data === null) out.push(...bicyclicHeuristic(trees, pair, centres));
      else out.push(ringContribution('polycyclic', found, 1, centres, 'ring-pair heuristic'));
    }
  }
  rings.forEach((ring, k) => {
    if (occurrences[k]! < 2) return;
    const single = singleRing(mol, ring, trees.table);
    const found = lookupOrThrow(trees.ring, single.graph, single.heavy);
    for (let n = 1; n < occurrences[k]!; n += 1) out.push(ringContribution('ring', found, -1, centres, 'ring-pair heuristic'));
  });
  return out;
}

export function ringCorrections(trees: RingTrees, mol: MolGraph): RingResult {
  const contributions: Contribution[] = [];
  const notes: string[] = [];
  for (const rings of ringClusters(mol.rings)) {
    const atoms = [...new Set(rings.flat())].sort((a, b) => a - b);
    if (rings.length === 1) {
      contributions.push(ringContribution('ring', lookupOrThrow(trees.ring, mol, rings[0]!), 1, atoms));
      continue;
    }
    const found = lookupOrThrow(trees.polycyclic, mol, atoms);
    if (found.partial) {
      notes.push(`polycyclic partial match (${found.node.label}): ring-pair heuristic`);
      contributions.push(...ringPairHeuristic(trees, mol, rings, atoms));
    } else if (rings.length === 2 && found.node.data === null) {
      notes.push(`polycyclic generic node ${found.node.label}: bicyclic heuristic`);
      contributions.push(...bicyclicHeuristic(trees, finish(ringCopy(mol, atoms), trees.table), atoms));
    } else {
      contributions.push(ringContribution('polycyclic', found, 1, atoms));
    }
  }
  return { contributions, notes };
}

// Looking a ring or ring cluster up in the ring or polycyclic tree: descend from every ring atom,
// prefer complete matches, take the deepest, average the children of a node without data.
import type { Contribution } from './contribution';
import type { GroupTree, TreeEntry } from './group-tree';
import type { MolGraph } from './mol-graph';
import { smallestRings } from './sssr';
import { averageThermo, type ThermoValues } from './thermo-values';

type Tree = GroupTree<ThermoValues>;
type Entry = TreeEntry<ThermoValues>;

export interface RingLookup {
  /** deepest entry matched */
  node: Entry;
  /** entry whose numbers are used (node itself, an averaged node, an ancestor or a referenced entry) */
  source: Entry;
  values: ThermoValues;
  partial: boolean;
  averaged: boolean;
}

const groupRingSizes = new WeakMap<Entry, string>();

function sizesKey(rings: number[][]): string {
  return rings
    .map((r) => r.length)
    .sort((a, b) => a - b)
    .join(',');
}

function ringSizesOfAtoms(mol: MolGraph, atoms: readonly number[]): string {
  const set = new Set(atoms);
  const edges: [number, number][] = [];
  for (const a of atoms) for (const b of mol.neighbours[a]!) if (a < b && set.has(b)) edges.push([a, b]);
  return sizesKey(smallestRings(mol.size, edges));
}

function isPartial(tree: Tree, entry: Entry, atomCount: number, molKey: () => string): boolean {
  const graph = tree.graphOf(entry);
  if (!graph) return true;
  if (graph.atoms.length < atomCount) return true;
  let groupKey = groupRingSizes.get(entry);
  if (groupKey === undefined) {
    const edges: [number, number][] = [];
    graph.adj.forEach((ns, a) => ns.forEach(({ to }) => a < to && edges.push([a, to])));
    groupKey = sizesKey(smallestRings(graph.atoms.length, edges));
    groupRingSizes.set(entry, groupKey);
  }
  return groupKey !== molKey();
}

const averages = new WeakMap<Entry, ThermoValues | null>();

/** Numbers of a node: its own (references followed), else the average over its children's. */
export function averagedValues(tree: Tree, node: Entry): ThermoValues | undefined {
  if (node.data !== null) return tree.followRefs(node)?.data;
  const known = averages.get(node);
  if (known !== undefined) return known ?? undefined;
  const list = node.children.map((c) => averagedValues(tree, c)).filter((v): v is ThermoValues => v !== undefined);
  const result = list.length > 0 ? averageThermo(list) : null;
  averages.set(node, result);
  return result ?? undefined;
}

export function lookupRing(tree: Tree, mol: MolGraph, atoms: readonly number[]): RingLookup | undefined {
  const matched: Entry[] = [];
  for (const a of atoms) {
    const e = tree.descend(mol, { '*': a });
    if (e) matched.push(e);
  }
  if (matched.length === 0) return undefined;
  let molSizes: string | undefined;
  const molKey = (): string => (molSizes ??= ringSizesOfAtoms(mol, atoms));
  const complete = matched.filter((e) => !isPartial(tree, e, atoms.length, molKey));
  const pool = complete.length > 0 ? complete : matched;
  const depths = pool.map((e) => tree.ancestors(e));
  const node = pool[depths.indexOf(Math.max(...depths))]!;
  for (let at: Entry | undefined = node; at; at = at.parent) {
    const values = averagedValues(tree, at);
    if (!values) continue;
    const source = at.data === null ? at : (tree.followRefs(at)?.entry ?? at);
    return { node, source, values, partial: complete.length === 0, averaged: at.data === null };
  }
  return undefined;
}

export function ringContribution(file: string, found: RingLookup, sign: 1 | -1, centres: number[], via?: Contribution['via']): Contribution {
  const how = via ?? (found.averaged ? 'averaged children' : undefined);
  return {
    file,
    label: found.source.label,
    sign,
    values: found.values,
    entry: found.source,
    reached: found.node,
    centres,
    ...(how ? { via: how } : {}),
  };
}

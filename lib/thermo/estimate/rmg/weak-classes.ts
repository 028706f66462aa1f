// Structures on which the published groups are known to be weak (rmg-groups/README.md, "Known
// weaknesses"). Each reason carries a kind that the σ model widens the uncertainty for.
import type { Contribution } from './contribution';
import type { GroupTree } from './group-tree';
import type { MolGraph } from './mol-graph';
import { isZero, type ThermoValues } from './thermo-values';

export type WeakKind =
  | 'n-heteroaromatic'
  | 'conjugated-carbonyl-oxygen'
  | 'nitroarene'
  | 'generic-ring'
  | 'generic-group'
  | 'ring-heuristic'
  | 'cumulene'
  | 'o-s-ring'
  | 'alcohol'
  | 'copied-ring'
  | 'nitro';

/** Kinds that only widen σ (a known, moderate offset); the others also mark the estimate "low". */
export const WIDEN_ONLY: ReadonlySet<WeakKind> = new Set(['o-s-ring', 'alcohol', 'nitro']);

/** Kinds whose error is a systematic offset per occurrence: σ grows linearly with the count. */
export const PER_OCCURRENCE: ReadonlySet<WeakKind> = new Set(['n-heteroaromatic', 'conjugated-carbonyl-oxygen']);

export interface WeakReason {
  kind: WeakKind;
  text: string;
  /** occurrences in the molecule (N-heteroaromatic rings, old carbonyl groups, ...) */
  count: number;
}

/** Carbonyl-carbon groups of older provenance next to the Paraskevas oxygen groups (README, item 2). */
const OLD_CARBONYL = new Set(['Cds-OdCbOs', 'Cds-O2d(Cds-Cds)O2s', 'Cds-OdCbCb', 'Cds-O2d(Cds-Cds)(Cds-Cds)']);

const copiedRings = new WeakMap<GroupTree<ThermoValues>, Set<string>>();

/** Ring entries whose numbers equal another ring entry's (e.g. Piperidine repeats Pyrrolidine). */
function copiedRingLabels(ringTree: GroupTree<ThermoValues>): Set<string> {
  let set = copiedRings.get(ringTree);
  if (set) return set;
  const byValue = new Map<string, string[]>();
  for (const e of ringTree.entries.values()) {
    const d = e.data;
    if (!d || 'ref' in d || (d.H === 0 && d.S === 0)) continue;
    const key = `${d.H.toFixed(3)}|${d.S.toFixed(3)}`;
    byValue.set(key, [...(byValue.get(key) ?? []), e.label]);
  }
  set = new Set([...byValue.values()].filter((labels) => labels.length > 1).flat());
  copiedRings.set(ringTree, set);
  return set;
}

/** Whether the entry that gave the numbers names every non-aromatic neighbour of the centre. */
function spellsOutNeighbours(tree: GroupTree<ThermoValues>, c: Contribution, mol: MolGraph): boolean {
  const centre = c.centres[0]!;
  const node = tree.withData(c.reached) ?? c.reached;
  const graph = tree.graphOf(node);
  if (!graph) return true;
  const star = graph.labels.get('*');
  if (star === undefined) return true;
  const listed = graph.adj[star]!.filter((e) => e.mask !== 8).length;
  const actual = mol.neighbours[centre]!.filter((n) => mol.order(centre, n) !== 1.5).length;
  return listed >= actual;
}

export function weakReasons(
  trees: { group: GroupTree<ThermoValues>; ring: GroupTree<ThermoValues> },
  mol: MolGraph,
  contributions: Contribution[],
  rdkitAromatic: ReadonlySet<string>,
): WeakReason[] {
  const groupTree = trees.group;
  const copied = copiedRingLabels(trees.ring);
  const out: WeakReason[] = [];
  const add = (kind: WeakKind, text: string): void => {
    const known = out.find((r) => r.kind === kind);
    if (known) known.count += 1;
    else out.push({ kind, text, count: 1 });
  };
  const key = (a: number, b: number): string => (a < b ? `${a}-${b}` : `${b}-${a}`);
  for (const ring of mol.rings) {
    const aromatic = ring.every((a, i) => rdkitAromatic.has(key(a, ring[(i + 1) % ring.length]!)));
    if (aromatic && ring.some((a) => mol.atom(a).element === 'N')) {
      add('n-heteroaromatic', 'N-heteroaromatic ring: kept as a Kekulé structure, so no aromatic stabilisation is counted');
    }
  }
  for (let i = 0; i < mol.size; i += 1) {
    if (mol.atom(i).type === 'N5dc' && !out.some((r) => r.kind === 'nitro')) add('nitro', 'nitro or nitrate group: entropies of these groups fit published data loosely');
    if (mol.atom(i).type === 'N5dc' && mol.neighbours[i]!.some((n) => mol.atom(n).type === 'Cb' || mol.atom(n).type === 'Cbf')) {
      add('nitroarene', 'nitro group on an aromatic ring: no Cb–NO2 group, the generic Cb value is used');
    }
  }
  for (let i = 0; i < mol.size; i += 1) {
    if (mol.atom(i).type === 'Cdd' && mol.neighbours[i]!.every((n) => mol.atom(n).element === 'C')) {
      add('cumulene', 'cumulated C=C=C (allene groups fitted on few species; S poorly determined)');
    }
  }
  // measured on the library: ring corrections of saturated O/S rings give S° tens of J/(mol K) low
  if (mol.rings.some((r) => r.some((a) => ['O', 'S'].includes(mol.atom(a).element)))) {
    add('o-s-ring', 'ring holding O or S: ring-correction entropies of these rings fit published data poorly');
  }
  for (const c of contributions) {
    if (c.file === 'group' && c.label === 'O2s-CsH') {
      add('alcohol', 'aliphatic alcohol: the O2s-CsH group gives simple alcohols a systematic offset of several kJ/mol');
    }
    if (c.file === 'group' && OLD_CARBONYL.has(c.label)) {
      add('conjugated-carbonyl-oxygen', `aromatic or conjugated acid, ester or anhydride: ${c.label} is of older provenance than its oxygen neighbours`);
    }
    // all-zero terminal groups (O2d, O0sc, N3t, halogens) are dummies by design: their value sits in the neighbour's group
    if (c.file === 'group' && !isZero(c.values) && !spellsOutNeighbours(groupTree, c, mol)) {
      add('generic-group', `generic fallback group ${c.reached.label} for atom ${c.centres[0]! + 1} (${mol.atom(c.centres[0]!).element})`);
    }
    if ((c.file === 'ring' || c.file === 'polycyclic') && c.sign === 1 && c.reached.children.length > 0 && c.reached.data === null) {
      add('generic-ring', `generic ring node ${c.reached.label}: no entry for this ring`);
    }
    if ((c.file === 'ring' || c.file === 'polycyclic') && c.reached.children.length > 0 && c.reached.data !== null && 'ref' in (c.reached.data as object)) {
      add('generic-ring', `generic ring node ${c.reached.label} (data borrowed from ${c.label})`);
    }
    if (c.file === 'ring' && c.sign === 1 && copied.has(c.label)) {
      add('copied-ring', `ring correction ${c.label} repeats another ring's numbers in the source data`);
    }
    if (c.via === 'bicyclic heuristic' || c.via === 'ring-pair heuristic') add('ring-heuristic', `ring system estimated by the ${c.via}`);
  }
  return out;
}

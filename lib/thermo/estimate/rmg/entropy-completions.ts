// Oxygen terms whose S° the tree lacks for the groups it now uses, completed the method's own way from ONE
// parent compound's tabulated S°(g) each (rmg-groups README, "Known weaknesses"; issue #17 allows it). S° only:
// ΔfH° and Cp stay the tree's. Each parent is calibration, not test: bench/estimate-accuracy.ts reports the
// fine-chemical figures without them.
// - Acetal carbon Cs-OsOsHH: the tree holds Paraskevas et al. 2013's CBS-QB3 value (17.89 J/(mol K)); the older
//   Benson table has no S° for C-(O)2(H)2. Completed from dimethoxymethane, the simplest (acyclic) compound that
//   holds it, so no ring term enters the derivation: S = S°(parent) + R ln σ − Σ(the parent's other groups).
// - Saturated O-rings: the tree's terms for THF (THERM, Dorofeeva 1992), 1,3-dioxolane and 1,4-dioxane (Benson
//   1976) were derived on Benson's oxygen groups, not on the Paraskevas groups now on the ring atoms, and
//   1,3,5,7-tetroxocane has no entry (the descent stops at a carbocycle node). Term = S°(parent) + R ln σ −
//   Σ(the parent's group terms, the acetal carbon already completed). The completed THF term (114.7) lands on the
//   tree's own cyclopentane term (114.2): a check that the completion is of the right kind.
// - 1,3,5-trioxane was tried and rejected: its own row asks for +25.6 J/(mol K) on the tree's term, but
//   paraldehyde, the library's one derivative of that ring, already fits the tree's term (+2.9) and would move away.
import type { Contribution } from './contribution';
import type { MolGraph } from './mol-graph';

interface Parent {
  name: string;
  smiles: string;
  S_J_per_K: number;
  source: string;
}

export interface GroupCompletion {
  label: string;
  treeS_J_per_K: number;
  treeSource: string;
  S_J_per_K: number;
  parent: Parent;
}

export interface RingCompletion {
  /** canonical cyclic sequence of ring elements (ring atoms sp3 C and ether O, ring bonds single) */
  signature: string;
  /** the tree entry (or generic node) the ring reaches, for the record */
  treeTerm: string;
  treeS_J_per_K: number;
  /** completed ring-term S°(298) in J/(mol K) */
  S_J_per_K: number;
  parent: Parent;
}

export const GROUP_ENTROPY_COMPLETIONS: readonly GroupCompletion[] = [
  {
    label: 'Cs-OsOsHH',
    treeS_J_per_K: 17.89,
    treeSource: 'Paraskevas et al. 2013',
    S_J_per_K: 28.29,
    parent: { name: 'dimethoxymethane', smiles: 'COCOC', S_J_per_K: 335.72, source: 'NIST WebBook' },
  },
];

export const RING_ENTROPY_COMPLETIONS: readonly RingCompletion[] = [
  {
    signature: 'C-C-C-C-O',
    treeTerm: 'Tetrahydrofuran (THERM, Dorofeeva 1992)',
    treeS_J_per_K: 88.54,
    S_J_per_K: 114.73,
    parent: { name: 'tetrahydrofuran', smiles: 'C1CCOC1', S_J_per_K: 301.7, source: 'NIST WebBook (CRC Handbook 302.4)' },
  },
  {
    signature: 'C-C-O-C-O',
    treeTerm: '1,3-Dioxolane (Benson 1976)',
    treeS_J_per_K: 85.36,
    S_J_per_K: 135.45,
    parent: { name: '1,3-dioxolane', smiles: 'C1COCO1', S_J_per_K: 310.5, source: 'NIST WebBook' },
  },
  {
    signature: 'C-C-O-C-C-O',
    treeTerm: '1,4-Dioxane (Benson 1976)',
    treeS_J_per_K: 74.5,
    S_J_per_K: 77.85,
    parent: { name: '1,4-dioxane', smiles: 'C1COCCO1', S_J_per_K: 299.91, source: 'NIST WebBook' },
  },
  {
    signature: 'C-O-C-O-C-O-C-O',
    treeTerm: 'no entry (descent stops at a generic eight-membered node; Cyclooctane numbers)',
    treeS_J_per_K: 69.58,
    S_J_per_K: 95.29,
    parent: { name: '1,3,5,7-tetroxocane', smiles: 'C1OCOCOCO1', S_J_per_K: 345.6, source: 'NIST WebBook' },
  },
];

const GROUP_BY_LABEL = new Map(GROUP_ENTROPY_COMPLETIONS.map((c) => [c.label, c]));
const RING_BY_SIGNATURE = new Map(RING_ENTROPY_COMPLETIONS.map((c) => [c.signature, c]));

/** Smallest rotation or reflection of the ring's element sequence, joined with '-'. */
function canonical(elements: string[]): string {
  const n = elements.length;
  let best: string | undefined;
  for (const seq of [elements, [...elements].reverse()]) {
    for (let k = 0; k < n; k += 1) {
      const s = [...seq.slice(k), ...seq.slice(0, k)].join('-');
      if (best === undefined || s < best) best = s;
    }
  }
  return best ?? '';
}

/** The completion for an isolated ring of sp3 C and ether O joined by single bonds, if one is on file. */
export function ringCompletionFor(mol: MolGraph, ringAtoms: readonly number[]): RingCompletion | undefined {
  const set = new Set(ringAtoms);
  const ring = mol.rings.find((r) => r.length === set.size && r.every((a) => set.has(a)));
  if (!ring) return undefined;
  const saturated = ring.every((a, i) => mol.order(a, ring[(i + 1) % ring.length]!) === 1 && ['Cs', 'O2s'].includes(mol.atom(a).type ?? ''));
  if (!saturated) return undefined;
  return RING_BY_SIGNATURE.get(canonical(ring.map((a) => mol.atom(a).element)));
}

const from = (p: Parent): string => `${p.name} (${p.source}, S° ${p.S_J_per_K} J/(mol K))`;

/** The contributions with each completed group or ring term's S° replaced; ΔfH°, Cp and every other term untouched. */
export function completedEntropies(mol: MolGraph, contributions: readonly Contribution[]): Contribution[] {
  return contributions.map((c) => {
    const group = c.file === 'group' && c.sign === 1 ? GROUP_BY_LABEL.get(c.label) : undefined;
    if (group) {
      const sourceOverride = `S° completed from ${from(group.parent)}; ΔfH° and Cp from the RMG tree (${group.treeSource})`;
      return { ...c, values: { ...c.values, S: group.S_J_per_K }, completedFrom: group.parent.name, sourceOverride };
    }
    if (c.file !== 'ring' || c.sign !== 1 || c.via === 'bicyclic heuristic' || c.via === 'ring-pair heuristic') return c;
    const ring = ringCompletionFor(mol, c.centres);
    if (!ring) return c;
    const sourceOverride = `S° completed from ${from(ring.parent)}; ΔfH° and Cp from the RMG tree (${ring.treeTerm})`;
    return { ...c, values: { ...c.values, S: ring.S_J_per_K }, completedFrom: ring.parent.name, sourceOverride };
  });
}

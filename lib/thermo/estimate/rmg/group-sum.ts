// The group-additivity sum over a molecule graph: a `group` term per non-H, non-halogen atom,
// long-distance terms (non-cyclic pairs for chain atoms, ordered pairs within each SSSR ring),
// `other` (ketene) terms, then ring corrections. Gives intrinsic values (no symmetry yet).
import type { Contribution } from './contribution';
import { HALOGENS, type MolGraph } from './mol-graph';
import type { RmgDatabase } from './rmg-database';
import { ringCorrections } from './ring-corrections';
import type { Centres, GroupTree, TreeEntry } from './group-tree';
import { addThermo, isZero, type ThermoValues, zeroThermo } from './thermo-values';

export interface UnplacedAtom {
  atom: number;
  element: string;
  reason: string;
}

export interface GroupSum {
  values: ThermoValues;
  contributions: Contribution[];
  notes: string[];
  /** atoms no group could centre: the sum is then incomplete and must not be used */
  unplaced: UnplacedAtom[];
}

type Tree = GroupTree<ThermoValues>;

interface Found {
  reached: TreeEntry<ThermoValues>;
  entry: TreeEntry<ThermoValues>;
  values: ThermoValues;
}

function lookup(tree: Tree, mol: MolGraph, centres: Centres): Found | undefined {
  const reached = tree.descend(mol, centres);
  if (!reached) return undefined;
  const withData = tree.withData(reached);
  if (!withData) return undefined;
  const resolved = tree.followRefs(withData);
  return resolved ? { reached, entry: resolved.entry, values: resolved.data } : undefined;
}

function term(file: string, found: Found, centres: number[]): Contribution {
  return { file, label: found.entry.label, sign: 1, values: found.values, entry: found.entry, reached: found.reached, centres };
}

/** Heavy first and second neighbours of a chain atom that can pair with it (README 5.1b). */
function longDistancePartners(mol: MolGraph, atom: number): number[] {
  const first = mol.neighbours[atom]!.filter((n) => mol.isHeavy(n));
  const partners = new Set(first);
  for (const n of first) for (const m of mol.neighbours[n]!) if (m !== atom && mol.isHeavy(m)) partners.add(m);
  const halogenated = (p: number): boolean => mol.neighbours[p]!.some((q) => HALOGENS.has(mol.atom(q).element));
  return [...partners].filter((p) => !mol.inRing[p] || halogenated(p));
}

export function groupAdditivity(db: RmgDatabase, mol: MolGraph): GroupSum {
  const { trees } = db;
  const contributions: Contribution[] = [];
  const unplaced: UnplacedAtom[] = [];
  const optional = (file: keyof RmgDatabase['trees'], centres: Centres, atoms: number[]): void => {
    const found = lookup(trees[file], mol, centres);
    if (found && !isZero(found.values)) contributions.push(term(file, found, atoms));
  };

  for (let i = 0; i < mol.size; i += 1) {
    const atom = mol.atom(i);
    if (atom.element === 'H' || HALOGENS.has(atom.element)) continue;
    const found = atom.type === undefined ? undefined : lookup(trees.group, mol, { '*': i });
    if (!found) {
      unplaced.push({ atom: i, element: atom.element, reason: atom.type === undefined ? 'no RMG atom type fits' : 'no group entry with data matches' });
      continue;
    }
    contributions.push(term('group', found, [i]));
    if (!mol.inRing[i]) {
      for (const p of longDistancePartners(mol, i)) optional('longDistanceInteraction_noncyclic', { '*1': i, '*2': p }, [i, p]);
    }
    optional('other', { '*': i }, [i]);
  }
  for (const ring of mol.rings) {
    for (const a of ring) for (const b of ring) if (a !== b) optional('longDistanceInteraction_cyclic', { '*1': a, '*2': b }, [a, b]);
  }
  const rings = unplaced.length === 0 ? ringCorrections({ ring: trees.ring, polycyclic: trees.polycyclic, table: db.atomTypes }, mol) : { contributions: [], notes: [] };
  contributions.push(...rings.contributions);

  const values = zeroThermo();
  for (const c of contributions) addThermo(values, c.values, c.sign);
  return { values, contributions, notes: rings.notes, unplaced };
}

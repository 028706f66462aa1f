// Abraham solute descriptors (E, S, A, B, L; V by McGowan) of a neutral closed-shell molecule: the
// solute library when it holds the molecule, else group additivity on the Chung 2022 trees. A
// halogenated molecule is its H-replaced parent plus one halogen correction per halogen atom; in
// rings the parent's ring-pair terms are swapped for the halogenated molecule's (the method in the
// solvation data README).
import { ThermoError } from '../../errors';
import type { Chem, ParsedStructure } from '../../structure/chem';
import type { MatchedGroup } from '../phase/matched-group';
import type { Contribution } from '../rmg/contribution';
import { groupAdditivity } from '../rmg/group-sum';
import type { GroupTree } from '../rmg/group-tree';
import type { MolGraph } from '../rmg/mol-graph';
import { buildMolecule } from '../rmg/rdkit-graph';
import { addThermo, zeroThermo, type ThermoValues } from '../rmg/thermo-values';
import { halogenFreeParent } from './halogen-free';
import { mcgowanVolume } from './mcgowan-volume';
import { loadSoluteDatabase, SOLUTE_SOURCE, unpackDescriptors, type SoluteDescriptors } from './solute-database';
import { soluteLibrary } from './solute-library';

export interface SoluteEstimate {
  descriptors: SoluteDescriptors & { V: number };
  /** 'library' = experimental (or COSMO-RS) descriptors of the molecule or its H-replaced parent */
  basis: 'library' | 'group additivity' | 'library parent + halogen groups';
  groups: MatchedGroup[];
  notes: string[];
}

type Tree = GroupTree<ThermoValues>;

function lookup(tree: Tree, mol: MolGraph, centres: Record<string, number>): { label: string; values: ThermoValues } | undefined {
  const reached = tree.descend(mol, centres);
  const withData = reached && tree.withData(reached);
  const resolved = withData && tree.followRefs(withData);
  return resolved ? { label: resolved.entry.label, values: resolved.data } : undefined;
}

function cyclicPairTerms(tree: Tree, mol: MolGraph): { label: string; values: ThermoValues }[] {
  const out: { label: string; values: ThermoValues }[] = [];
  for (const ring of mol.rings) for (const a of ring) for (const b of ring) if (a !== b) {
    const found = lookup(tree, mol, { '*1': a, '*2': b });
    if (found) out.push(found);
  }
  return out;
}

function tally(into: Map<string, MatchedGroup>, label: string, sign: number): void {
  const g = into.get(label) ?? { label, count: 0, source: SOLUTE_SOURCE };
  g.count += sign;
  into.set(label, g);
}

function unplacedError(atoms: { atom: number; element: string }[]): ThermoError {
  const list = atoms.map((a) => `${a.element}${a.atom + 1}`).join(', ');
  return new ThermoError('UNSUPPORTED_STRUCTURE', `The Abraham solute groups cannot place atom(s) ${list}; no partial descriptor estimate is given.`, {
    field: 'smiles',
    hint: 'Give the hydration free energy directly, or estimate a close analogue.',
    details: { uncoveredAtoms: atoms },
  });
}

/**
 * `library`: 'use' (default, as RMG: the molecule's own library entry first, else its H-replaced parent's),
 * 'parents only' (leave-one-out, for calibration), 'none' (pure group additivity).
 */
export type LibraryUse = 'use' | 'parents only' | 'none';

/** `structure`: a SMILES, or the resolver's parsed structure (reused: no second parse or InChI). */
export function estimateSoluteDescriptors(chem: Chem, structure: string | ParsedStructure, options: { library?: LibraryUse } = {}): SoluteEstimate {
  const libraryUse = options.library ?? 'use';
  const parsed = typeof structure === 'string' ? chem.parse(structure) : structure;
  const { db, halogen } = loadSoluteDatabase();
  const built = buildMolecule(chem, parsed, db.atomTypes);
  const V = mcgowanVolume(parsed.elements, built.graph.rings.length);
  const library = libraryUse === 'none' ? undefined : soluteLibrary(chem);
  const own = libraryUse === 'use' ? library?.get(parsed.smiles) : undefined;
  if (own) {
    return { descriptors: { ...own.descriptors, V }, basis: 'library', groups: [{ label: `solute library: ${own.label}`, count: 1, source: own.source }], notes: own.computed ? ['Library descriptors are COSMO-RS calculations, not experiments.'] : [] };
  }
  if (!parsed.elements.C) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', 'Abraham descriptors by groups cover organic solutes; this carbon-free molecule is not in the solute library.', {
      field: 'smiles',
      hint: 'Give its hydration free energy or Henry constant directly.',
    });
  }
  const parentSmiles = halogenFreeParent(chem, parsed.smiles);
  const groups = new Map<string, MatchedGroup>();
  const total = zeroThermo();
  const notes: string[] = [];
  const parent = parentSmiles === null ? built : buildMolecule(chem, parentSmiles, db.atomTypes);
  const parentLibrary = parentSmiles === null ? undefined : library?.get(parentSmiles);
  if (parentLibrary) {
    addThermo(total, { H: parentLibrary.descriptors.S, S: parentLibrary.descriptors.B, Cp: [parentLibrary.descriptors.E, parentLibrary.descriptors.L, parentLibrary.descriptors.A, 0, 0, 0, 0] });
    groups.set('library', { label: `solute library: ${parentLibrary.label} (H-replaced parent)`, count: 1, source: parentLibrary.source });
  } else {
    const sum = groupAdditivity(db, parent.graph);
    if (sum.unplaced.length > 0) throw unplacedError(sum.unplaced);
    addThermo(total, sum.values);
    sum.contributions.forEach((c: Contribution) => tally(groups, `${c.file}: ${c.label}`, c.sign));
    notes.push(...sum.notes);
  }
  if (parentSmiles !== null) {
    const mol = built.graph;
    const missing: { atom: number; element: string }[] = [];
    for (let i = 0; i < mol.size; i += 1) {
      if (!['F', 'Cl', 'Br', 'I'].includes(mol.atom(i).element)) continue;
      const found = lookup(halogen, mol, { '*': i });
      if (!found) missing.push({ atom: i, element: mol.atom(i).element });
      else {
        addThermo(total, found.values);
        tally(groups, `halogen: ${found.label}`, 1);
      }
    }
    if (missing.length > 0) throw unplacedError(missing);
    if (mol.rings.length > 0) {
      const ldc = db.trees.longDistanceInteraction_cyclic;
      for (const t of cyclicPairTerms(ldc, parent.graph)) {
        addThermo(total, t.values, -1);
        tally(groups, `longDistanceInteraction_cyclic: ${t.label}`, -1);
      }
      for (const t of cyclicPairTerms(ldc, mol)) {
        addThermo(total, t.values, 1);
        tally(groups, `longDistanceInteraction_cyclic: ${t.label}`, 1);
      }
    }
  }
  return {
    descriptors: { ...unpackDescriptors(total), V },
    basis: parentLibrary ? 'library parent + halogen groups' : 'group additivity',
    groups: [...groups.values()].filter((g) => g.count !== 0),
    notes,
  };
}

// Builds the RMG molecule graph from a SMILES through RDKit: explicit H, RDKit's Kekulé bond
// orders, SSSR, RMG aromaticity, lone pairs and atom types.
import { type Chem, MAX_HEAVY_ATOMS, type ParsedStructure, type RdkitMolJson } from '../../structure/chem';
import { ELEMENT_SYMBOLS } from '../../formula';
import { ThermoError } from '../../errors';
import type { AtomTypeTable } from './atom-types';
import { type BondOrder, MolGraph } from './mol-graph';
import { applyRmgAromaticity } from './rmg-aromaticity';

const ELEMENTS_BY_Z = ['', ...ELEMENT_SYMBOLS];

export interface BuiltMolecule {
  graph: MolGraph;
  /** number of heavy atoms (they come first, in SMILES order) */
  heavyCount: number;
  /** RDKit's aromatic bonds as "a-b" keys (used by the symmetry code for real aromatic rings) */
  rdkitAromatic: Set<string>;
}

const bondKey = (a: number, b: number): string => (a < b ? `${a}-${b}` : `${b}-${a}`);

function connected(graph: MolGraph): boolean {
  if (graph.size === 0) return false;
  const seen = new Uint8Array(graph.size);
  const stack = [0];
  seen[0] = 1;
  let count = 1;
  while (stack.length > 0) {
    for (const j of graph.neighbours[stack.pop()!]!) {
      if (seen[j]) continue;
      seen[j] = 1;
      count += 1;
      stack.push(j);
    }
  }
  return count === graph.size;
}

/** `structure`: a SMILES, or a structure the resolver has parsed already (its RDKit JSON is reused, no second parse). */
export function buildMolecule(chem: Chem, structure: string | ParsedStructure, table: AtomTypeTable): BuiltMolecule {
  const json = typeof structure === 'string' ? chem.withMol(structure, (mol) => JSON.parse(mol.get_json()) as RdkitMolJson) : structure.molJson;
  const mixture = (): ThermoError => new ThermoError('UNSUPPORTED_STRUCTURE', 'Give one molecule: the SMILES holds several disconnected parts.', { field: 'smiles' });
  if (json.molecules.length !== 1) throw mixture();
  const mol = json.molecules[0]!;
  const d = json.defaults;
  if (mol.atoms.length > MAX_HEAVY_ATOMS) {
    throw new ThermoError('INVALID_STRUCTURE', `A structure may have at most ${MAX_HEAVY_ATOMS} heavy atoms; this one has ${mol.atoms.length}.`, { field: 'smiles' });
  }
  const graph = new MolGraph();
  const implicitH: number[] = [];
  for (const a of mol.atoms) {
    const z = a.z ?? d.atom.z;
    const element = ELEMENTS_BY_Z[z];
    if (!element) throw new ThermoError('INVALID_STRUCTURE', 'The SMILES holds a dummy or unknown atom (*).', { field: 'smiles' });
    graph.addAtom(element, a.chg ?? d.atom.chg, a.nRad ?? d.atom.nRad);
    implicitH.push(a.impHs ?? d.atom.impHs);
  }
  const heavyCount = graph.size;
  const aromaticIdx = new Set(mol.extensions?.find((e) => e.name === 'rdkitRepresentation')?.aromaticBonds ?? []);
  const rdkitAromatic = new Set<string>();
  (mol.bonds ?? []).forEach((b, i) => {
    const bo = b.bo ?? d.bond.bo;
    if (bo !== 1 && bo !== 2 && bo !== 3) {
      throw new ThermoError('UNSUPPORTED_STRUCTURE', `Bond ${i + 1} has an order (${bo}) the group method does not know.`, { field: 'smiles' });
    }
    graph.addBond(b.atoms[0], b.atoms[1], bo as BondOrder);
    if (aromaticIdx.has(i)) rdkitAromatic.add(bondKey(b.atoms[0], b.atoms[1]));
  });
  implicitH.forEach((n, i) => {
    for (let k = 0; k < n; k += 1) graph.addBond(i, graph.addAtom('H'), 1);
  });
  if (!connected(graph)) throw mixture();
  graph.perceiveRings();
  applyRmgAromaticity(graph, rdkitAromatic);
  graph.assignTypes(table);
  return { graph, heavyCount, rdkitAromatic };
}

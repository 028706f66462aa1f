// The Gani groups were written for the authors' own aromaticity, narrower than RDKit's: only
// six-membered rings of carbon and pyridine-type nitrogen (benzene, pyridine, pyrimidine, pyrazine,
// triazine) and all-carbon rings stay aromatic. Furans, pyrroles, thiophenes, azoles, pyridones and
// other rings with an exocyclic C=X, N-bridgehead rings and 1,2-diazines are matched in their Kekulé
// form (rules described in the data README, checked here against the authors' own group vectors).
// RDKit's JSON carries the Kekulé bond orders plus the aromatic flags, so we drop the flags of the
// rings that must not be aromatic and read the molecule back without re-perceiving aromaticity.
import type { Mol as JSMol } from '@rdkit/rdkit';
import type { Chem } from '../../structure/chem';

interface JsonAtom {
  z?: number;
  impHs?: number;
  chg?: number;
}
interface JsonBond {
  bo?: number;
  atoms: [number, number];
}
interface RdkitExtension {
  name: string;
  aromaticAtoms?: number[];
  aromaticBonds?: number[];
  atomRings?: number[][];
}
interface MolJson {
  defaults: { atom: Required<JsonAtom>; bond: { bo: number } };
  molecules: { atoms: JsonAtom[]; bonds?: JsonBond[]; extensions?: RdkitExtension[] }[];
}

function keepsAromatic(ring: number[], atoms: JsonAtom[], bonds: JsonBond[], defaults: MolJson['defaults'], aromatic: Set<number>, aromaticBonds: Set<number>): boolean {
  if (!ring.every((a) => aromatic.has(a))) return false;
  const z = (a: number): number => atoms[a]!.z ?? defaults.atom.z;
  const inRing = new Set(ring);
  const ringAtomsAllCarbon = ring.every((a) => z(a) === 6);
  // No ring atom with an exocyclic double bond (pyridones, pyrones); a fused neighbour's aromatic bond does not count.
  const exocyclicDouble = bonds.some((b, i) => !aromaticBonds.has(i) && (b.bo ?? defaults.bond.bo) === 2 && inRing.has(b.atoms[0]) !== inRing.has(b.atoms[1]));
  if (exocyclicDouble) return false;
  if (ringAtomsAllCarbon) return true;
  if (ring.length !== 6) return false;
  for (const a of ring) {
    if (z(a) === 6) continue;
    if (z(a) !== 7) return false;
    const atom = atoms[a]!;
    if ((atom.impHs ?? defaults.atom.impHs) !== 0 || (atom.chg ?? defaults.atom.chg) !== 0) return false;
    // Pyridine-type N has two ring neighbours and nothing else (not a bridgehead).
    const degree = bonds.filter((b) => b.atoms.includes(a)).length;
    if (degree !== 2) return false;
    // 1,2-diazine (pyridazine-type) rings are not aromatic in the authors' scheme.
    const nNeighbour = bonds.some((b) => b.atoms.includes(a) && z(b.atoms[0] === a ? b.atoms[1] : b.atoms[0]) === 7 && inRing.has(b.atoms[0] === a ? b.atoms[1] : b.atoms[0]));
    if (nNeighbour) return false;
  }
  return true;
}

/** Runs `use` on the molecule with the authors' aromaticity; frees the WASM memory afterwards. */
export function withGaniMol<T>(chem: Chem, smiles: string, run: (mol: JSMol) => T): T {
  const json = chem.withMol(smiles, (mol) => JSON.parse(mol.get_json()) as MolJson);
  for (const m of json.molecules) {
    const ext = m.extensions?.find((e) => e.name === 'rdkitRepresentation');
    if (!ext?.aromaticAtoms?.length) continue;
    const bonds = m.bonds ?? [];
    const aromatic = new Set(ext.aromaticAtoms);
    const aromaticBonds = new Set(ext.aromaticBonds ?? []);
    const kept = (ext.atomRings ?? []).filter((ring) => keepsAromatic(ring, m.atoms, bonds, json.defaults, aromatic, aromaticBonds));
    const keptAtoms = new Set(kept.flat());
    ext.aromaticAtoms = ext.aromaticAtoms.filter((a) => keptAtoms.has(a));
    ext.aromaticBonds = (ext.aromaticBonds ?? []).filter((i) => {
      const [a, b] = bonds[i]!.atoms;
      return kept.some((ring) => ring.includes(a) && ring.includes(b));
    });
  }
  const mol = chem.rdkit.get_mol(JSON.stringify(json), JSON.stringify({ setAromaticity: false, kekulize: false }));
  if (!mol || !mol.is_valid()) {
    mol?.delete();
    throw new Error(`RDKit could not rebuild ${smiles} with the Gani aromaticity`);
  }
  try {
    return run(mol);
  } finally {
    mol.delete();
  }
}

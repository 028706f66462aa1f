// The solute method estimates a halogenated molecule as its parent with every halogen replaced by H,
// plus one halogen correction per halogen atom. The parent is built from RDKit's JSON: halogen atoms
// dropped, an implicit H added to each atom they were bonded to.
import type { Chem } from '../../structure/chem';

const HALOGEN_Z = new Set([9, 17, 35, 53]);

interface MolJson {
  defaults: { atom: { z: number; impHs: number } };
  molecules: { atoms: { z?: number; impHs?: number }[]; bonds?: { atoms: [number, number]; bo?: number }[]; extensions?: unknown[] }[];
}

/** Canonical SMILES of the molecule with halogens replaced by H, or null if it has none. */
export function halogenFreeParent(chem: Chem, smiles: string): string | null {
  const json = chem.withMol(smiles, (mol) => {
    mol.convert_to_kekule_form();
    return JSON.parse(mol.get_json()) as MolJson;
  });
  const m = json.molecules[0]!;
  const z = (i: number): number => m.atoms[i]!.z ?? json.defaults.atom.z;
  const halogens = new Set(m.atoms.flatMap((_, i) => (HALOGEN_Z.has(z(i)) ? [i] : [])));
  if (halogens.size === 0) return null;
  if (halogens.size === m.atoms.length) return '[H][H]';
  const newIndex = new Map<number, number>();
  m.atoms.forEach((_, i) => !halogens.has(i) && newIndex.set(i, newIndex.size));
  const atoms = m.atoms.filter((_, i) => !halogens.has(i)).map((a) => ({ ...a }));
  const bonds: NonNullable<(typeof m)['bonds']> = [];
  for (const b of m.bonds ?? []) {
    const [p, q] = b.atoms;
    if (halogens.has(p) !== halogens.has(q)) {
      const kept = atoms[newIndex.get(halogens.has(p) ? q : p)!]!;
      kept.impHs = (kept.impHs ?? json.defaults.atom.impHs) + 1;
    } else if (!halogens.has(p)) {
      bonds.push({ ...b, atoms: [newIndex.get(p)!, newIndex.get(q)!] });
    }
  }
  const parent = { ...json, molecules: [{ atoms, bonds }] };
  const mol = chem.rdkit.get_mol(JSON.stringify(parent));
  if (!mol) throw new Error(`RDKit could not rebuild the halogen-free parent of ${smiles}`);
  try {
    return mol.get_smiles();
  } finally {
    mol.delete();
  }
}

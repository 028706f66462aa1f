// A molfile (MDL V2000 or V3000 connection table, as drawing programs save or copy it) read by RDKit and turned
// into canonical SMILES, so that everything after it takes the normal SMILES path. No hand-written parsing.
import { ThermoError } from '../errors';
import type { Chem } from './chem';

/** Longest molfile text accepted (a 150-heavy-atom structure with explicit hydrogens fits well inside). */
export const MAX_MOLFILE_LENGTH = 100_000;

export function smilesFromMolfile(chem: Chem, molfile: string, field = 'molfile'): string {
  const text = molfile.replace(/\r\n?/g, '\n');
  if (text.trim().length === 0) throw new ThermoError('INVALID_STRUCTURE', 'The molfile is empty.', { field });
  if (text.length > MAX_MOLFILE_LENGTH) {
    throw new ThermoError('INVALID_STRUCTURE', `A molfile may be at most ${MAX_MOLFILE_LENGTH} characters; this one has ${text.length}.`, { field });
  }
  if (!/^M {2}END\s*$/m.test(text)) {
    throw new ThermoError('INVALID_STRUCTURE', 'This is not a molfile: it has no "M  END" line. Paste the whole file, or a SMILES instead.', { field });
  }
  // Hydrogens drawn as atoms become implicit, so the SMILES is the same as for the skeletal drawing.
  const mol = chem.rdkit.get_mol(text, JSON.stringify({ removeHs: true }));
  if (!mol || !mol.is_valid()) {
    mol?.delete();
    throw new ThermoError('INVALID_STRUCTURE', 'Cannot read the molfile: check its counts line and the atom and bond blocks.', { field });
  }
  try {
    const smiles = mol.get_smiles();
    if (!smiles) throw new ThermoError('INVALID_STRUCTURE', 'The molfile holds no atoms.', { field });
    return smiles;
  } finally {
    mol.delete();
  }
}

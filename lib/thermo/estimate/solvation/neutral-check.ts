// The Abraham/Mintz relations hold for neutral, closed-shell solutes. Charge-separated neutral groups
// (nitro, N-oxides, azides: + and − on bonded atoms) are fine; ions, zwitterions and radicals are not.
import { ThermoError } from '../../errors';
import type { Chem, ParsedStructure } from '../../structure/chem';

interface MolJson {
  defaults: { atom: { chg: number; nRad: number } };
  molecules: { atoms: { chg?: number; nRad?: number }[]; bonds?: { atoms: [number, number] }[] }[];
}

export function assertNeutralClosedShell(chem: Chem, structure: string | ParsedStructure): void {
  const json: MolJson = typeof structure === 'string' ? chem.withMol(structure, (mol) => JSON.parse(mol.get_json()) as MolJson) : structure.molJson;
  const atoms = json.molecules.flatMap((m) => m.atoms);
  const bonds = json.molecules.flatMap((m) => m.bonds ?? []);
  const charge = (i: number): number => atoms[i]?.chg ?? json.defaults.atom.chg;
  const net = atoms.reduce((s, _, i) => s + charge(i), 0);
  const unpaired = atoms.some((a) => (a.nRad ?? json.defaults.atom.nRad) > 0);
  const isolated = atoms.some((_, i) => charge(i) !== 0 && !bonds.some((b) => b.atoms.includes(i) && charge(b.atoms[0] === i ? b.atoms[1] : b.atoms[0]) * charge(i) < 0));
  if (net !== 0 || isolated) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', 'Aqueous estimates cover neutral solutes only: an ionised species needs its pKa and the biochemical standard state (pH, ionic strength), which this estimate does not model.', {
      field: 'smiles',
      hint: 'Give the neutral form (e.g. CC(=O)O, not CC(=O)[O-]); the result then applies to the undissociated solute at 1 mol/L.',
    });
  }
  if (unpaired) {
    throw new ThermoError('UNSUPPORTED_STRUCTURE', 'Aqueous estimates cover closed-shell solutes only; this structure has unpaired electrons.', { field: 'smiles', hint: 'Radical solvation corrections are not included.' });
  }
}

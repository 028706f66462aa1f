import 'server-only';
import { hillBody, loadChem, type Chem, type ParsedStructure } from '../../thermo/structure/chem';
import { smilesFromMolfile } from '../../thermo/structure/molfile';

/** A pasted structure read by RDKit: a molfile becomes SMILES first; errors name the field the text came from. */
export async function readStructure(given: { smiles?: string; molfile?: string }): Promise<{ chem: Chem; structure: ParsedStructure; field: 'smiles' | 'molfile' }> {
  const chem = await loadChem();
  if (given.molfile !== undefined) return { chem, structure: chem.parse(smilesFromMolfile(chem, given.molfile, 'molfile'), 'molfile'), field: 'molfile' };
  return { chem, structure: chem.parse(given.smiles ?? '', 'smiles'), field: 'smiles' };
}

/** The formula as a team species form writes it (charge sign first, "SO4-2"), from the structure's element counts. */
export function enteredFormula(structure: Pick<ParsedStructure, 'elements' | 'charge'>): string {
  const { elements, charge } = structure;
  const body = hillBody(elements);
  if (charge === 0) return body;
  return `${body}${charge > 0 ? '+' : '-'}${Math.abs(charge) === 1 ? '' : Math.abs(charge)}`;
}

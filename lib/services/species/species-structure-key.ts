import 'server-only';
import { AppError } from '../../api/errors';
import type { BuiltSpecies } from '../../species/build-species';
import { organicKey } from '../../thermo/structure/organic-format';
import { builtinLookup } from '../../thermo/species-library';
import { readStructure } from './read-structure';
import type { StoredStructure } from './team-species-record';

/** The library's record for this structure and phase, if it has one: the team is pointed at it, not given a copy. */
export function libraryStructure(inchikey: string, phase: string) {
  const key = builtinLookup.findStructure?.(inchikey, phase);
  const record = key ? builtinLookup.get(key) : undefined;
  return record ? { key: record.key, name: record.name, source: record.source } : null;
}

const sameElements = (a: Record<string, number>, b: Record<string, number>) =>
  JSON.stringify(Object.entries(a).filter(([, n]) => n > 0).sort()) === JSON.stringify(Object.entries(b).filter(([, n]) => n > 0).sort());

/**
 * A species as entered, tied to a structure (or to none): the structure must have the entered formula, and a
 * species known by structure is keyed by InChIKey and phase (or by the library's key when it replaces a library species).
 */
export async function createdFromStructure(species: BuiltSpecies, smiles: string | null): Promise<{ species: BuiltSpecies; structure: StoredStructure }> {
  if (smiles === null) return { species, structure: { smiles: null, inchikey: null } };
  const { structure } = await readStructure({ smiles });
  if (!sameElements(structure.elements, species.elements) || structure.charge !== species.charge) {
    throw new AppError('VALIDATION', `The structure is ${structure.formula}, but the formula says ${species.formula}.`, {
      fields: { formula: `The structure is ${structure.formula}; change the formula or the SMILES.` },
    });
  }
  const key = libraryStructure(structure.inchikey, species.phase)?.key ?? organicKey(structure.inchikey, species.phase);
  return { species: { ...species, key, form: null }, structure: { smiles: structure.smiles, inchikey: structure.inchikey } };
}

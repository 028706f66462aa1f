// The errors a name can give: several different compounds answer to it (offer them as choices), or none does.
import { ThermoError } from '../errors';
import type { IdentifiedCompound } from './identifiers';

export function ambiguousName(name: string, phase: string, compounds: readonly IdentifiedCompound[], field: string): ThermoError {
  const choices = compounds.slice(0, 10).map((c) => ({ name: c.name, smiles: c.smiles, formula: c.formula, inchikey: c.inchikey, cas: c.cas }));
  return new ThermoError('AMBIGUOUS_NAME', `"${name}" names ${compounds.length} different compounds: ${choices.map((c) => `${c.name} (${c.formula})`).join('; ')}. Choose one by its SMILES or a fuller name.`, {
    field,
    hint: `e.g. { "smiles": "${choices[0]!.smiles}", "phase": "${phase}" }`,
    details: { name, phase, choices },
  });
}

export function unknownName(name: string, phase: string, suggestions: readonly string[], field: string): ThermoError {
  const closest = suggestions.length ? ` (closest: ${suggestions.join(', ')})` : '';
  return new ThermoError('UNKNOWN_SPECIES', `No compound called "${name}" is known${closest}. Give it by SMILES to have it estimated.`, {
    field,
    hint: suggestions.length ? `did you mean ${suggestions[0]}?` : 'give a SMILES, a formula with its phase, or a CAS-listed name',
    details: { name, phase, suggestions },
  });
}

// The shape of a structure-aware lookup, apart from its implementation, so the engine's hot paths can test for
// it without loading RDKit or the estimators.
import type { SpeciesLookup } from '../species-library';
import type { LibraryPhase } from '../species-types';
import type { Chem } from './chem';

export type SpeciesDefinition =
  | { smiles: string; phase: LibraryPhase; name?: string; estimate?: boolean }
  | { name: string; phase: LibraryPhase; estimate?: boolean }
  | { key: string; estimate?: boolean };

export interface StructureLookup extends SpeciesLookup {
  readonly chem: Chem;
  /** the key a definition stands for, estimating when needed; errors name `field` */
  resolveDefinition(def: SpeciesDefinition, field: string): string;
  /** the same lookup with the request's labels ("EtOAc" → a definition) resolved */
  withLabels(defs: Readonly<Record<string, SpeciesDefinition>>, fieldPrefix?: string): SpeciesLookup;
}

export function isStructureLookup(lookup: SpeciesLookup): lookup is StructureLookup {
  return typeof (lookup as Partial<StructureLookup>).withLabels === 'function';
}

